// VDMOS cards become deck text only from numbers and known parameter names.
import { describe, expect, it } from "vitest";
import { modelLine, type VdmosCard } from "@/simulation/mosfetCard";

const ok: VdmosCard = { name: "t60", params: { vto: 3, kp: 20, cgdmax: 1e-9 } };

describe("modelLine", () => {
  it("writes known parameters in exponent notation", () => {
    expect(modelLine(ok)).toBe(".model t60 VDMOS(vto=3.000000000e+0 kp=2.000000000e+1 cgdmax=1.000000000e-9)");
  });

  it.each(["T60 x", "t60\n.include /etc/passwd", "", "9a", "a".repeat(17)])("refuses the model name %j", (name) => {
    expect(() => modelLine({ ...ok, name })).toThrow(/model name/);
  });

  it("refuses an unknown parameter", () => {
    expect(() => modelLine({ name: "t60", params: { vto: 3, "x) .control": 1 } as VdmosCard["params"] })).toThrow(/unknown VDMOS parameter/);
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY])("refuses the value %d", (v) => {
    expect(() => modelLine({ name: "t60", params: { vto: v } })).toThrow(/non-finite/);
  });

  it("refuses a value that is not a number", () => {
    expect(() => modelLine({ name: "t60", params: { vto: "3 .include x" as unknown as number } })).toThrow(/not a number/);
  });
});
