// Flyback operating points checked against hand-worked examples.
// Source of the relations: Erickson & Maksimović, Fundamentals of Power
// Electronics, 3rd ed. (2020): ch. 6 (flyback as an isolated buck-boost,
// M = D/(n·(1 − D)) with n = Np/Ns), ch. 5 (DCM, buck-boost row of Table 5.2),
// ch. 2 (volt-second and charge balance). Arithmetic to six figures.
import { describe, expect, it } from "vitest";
import type { ConverterSpec } from "@/models/converter/types";
import { expectBalances, near, pointOf, positionOf } from "./converter-helpers";

// 9–36 V to 5 V / 6 A, 100 kHz, Np:Ns = 2:1, Lm = 10 µH, η = 0.9,
// synchronous rectifier with dead times t1 = 50 ns, t2 = 30 ns.
const flyback = (vin: number, iout: number, extra: Partial<ConverterSpec> = {}): ConverterSpec => ({
  topology: "flyback", vin, vout: 5, iout, fsw: 100e3, efficiency: 0.9, turnsRatio: 2,
  magnetizingInductance: 10e-6, rectifier: "synchronous", deadTimes: [50e-9, 30e-9], mode: "auto", ...extra,
});

describe("flyback, 9 V in, 5 V / 6 A (continuous)", () => {
  // η·Vin = 8.1 V; n·Vout = 10 V. Volt-seconds on Lm: 8.1·D = 10·(1 − D)
  //   → D = 10/18.1 = 0.552486.
  // Load referred to the primary R' = n²·V/I = 4·5/6 = 3.33333 Ω;
  //   K = 2·Lm·fsw/R' = 2·10 µH·100 kHz/3.33333 = 0.6 > Kcrit = (1 − D)² = 0.200269: CCM.
  // Charge balance on the output: Iout = n·I_Lm·(1 − D) → I_Lm = 6/(2·0.447514) = 6.70370 A.
  // Ripple 8.1 V·0.552486·10 µs/10 µH = 4.47514 A → valley 4.46613 A, peak 8.94127 A.
  const p = pointOf(flyback(9, 6));
  const q1 = positionOf(p, "Q1");
  const sr = positionOf(p, "SR1");

  it("is continuous with the volt-second duty", () => {
    expect(p.mode).toBe("continuous");
    near(p.duty, 0.552486);
    near(p.k, 0.6);
    near(p.kCrit, 0.200269);
    const lm = p.inductors[0];
    near(lm.valley, 4.46613);
    near(lm.peak, 8.94127);
  });

  it("Q1: hard edges at Vin + n·Vout = 19 V, valley and peak current, RMS and average", () => {
    near(q1.duty, 0.552486);
    expect(q1.turnOn).toMatchObject({ vds: 19, hard: true, zeroCurrent: false });
    near(q1.turnOn.id, 4.46613);
    expect(q1.turnOff).toMatchObject({ vds: 19, hard: true });
    near(q1.turnOff.id, 8.94127);
    // Average D·I_Lm = 3.70370 A (= Pout/(η·Vin) = 30/8.1). RMS of a trapezoid:
    // √(D·(I² + ΔI²/12)) = √(0.552486·(44.9396 + 1.66891)) = 5.07450 A.
    near(q1.iAvg, 3.70370);
    near(q1.iRms, 5.07450);
    near(p.inputCurrent, 3.70370);
  });

  it("SR1: zero-voltage edges, body diode in the dead times, reverse voltage Vout + Vin/n", () => {
    // Secondary current falls from n·8.94127 = 17.8825 A at Vout/(Lm/n²) = 5 V/2.5 µH = 2 A/µs.
    // Channel on 50 ns after Q1 turns off: 17.8825 − 0.1 = 17.7825 A;
    // channel off 30 ns before Q1 turns on: n·4.46613 + 0.06 = 8.99227 A.
    near(sr.turnOn.id, 17.7825);
    near(sr.turnOff.id, 8.99227);
    expect(sr.turnOn.zeroVoltage && sr.turnOff.zeroVoltage).toBe(true);
    expect(sr.turnOn.hard || sr.turnOff.hard).toBe(false);
    // Channel duty (4.47514 µs − 80 ns)/10 µs = 0.439514.
    near(sr.duty, 0.439514);
    expect(sr.bodyDiode?.beforeOn).toBeCloseTo(50e-9, 15);
    expect(sr.bodyDiode?.afterOff).toBeCloseTo(30e-9, 15);
    // Body-diode charge per period: 50 ns·(17.8825 + 17.7825)/2 + 30 ns·(8.99227 + 8.93227)/2
    //   = 0.891625 nC + 0.268868 nC = 1.16049 nC, over 10 µs 0.116049 A;
    //   the channel carries the rest of the 6 A: 5.88395 A.
    near(sr.bodyDiode?.iAvg ?? 0, 0.116049);
    near(sr.iAvg, 5.88395);
    near(sr.reverseVoltage, 9.5);
    near(sr.blockingAfterConduction, 9.5);
  });

  it("balances energy and charge", () => expectBalances(p, flyback(9, 6), ["SR1"]));
});

