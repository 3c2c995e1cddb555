import { describe, expect, it } from "vitest";
import { chargeAt, qgs2, scaleCurve, swingCharge } from "@/models/gateCharge";
import { gateDrivePower, splitByResistance } from "@/models/gatePower";
import { parseDesign, type DesignInput } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";

const curve = { qgs: 17e-9, qgd: 13e-9, qg: 58e-9, qgVgs: 10, vth: 3, vpl: 4.9 };

describe("gate charge curve (DOMAIN item 1)", () => {
  it("is linear to Vpl, flat by Qgd on the plateau, linear above to Qg(qgVgs)", () => {
    // Worked by hand: above the plateau the slope is (58 − 30) nC / (10 − 4.9) V.
    expect(chargeAt(curve, 2.45)).toBeCloseTo(8.5e-9, 15);
    expect(chargeAt(curve, 4.9)).toBeCloseTo(17e-9, 15);
    expect(chargeAt(curve, 4.9001)).toBeCloseTo(30e-9 + (28e-9 / 5.1) * 1e-4, 15);
    expect(chargeAt(curve, 10)).toBeCloseTo(58e-9, 15);
    expect(chargeAt(curve, 12)).toBeCloseTo(30e-9 + (28e-9 / 5.1) * 7.1, 15);
  });

  it("uses Ciss below 0 V, default Qgs/Vpl", () => {
    expect(chargeAt(curve, -5)).toBeCloseTo((-5 * 17e-9) / 4.9, 15);
    expect(chargeAt({ ...curve, ciss: 3e-9 }, -5)).toBeCloseTo(-15e-9, 15);
    expect(swingCharge({ ...curve, ciss: 3e-9 }, 12, -5)).toBeCloseTo(30e-9 + (28e-9 / 5.1) * 7.1 + 15e-9, 15);
  });

  it("Qgs2 is the charge from Vth to Vpl and scaleCurve scales every charge", () => {
    expect(qgs2(curve)).toBeCloseTo((17e-9 * 1.9) / 4.9, 15);
    expect(swingCharge(scaleCurve(curve, 2), 12, 0)).toBeCloseTo(2 * swingCharge(curve, 12, 0), 15);
  });
});

describe("gate-drive power and its split (DOMAIN items 2–3)", () => {
  it("P = ΔQ·ΔV·fsw", () => {
    expect(gateDrivePower({ deltaQ: 47e-9, vHigh: 12, vLow: -3, fsw: 250e3 })).toBeCloseTo(47e-9 * 15 * 250e3, 12);
  });

  it("closed form: a linear C charged through series resistors burns ½CV² in them, split by ratio, whatever R", () => {
    // Independent check: integrate the RC charge numerically and sum i²·R per resistor.
    for (const rs of [[5, 2.2, 1], [0.5, 10, 0.1], [1, 1, 1]]) {
      const C = 5e-9;
      const V = 12;
      const rTot = rs.reduce((a, b) => a + b, 0);
      const tau = rTot * C;
      const dt = tau / 4000;
      let vc = 0;
      const e = rs.map(() => 0);
      for (let t = 0; t < 25 * tau; t += dt) {
        const i = (V - vc) / rTot;
        rs.forEach((r, k) => (e[k] += i * i * r * dt));
        vc += (i * dt) / C;
      }
      const split = splitByResistance(0.5 * C * V * V, { a: rs[0], b: rs[1], c: rs[2] });
      expect(e.reduce((a, b) => a + b, 0) / (0.5 * C * V * V)).toBeCloseTo(1, 3);
      expect(e[0] / split.a).toBeCloseTo(1, 3);
      expect(e[1] / split.b).toBeCloseTo(1, 3);
      expect(e[2] / split.c).toBeCloseTo(1, 3);
    }
  });

  it("the full model books exactly C·V²·fsw for a linear gate, split by resistance per edge", () => {
    const C = 4e-9;
    const input: DesignInput = {
      schemaVersion: 2,
      name: "linear gate",
      corners: [{ id: "a", vin: 48, ambient: 25, fsw: 200e3 }],
      controller: { vcc: 12, iq: 0, pin: { sourceResistance: 6, sinkResistance: 3 }, rthJA: 50 },
      positions: [{
        id: "Q1", role: "primary",
        // Linear Q(V) = C·V: Qgs = C·Vpl, no plateau, Qg = C·qgVgs, Ciss = C.
        mosfet: { qgs: C * 4, qgd: 0, qg: C * 10, qgVgs: 10, vth: 3, vpl: 4, ciss: C, rgInt: 1, rds25: 0.01, rthJA: 30 },
        drive: { kind: "direct" }, gate: { rTurnOn: 2, rTurnOff: 0.5 },
        conduction: { switching: "zvs", points: [{ vin: 48, turnOnVds: 0, turnOnId: 0, turnOffVds: 0, turnOffId: 0, iRms: 0, iAvg: 0, duty: 0.5 }] },
      }],
    };
    const r = parseDesign(input);
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    const c = evaluateDesign(r.design).corners[0];
    const by = (id: string) => c.parts.find((p) => p.id === id)!.losses.gateDrive;
    const half = 0.5 * C * 144 * 200e3;
    expect(by("controller") + by("Q1") + by("Q1.rgOn") + by("Q1.rgOff")).toBeCloseTo(2 * half, 12);
    expect(by("controller")).toBeCloseTo(half * (6 / 9) + half * (3 / 4.5), 12);
    expect(by("Q1.rgOn")).toBeCloseTo(half * (2 / 9), 12);
    expect(by("Q1.rgOff")).toBeCloseTo(half * (0.5 / 4.5), 12);
    expect(by("Q1")).toBeCloseTo(half * (1 / 9) + half * (1 / 4.5), 12);
  });
});
