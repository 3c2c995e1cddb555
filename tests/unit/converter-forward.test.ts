// Forward converter operating points (reset winding and active clamp)
// checked against hand-worked examples. Source: Erickson & Maksimović,
// Fundamentals of Power Electronics, 3rd ed. (2020): ch. 6 (the forward
// converter: M = D·Ns/Np, reset condition D ≤ 1/(1 + Nr/Np)), ch. 2
// (volt-second balance on Lm, charge balance on the clamp capacitor),
// ch. 5 (DCM of the buck-type output filter). Arithmetic to six figures.
import { describe, expect, it } from "vitest";
import type { ConverterSpec } from "@/models/converter/types";
import { expectBalances, near, pointOf, positionOf, refusalOf } from "./converter-helpers";

// 48 V to 12 V / 10 A, 200 kHz, Np:Ns = 1.5, Np:Nr = 1, Lm = 400 µH, Lo = 10 µH, η = 0.9, diodes.
const resetWinding = (extra: Partial<ConverterSpec> = {}): ConverterSpec => ({
  topology: "forward", forwardReset: "reset-winding", vin: 48, vout: 12, iout: 10, fsw: 200e3, efficiency: 0.9,
  turnsRatio: 1.5, resetTurnsRatio: 1, magnetizingInductance: 400e-6, filterInductance: 10e-6,
  rectifier: "diode", mode: "auto", ...extra,
});

describe("forward with reset winding, 48 V → 12 V / 10 A", () => {
  // η·Vin/n = 43.2/1.5 = 28.8 V → D = 12/28.8 = 0.416667 (≤ 1/(1 + 1) = 0.5: the core resets).
  // Output inductor ripple 12·(1 − D)·5 µs/10 µH = 3.5 A → 8.25 … 11.75 A; K = 3.33 > 1 − D: CCM.
  // Magnetizing current rises by 43.2 V·2.08333 µs/400 µH = 0.225 A.
  const p = pointOf(resetWinding());
  const q1 = positionOf(p, "Q1");

  it("Q1: turns on at Vin (reset over) with the reflected valley current, off at 2·Vin with peak + magnetizing", () => {
    expect(p.mode).toBe("continuous");
    near(p.duty, 0.416667);
    expect(q1.turnOn).toMatchObject({ vds: 48, hard: true });
    near(q1.turnOn.id, 8.25 / 1.5);
    // 11.75/1.5 + 0.225 = 8.05833 A at Vin·(1 + Np/Nr) = 96 V.
    near(q1.turnOff.id, 8.05833);
    expect(q1.turnOff.vds).toBeCloseTo(96, 9);
    near(q1.reverseVoltage, 96);
    // Trapezoid 5.5 → 8.05833 A over D: mean 6.77917, span 2.55833;
    // RMS √(D·(6.77917² + 2.55833²/12)) = 4.40182 A; average D·(10/1.5 + 0.225/2) = 2.82465 A.
    near(q1.iRms, 4.40182);
    near(q1.iAvg, 2.82465);
  });

  it("the reset diode returns the magnetizing charge: Iin = 2.82465 − 0.046875 = 2.77778 A = 120 W/43.2 V", () => {
    const d3 = positionOf(p, "D3");
    near(d3.iAvg, 0.046875);
    near(d3.turnOn.id, 0.225);
    expect(d3.turnOff).toMatchObject({ id: 0, zeroCurrent: true });
    near(d3.reverseVoltage, 96);
    near(p.inputCurrent, 2.77778);
  });

  it("rectifiers: currents and reverse voltages", () => {
    const d1 = positionOf(p, "D1");
    const d2 = positionOf(p, "D2");
    // RMS √(D·(100 + 3.5²/12)) = 6.48784 A and √((1 − D)·(…)) = 7.67651 A.
    near(d1.iRms, 6.48784);
    near(d2.iRms, 7.67651);
    // Forward rectifier blocks the reset-winding voltage reflected: Vin·(Np/Nr)/n = 32 V;
    // the freewheeling one blocks Vin/n = 32 V while Q1 conducts.
    near(d1.reverseVoltage, 32);
    near(d2.reverseVoltage, 32);
    // D2 is switched off at the valley current when Q1 turns on: hard recovery at 32 V.
    expect(d2.turnOff).toMatchObject({ hard: true });
    near(d2.turnOff.id, 8.25);
    expectBalances(p, resetWinding(), ["D1", "D2"]);
  });

  it("refuses a duty the core cannot reset from", () => {
    // At 30 V: D = 12/(27/1.5) = 0.667 > 0.5.
    const r = refusalOf(resetWinding({ vin: 30 }));
    expect(r.field).toBe("turnsRatio");
    expect(r.message).toMatch(/cannot reset/);
    // With Np/Nr = 3 (fewer reset turns) the limit is 3/4 and 0.667 is fine.
    expect(pointOf(resetWinding({ vin: 30, resetTurnsRatio: 3 })).duty).toBeCloseTo(0.666667, 5);
  });
});

