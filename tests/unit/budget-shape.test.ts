import { describe, expect, it } from "vitest";
import { parseDesign, type Design } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { demoOptions } from "@/models/demo";
import { LOSS_MECHANISMS } from "@/models/losses";
import { controllerByCorner, editorHref, elementWords, junctionRows, junctionStatus, lossBarData, NEAR_LIMIT_BAND_K, warningsFor } from "@/components/budget/shape";
import { driveChainBill } from "@/components/budget/bill";
import fc from "fast-check";
import { knobEdits, knobTargets, readKnobs, trialIssues, withEdits } from "@/components/budget/trialEdits";

function design(i: number): Design {
  const r = parseDesign(demoOptions[i].input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

describe("lossBarData", () => {
  const ev = evaluateDesign(design(0));
  const corner = ev.corners[0];
  const { rows, keys } = lossBarData(corner);

  it("has one bar per part with loss, in the model's part order", () => {
    const withLoss = corner.parts.filter((p) => p.total > 0).map((p) => p.id);
    expect(rows.map((r) => r.part)).toEqual(withLoss);
    expect(rows.length).toBeGreaterThan(1);
  });

  it("stacks only mechanisms that carry loss, and the stack adds up to the part total", () => {
    expect(keys.length).toBeGreaterThan(0);
    expect(keys).toEqual(LOSS_MECHANISMS.filter((m) => keys.includes(m)));
    for (const r of rows) {
      const sum = keys.reduce((s, k) => s + (r[k] ?? 0), 0);
      expect(sum).toBeCloseTo(r.total, 12);
    }
    for (const k of keys) expect(rows.some((r) => (r[k] ?? 0) > 0)).toBe(true);
  });
});

describe("junctions and the controller", () => {
  const ev = evaluateDesign(design(0));
  it("sorts junctions tightest first and classifies margins", () => {
    const rows = junctionRows(ev.corners[0]);
    const margins = rows.map((r) => r.margin ?? -Infinity);
    expect([...margins].sort((a, b) => a - b)).toEqual(margins);
    expect(junctionStatus({ runaway: false, tj: 100, tjMax: 150, limit: 125, margin: 25 })).toBe("ok");
    expect(junctionStatus({ runaway: false, tj: 120, tjMax: 150, limit: 125, margin: NEAR_LIMIT_BAND_K - 5 })).toBe("close");
    expect(junctionStatus({ runaway: false, tj: 130, tjMax: 150, limit: 125, margin: -5 })).toBe("over");
    expect(junctionStatus({ runaway: true, tjMax: 150, limit: 125 })).toBe("over");
  });

  it("splits the controller loss into quiescent and pin gate drive, summing to its total", () => {
    const all = controllerByCorner(ev);
    expect(all).toHaveLength(ev.corners.length);
    for (const c of all) {
      expect(c.quiescent + c.gateDrive + c.other).toBeCloseTo(c.total, 12);
      expect(c.quiescent).toBeGreaterThan(0);
    }
  });

  it("moves gate-drive heat out of the controller when a buffer drives the gate", () => {
    const direct = controllerByCorner(evaluateDesign(design(0)))[0];
    const others = demoOptions.slice(1).map((_, i) => controllerByCorner(evaluateDesign(design(i + 1)))[0]);
    expect(others.some((o) => o.gateDrive < direct.gateDrive)).toBe(true);
  });
});

describe("links and words", () => {
  it("points the editor at the element", () => {
    expect(editorHref({ projectId: "p1", optionId: "o1", element: "positions.0.gate.rTurnOn" })).toBe(
      "/projects/p1/options/o1?element=positions.0.gate.rTurnOn#positions.0.gate.rTurnOn",
    );
    expect(elementWords("positions.1.drive.npn.hfe", ["Q1", "SR1"])).toBe("SR1 · drive · npn · hfe");
    expect(elementWords("controller.vcc", [])).toBe("controller · vcc");
  });

  it("splits warnings by corner, errors first", () => {
    const ev = evaluateDesign(design(0));
    const cid = ev.corners[0].cornerId;
    const { here, elsewhere } = warningsFor(ev, cid);
    expect(here.length + elsewhere.length).toBe(ev.warnings.length);
    expect(here.every((w) => w.cornerId === cid)).toBe(true);
    const rank = { error: 0, warning: 1, info: 2 };
    expect(here.map((w) => rank[w.severity])).toEqual([...here.map((w) => rank[w.severity])].sort());
  });
});

describe("what-if knobs", () => {
  const d = design(0);
  const doc = demoOptions[0].input;
  const t = knobTargets(d, 0);

  it("applies fsw as one factor and the ambient as one shift over every corner", () => {
    const k = readKnobs(d, t);
    const next = withEdits(doc, knobEdits(d, t, { ...k, fsw: k.fsw * 2, ambient: k.ambient - 10 }));
    const parsed = parseDesign(next);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    parsed.design.corners.forEach((c, i) => {
      expect(c.fsw).toBeCloseTo(d.corners[i].fsw * 2, 6);
      expect(c.ambient).toBeCloseTo(d.corners[i].ambient - 10, 9);
    });
    expect(parsed.design.positions[0].gate).toEqual(d.positions[0].gate);
  });

  it("keeps the on/off resistor ratio and leaves the original document untouched", () => {
    const k = readKnobs(d, t);
    const before = JSON.stringify(doc);
    const next = withEdits(doc, knobEdits(d, t, { ...k, rOn: (k.rOn ?? 1) * 2 }));
    expect(JSON.stringify(doc)).toBe(before);
    const parsed = parseDesign(next);
    if (!parsed.ok) throw new Error("does not parse");
    const g = parsed.design.positions[0].gate;
    expect(g.rTurnOn).toBeCloseTo((k.rOn ?? 1) * 2, 9);
    if (d.positions[0].gate.rTurnOff !== undefined) expect(g.rTurnOff! / g.rTurnOn).toBeCloseTo(d.positions[0].gate.rTurnOff / d.positions[0].gate.rTurnOn, 9);
  });

  it("changes the evaluated numbers", () => {
    const k = readKnobs(d, t);
    const next = parseDesign(withEdits(doc, knobEdits(d, t, { ...k, fsw: k.fsw * 1.5 })));
    if (!next.ok) throw new Error("does not parse");
    expect(evaluateDesign(next.design).corners[0].totalLoss).toBeGreaterThan(evaluateDesign(d).corners[0].totalLoss);
  });
});

describe("what-if trial without parsing in the browser", () => {
  // The dashboard writes the knobs' edits into the parsed design and checks
  // trialIssues(edits) instead of parsing the edited document; both must agree with the
  // schema for any knob values, in range or not.
  const factor = fc.oneof(fc.double({ min: 0.2, max: 5, noNaN: true }), fc.constantFrom(0, -1, 1e6, 1e-9));
  const shift = fc.oneof(fc.double({ min: -40, max: 40, noNaN: true }), fc.constantFrom(-500, 300));

  it.each(demoOptions.map((o, i) => [o.key, i] as const))("%s: valid exactly when the schema accepts, and equal to the parse", (_key, i) => {
    const d = design(i);
    fc.assert(
      fc.property(fc.nat({ max: d.positions.length - 1 }), factor, shift, factor, factor, (pos, fk, dT, rk, vk) => {
        const t = knobTargets(d, pos);
        const k = readKnobs(d, t);
        const knobs = {
          fsw: k.fsw * fk,
          ambient: k.ambient + dT,
          rOn: k.rOn === null ? null : k.rOn === 0 ? rk : k.rOn * rk,
          driveVoltage: k.driveVoltage === null ? null : k.driveVoltage * vk,
        };
        const edits = knobEdits(d, t, knobs);
        const parsed = parseDesign(withEdits(demoOptions[i].input, edits));
        const issues = trialIssues(edits);
        expect(issues.length === 0).toBe(parsed.ok);
        if (parsed.ok) expect(withEdits(d, edits)).toEqual(parsed.design);
        else expect(issues.join(" ")).toContain(parsed.issues[0].path);
      }),
      { numRuns: 150, seed: 20261202 },
    );
  });
});

describe("driveChainBill", () => {
  it("counts every part of the chain and sums the given costs", () => {
    const d = design(0);
    const bill = driveChainBill(d);
    const mosfets = d.positions.reduce((s, p) => s + p.mosfet.count, 0);
    expect(bill.partCount).toBeGreaterThanOrEqual(1 + mosfets);
    const floor = (d.controller.cost ?? 0) + d.positions.reduce((s, p) => s + (p.mosfet.cost ?? 0) * p.mosfet.count, 0);
    expect(bill.cost).toBeGreaterThanOrEqual(floor);
    expect(bill.cost).toBeGreaterThan(0);
  });
});
