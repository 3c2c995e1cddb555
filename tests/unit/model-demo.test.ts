import { describe, expect, it } from "vitest";
import { parseDesign } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { demoFollowerHighCurrent, demoOptions, demoParts } from "@/models/demo";
import { designBom } from "@/models/bom";

describe("demo options (invented HX-240 converter)", () => {
  it("has the five options, invented parts with costs", () => {
    expect(demoOptions.map((o) => o.key)).toEqual(["direct", "bjt-small", "driver-ic", "transformer", "self-driven-sr"]);
    for (const p of demoParts) expect(p.unitCostUsd).toBeGreaterThan(0);
  });

  it.each([...demoOptions, demoFollowerHighCurrent].map((o) => [o.key, o] as const))("%s parses and evaluates without runaway, plausible totals", (_k, o) => {
    const r = parseDesign(o.input);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const e = evaluateDesign(r.design);
    expect(e.runaway).toBe(false);
    for (const c of e.corners) {
      // A 240 W brick at 93–96 % loses 10–17 W in total; the switches and their drive are a
      // large part of it (common practice): expect 3–20 W modelled at full load, less at 20 %.
      if (c.loadFraction === 1) {
        expect(c.totalLoss).toBeGreaterThan(3);
        expect(c.totalLoss).toBeLessThan(20);
        expect(c.efficiency!).toBeGreaterThan(0.9);
      } else expect(c.totalLoss).toBeLessThan(c.outputPower! * 0.1);
      for (const p of c.parts) if (p.junction && !p.junction.runaway) expect(p.junction.tj).toBeLessThan(p.junction.tjMax);
    }
    expect(designBom(r.design).unpriced).toEqual([]);
  });

  it("tells the story: the controller is hottest on direct drive, the clamp is needed at 75 V", () => {
    const ev = (key: string) => {
      const r = parseDesign(demoOptions.find((o) => o.key === key)!.input);
      if (!r.ok) throw new Error(key);
      return evaluateDesign(r.design);
    };
    const ctlTj = (key: string) => {
      const j = ev(key).parts.find((p) => p.id === "controller")!.junction!;
      return j.runaway ? Infinity : j.tj;
    };
    expect(ctlTj("direct")).toBeGreaterThan(ctlTj("driver-ic") + 10);
    const self = ev("self-driven-sr");
    const vmax = self.corners.find((c) => c.cornerId === "vmax")!;
    expect(vmax.positions.find((p) => p.positionId === "SR1")!.vHigh).toBeLessThan(0.8 * 20);
    expect(vmax.parts.find((p) => p.id === "SR1.clamp")!.losses.clamp).toBeGreaterThan(0);
  });
});
