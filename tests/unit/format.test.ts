import { describe, expect, it } from "vitest";
import { formatSi, siParts, MINUS, NO_VALUE } from "@/lib/format";

// Tests compare with a plain space; the formatter uses U+00A0.
const fmt = (...args: Parameters<typeof formatSi>) => formatSi(...args).replace(/\u00a0/g, " ");

describe("formatSi", () => {
  it("prints the examples the UI relies on", () => {
    expect(fmt(47e-9, "C")).toBe("47 nC");
    expect(fmt(1.3201, "W")).toBe("1.32 W");
    expect(fmt(104.62, "°C", 4)).toBe("104.6 °C");
  });

  it("chooses the prefix by engineering exponent", () => {
    expect(fmt(4.7, "Ω")).toBe("4.7 Ω");
    expect(fmt(0.0042, "Ω")).toBe("4.2 mΩ");
    expect(fmt(2.2e-12, "F")).toBe("2.2 pF");
    expect(fmt(350e-6, "J")).toBe("350 µJ");
    expect(fmt(250_000, "Hz")).toBe("250 kHz");
    expect(fmt(1.2e6, "Hz")).toBe("1.2 MHz");
    expect(fmt(12e-9, "s")).toBe("12 ns");
    expect(fmt(400, "V")).toBe("400 V");
  });

  it("uses the micro sign U+00B5 and a no-break space", () => {
    expect(formatSi(3.3e-6, "F")).toBe("3.3\u00a0\u00b5F");
  });

  it("rounds to significant figures and drops trailing zeros", () => {
    expect(fmt(1.23456, "W", 2)).toBe("1.2 W");
    expect(fmt(1.5, "W", 3)).toBe("1.5 W");
    expect(fmt(0.1 + 0.2, "A")).toBe("300 mA");
    expect(fmt(123456, "Hz", 2)).toBe("120 kHz");
  });

  it("carries into the next prefix when rounding reaches a thousand", () => {
    expect(fmt(0.99996, "W", 3)).toBe("1 W");
    expect(fmt(999.96e-3, "A", 4)).toBe("1 A");
    expect(fmt(999_960, "Hz", 3)).toBe("1 MHz");
    expect(fmt(999.4e-9, "C", 3)).toBe("999 nC");
  });

  it("never prefixes temperatures, kelvin differences and thermal resistances", () => {
    expect(fmt(1500, "K")).toBe("1500 K");
    expect(fmt(1549, "K", 2)).toBe("1500 K");
    expect(fmt(0.45, "K/W")).toBe("0.45 K/W");
    expect(fmt(0.0123, "°C")).toBe("0.0123 °C");
    expect(fmt(62.5, "°C/W")).toBe("62.5 °C/W");
    expect(fmt(87.25, "%", 3)).toBe("87.3 %");
  });

  it("prints negatives with a typographic minus", () => {
    expect(fmt(-3.24, "K")).toBe(`${MINUS}3.24 K`);
    expect(fmt(-5e-3, "V")).toBe(`${MINUS}5 mV`);
  });

  it("does not print a signed zero", () => {
    expect(fmt(0, "W")).toBe("0 W");
    expect(fmt(-0, "W")).toBe("0 W");
    expect(fmt(-0.00001, "K", 2)).toBe(`${MINUS}0.00001 K`);
  });

  it("shows a dash, not a number, for NaN and infinities", () => {
    expect(fmt(Number.NaN, "W")).toBe(`${NO_VALUE} W`);
    expect(fmt(Number.POSITIVE_INFINITY, "°C")).toBe(`${NO_VALUE} °C`);
  });

  it("clamps at the ends of the prefix table", () => {
    expect(fmt(3e-18, "F")).toBe("0.003 fF");
    expect(fmt(5e15, "Hz")).toBe("5000 THz");
  });

  it("handles a bare number without a unit", () => {
    expect(formatSi(2.5, "")).toBe("2.5");
    expect(formatSi(12_000, "", 3)).toBe("12000");
  });

  it("clamps the digit count to a sane range", () => {
    expect(fmt(1.26, "W", 0)).toBe("1 W");
    expect(fmt(1.26, "W", 2.4)).toBe("1.3 W");
  });
});

describe("siParts", () => {
  it("splits mantissa, prefix and unit for separate styling", () => {
    expect(siParts(47e-9, "C")).toEqual({ mantissa: "47", prefix: "n", unit: "C" });
    expect(siParts(-0.0042, "Ω")).toEqual({ mantissa: `${MINUS}4.2`, prefix: "m", unit: "Ω" });
  });
});
