import { describe, expect, it } from "vitest";
import { z } from "zod";
import { formatQuantity, parseQuantity, qty } from "@/models/input/units";

describe("parseQuantity (unit strings at the model edge, SI inside)", () => {
  it.each([
    ["47 nC", "charge", 47e-9],
    ["250 kHz", "frequency", 250e3],
    ["4.7 Ω", "resistance", 4.7],
    ["4.7 ohm", "resistance", 4.7],
    ["12 mΩ", "resistance", 0.012],
    ["2.2 kΩ", "resistance", 2200],
    ["1.2 nF", "capacitance", 1.2e-9],
    ["300 µH", "inductance", 300e-6],
    ["50 ns", "time", 50e-9],
    ["3 uJ", "energy", 3e-6],
    ["1.5 W", "power", 1.5],
    ["-5 V", "voltage", -5],
    ["600 mA", "current", 0.6],
  ] as const)("%s -> %s %d", (text, dim, si) => {
    expect(parseQuantity(text, dim) / si).toBeCloseTo(1, 12);
  });

  it("keeps temperatures in °C and reads °C/W as K/W and a difference in °C as K", () => {
    expect(parseQuantity("85 °C", "temperature")).toBeCloseTo(85, 12);
    expect(parseQuantity("85 degC", "temperature")).toBeCloseTo(85, 12);
    expect(parseQuantity("358.15 K", "temperature")).toBeCloseTo(85, 9);
    expect(parseQuantity("12 K/W", "thermalResistance")).toBe(12);
    expect(parseQuantity("12 °C/W", "thermalResistance")).toBe(12);
    expect(parseQuantity("25 °C", "temperatureDifference")).toBe(25);
    expect(parseQuantity("25 K", "temperatureDifference")).toBe(25);
  });

  it("reads ratios and costs without mathjs units", () => {
    expect(parseQuantity("45 %", "ratio")).toBeCloseTo(0.45, 12);
    expect(parseQuantity("0.45", "ratio")).toBe(0.45);
    expect(parseQuantity("1.20 USD", "cost")).toBe(1.2);
    expect(parseQuantity("$0.35", "cost")).toBe(0.35);
  });

  it("takes numbers as SI and refuses wrong dimensions, bare numbers in strings and absurd values", () => {
    expect(parseQuantity(4.7e-8, "charge")).toBe(4.7e-8);
    expect(() => parseQuantity("4.7 V", "charge")).toThrow('expected a charge (e.g. "47 nC"), got "4.7 V"');
    expect(() => parseQuantity("47", "charge")).toThrow(/expected a charge/);
    expect(() => parseQuantity("47 foo", "charge")).toThrow(/expected a charge/);
    expect(() => parseQuantity("1e400 V", "voltage")).toThrow();
    expect(() => parseQuantity(Number.NaN, "voltage")).toThrow();
    expect(() => parseQuantity(1e300, "voltage")).toThrow(/plausible range/);
  });
});

describe("qty zod field", () => {
  it("outputs SI numbers and reports the field path with a plain message", () => {
    const s = z.object({ mosfet: z.object({ qg: qty("charge", { gt: 0 }) }) });
    expect(s.parse({ mosfet: { qg: "47 nC" } }).mosfet.qg).toBeCloseTo(47e-9, 20);
    const bad = s.safeParse({ mosfet: { qg: "4.7 V" } });
    expect(bad.success).toBe(false);
    if (!bad.success) {
      expect(bad.error.issues[0].path).toEqual(["mosfet", "qg"]);
      expect(bad.error.issues[0].message).toBe('expected a charge (e.g. "47 nC"), got "4.7 V"');
    }
    const neg = s.safeParse({ mosfet: { qg: 0 } });
    expect(neg.success).toBe(false);
  });
});

describe("formatQuantity", () => {
  it("uses SI prefixes", () => {
    expect(formatQuantity(4.7e-8, "charge")).toBe("47 nC");
    expect(formatQuantity(250e3, "frequency")).toBe("250 kHz");
    expect(formatQuantity(0.012, "resistance")).toBe("12 mΩ");
    expect(formatQuantity(85, "temperature")).toBe("85 °C");
    expect(formatQuantity(999.96, "voltage")).toBe("1 kV");
  });
});
