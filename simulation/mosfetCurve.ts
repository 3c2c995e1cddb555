// Integrals over a datasheet capacitance curve given as points, the way a
// designer reads the log-log plot: between two points C follows a power law
// C = C1·(V/V1)^p, which integrates in closed form; below the first point C
// is taken as constant. Used by the tests to hold the AC deck against the
// transient ones (charge and energy from ∫C dV and ∫V·C dV).
import type { CapacitancePoint } from "./mosfetSheet";

type Which = "ciss" | "coss" | "crss";

/** ∫ V^k · C(V) dV over [v1, v2] (0 ≤ v1 ≤ v2), k = 0 for charge, 1 for energy. */
export function curveIntegral(curve: CapacitancePoint[], which: Which, v1: number, v2: number, k: 0 | 1): number {
  if (!(v1 >= 0 && v2 >= v1)) throw new Error(`bad interval [${v1}, ${v2}]`);
  const last = curve[curve.length - 1];
  if (v2 > last.vds * (1 + 1e-9)) throw new Error(`${v2} V is beyond the curve (${last.vds} V)`);
  let s = 0;
  const first = curve[0];
  if (v1 < first.vds) {
    const b = Math.min(v2, first.vds);
    s += (first[which] * (b ** (k + 1) - v1 ** (k + 1))) / (k + 1);
  }
  for (let i = 1; i < curve.length; i++) {
    const a = Math.max(v1, curve[i - 1].vds);
    const b = Math.min(v2, curve[i].vds);
    if (b <= a) continue;
    const [p0, p1] = [curve[i - 1], curve[i]];
    const p = Math.log(p1[which] / p0[which]) / Math.log(p1.vds / p0.vds);
    // ∫ C0·(V/V0)^p · V^k dV = C0/V0^p · [V^(p+k+1)/(p+k+1)]
    const e = p + k + 1;
    const f = (v: number) => (Math.abs(e) < 1e-12 ? Math.log(v) : v ** e / e);
    s += (p0[which] / p0.vds ** p) * (f(b) - f(a));
  }
  return s;
}

/** C at V, power law between points (constant below the first). */
export function curveAt(curve: CapacitancePoint[], which: Which, v: number): number {
  if (v <= curve[0].vds) return curve[0][which];
  for (let i = 1; i < curve.length; i++) {
    if (v <= curve[i].vds) {
      const [p0, p1] = [curve[i - 1], curve[i]];
      const p = Math.log(p1[which] / p0[which]) / Math.log(p1.vds / p0.vds);
      return p0[which] * (v / p0.vds) ** p;
    }
  }
  throw new Error(`${v} V is beyond the curve`);
}
