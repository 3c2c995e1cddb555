// The drive-path decks of issue #18: a current-limited driver
// (simulation/driveLimited.ts), the zener-referenced clamp on a self-driven
// gate (simulation/clamp.ts) and a forward converter's self-driven off level
// (simulation/windingReset.ts), checked against closed forms of the same
// circuits. These check the decks, not the Heatsplit model.
import { beforeAll, describe, expect, it } from "vitest";
import { BJT_PAIRS } from "@/simulation/bjtCards";
import { extractDatasheet } from "@/simulation/bjtDatasheet";
import { clampAccounted, simulateClamp, type ClampMeasurement } from "@/simulation/clamp";
import { limitBites, simulateLimited, type LimitedCase, type LimitedMeasurement } from "@/simulation/driveLimited";
import { chargeAt, energyOnCurve } from "@/simulation/gateLoad";
import { simulateForwardGate, type ForwardGateMeasurement } from "@/simulation/windingReset";
import { CLAMP_CASES, DATASHEET_CONDITIONS, FORWARD_CASES, LIMITED_CASES, mapLimited } from "./reference-drive-cases";

let limited: Array<{ id: string; c: LimitedCase; m: LimitedMeasurement }>;
let clamp: Array<{ id: string; c: (typeof CLAMP_CASES)[number]["c"]; m: ClampMeasurement }>;
let forward: Array<{ id: string; c: (typeof FORWARD_CASES)[number]["c"]; m: ForwardGateMeasurement }>;
const hfePeak = new Map<string, number>();

beforeAll(async () => {
  limited = await mapLimited(LIMITED_CASES, async ({ id, c }) => ({ id, c, m: await simulateLimited(c) }));
  clamp = await mapLimited(CLAMP_CASES, async ({ id, c }) => ({ id, c, m: await simulateClamp(c) }));
  forward = await mapLimited(FORWARD_CASES, async ({ id, c }) => ({ id, c, m: await simulateForwardGate(c) }));
  for (const family of ["small", "high"] as const) {
    const s = await extractDatasheet(BJT_PAIRS[family].npn, DATASHEET_CONDITIONS[family]);
    hfePeak.set(BJT_PAIRS[family].npn.name, Math.max(...s.hfe.map((p) => p.hfe)));
  }
}, 120_000);

/**
 * Charge-domain closed form of one edge of a limited driver, gate from a to b toward rail v:
 * while limited the current is I_L, so each series R_k takes I_L·R_k·ΔQ and the limiter the rest of
 * ∫(V − v)dQ; after it the loop is resistive and R_k takes R_k/R_total of ∫(V − v)dQ (I²R = (R/Rt)(V − v)·I
 * and I·dt = dQ, exact for any Q(v)).
 */
function edgeSplit(c: LimitedCase, edge: "on" | "off", a: number, b: number) {
  const d = c.driver;
  const [v, rDrv, lim] = edge === "on" ? [d.vHigh, d.rSource, d.sourceLimit] : [d.vLow, d.rSink, d.sinkLimit];
  const rt = rDrv + c.rExt + c.rgInt;
  const work = (x: number, y: number) => -energyOnCurve(c.gate, x, y, v); // ∫(V − v)dQ from x to y
  const vb = limitBites(c, edge) ? v - Math.sign(v - a) * (lim ?? 0) * rt : a;
  const dq1 = Math.abs(chargeAt(c.gate, vb) - chargeAt(c.gate, a));
  const share = (r: number) => (lim !== undefined && vb !== a ? lim * r * dq1 : 0) + (r / rt) * work(vb, b);
  return { rExt: share(c.rExt), rgInt: share(c.rgInt), driver: work(a, b) - share(c.rExt) - share(c.rgInt), limitCharge: dq1, lim };
}

describe("current-limited driver (issue #18 item 2)", () => {
  it("rails = driver + resistors + gate on each edge, within 0.1 % (conservation of energy)", () => {
    for (const { m } of limited) for (const e of ["on", "off"] as const) {
      expect(Math.abs(m.supply[e] - (m.driver[e] + m.rExt[e] + m.rgInt[e] + m.gate[e])) / Math.abs(m.gate.on)).toBeLessThan(1e-3);
    }
  });

  it("each element's energy per edge matches the charge-domain closed form (limit phase, then resistive) within 1 %", () => {
    for (const { id, c, m } of limited) {
      const on = edgeSplit(c, "on", m.vgBottom, m.vgTop), off = edgeSplit(c, "off", m.vgTop, m.vgBottom);
      for (const [edge, s] of [["on", on], ["off", off]] as const) for (const k of ["rExt", "rgInt", "driver"] as const) {
        expect(Math.abs(m[k][edge] / s[k] - 1), `${id} ${edge} ${k}`).toBeLessThan(0.01);
      }
    }
  });

  it("the limit phase lasts ΔQ/I_L (within 2 %), and a limit moves heat from the resistors into the driver", () => {
    for (const { id, c, m } of limited) {
      const on = edgeSplit(c, "on", m.vgBottom, m.vgTop);
      if (limitBites(c, "on")) expect(Math.abs(m.limitTimeOn / (on.limitCharge / on.lim!) - 1), id).toBeLessThan(0.02);
      else expect(m.driverLimit.on / m.driver.on).toBeLessThan(0.01);
    }
    const [free, lim] = [limited.find((x) => x.id === "pin 100nC unlimited")!.m, limited.find((x) => x.id === "pin 100nC 0.5/0.8A")!.m];
    expect(lim.driver.on).toBeGreaterThan(free.driver.on);
    expect(lim.rExt.on).toBeLessThan(free.rExt.on);
  });
});

