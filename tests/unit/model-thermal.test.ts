import { describe, expect, it } from "vitest";
import { singlePartFixedPoint, solveNetwork } from "@/models/thermal";
import { parseDesign, type Design, type DesignInput } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";

function conductionOnly({ iRms, rthJA, ambient = 40 }: { iRms: number; rthJA: number; ambient?: number }): Design {
  const input: DesignInput = {
    schemaVersion: 2,
    name: "thermal test",
    corners: [{ id: "a", vin: 48, ambient, fsw: 1000 }],
    controller: { vcc: 12, iq: 0.005, pin: { sourceResistance: 5, sinkResistance: 2 }, rthJA: 80 },
    positions: [{
      id: "Q1", role: "other",
      mosfet: { qgs: 10e-9, qgd: 5e-9, qg: 30e-9, vth: 3, vpl: 4.5, rds25: 0.01, rdsHot: 0.018, tHot: 125, rthJA },
      drive: { kind: "direct" }, gate: { rTurnOn: 0 },
      conduction: { switching: "zvs", points: [{ vin: 48, turnOnVds: 0, turnOnId: 0, turnOffVds: 0, turnOffId: 0, iRms, iAvg: 0, duty: 0.5 }] },
    }],
  };
  const r = parseDesign(input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

describe("electro-thermal fixed point (DOMAIN item 11)", () => {
  it("closed form T = (Ta + Θ(P0 − kT0))/(1 − Θk) matches the Newton iteration", () => {
    // P(T) = I²·(R25 + s·(T − 25)), I = 10 A, R25 = 10 mΩ, s = 80 µΩ/K, Θ = 40 K/W.
    const I2 = 100;
    const s = 0.008 / 100;
    const out = new Float64Array(1);
    const ok = solveNetwork({
      n: 1, ambient: 40, theta: [40],
      lossAt: (_i, t) => I2 * (0.01 + s * (t - 25)), slopeAt: () => I2 * s,
    }, out);
    const closed = singlePartFixedPoint({ ambient: 40, theta: 40, p0: I2 * 0.01, k: I2 * s, t0: 25 });
    expect(ok).toBe(true);
    expect(closed.runaway).toBe(false);
    if (!closed.runaway) {
      // By hand: Θk = 0.32, T = (40 + 40·(1 − 0.008·25))/(0.68) = 105.88 °C.
      expect(closed.tj).toBeCloseTo((40 + 40 * (1 - 0.2)) / 0.68, 12);
      expect(out[0]).toBeCloseTo(closed.tj, 9);
    }
  });

  it("the evaluated MOSFET junction equals the closed form", () => {
    const d = conductionOnly({ iRms: 10, rthJA: 40 });
    const q = evaluateDesign(d).corners[0].parts.find((p) => p.id === "Q1")!;
    // The small Rg(int) share of the gate drive is a constant loss on top of I²·Rds(T).
    const closed = singlePartFixedPoint({ ambient: 40, theta: 40, p0: 100 * 0.01 + q.losses.gateDrive, k: 100 * 0.00008, t0: 25 });
    if (q.junction!.runaway || closed.runaway) throw new Error("unexpected runaway");
    expect(q.junction!.tj).toBeCloseTo(closed.tj, 9);
  });

  it("reports runaway with no temperature number when Θ·dP/dT ≥ 1", () => {
    // k = I²·s = 400·8e-5 = 0.032 W/K, Θ = 40 K/W -> loop gain 1.28.
    expect(singlePartFixedPoint({ ambient: 40, theta: 40, p0: 4, k: 0.032, t0: 25 })).toEqual({ runaway: true });
    const e = evaluateDesign(conductionOnly({ iRms: 20, rthJA: 40 }));
    const q = e.corners[0].parts.find((p) => p.id === "Q1")!;
    expect(q.junction).toMatchObject({ runaway: true });
    expect(q.junction && "tj" in q.junction).toBe(false);
    expect(Number.isFinite(q.total)).toBe(true);
    expect(e.runaway).toBe(true);
    expect(e.warnings.some((w) => w.code === "thermal-runaway" && w.partId === "Q1" && w.element === "positions.0.mosfet.rthJA")).toBe(true);
    // The uncoupled controller still has a temperature.
    expect(e.corners[0].parts.find((p) => p.id === "controller")!.junction).toMatchObject({ runaway: false });
  });

  it("a coupled network with constant losses is T = Ta + Θ·P (by hand)", () => {
    const out = new Float64Array(2);
    const P = [1, 2];
    solveNetwork({ n: 2, ambient: 25, theta: [50, 10, 10, 20], lossAt: (i) => P[i], slopeAt: () => 0 }, out);
    expect(out[0]).toBeCloseTo(25 + 50 * 1 + 10 * 2, 12);
    expect(out[1]).toBeCloseTo(25 + 10 * 1 + 20 * 2, 12);
  });

  it("a coupled pair runs away when ρ(Θ·dP/dT) ≥ 1 even if each part alone would not", () => {
    // Each alone: gain 0.6; coupled with Θ12 = 30: ρ = (30 + 30)·0.02 = 1.2.
    const out = new Float64Array(2);
    const ok = solveNetwork({ n: 2, ambient: 25, theta: [30, 30, 30, 30], lossAt: (_i, t) => 0.02 * t, slopeAt: () => 0.02 }, out);
    expect(ok).toBe(false);
  });

  it("the exponential Rds model converges to a point that satisfies T = Ta + Θ·P(T)", () => {
    const d = conductionOnly({ iRms: 10, rthJA: 40 });
    d.positions[0].mosfet.rdsModel = "exponential";
    const c = evaluateDesign(d).corners[0];
    const q = c.parts.find((p) => p.id === "Q1")!;
    if (q.junction!.runaway) throw new Error("unexpected runaway");
    expect(q.junction!.tj).toBeCloseTo(40 + 40 * q.total, 9);
  });
});
