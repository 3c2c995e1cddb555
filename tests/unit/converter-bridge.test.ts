// Half- and full-bridge operating points checked against hand-worked
// examples. Source: Erickson & Maksimović, Fundamentals of Power
// Electronics, 3rd ed. (2020), ch. 6 (bridge isolated buck converters; with
// D here each switch's fraction of the whole period, M = 2D·Ns/Np for the
// full bridge and D·Ns/Np for the half bridge), ch. 5 (DCM of the output
// filter, which runs at 2·fsw), ch. 2 (balances). Arithmetic to six figures.
import { describe, expect, it } from "vitest";
import type { ConverterSpec } from "@/models/converter/types";
import { expectBalances, near, pointOf, positionOf, refusalOf } from "./converter-helpers";

// 48 V to 5 V / 20 A, 200 kHz per switch, Np:Ns = 4 (each half), Lo = 2 µH, η = 0.9, SRs, 30 ns / 30 ns.
const halfBridge = (extra: Partial<ConverterSpec> = {}): ConverterSpec => ({
  topology: "half-bridge", vin: 48, vout: 5, iout: 20, fsw: 200e3, efficiency: 0.9, turnsRatio: 4,
  filterInductance: 2e-6, rectifier: "synchronous", deadTimes: [30e-9, 30e-9], mode: "auto", ...extra,
});

describe("half bridge 48 V → 5 V / 20 A", () => {
  // Winding sees η·Vin/2 = 21.6 V → rectified 21.6/4 = 5.4 V; stage duty 5/5.4 = 0.925926, D = 0.462963.
  // Stage period 2.5 µs: ripple 5·0.0740741·2.5 µs/2 µH = 0.462963 A → 19.7685 … 20.2315 A.
  // K = 2·2 µH·400 kHz/0.25 Ω = 6.4 > 0.0740741: CCM.
  const p = pointOf(halfBridge());
  it("Q1 and Q2: hard at Vin/2 (switch node at the divider midpoint while both are off)", () => {
    expect(p.mode).toBe("continuous");
    near(p.duty, 0.462963);
    for (const id of ["Q1", "Q2"]) {
      const q = positionOf(p, id);
      near(q.duty, 0.462963);
      expect(q.turnOn).toMatchObject({ vds: 24, hard: true });
      near(q.turnOn.id, 4.94213);
      near(q.turnOff.id, 5.05787);
      near(q.reverseVoltage, 48);
      // √(D·(5² + 0.115741²/12)) = 3.40215 A.
      near(q.iRms, 3.40215);
    }
    // Iin = D·Iout/n = 2.31481 A; 48 V·2.31481 A = 111.111 W = 100 W/0.9.
    near(p.inputCurrent, 2.31481);
  });

  it("SRs: each conducts for (1 − D)·Ts = 2.68519 µs, sharing the freewheeling current", () => {
    for (const id of ["SR1", "SR2"]) {
      const sr = positionOf(p, id);
      near(sr.duty, 0.525037);
      // Start of its interval: half of the peak, less 30 ns at Vout/L/2 = 1.25 A/µs → 10.0782 A;
      // end: half of the valley plus 30 ns of the same slope → 9.92176 A.
      near(sr.turnOn.id, 10.0782);
      near(sr.turnOff.id, 9.92176);
      // Each off SR blocks twice the half-winding voltage: Vin/n = 12 V.
      near(sr.reverseVoltage, 12);
    }
    expectBalances(p, halfBridge(), ["SR1", "SR2"]);
  });

  it("refuses a turns ratio that needs D ≥ 1/2", () => {
    const r = refusalOf(halfBridge({ turnsRatio: 5 }));
    expect(r.field).toBe("turnsRatio");
    expect(r.message).toMatch(/below 1\/2/);
  });
});

// 400 V to 48 V / 10 A, 100 kHz, Np:Ns = 3 (each half), Lo = 47 µH, η = 0.95, diodes.
const fullBridge = (iout: number): ConverterSpec => ({
  topology: "full-bridge", vin: 400, vout: 48, iout, fsw: 100e3, efficiency: 0.95, turnsRatio: 3,
  filterInductance: 47e-6, rectifier: "diode", mode: "auto",
});

describe("full bridge 400 V → 48 V / 10 A", () => {
  // Rectified 380/3 = 126.667 V; stage duty 48/126.667 = 0.378947, D = 0.189474.
  // Ripple 48·0.621053·5 µs/47 µH = 3.17133 A → 8.41433 … 11.5857 A; K = 3.91667 > 0.621053: CCM.
  const p = pointOf(fullBridge(10));
  it("four switches alike; diodes block 2·Vin/n", () => {
    for (const id of ["Q1", "Q2", "Q3", "Q4"]) {
      const q = positionOf(p, id);
      near(q.duty, 0.189474);
      expect(q.turnOn).toMatchObject({ vds: 200, hard: true });
      near(q.turnOn.id, 2.80478);
      near(q.turnOff.id, 3.86189);
      // √(D·(3.33333² + 1.05711²/12)) = 1.45702 A.
      near(q.iRms, 1.45702);
    }
    // Iin = 2·D·Iout/n = 1.26316 A; 400 V·1.26316 A = 505.263 W = 480 W/0.95.
    near(p.inputCurrent, 1.26316);
    for (const id of ["D1", "D2"]) {
      const d = positionOf(p, id);
      near(d.iAvg, 5);
      // Full current for D·Ts, half of it for 2·(1 − 2D)·Ts/2:
      // √(0.189474·(100 + 0.838099) + 0.621053·(25 + 0.209525)) = 5.89598 A.
      near(d.iRms, 5.89598);
      near(d.reverseVoltage, 266.667);
      // Recovers from half the valley current when the other diagonal turns on.
      near(d.turnOff.id, 4.20717);
      expect(d.turnOff.hard).toBe(true);
    }
    expectBalances(p, fullBridge(10), ["D1", "D2"]);
  });
});

describe("full bridge at 1 A (discontinuous)", () => {
  // R = 48 Ω, K = 0.391667 < 0.621053: DCM. Stage duty 0.378947·√(0.391667/0.621053) = 0.300935,
  // D = 0.150468; D2 = K·M/Dstage = 0.493199; peak (126.667 − 48)·0.300935·5 µs/47 µH = 2.51846 A.
  const p = pointOf(fullBridge(1));
  it("two conduction intervals per rectifier, zero-current turn-on of the switches", () => {
    expect(p.mode).toBe("discontinuous");
    near(p.duty, 0.150468);
    near(p.dutyFreewheel, 0.493199);
    near(p.inductors[0].peak, 2.51846);
    expect(positionOf(p, "Q1").turnOn).toMatchObject({ vds: 200, id: 0, hard: true, zeroCurrent: true });
    const d1 = positionOf(p, "D1");
    expect(d1.runs).toBe(2);
    expect(d1.turnOff).toMatchObject({ id: 0, zeroCurrent: true, hard: false });
    near(d1.blockingAfterConduction, 48);
    expectBalances(p, fullBridge(1), ["D1", "D2"]);
  });
});
