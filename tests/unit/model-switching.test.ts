import { describe, expect, it } from "vitest";
import { eossAt, hardEdge } from "@/models/switching";
import { channelLoss, deadTimeLoss, diodeLoss, rdsAt } from "@/models/conduction";
import { parseDesign, type Design, type DesignInput } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";

function oneSwitchInput(over: Partial<DesignInput["positions"][number]["conduction"]> = {}): DesignInput {
  return {
    schemaVersion: 2,
    name: "switching test",
    corners: [{ id: "a", vin: 48, ambient: 25, fsw: 100e3 }],
    controller: { vcc: 12, iq: 0, pin: { sourceResistance: 5, sinkResistance: 2 }, rthJA: 50 },
    positions: [{
      id: "Q1", role: "primary",
      mosfet: { qgs: 17e-9, qgd: 13e-9, qg: 58e-9, vth: 3, vpl: 4.9, rgInt: 1, rds25: 0.01, rdsHot: 0.017, tHot: 125, rthJA: 1,
        outputCapacitance: { vds: 75, eoss: 1.6e-6 }, vsd: 0.85, rDiode: 0.01 },
      drive: { kind: "direct" }, gate: { rTurnOn: 2 },
      conduction: { points: [{ vin: 48, turnOnVds: 48, turnOnId: 10, turnOffVds: 80, turnOffId: 12, iRms: 8, iAvg: 6, duty: 0.5 }], opposingQrr: 50e-9, ...over },
    }],
  };
}

function oneSwitch(over: Partial<DesignInput["positions"][number]["conduction"]> = {}): Design {
  const r = parseDesign(oneSwitchInput(over));
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

describe("hard-switching edges, clamped inductive load (Erickson & Maksimović 3rd ed. ch. 4; Mohan et al. 3rd ed. ch. 2)", () => {
  it("worked number: t_i = Qgs2/I, t_v = Qgd/I, E = ½·V·I·(t_i + t_v)", () => {
    const e = hardEdge({ vds: 48, id: 10, iGate: 1, qgd: 10e-9, qgs2: 3e-9, fsw: 100e3 });
    expect(e.ti).toBeCloseTo(3e-9, 18);
    expect(e.tv).toBeCloseTo(10e-9, 18);
    expect(e.energy).toBeCloseTo(0.5 * 48 * 10 * 13e-9, 15); // 3.12 µJ
    expect(e.capped).toBe(false);
  });

  it("the evaluated design reproduces hand-computed edge losses", () => {
    const c = evaluateDesign(oneSwitch()).corners[0];
    const q = c.parts.find((p) => p.id === "Q1")!;
    // By hand: I_on = (12 − 4.9)/(5 + 2 + 1) = 0.8875 A, I_off = 4.9/(2 + 2 + 1) = 0.98 A,
    // Qgs2 = 17 nC·(4.9 − 3)/4.9 = 6.5918 nC.
    const qgs2 = (17e-9 * 1.9) / 4.9;
    const tOn = (qgs2 + 13e-9) / 0.8875;
    const tOff = (qgs2 + 13e-9) / 0.98;
    expect(q.losses.turnOn).toBeCloseTo(0.5 * 48 * 10 * tOn * 100e3, 9);
    expect(q.losses.turnOff).toBeCloseTo(0.5 * 80 * 12 * tOff * 100e3, 9);
    // Eoss ∝ V^1.5 from 1.6 µJ at 75 V; Qrr·V of the commutated diode.
    expect(q.losses.coss).toBeCloseTo(1.6e-6 * Math.pow(48 / 75, 1.5) * 100e3, 9);
    expect(q.losses.reverseRecovery).toBeCloseTo(50e-9 * 48 * 100e3, 9);
    expect(c.positions[0].turnOn!.ti + c.positions[0].turnOn!.tv).toBeCloseTo(tOn, 15);
  });

  it("ZVS drops the turn-on terms and keeps turn-off", () => {
    const q = evaluateDesign(oneSwitch({ switching: "zvs" })).corners[0].parts.find((p) => p.id === "Q1")!;
    expect([q.losses.turnOn, q.losses.coss, q.losses.reverseRecovery]).toEqual([0, 0, 0]);
    expect(q.losses.turnOff).toBeGreaterThan(0);
  });

  it("Eoss from Qoss or Coss assumes Coss ∝ V^−½ (E = QV/3, E = ⅔·C·V²)", () => {
    expect(eossAt({ vds: 50, qoss: 30e-9 }, 50)).toBeCloseTo((30e-9 * 50) / 3, 15);
    expect(eossAt({ vds: 50, coss: 600e-12 }, 50)).toBeCloseTo((2 / 3) * 600e-12 * 2500, 15);
  });
});

describe("output capacitance given as several datasheet figures", () => {
  const withOc = (oc: Record<string, unknown>) => {
    const input = JSON.parse(JSON.stringify(oneSwitchInput()));
    input.positions[0].mosfet.outputCapacitance = oc;
    return parseDesign(input);
  };
  const evaluated = (oc: Record<string, unknown>) => {
    const r = withOc(oc);
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    return evaluateDesign(r.design).corners[0];
  };
  const cossLoss = (c: ReturnType<typeof evaluated>) => c.parts.find((p) => p.id === "Q1")!.losses.coss;

  it("uses Eoss when all three are given, and says so", () => {
    const all = evaluated({ vds: "75 V", eoss: "1.6 µJ", qoss: "60 nC", coss: "400 pF" });
    expect(cossLoss(all)).toBeCloseTo(cossLoss(evaluated({ vds: "75 V", eoss: "1.6 µJ" })), 15);
    expect(all.positions[0].outputCapacitance).toEqual({ figure: "eoss", reason: expect.stringMatching(/Qoss and Coss also given/) });
  });

  it("falls back to Qoss before Coss, and to Coss alone", () => {
    const qc = evaluated({ vds: "50 V", qoss: "30 nC", coss: "600 pF" });
    expect(cossLoss(qc)).toBeCloseTo(((30e-9 * 50) / 3) * Math.pow(48 / 50, 1.5) * 100e3, 9);
    expect(qc.positions[0].outputCapacitance?.figure).toBe("qoss");
    expect(qc.positions[0].outputCapacitance?.reason).toMatch(/no Eoss given/);
    expect(evaluated({ vds: "50 V", coss: "600 pF" }).positions[0].outputCapacitance?.figure).toBe("coss");
  });

  it("refuses a test voltage with no figure, in plain words", () => {
    const r = withOc({ vds: "75 V" });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues).toContainEqual({ path: "positions.0.mosfet.outputCapacitance.eoss", message: "give at least one of Eoss, Qoss or Coss at the test voltage" });
  });

  it("reports no figure for a MOSFET without an output-capacitance block", () => {
    const input = JSON.parse(JSON.stringify(oneSwitchInput()));
    delete input.positions[0].mosfet.outputCapacitance;
    const r = parseDesign(input);
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    expect(evaluateDesign(r.design).corners[0].positions[0].outputCapacitance).toBeNull();
  });
});