describe("flyback, 36 V in, 5 V / 2 A (discontinuous)", () => {
  // η·Vin = 32.4 V, M = n·V/(η·Vin) = 10/32.4 = 0.308642. R' = 4·5/2 = 10 Ω, K = 0.2.
  // CCM duty would be 10/42.4 = 0.235849, Kcrit = 0.764151² = 0.583927 > K: DCM.
  // DCM (Table 5.2, buck-boost): D = M·√K = 0.308642·0.447214 = 0.138029; D2 = √K = 0.447214.
  // Peak 32.4 V·0.138029·10 µs/10 µH = 4.47214 A.
  const p = pointOf(flyback(36, 2));
  const q1 = positionOf(p, "Q1");
  const sr = positionOf(p, "SR1");

  it("is discontinuous with the DCM duty", () => {
    expect(p.mode).toBe("discontinuous");
    near(p.duty, 0.138029);
    near(p.dutyFreewheel, 0.447214);
    near(p.inductors[0].peak, 4.47214);
  });

  it("Q1 turns on hard at zero current, from Vin (the magnetizing current is zero in the idle interval)", () => {
    expect(q1.turnOn).toMatchObject({ vds: 36, id: 0, zeroCurrent: true, zeroVoltage: false, hard: true });
    expect(q1.turnOff.vds).toBeCloseTo(46, 9);
    near(q1.turnOff.id, 4.47214);
    // Triangle: RMS Ipk·√(D/3) = 4.47214·0.214499 = 0.959267 A; average Ipk·D/2 = 0.308642 A.
    near(q1.iRms, 0.959267);
    near(q1.iAvg, 0.308642);
  });

  it("SR1 turns off at zero current (diode emulation) and then blocks Vout", () => {
    // Turn-on 50 ns after Q1: n·4.47214 − 2 A/µs·50 ns = 8.84427 A.
    near(sr.turnOn.id, 8.84427);
    expect(sr.turnOff).toMatchObject({ id: 0, zeroCurrent: true, hard: false, vds: 5 });
    expect(sr.bodyDiode?.afterOff).toBe(0);
    near(sr.blockingAfterConduction, 5);
    near(sr.reverseVoltage, 5 + 36 / 2);
  });

  it("balances energy and charge", () => expectBalances(p, flyback(36, 2), ["SR1"]));
});

describe("flyback at the CCM/DCM boundary, 36 V, 6 A", () => {
  // D = 0.235849, Kcrit = 0.583927, R' = 3.33333 Ω: L_crit = Kcrit·R'·Ts/2 = 9.73211 µH.
  const lCrit = 9.73211e-6;
  it("auto finds boundary at L_crit and either side of it", () => {
    const at = pointOf(flyback(36, 6, { magnetizingInductance: 9.732111071555713e-6 }));
    expect(at.mode).toBe("boundary");
    expect(pointOf(flyback(36, 6, { magnetizingInductance: lCrit * 1.01 })).mode).toBe("continuous");
    expect(pointOf(flyback(36, 6, { magnetizingInductance: lCrit * 0.99 })).mode).toBe("discontinuous");
  });

  it("the two modes meet at the boundary: duty and peak current agree on both sides", () => {
    const above = pointOf(flyback(36, 6, { magnetizingInductance: lCrit * (1 + 1e-6) }));
    const below = pointOf(flyback(36, 6, { magnetizingInductance: lCrit * (1 - 1e-6) }));
    near(above.duty, 0.235849);
    near(below.duty, above.duty, 1e-5);
    near(below.inductors[0].peak, above.inductors[0].peak, 1e-5);
    expect(above.inductors[0].valley).toBeLessThan(1e-4);
  });

  it("boundary mode sets the frequency: fsw = R'·Kcrit/(2·Lm) = 97.3211 kHz, zero-current hard turn-on", () => {
    const p = pointOf(flyback(36, 6, { mode: "boundary" }));
    near(p.fsw, 97321.1);
    expect(p.notes.join(" ")).toMatch(/frequency follows from the inductance/);
    const q1 = positionOf(p, "Q1");
    // The rectifier current reaches zero just as Q1 turns on: Vds is still Vin + n·Vout.
    expect(q1.turnOn).toMatchObject({ id: 0, zeroCurrent: true, hard: true });
    near(q1.turnOn.vds, 46);
    expectBalances(p, flyback(36, 6), ["SR1"]);
  });
});
