// Buck and boost operating points checked against hand-worked examples.
// Source: Erickson & Maksimović, Fundamentals of Power Electronics, 3rd ed.
// (2020): ch. 2 (volt-second balance: buck M = D, boost M = 1/(1 − D);
// capacitor charge balance; linear ripple), ch. 5 (DCM: K = 2L/(R·Ts),
// Table 5.2). Arithmetic to six figures.
import { describe, expect, it } from "vitest";
import type { ConverterSpec } from "@/models/converter/types";
import { expectBalances, near, pointOf, positionOf, refusalOf } from "./converter-helpers";

// 12 V to 3.3 V, 500 kHz, 1.5 µH, η = 0.92, synchronous, dead times 20 ns / 20 ns.
const buck = (iout: number, extra: Partial<ConverterSpec> = {}): ConverterSpec => ({
  topology: "buck", vin: 12, vout: 3.3, iout, fsw: 500e3, efficiency: 0.92, filterInductance: 1.5e-6,
  rectifier: "synchronous", deadTimes: [20e-9, 20e-9], mode: "auto", ...extra,
});

describe("buck 12 V → 3.3 V / 10 A (continuous)", () => {
  // η·Vin = 11.04 V; D = 3.3/11.04 = 0.298913.
  // K = 2·1.5 µH·500 kHz/0.33 Ω = 4.54545 > Kcrit = 1 − D = 0.701087: CCM.
  // Ripple (11.04 − 3.3)·0.298913·2 µs/1.5 µH = 3.08478 A → valley 8.45761 A, peak 11.5424 A.
  const p = pointOf(buck(10));
  const q1 = positionOf(p, "Q1");
  const sr = positionOf(p, "SR1");

  it("Q1: duty, hard edges at Vin, RMS and average", () => {
    expect(p.mode).toBe("continuous");
    near(q1.duty, 0.298913);
    expect(q1.turnOn).toMatchObject({ vds: 12, hard: true });
    near(q1.turnOn.id, 8.45761);
    expect(q1.turnOff).toMatchObject({ vds: 12, hard: true });
    near(q1.turnOff.id, 11.5424);
    // √(D·(I² + ΔI²/12)) = √(0.298913·(100 + 0.792983)) = 5.48893 A; average D·I = 2.98913 A.
    near(q1.iRms, 5.48893);
    near(q1.iAvg, 2.98913);
    near(p.inductors[0].ripple, 3.08478);
  });

  it("SR1: body diode 20 ns each side, channel edges at zero voltage", () => {
    // Fall rate Vout/L = 2.2 A/µs: 20 ns moves the current by 0.044 A.
    near(sr.turnOn.id, 11.4984);
    near(sr.turnOff.id, 8.50161);
    expect([sr.turnOn.zeroVoltage, sr.turnOff.zeroVoltage]).toEqual([true, true]);
    // Channel duty 0.701087 − 40 ns·500 kHz = 0.681087.
    near(sr.duty, 0.681087);
    // Body diode: 20 ns·(11.5424 + 11.4984)/2 + 20 ns·(8.50161 + 8.45761)/2 = 20 ns·20 A = 0.4 nC → 0.2 A.
    near(sr.bodyDiode?.iAvg ?? 0, 0.2);
    near(sr.reverseVoltage, 12);
  });

  it("balances energy and charge", () => expectBalances(p, buck(10), ["Q1", "SR1"]));
});

describe("buck at 1 A (discontinuous)", () => {
  // R = 3.3 Ω, K = 0.454545 < 0.701087: DCM. D = M·√(K/(1 − M)) = 0.298913·√0.648346 = 0.240684;
  // D2 = K·M/D = 0.564514; peak (11.04 − 3.3)·0.240684·2 µs/1.5 µH = 2.48386 A.
  const p = pointOf(buck(1));
  it("duty, peak and the zero-current hard turn-on from Vin − Vout", () => {
    expect(p.mode).toBe("discontinuous");
    near(p.duty, 0.240684);
    near(p.dutyFreewheel, 0.564514);
    near(p.inductors[0].peak, 2.48386);
    const q1 = positionOf(p, "Q1");
    expect(q1.turnOn).toMatchObject({ id: 0, zeroCurrent: true, hard: true });
    near(q1.turnOn.vds, 12 - 3.3);
    // Triangle RMS 2.48386·√(0.240684/3) = 0.703543 A.
    near(q1.iRms, 0.703543);
    const sr = positionOf(p, "SR1");
    expect(sr.turnOff).toMatchObject({ id: 0, zeroCurrent: true });
    near(sr.turnOff.vds, 3.3);
    expectBalances(p, buck(1), ["Q1", "SR1"]);
  });

  it("refuses continuous mode here and names the inductance it needs: Kcrit·R·Ts/2 = 2.31 µH", () => {
    const r = refusalOf(buck(1, { mode: "continuous" }));
    expect(r.field).toBe("filterInductance");
    expect(r.message).toMatch(/at least 2\.31 µH/);
  });

  it("refuses discontinuous mode at 10 A", () => {
    const r = refusalOf(buck(10, { mode: "discontinuous" }));
    expect(r.field).toBe("filterInductance");
    expect(r.message).toMatch(/does not fall to zero/);
  });
});