describe("conduction (DOMAIN items 8–9; Erickson & Maksimović ch. 4/5, Mohan et al. ch. 2 diode model)", () => {
  it("Rds(on) is a straight line through the two datasheet points", () => {
    const m = { rds25: 0.01, rdsHot: 0.017, tHot: 125, rdsModel: "linear" as const };
    expect(rdsAt(m, 85)).toBeCloseTo(0.01 + 0.007 * 0.6, 15);
    const e = { ...m, rdsModel: "exponential" as const };
    expect(rdsAt(e, 125)).toBeCloseTo(0.017, 15);
    expect(rdsAt(e, 75)).toBeCloseTo(Math.sqrt(0.01 * 0.017), 15);
  });

  it("worked numbers: I²·R/n, Vsd·Iavg + rD·Irms², dead-time diode loss", () => {
    expect(channelLoss({ iRms: 8, rds: 0.0142, count: 1 })).toBeCloseTo(0.9088, 12);
    expect(channelLoss({ iRms: 8, rds: 0.0142, count: 2 })).toBeCloseTo(0.4544, 12);
    expect(diodeLoss({ iAvg: 6, iRms: 8, vsd: 0.85, rDiode: 0.01, count: 1 })).toBeCloseTo(5.1 + 0.64, 12);
    expect(deadTimeLoss({ idOn: 10, idOff: 12, t1: 50e-9, t2: 30e-9, vsd: 0.85, rDiode: 0, count: 1, fsw: 100e3 }))
      .toBeCloseTo(0.85 * (10 * 50e-9 + 12 * 30e-9) * 100e3, 12);
  });

  it("the evaluated channel loss uses Rds at the solved Tj", () => {
    const c = evaluateDesign(oneSwitch()).corners[0];
    const q = c.parts.find((p) => p.id === "Q1")!;
    const j = q.junction!;
    if (j.runaway) throw new Error("unexpected runaway");
    expect(q.losses.conduction).toBeCloseTo(64 * (0.01 + (0.007 * (j.tj - 25)) / 100), 12);
  });

  it("body-diode mode books Vsd·Iavg + rD·Irms² and no gate drive", () => {
    const c = evaluateDesign(oneSwitch({ mode: "body-diode" })).corners[0];
    const q = c.parts.find((p) => p.id === "Q1")!;
    expect(q.losses.diodeConduction).toBeCloseTo(0.85 * 6 + 0.01 * 64, 12);
    expect(q.losses.conduction).toBe(0);
    expect(c.parts.find((p) => p.id === "controller")!.losses.gateDrive).toBe(0);
  });
});