// 48 V to 12 V / 10 A, 250 kHz, Np:Ns = 1.5, Lm = 150 µH, Lo = 6.8 µH, η = 0.92, SRs, dead times 60 ns / 60 ns.
const clamp = (extra: Partial<ConverterSpec> = {}): ConverterSpec => ({
  topology: "forward", forwardReset: "active-clamp", vin: 48, vout: 12, iout: 10, fsw: 250e3, efficiency: 0.92,
  turnsRatio: 1.5, magnetizingInductance: 150e-6, filterInductance: 6.8e-6, rectifier: "synchronous",
  deadTimes: [60e-9, 60e-9], mode: "auto", ...extra,
});

describe("active-clamp forward, 48 V → 12 V / 10 A", () => {
  // η·Vin/n = 44.16/1.5 = 29.44 V → D = 0.407609, on-time 1.63043 µs of 4 µs.
  // Output ripple 12·0.592391·4 µs/6.8 µH = 4.18159 A → 7.90921 … 12.0908 A.
  // Magnetizing swing 44.16 V·1.63043 µs/150 µH = 0.48 A, i.e. ±0.24 A (clamp charge balance).
  // Clamp: Vc = Vin·D·Ts/(Ts − D·Ts − t2) = 48·1.63043/(4 − 1.63043 − 0.06) = 33.8855 V; Q1 blocks 81.8855 V.
  const p = pointOf(clamp());
  const q1 = positionOf(p, "Q1");
  const q2 = positionOf(p, "Q2");

  it("Q1: hard turn-on at Vin after the dead time, turn-off at Vin + Vc", () => {
    near(p.duty, 0.407609);
    expect(q1.turnOn).toMatchObject({ vds: 48, hard: true });
    // 7.90921/1.5 − 0.24 = 5.03280 A; off 12.0908/1.5 + 0.24 = 8.30053 A.
    near(q1.turnOn.id, 5.03280);
    near(q1.turnOff.id, 8.30053);
    near(q1.turnOff.vds, 81.8855);
    // Trapezoid mean 6.66667, span 3.26772: RMS √(D·(44.4444 + 0.889836)) = 4.29868 A.
    near(q1.iRms, 4.29868);
    near(p.inputCurrent, 2.71739);
  });

  it("Q2: zero-voltage turn-on after its body diode, hard turn-off at the reversed magnetizing current", () => {
    // Duty (4 − 1.63043 − 0.12)/4 = 0.562391. Magnetizing current falls at 0.48 A/2.30957 µs
    // = 0.207831 A/µs: after t1 it is 0.24 − 0.0124699 = 0.227530 A (in the body-diode direction).
    near(q2.duty, 0.562391);
    expect(q2.turnOn).toMatchObject({ vds: 0, zeroVoltage: true, hard: false });
    near(q2.turnOn.id, -0.227530);
    near(q2.turnOff.id, 0.24);
    near(q2.turnOff.vds, 33.8855);
    near(q2.reverseVoltage, 81.8855);
    // Symmetric triangle ±0.24 A over 2.30957 µs of 4 µs: RMS 0.24·√(0.577391/3) = 0.105290 A, average 0.
    near(q2.deviceIRms, 0.105290);
    expect(Math.abs(q2.deviceIAvg)).toBeLessThan(1e-12);
  });

  it("rectifiers: the forward SR carries n·ΔIm/2 = 0.36 A in the dead time before Q1 turns on", () => {
    const sr1 = positionOf(p, "SR1");
    const sr2 = positionOf(p, "SR2");
    near(sr1.bodyDiode?.intervals.find((iv) => iv.duration > 59e-9 && iv.iStart < 1)?.iStart ?? 0, 0.36);
    near(sr1.turnOn.id, 7.90921);
    // SR1 off 60 ns before Q1: 12.0908 − 4.18159·60/1630.43 = 11.9369 A; duty (1.63043 − 0.06)/4 = 0.392609.
    near(sr1.turnOff.id, 11.9369);
    near(sr1.duty, 0.392609);
    // SR2 off at the start of t2: 7.90921 + 12/6.8 µH·60 ns = 8.01509 A; on 60 ns after Q1 off: 11.9849 A.
    near(sr2.turnOff.id, 8.01509);
    near(sr2.turnOn.id, 11.9849);
    // Reverse voltages: Vc/n = 22.5904 V and Vin/n = 32 V.
    near(sr1.reverseVoltage, 22.5904);
    near(sr2.reverseVoltage, 32);
    expectBalances(p, clamp(), ["SR1", "SR2"]);
  });

  it("refuses a magnetizing current too large for the dead-time analysis", () => {
    // Lm = 5 µH: ΔIm/2 = 7.2 A > 7.909/1.5 A.
    const r = refusalOf(clamp({ magnetizingInductance: 5e-6 }));
    expect(r.field).toBe("magnetizingInductance");
    expect(r.message).toMatch(/zero-voltage/);
  });
});
