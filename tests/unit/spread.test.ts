import { describe, expect, it } from "vitest";
import { demoOptions, evaluateDesign } from "@/models";
import { parseDesign, type Design } from "@/models/input";
import { COMMON_PRACTICE_TOLERANCE, monteCarlo, monteCarloDesigns } from "@/models/spread";
import { createRng } from "@/models/rng";

function demo(key: string): Design {
  const r = parseDesign(demoOptions.find((o) => o.key === key)!.input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

/** Hottest Tj of a part over the given corners by a full evaluation; null = runaway somewhere. */
function hottest(design: Design, part: string, cornerIds: string[]): number | null {
  let t = Number.NEGATIVE_INFINITY;
  for (const c of evaluateDesign(design, { corners: cornerIds }).corners) {
    const j = c.parts.find((p) => p.id === part)!.junction!;
    if (j.runaway) return null;
    t = Math.max(t, j.tj);
  }
  return t;
}

function zeroTolerance(d: Design): Design {
  const z = structuredClone(d);
  const zero = { qg: 0, rdsOn: 0, vpl: 0, hfe: 0, vbe: 0, iq: 0, resistance: 0, rth: 0 };
  z.controller.tolerance = zero;
  for (const p of z.positions) {
    p.mosfet.tolerance = zero;
    if (p.drive.kind === "bjt-follower") p.drive.npn.tolerance = p.drive.pnp.tolerance = zero;
    if (p.drive.kind === "driver-ic") p.drive.tolerance = zero;
  }
  return z;
}

describe("monteCarlo", () => {
  it("same seed gives identical numbers; a different seed different ones", () => {
    const d = demo("bjt-small");
    const a = monteCarlo(d, { samples: 200, seed: 7 });
    const b = monteCarlo(d, { samples: 200, seed: 7 });
    const c = monteCarlo(d, { samples: 200, seed: 8 });
    expect(b).toEqual(a);
    const p50 = (r: typeof a) => r.parts.map((p) => p.tj.p50);
    expect(p50(c)).not.toEqual(p50(a));
  });

  it("zero tolerance: every sample equals the nominal evaluation", () => {
    const d = zeroTolerance(demo("bjt-small"));
    const r = monteCarlo(d, { samples: 50, seed: 1, corner: "all", defaults: "none" });
    expect(r.parameters.every((p) => p.tolerance === 0)).toBe(true);
    const ids = d.corners.map((c) => c.id);
    for (const p of r.parts) {
      const want = hottest(d, p.id, ids) as number;
      expect(p.nominalTj).toBeCloseTo(want, 9);
      for (const v of Object.values(p.tj)) expect(Math.abs((v as number) - want)).toBeLessThan(1e-9 * want);
      expect(p.runaway).toBe(0);
    }
  });

  it("each sample equals a fresh evaluation of that perturbed design", () => {
    const d = demo("transformer");
    const one = monteCarlo(d, { samples: 1, seed: 99 });
    const [sampled] = monteCarloDesigns(d, { seed: 99 }, 1);
    for (const p of one.parts) {
      const want = hottest(sampled, p.id, one.cornerIds) as number;
      expect(Math.abs((p.tj.p50 as number) - want), p.id).toBeLessThan(1e-9 * want);
    }
    // Three samples at one corner (the drive-stage cache must not carry over between samples):
    // the median and the max are order statistics of the three evaluations.
    const f = demo("bjt-small");
    const three = monteCarlo(f, { samples: 3, seed: 5, corner: "vmax" });
    const designs = monteCarloDesigns(f, { seed: 5 }, 3);
    for (const p of three.parts) {
      const v = designs.map((x) => hottest(x, p.id, three.cornerIds) as number).sort((a, b) => a - b);
      expect(p.tj.p50 as number).toBeCloseTo(v[1], 9);
      expect(p.tj.max as number).toBeCloseTo(v[2], 9);
    }
  });

  it("percentiles are ordered and probabilities agree with them", () => {
    const r = monteCarlo(demo("transformer"), { samples: 400, seed: 3 });
    for (const p of r.parts) {
      const { p5, p50, p95, p99, max } = p.tj as unknown as Record<string, number>;
      expect(p5).toBeLessThanOrEqual(p50);
      expect(p50).toBeLessThanOrEqual(p95);
      expect(p95).toBeLessThanOrEqual(p99);
      expect(p99).toBeLessThanOrEqual(max);
      if (max <= p.limit) expect(p.pOverLimit).toBe(0);
      if (p5 > p.limit) expect(p.pOverLimit).toBeGreaterThanOrEqual(0.95);
      expect(p.pOverTjMax).toBeLessThanOrEqual(p.pOverLimit);
      expect(p.pOverLimitCi95[0]).toBeLessThanOrEqual(p.pOverLimit);
      expect(p.pOverLimitCi95[1]).toBeGreaterThanOrEqual(p.pOverLimit);
    }
    // This option's driver sits above its derated limit at nominal: most samples do too.
    const drv = r.parts.find((p) => p.id === "Q1.driver")!;
    expect(drv.nominalTj as number).toBeGreaterThan(drv.limit);
    expect(drv.pOverLimit).toBeGreaterThan(0.5);
  });

  it("counts runaway samples and reports their percentiles as null, never NaN", () => {
    const d = demo("direct");
    // Nominal loop gain just under 1 at Vin min: part spread pushes some samples over.
    d.positions[0].mosfet.rthSA = 112;
    const r = monteCarlo(d, { samples: 300, seed: 11, corner: "vmin" });
    const q1 = r.parts.find((p) => p.id === "Q1")!;
    expect(q1.runaway).toBeGreaterThan(0);
    expect(q1.runaway).toBeLessThan(300);
    expect(q1.tj.max).toBeNull();
    expect(q1.tj.p5).not.toBeNull();
    expect(q1.pOverTjMax).toBeGreaterThanOrEqual(q1.runaway / 300);
    for (const p of r.parts) for (const v of Object.values(p.tj)) expect(v === null || Number.isFinite(v)).toBe(true);
  });

  it("takes tolerances from the design, falls back to the common-practice table, and stays inside the band", () => {
    const d = demo("direct");
    const r = monteCarlo(d, { samples: 10, seed: 1 });
    const find = (part: string, parameter: string) => r.parameters.find((p) => p.part === part && p.parameter === parameter)!;
    expect(find("Q1", "qg")).toMatchObject({ tolerance: 0.15, source: "design" });
    expect(find("Q1", "resistance")).toMatchObject({ tolerance: COMMON_PRACTICE_TOLERANCE.resistance, source: "common practice" });
    const n = 3000;
    const rds = monteCarloDesigns(d, { seed: 21 }, n).map((x) => x.positions[0].mosfet.rds25 / d.positions[0].mosfet.rds25 - 1);
    expect(Math.max(...rds.map(Math.abs))).toBeLessThanOrEqual(0.2 + 1e-12);
    const mean = rds.reduce((s, v) => s + v, 0) / n;
    const sd = Math.sqrt(rds.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1));
    // ±3σ truncated at ±3σ: σ_truncated = 0.9866·σ (standard truncated-normal variance formula).
    expect(Math.abs(mean)).toBeLessThan(0.005);
    expect(sd).toBeGreaterThan(0.2 / 3 * 0.9866 * 0.95);
    expect(sd).toBeLessThan(0.2 / 3 * 0.9866 * 1.05);
  });
});

describe("rng", () => {
  it("is reproducible and spreads seeds apart", () => {
    const a = createRng(1), b = createRng(1), c = createRng(2);
    const xa = Array.from({ length: 5 }, () => a.uniform());
    expect(Array.from({ length: 5 }, () => b.uniform())).toEqual(xa);
    expect(Array.from({ length: 5 }, () => c.uniform())).not.toEqual(xa);
  });

  it("uniform in [0,1) with mean ½; truncated normal inside the limit with unit-ish spread", () => {
    const r = createRng(123);
    const n = 20000;
    let s = 0, lo = 1, hi = 0;
    for (let i = 0; i < n; i++) {
      const u = r.uniform();
      s += u;
      lo = Math.min(lo, u);
      hi = Math.max(hi, u);
    }
    expect(lo).toBeGreaterThanOrEqual(0);
    expect(hi).toBeLessThan(1);
    expect(Math.abs(s / n - 0.5)).toBeLessThan(0.01);
    let s2 = 0, m = 0;
    for (let i = 0; i < n; i++) {
      const z = r.truncatedNormal(3);
      expect(Math.abs(z)).toBeLessThanOrEqual(3);
      s2 += z * z;
      m += z;
    }
    expect(Math.abs(m / n)).toBeLessThan(0.03);
    expect(Math.sqrt(s2 / n)).toBeCloseTo(0.9866, 1);
  });
});
