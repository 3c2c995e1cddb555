// Rg(int) = 0 is a valid part (its gate resistance lumped into the external
// resistor): every path that divided by the gate-side resistance stays finite
// and the gate energy is still all booked.
import { describe, expect, it } from "vitest";
import { parseDesign, type Design, type DesignInput } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { npnQTN3HC, pnpQTP3HC } from "@/models/demoParts";

type PositionInput = DesignInput["positions"][number];

function design(mosfet: Partial<PositionInput["mosfet"]>, drive: PositionInput["drive"], gate: PositionInput["gate"]): Design {
  const input: DesignInput = {
    schemaVersion: 2,
    name: "rg(int) test",
    corners: [{ id: "a", vin: 48, ambient: 25, fsw: 100e3 }],
    controller: { vcc: 12, iq: 0, pin: { sourceResistance: 5, sinkResistance: 2 }, rthJA: 50 },
    positions: [{
      id: "Q1", role: "primary",
      mosfet: { qgs: 17e-9, qgd: 13e-9, qg: 58e-9, vth: 3, vpl: 4.9, rgInt: 1, rds25: 0.01, rthJA: 1, ...mosfet },
      drive, gate,
      conduction: { points: [{ vin: 48, turnOnVds: 48, turnOnId: 10, turnOffVds: 80, turnOffId: 12, iRms: 8, iAvg: 6, duty: 0.5 }] },
    }],
  };
  const r = parseDesign(input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

const gateDriveSum = (d: Design) => evaluateDesign(d).corners[0].parts.reduce((s, p) => s + p.losses.gateDrive, 0);

describe("internal gate resistance of 0 Ω", () => {
  it("is accepted by the schema (a negative one is not)", () => {
    expect(design({ rgInt: 0 }, { kind: "direct" }, { rTurnOn: 2 }).positions[0].mosfet.rgInt).toBe(0);
    expect(() => design({ rgInt: -1 }, { kind: "direct" }, { rTurnOn: 2 })).toThrow(/rgInt/);
  });

  it("series resistances add (KVL): 0 Ω inside + 3 Ω outside drives the gate like 1 Ω + 2 Ω", () => {
    const lumped = evaluateDesign(design({ rgInt: 0 }, { kind: "direct" }, { rTurnOn: 3 })).corners[0];
    const split = evaluateDesign(design({ rgInt: 1 }, { kind: "direct" }, { rTurnOn: 2 })).corners[0];
    const [a, b] = [lumped.positions[0], split.positions[0]];
    expect(a.iOnPeak).toBeCloseTo(b.iOnPeak, 12);
    expect(a.iOffPeak).toBeCloseTo(b.iOffPeak, 12);
    expect(a.turnOn!.energy).toBeCloseTo(b.turnOn!.energy, 15);
    expect(a.turnOff!.energy).toBeCloseTo(b.turnOff!.energy, 15);
    const loss = (c: typeof lumped, id: string) => c.parts.find((p) => p.id === id)!.losses.gateDrive;
    expect(loss(lumped, "Q1")).toBe(0); // nothing burnt inside the switch's gate
    expect(loss(lumped, "Q1.rgOn")).toBeCloseTo(loss(split, "Q1.rgOn") + loss(split, "Q1"), 12);
    expect(loss(lumped, "controller")).toBeCloseTo(loss(split, "controller"), 12);
  });

  it("a self-driven gate with no resistance anywhere still books ΔQ·ΔV·fsw (½·Q·V per edge, closed form)", () => {
    const d = design(
      { rgInt: 0 },
      { kind: "self-driven", winding: { ref: "vout", vHigh: 10, vLow: 0 }, windingResistance: 0 },
      { rTurnOn: 0 },
    );
    const c = evaluateDesign(d).corners[0];
    const p = c.positions[0];
    for (const v of [p.iOnPeak, p.iOffPeak, p.turnOn!.energy, p.turnOff!.energy, c.totalLoss]) expect(Number.isFinite(v)).toBe(true);
    expect(p.gatePower).toBeGreaterThan(0);
    expect(gateDriveSum(d)).toBeCloseTo(p.gatePower, 12);
  });

  it("a bipolar follower straight onto a 0 Ω gate keeps finite numbers and books all of the gate energy", () => {
    const d = design({ rgInt: 0 }, { kind: "bjt-follower", npn: npnQTN3HC, pnp: pnpQTP3HC }, { rTurnOn: 0 });
    const c = evaluateDesign(d).corners[0];
    const p = c.positions[0];
    for (const v of [p.iOnPeak, p.iOffPeak, p.iOnPlateau, c.totalLoss]) expect(Number.isFinite(v)).toBe(true);
    // The follower's drop (supply − gate level) is booked under `buffer`; the ΔQ·ΔV part under gateDrive.
    expect(gateDriveSum(d)).toBeCloseTo(p.gatePower, 12);
  });
});