describe("zener-referenced NPN clamp on a self-driven gate (issue #18 item 1)", () => {
  it("the winding's energy = every element's heat + the gate's, on each window, within 0.1 %", () => {
    for (const { id, m } of clamp) for (const e of ["on", "off"] as const) {
      expect(Math.abs(m.winding[e] - clampAccounted(m, e)) / m.winding.on, `${id} ${e}`).toBeLessThan(1e-3);
    }
  });

  it("the gate sits one VBE below the zener, which sits at BV + Iz·Rs (within 0.15 V)", () => {
    for (const { id, c, m } of clamp) {
      expect(Math.abs(m.vbTop - (c.zener.bv + m.zenerHold * c.zener.rs)), id).toBeLessThan(0.15);
      expect(m.vbTop - m.vgTop).toBeGreaterThan(0.4);
      expect(m.vbTop - m.vgTop).toBeLessThan(0.75);
    }
  });

  it("the clamp burns between (V_winding − V_gs − 1 V)·Q and V_winding·Q on the turn-on (DOMAIN item 6; 1 V for the blocking diode)", () => {
    for (const { id, c, m } of clamp) {
      const q = m.gateCharge.on;
      expect(m.clamp.on, id).toBeGreaterThan((c.vOn - m.vgTop - 1) * q);
      expect(m.clamp.on, id).toBeLessThan(c.vOn * q);
    }
  });

  it("the clamp is a current limit: the gate never gets more than hFE × the current Rz delivers, and at low line under half the resistor-limited plateau current", () => {
    for (const { id, c, m } of clamp) {
      expect(m.igPeak, id).toBeLessThan(hfePeak.get(c.npn.name)! * m.rzCurrentMax);
      if (c.vOn === 18) expect(m.igPeak, id).toBeLessThan((0.5 * (m.vgTop - 5)) / (c.rGate + c.rgInt));
    }
  });

  it("higher line drives the clamp harder: more clamp heat, more gate current, threshold sooner; the high-current pair's junctions on the Rz node make it slower", () => {
    for (const family of ["small", "high"]) {
      const rows = clamp.filter((x) => x.id.startsWith(family)).sort((p, q) => p.c.vOn - q.c.vOn);
      for (let k = 1; k < rows.length; k++) {
        expect(rows[k].m.clamp.on).toBeGreaterThan(rows[k - 1].m.clamp.on);
        expect(rows[k].m.igPeak).toBeGreaterThan(rows[k - 1].m.igPeak);
        expect(rows[k].m.tThreshold).toBeLessThan(rows[k - 1].m.tThreshold);
      }
    }
    for (const { id, m } of clamp.filter((x) => x.id.startsWith("high"))) {
      expect(m.tThreshold).toBeGreaterThan(2 * clamp.find((x) => x.id === id.replace("high", "small"))!.m.tThreshold);
    }
  });
});

describe("forward converter: the self-driven gate's off level (issue #18 item 4)", () => {
  it("volt-second balance closes over the measured period: on·D + off·(1 − D) = 0 within 0.2 % (Erickson & Maksimović 3rd ed., ch. 2)", () => {
    for (const { id, m } of forward) {
      const d = m.dutyMeasured;
      expect(Math.abs(m.windingOnAvg * d + m.windingOffAvg * (1 - d)) / (m.windingOnAvg * d), id).toBeLessThan(2e-3);
      expect(Math.abs(m.windingOffAvg / m.windingOffAvgBefore - 1), `${id} settled`).toBeLessThan(1e-3);
    }
  });

  it("active clamp: the off level is −k·Vin·D/(1 − D) within 1.5 % (the switch node's ~10 ns slew adds 0.2 % of duty) and grows as the line falls", () => {
    const rows = forward.filter((x) => x.c.reset.kind === "active-clamp").sort((p, q) => p.c.vin - q.c.vin);
    for (const { id, c, m } of rows) {
      expect(Math.abs(m.windingOffAvg / ((-c.k * c.vin * c.duty) / (1 - c.duty)) - 1), id).toBeLessThan(0.015);
      expect(Math.abs(m.gateReset / m.resetLevel - 1), `${id} gate follows`).toBeLessThan(0.01);
    }
    for (let k = 1; k < rows.length; k++) expect(rows[k].m.windingOffAvg).toBeGreaterThan(rows[k - 1].m.windingOffAvg);
  });

  // The reset time is read between the winding's crossings of half its reset level; the critically
  // damped switch node takes some 30 ns to come back after the diode stops, 3 % of a 1 µs reset: 5 %.
  it("reset winding: −k·(Vin + Vf)·Np/Nr (Vf ≤ 1.5 V) whatever the duty, for D·T·Nr/Np (within 5 %)", () => {
    const rows = forward.filter((x) => x.c.reset.kind === "reset-winding");
    for (const { id, c, m } of rows) {
      const n = c.reset.kind === "reset-winding" ? c.reset.turnsRatio : NaN;
      expect(m.resetLevel, id).toBeLessThan((-c.k * c.vin) / n);
      expect(m.resetLevel, id).toBeGreaterThan((-c.k * (c.vin + 1.5)) / n);
      expect(Math.abs(m.resetTime / ((c.duty / c.fsw) * n) - 1), id).toBeLessThan(0.05);
    }
    expect(Math.abs(rows[0].m.resetLevel / rows[1].m.resetLevel - 1)).toBeLessThan(0.01);
  });
});
