// The calculator's refusals of hostile or impossible specs, and the
// balances every operating point must satisfy across a grid of specs:
// Pin = Vin·Iin = Pout/η and output-capacitor charge balance (Erickson &
// Maksimović 3rd ed. 2020, ch. 2: in steady state the average capacitor
// current is zero and the average inductor voltage is zero).
import { describe, expect, it } from "vitest";
import { operatingPoint } from "@/models/converter/calculate";
import type { ConverterSpec } from "@/models/converter/types";
import { expectBalances, refusalOf } from "./converter-helpers";

const flyback: ConverterSpec = {
  topology: "flyback", vin: 24, vout: 5, iout: 6, fsw: 100e3, efficiency: 0.9, turnsRatio: 2,
  magnetizingInductance: 10e-6, rectifier: "synchronous", deadTimes: [50e-9, 30e-9], mode: "auto",
};

describe("hostile input is refused in words, naming the field", () => {
  const cases: [string, Partial<Record<keyof ConverterSpec, unknown>>, keyof ConverterSpec][] = [
    ["NaN Vin", { vin: Number.NaN }, "vin"],
    ["negative Vout", { vout: -5 }, "vout"],
    ["a string for Iout", { iout: "6 A" }, "iout"],
    ["zero load", { iout: 0 }, "iout"],
    ["infinite fsw", { fsw: Number.POSITIVE_INFINITY }, "fsw"],
    ["efficiency above 1", { efficiency: 1.2 }, "efficiency"],
    ["unknown topology", { topology: "cuk" }, "topology"],
    ["unknown rectifier", { rectifier: "magic" }, "rectifier"],
    ["unknown mode", { mode: "sometimes" }, "mode"],
    ["missing turns ratio", { turnsRatio: undefined }, "turnsRatio"],
    ["zero magnetizing inductance", { magnetizingInductance: 0 }, "magnetizingInductance"],
    ["one dead time", { deadTimes: [50e-9] }, "deadTimes"],
    ["negative dead time", { deadTimes: [-1e-9, 0] }, "deadTimes"],
    ["dutyMax above 1", { dutyMax: 2 }, "dutyMax"],
  ];
  it.each(cases)("%s", (_, patch, field) => {
    const r = refusalOf({ ...flyback, ...patch } as ConverterSpec);
    expect(r.field).toBe(field);
    expect(r.message.length).toBeGreaterThan(10);
  });

  it("a forward needs its filter inductance and a reset choice", () => {
    const fwd = { ...flyback, topology: "forward" as const, forwardReset: "reset-winding" as const, turnsRatio: 1.5 };
    expect(refusalOf(fwd).field).toBe("filterInductance");
    expect(refusalOf({ ...fwd, filterInductance: 10e-6, forwardReset: undefined }).field).toBe("forwardReset");
  });

  it("refuses a duty above the controller's maximum (flyback at 9 V needs 0.552)", () => {
    const r = refusalOf({ ...flyback, vin: 9, dutyMax: 0.5 });
    expect(r.field).toBe("dutyMax");
    expect(r.message).toMatch(/0\.552/);
  });
});

// A grid over every topology, mode, rectifier and load: each point must balance.
type Base = Omit<ConverterSpec, "iout" | "rectifier" | "mode">;
const two = (s: boolean) => (s ? ["SR1", "SR2"] : ["D1", "D2"]);
const one = (s: boolean) => [s ? "SR1" : "D1"];
const SPECS: [string, Base, (sync: boolean) => string[]][] = [
  ["buck", { topology: "buck", vin: 24, vout: 5, fsw: 200e3, efficiency: 0.9, filterInductance: 4.7e-6, deadTimes: [20e-9, 30e-9] }, (s) => ["Q1", ...one(s)]],
  ["boost", { topology: "boost", vin: 12, vout: 36, fsw: 150e3, efficiency: 0.93, filterInductance: 15e-6, deadTimes: [20e-9, 30e-9] }, one],
  ["flyback", { topology: "flyback", vin: 48, vout: 12, fsw: 120e3, efficiency: 0.88, turnsRatio: 3, magnetizingInductance: 60e-6, deadTimes: [40e-9, 20e-9] }, one],
  ["forward, reset winding", { topology: "forward", forwardReset: "reset-winding", vin: 48, vout: 5, fsw: 250e3, efficiency: 0.9, turnsRatio: 3, magnetizingInductance: 300e-6, filterInductance: 2.2e-6, deadTimes: [30e-9, 30e-9] }, two],
  // t2 = 0: with a dead time before Q1's turn-on a light (DCM) load is refused (see converter-forward.test.ts).
  ["forward, active clamp", { topology: "forward", forwardReset: "active-clamp", vin: 48, vout: 5, fsw: 250e3, efficiency: 0.9, turnsRatio: 3, magnetizingInductance: 300e-6, filterInductance: 2.2e-6, deadTimes: [30e-9, 0] }, two],
  ["half bridge", { topology: "half-bridge", vin: 100, vout: 12, fsw: 100e3, efficiency: 0.92, turnsRatio: 3, filterInductance: 10e-6, deadTimes: [50e-9, 50e-9] }, two],
  ["full bridge", { topology: "full-bridge", vin: 100, vout: 12, fsw: 100e3, efficiency: 0.92, turnsRatio: 3, filterInductance: 10e-6, deadTimes: [50e-9, 50e-9] }, two],
];

describe("every operating point balances energy and charge", () => {
  const grid: [string, number, "synchronous" | "diode", ConverterSpec["mode"]][] = [];
  for (const [name] of SPECS)
    for (const iout of [0.3, 1, 4, 12])
      for (const rect of ["synchronous", "diode"] as const)
        for (const mode of ["auto", "boundary"] as const) grid.push([name, iout, rect, mode]);
  it.each(grid)("%s at %d A, %s, %s", (name, iout, rectifier, mode) => {
    const [, base, feeders] = SPECS.find((x) => x[0] === name)!;
    const spec = { ...base, iout, rectifier, mode } as ConverterSpec;
    const r = operatingPoint(spec);
    if (!r.ok) throw new Error(`${name}: ${r.refusal.message}`);
    expect(["continuous", "discontinuous", "boundary"]).toContain(r.point.mode);
    expectBalances(r.point, spec, feeders(rectifier === "synchronous"));
    for (const p of r.point.positions) {
      expect(p.duty).toBeGreaterThan(0);
      expect(p.duty).toBeLessThan(1);
      expect(p.iRms).toBeGreaterThanOrEqual(Math.abs(p.iAvg));
      expect(p.reverseVoltage).toBeGreaterThan(0);
    }
  });
});
