// The calculator's zod input schema: unit strings in, the calculator's SI spec out.
import { describe, expect, it } from "vitest";
import { converterSpecSchema } from "@/models/input/converterSpec";
import { operatingPoint } from "@/models/converter/calculate";
import type { ConverterSpec } from "@/models/converter/types";

const typed = {
  topology: "flyback", vin: "9 V", vout: "5 V", iout: "6 A", fsw: "100 kHz", efficiency: "90 %",
  turnsRatio: 2, magnetizingInductance: "10 µH", rectifier: "synchronous", deadTimes: ["50 ns", "30 ns"],
};

describe("converter spec schema", () => {
  it("parses unit strings to SI and defaults the mode to auto", () => {
    const r = converterSpecSchema.safeParse(typed);
    expect(r.success).toBe(true);
    if (!r.success) return;
    expect(r.data).toMatchObject({ vin: 9, fsw: 100e3, efficiency: 0.9, mode: "auto" });
    expect(r.data.magnetizingInductance).toBeCloseTo(10e-6, 15);
    expect(r.data.deadTimes?.[0]).toBeCloseTo(50e-9, 18);
    // The same spec in numbers gives the same operating point.
    const numeric: ConverterSpec = {
      topology: "flyback", vin: 9, vout: 5, iout: 6, fsw: 100e3, efficiency: 0.9, turnsRatio: 2,
      magnetizingInductance: 10e-6, rectifier: "synchronous", deadTimes: [50e-9, 30e-9], mode: "auto",
    };
    const a = operatingPoint(r.data);
    const b = operatingPoint(numeric);
    expect(a.ok && b.ok && a.point.duty).toBeCloseTo(b.ok ? b.point.duty : Number.NaN, 12);
  });

  it("refuses unknown fields, wrong units and out-of-range values at their path", () => {
    const paths = (input: unknown) => {
      const r = converterSpecSchema.safeParse(input);
      return r.success ? [] : r.error.issues.map((i) => i.path.join("."));
    };
    expect(paths({ ...typed, extra: 1 })).toEqual([""]);
    expect(paths({ ...typed, fsw: "100 kV" })).toEqual(["fsw"]);
    expect(paths({ ...typed, efficiency: "120 %" })).toEqual(["efficiency"]);
    expect(paths({ ...typed, topology: "cuk" })).toEqual(["topology"]);
  });
});