describe("buck limits", () => {
  it("refuses to step up", () => {
    const r = refusalOf(buck(1, { vin: 3 }));
    expect(r.field).toBe("vout");
    expect(r.message).toMatch(/steps down/);
  });
  it("refuses a duty above the controller's maximum", () => {
    // 3.3/(0.92·4) = 0.897 > 0.85.
    const r = refusalOf(buck(10, { vin: 4, dutyMax: 0.85 }));
    expect(r.field).toBe("dutyMax");
    expect(r.message).toMatch(/0\.897/);
  });
  it("refuses dead times that leave the SR no channel time", () => {
    const r = refusalOf(buck(10, { deadTimes: [800e-9, 800e-9] }));
    expect(r.field).toBe("deadTimes");
  });
});

// 12 V to 24 V, 200 kHz, 22 µH, η = 0.95, diode rectifier.
const boost = (iout: number, extra: Partial<ConverterSpec> = {}): ConverterSpec => ({
  topology: "boost", vin: 12, vout: 24, iout, fsw: 200e3, efficiency: 0.95, filterInductance: 22e-6,
  rectifier: "diode", mode: "auto", ...extra,
});

describe("boost 12 V → 24 V / 2 A (continuous)", () => {
  // η·Vin = 11.4 V, M = 2.10526, D = 1 − 11.4/24 = 0.525.
  // Charge balance: I_L = Iout/(1 − D) = 4.21053 A (= Iin, and 12 V·4.21053 A = 48 W/0.95).
  // Ripple 11.4·0.525·5 µs/22 µH = 1.36023 A → valley 3.53041 A, peak 4.89064 A.
  // K = 2·22 µH·200 kHz/12 Ω = 0.733333 > Kcrit = D(1 − D)² = 0.118453: CCM.
  const p = pointOf(boost(2));
  it("Q1 and D1 figures", () => {
    expect(p.mode).toBe("continuous");
    near(p.duty, 0.525);
    near(p.inputCurrent, 4.21053);
    const q1 = positionOf(p, "Q1");
    expect(q1.turnOn).toMatchObject({ vds: 24, hard: true });
    near(q1.turnOn.id, 3.53041);
    near(q1.turnOff.id, 4.89064);
    // √(0.525·(17.7285 + 0.154181)) = 3.06405 A.
    near(q1.iRms, 3.06405);
    const d1 = positionOf(p, "D1");
    near(d1.duty, 0.475);
    near(d1.iAvg, 2);
    // √(0.475·17.8827) = 2.91450 A.
    near(d1.iRms, 2.91450);
    // The diode is switched off at the valley current against Vout: a hard (recovering) turn-off.
    expect(d1.turnOff).toMatchObject({ vds: 24, hard: true });
    near(d1.turnOff.id, 3.53041);
    expect(d1.turnOn).toMatchObject({ zeroVoltage: true, hard: false });
    near(d1.reverseVoltage, 24);
    expectBalances(p, boost(2), ["D1"]);
  });
});

describe("boost at 0.2 A (discontinuous)", () => {
  // R = 120 Ω, K = 0.0733333 < 0.118453: DCM.
  // D = √(K·M·(M − 1)) = √(0.0733333·2.10526·1.10526) = 0.413082; D2 = K·M/D = 0.373741;
  // peak 11.4·0.413082·5 µs/22 µH = 1.07026 A; check Iout = Ipk·D2/2 = 0.2 A.
  const p = pointOf(boost(0.2));
  it("duty, peak, zero-current turn-on from Vin, diode ends at zero current", () => {
    expect(p.mode).toBe("discontinuous");
    near(p.duty, 0.413082);
    near(p.dutyFreewheel, 0.373741);
    near(p.inductors[0].peak, 1.07026);
    expect(positionOf(p, "Q1").turnOn).toMatchObject({ vds: 12, id: 0, hard: true, zeroCurrent: true });
    const d1 = positionOf(p, "D1");
    expect(d1.turnOff).toMatchObject({ id: 0, zeroCurrent: true, hard: false });
    near(d1.turnOff.vds, 12);
    expectBalances(p, boost(0.2), ["D1"]);
  });
  it("boundary at L_crit = Kcrit·R·Ts/2 = 35.5359 µH", () => {
    expect(pointOf(boost(0.2, { filterInductance: 35.53593749999999e-6 })).mode).toBe("boundary");
    expect(pointOf(boost(0.2, { filterInductance: 36e-6 })).mode).toBe("continuous");
  });
});

describe("boost limits", () => {
  it("refuses to step down", () => {
    const r = refusalOf(boost(1, { vin: 30 }));
    expect(r.field).toBe("vout");
    expect(r.message).toMatch(/steps up/);
  });
});
