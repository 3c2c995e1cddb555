import { describe, expect, it } from "vitest";
import { assertFinite } from "@/lib/finite";
import { AppError } from "@/lib/errors";
import { evaluateDesign } from "@/models/evaluate";
import { parseDesign } from "@/models/input/schema";
import { demoOptions } from "@/models/demo";

function caught(v: unknown): AppError | null {
  try {
    assertFinite(v);
    return null;
  } catch (e) {
    return e as AppError;
  }
}

describe("assertFinite, the guard on every evaluation answer", () => {
  it("passes a whole demo evaluation (the model promises finite numbers)", () => {
    for (const o of demoOptions) {
      const p = parseDesign(o.input);
      if (!p.ok) throw new Error(o.key);
      expect(caught({ evaluation: evaluateDesign(p.design) })).toBeNull();
    }
  });

  it.each([
    [{ a: { b: [1, 2, Number.NaN] } }, "result.a.b.2"],
    [{ corners: [{ parts: [{ total: 1 }, { total: Infinity }] }] }, "result.corners.0.parts.1.total"],
    [[-Infinity], "result.0"],
  ])("refuses a non-finite number with a 422 naming where (%#)", (value, where) => {
    const e = caught(value);
    expect(e).toBeInstanceOf(AppError);
    expect(e!.status).toBe(422);
    expect(e!.message).toContain(`at ${where};`);
  });

  it("ignores strings, booleans and null", () => {
    expect(caught({ s: "NaN", b: true, n: null, u: undefined })).toBeNull();
  });
});
