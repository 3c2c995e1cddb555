import { describe, expect, it } from "vitest";
import { acCoupledLevels, followerCurrent, hfeAt } from "@/models/driveStage";
import { chargeAt } from "@/models/gateCharge";
import { parseDesign, type Design, type DesignInput } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";

type PositionInput = DesignInput["positions"][number];

function build(drive: PositionInput["drive"], over: { vin?: number; duty?: number; gate?: PositionInput["gate"] } = {}): Design {
  const vin = over.vin ?? 48;
  const input: DesignInput = {
    schemaVersion: 2,
    name: "drive test",
    corners: [{ id: "a", vin, ambient: 25, fsw: 100e3 }],
    controller: { vcc: 12, iq: 0, pin: { sourceResistance: 10, sinkResistance: 5 }, rthJA: 100 },
    positions: [{
      id: "Q1", role: "synchronous-rectifier",
      mosfet: { qgs: 10e-9, qgd: 8e-9, qg: 40e-9, vth: 2.5, vpl: 4, rgInt: 1, rds25: 0.005, rthJA: 40, vgsMax: 20 },
      drive, gate: over.gate ?? { rTurnOn: 2 },
      conduction: { switching: "zvs", points: [{ vin, turnOnVds: 0, turnOnId: 0, turnOffVds: 0, turnOffId: 0, iRms: 0, iAvg: 0, duty: over.duty ?? 0.4 }] },
    }],
  };
  const r = parseDesign(input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

const curve = { qgs: 10e-9, qgd: 8e-9, qg: 40e-9, qgVgs: 10, vth: 2.5, vpl: 4 };
const pts = [{ ic: 0.01, hfe: 160 }, { ic: 0.15, hfe: 130 }, { ic: 1, hfe: 15 }, { ic: 2, hfe: 5 }];

describe("hFE(Ic) interpolation", () => {
  it("is linear in log(Ic) between points, flat below, falls on past the last point, never below 1", () => {
    expect(hfeAt(pts, Math.sqrt(0.01 * 0.15))).toBeCloseTo(145, 9);
    expect(hfeAt(pts, 0.001)).toBe(160);
    // Last segment falls by 10 per factor 2 in Ic: at 2·2^¼ A it is 2.5, at 2·√2 A it would be 0 -> floor 1.
    expect(hfeAt(pts, 2 * Math.pow(2, 0.25))).toBeCloseTo(2.5, 9);
    expect(hfeAt(pts, 2 * Math.SQRT2)).toBe(1);
    expect(hfeAt(pts, 1.5)).toBeLessThan(15);
  });

  it("follower current solves Ie = V/(Rb/(hFE+1) + Rg) with hFE at that current", () => {
    const f = followerCurrent({ vAvail: 8, rBase: 10, rGate: 3, pinLimit: 1, points: pts });
    const h = hfeAt(pts, f.current);
    expect(f.current).toBeCloseTo(8 / (10 / (h + 1) + 3), 6);
    expect(f.current).toBeLessThan(f.nominal);
  });
});

describe("emitter-follower buffer (DOMAIN item 4)", () => {
  const bjt = (vbe: number) => ({ hfe: [{ ic: "10 mA", hfe: 100 }], vbe: `${vbe} V`, icMax: "3 A", pMax: "0.5 W", rthJA: "250 K/W" });

  it("swings the gate to V+ − VBE and V− + VBE and burns VBE·ΔQ·fsw in each transistor", () => {
    const d = build({ kind: "bjt-follower", npn: bjt(0.8), pnp: bjt(0.7) });
    const c = evaluateDesign(d).corners[0];
    const pos = c.positions[0];
    expect(pos.vHigh).toBeCloseTo(11.2, 12);
    expect(pos.vLow).toBeCloseTo(0.7, 12);
    const dq = chargeAt(curve, 11.2) - chargeAt(curve, 0.7);
    const npn = c.parts.find((p) => p.id === "Q1.npn")!;
    const pnp = c.parts.find((p) => p.id === "Q1.pnp")!;
    expect(npn.losses.buffer).toBeCloseTo(0.8 * dq * 100e3, 12);
    expect(pnp.losses.buffer).toBeCloseTo(0.7 * dq * 100e3, 12);
    // Energy balance: everything the rails deliver, ΔQ·(Vcc − 0)·fsw, is burnt somewhere.
    const drive = c.parts.reduce((s, p) => s + p.losses.gateDrive + p.losses.buffer, 0);
    expect(drive).toBeCloseTo(dq * 12 * 100e3, 12);
  });
});

describe("AC-coupled gate transformer (DOMAIN item 5)", () => {
  it("closed form: volt-second balance gives +nV(1−D) and −nV·D", () => {
    for (const duty of [0.1, 0.3, 0.5, 0.7]) {
      const { vHigh, vLow } = acCoupledLevels({ vPrimary: 12, turnsRatio: 1.5, duty });
      expect(vHigh).toBeCloseTo(18 * (1 - duty), 12);
      expect(vLow).toBeCloseTo(-18 * duty, 12);
      expect(vHigh * duty + vLow * (1 - duty)).toBeCloseTo(0, 12); // zero average winding voltage
      expect(vHigh - vLow).toBeCloseTo(18, 12);
    }
  });

  it("positive drive shrinks as the duty grows; a DC-restored winding holds its rails", () => {
    const ac = (duty: number) =>
      evaluateDesign(build({ kind: "transformer", mode: "ac-coupled", turnsRatio: 1.5 }, { duty })).corners[0].positions[0].vHigh;
    expect(ac(0.6)).toBeLessThan(ac(0.3));
    const dc = build({ kind: "transformer", mode: "dc-restored", turnsRatio: 1.5, vPos: "12 V", vNeg: "-5 V" }, { duty: 0.6 });
    const p = evaluateDesign(dc).corners[0].positions[0];
    expect([p.vHigh, p.vLow]).toEqual([12, -5]);
  });
});

describe("self-driven SR with zener clamp (DOMAIN item 6)", () => {
  const winding = { ref: "vin" as const, k: 0.25 };

  it("follows k·Vin without a clamp", () => {
    expect(evaluateDesign(build({ kind: "self-driven", winding }, { vin: 72 })).corners[0].positions[0].vHigh).toBeCloseTo(18, 12);
  });

  it("clamps to Vz − VBE and burns (Vwinding − Vgs)·ΔQ·fsw plus the zener bias power", () => {
    const clamp = { zenerVoltage: "12 V", zenerBiasCurrent: "2 mA", vbe: "0.7 V", rthJA: "300 K/W" };
    const d = build({ kind: "self-driven", winding, clamp }, { vin: 72, duty: 0.3 });
    const c = evaluateDesign(d).corners[0];
    expect(c.positions[0].vHigh).toBeCloseTo(11.3, 12);
    const dq = chargeAt(curve, 11.3) - chargeAt(curve, 0);
    expect(c.parts.find((p) => p.id === "Q1.clamp")!.losses.clamp).toBeCloseTo((18 - 11.3) * dq * 100e3, 12);
    expect(c.parts.find((p) => p.id === "Q1.zener")!.losses.clamp).toBeCloseTo(18 * 2e-3 * 0.3, 12);
  });
});
