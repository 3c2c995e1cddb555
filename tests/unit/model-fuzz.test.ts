/**
 * Property-based robustness: parseDesign never throws on anything, and
 * evaluateDesign on anything that parses never throws and returns only
 * finite numbers. FUZZ_RUNS scales the run count (default keeps it ~seconds).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseDesign, type Design } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { demoFollowerHighCurrent, demoOptions } from "@/models/demo";

const RUNS = Number(process.env.FUZZ_RUNS ?? 400);
/** A large FUZZ_RUNS needs more than vitest's default 5 s per test. */
const TIMEOUT = Math.max(20_000, RUNS * 30);
const inputs = [...demoOptions, demoFollowerHighCurrent].map((o) => o.input);
const designs: Design[] = inputs.map((i) => {
  const r = parseDesign(i);
  if (!r.ok) throw new Error("demo must parse");
  return r.design;
});

/** Every number in a result must be finite; returns the first offending path. */
function firstNonFinite(x: unknown, path = "$"): string | null {
  if (typeof x === "number") return Number.isFinite(x) ? null : path;
  if (Array.isArray(x)) {
    for (let i = 0; i < x.length; i++) {
      const bad = firstNonFinite(x[i], `${path}[${i}]`);
      if (bad) return bad;
    }
    return null;
  }
  if (x && typeof x === "object") {
    for (const [k, v] of Object.entries(x)) {
      const bad = firstNonFinite(v, `${path}.${k}`);
      if (bad) return bad;
    }
  }
  return null;
}

function paths(x: unknown, prefix: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  if (x && typeof x === "object") {
    for (const [k, v] of Object.entries(x)) {
      const p = [...prefix, Array.isArray(x) ? Number(k) : k];
      out.push(p);
      paths(v, p, out);
    }
  }
  return out;
}

function setAt(root: unknown, path: (string | number)[], value: unknown, remove: boolean): void {
  let o = root as Record<string | number, unknown>;
  for (let i = 0; i < path.length - 1; i++) {
    o = o[path[i]] as Record<string | number, unknown>;
    if (!o || typeof o !== "object") return; // an earlier edit replaced this branch
  }
  const last = path[path.length - 1];
  if (remove && !Array.isArray(o)) delete o[last];
  else o[last] = value;
}

const nasty = fc.oneof(
  fc.jsonValue(),
  fc.double(),
  fc.constantFrom(0, -0, 1e-300, 1e300, -1e300, Number.MAX_VALUE, Number.MIN_VALUE, -1, 1e9, -1e9),
  fc.constantFrom("", "4.7 V", "47 nC", "1e400 V", "-5 nC", "NaN A", "12 K/W", "85 °C", "0 Ω", "∞", "2 * 3 V", "50 %", "$-1"),
  fc.string(),
);

function checkEvaluation(raw: unknown): void {
  const r = parseDesign(raw);
  if (!r.ok) {
    for (const i of r.issues) expect(typeof i.message).toBe("string");
    return;
  }
  const e = evaluateDesign(r.design);
  expect(firstNonFinite(e)).toBeNull();
}

describe("fuzz: parse and evaluate are total and finite", () => {
  it("random JSON never makes parseDesign throw", () => {
    fc.assert(fc.property(fc.jsonValue(), (v) => { parseDesign(v); }), { numRuns: RUNS * 2 });
  }, TIMEOUT);

  it("mutated demo documents (unit strings) never throw and evaluate to finite numbers", () => {
    const arb = fc.record({
      doc: fc.integer({ min: 0, max: inputs.length - 1 }),
      edits: fc.array(fc.record({ at: fc.nat(), value: nasty, remove: fc.boolean() }), { minLength: 1, maxLength: 4 }),
    });
    fc.assert(
      fc.property(arb, ({ doc, edits }) => {
        const d = structuredClone(inputs[doc]);
        const all = paths(d);
        for (const e of edits) setAt(d, all[e.at % all.length], e.value, e.remove);
        checkEvaluation(d);
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);

  it("extreme but valid numbers (SI designs scaled by 10^±8 per field) evaluate to finite numbers", () => {
    const arb = fc.record({
      doc: fc.integer({ min: 0, max: designs.length - 1 }),
      edits: fc.array(fc.record({ at: fc.nat(), exp: fc.integer({ min: -8, max: 8 }), zero: fc.boolean() }), { minLength: 1, maxLength: 8 }),
    });
    fc.assert(
      fc.property(arb, ({ doc, edits }) => {
        const d = structuredClone(designs[doc]);
        const numeric = paths(d).filter((p) => {
          let o: unknown = d;
          for (const k of p) o = (o as Record<string | number, unknown>)[k];
          return typeof o === "number";
        });
        for (const e of edits) {
          const p = numeric[e.at % numeric.length];
          let o: unknown = d;
          for (const k of p) o = (o as Record<string | number, unknown>)[k];
          setAt(d, p, e.zero ? 0 : (o as number) * 10 ** e.exp, false);
        }
        checkEvaluation(d);
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);
});
