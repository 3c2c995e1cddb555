// Circuit values taken from the model's inputs, so ngspice simulates the
// circuit the model describes. Only inputs cross over here, never results.
import { chargeAt, type GateChargeCurve } from "@/models";
import { parseDesign, type Design, type DesignInput } from "@/models/input";
import type { GateLoad } from "./netlists";

export function designOf(input: DesignInput): Design {
  const r = parseDesign(input);
  if (!r.ok) throw new Error(`demo design does not parse: ${JSON.stringify(r.issues)}`);
  return r.design;
}

/**
 * The datasheet gate-charge curve as a pwl Q(V) table for ngspice. The
 * model's flat plateau becomes a 20 mV ramp carrying Qgd (a true step has no
 * finite dQ/dV); every breakpoint has the model's charge.
 */
export function curveLoad(c: GateChargeCurve, vMin = -25, vMax = 30): GateLoad {
  const vs = [vMin, 0, c.vpl, c.vpl + 0.02, c.qgVgs, vMax];
  return { kind: "curve", points: vs.map((v) => [v, chargeAt(c, v)] as [number, number]) };
}

/** ∫ v dQ from a to b along a pwl Q(V) table (exact for piecewise-linear Q). */
export function integralVdQ(points: Array<[number, number]>, a: number, b: number): number {
  let s = 0;
  for (let k = 1; k < points.length; k++) {
    const [v0, q0] = points[k - 1];
    const [v1, q1] = points[k];
    const lo = Math.max(v0, a), hi = Math.min(v1, b);
    if (!(hi > lo)) continue;
    const slope = (q1 - q0) / (v1 - v0);
    s += slope * (hi * hi - lo * lo) / 2;
  }
  return s;
}

/** Q at v on a pwl table. */
export function chargeOn(points: Array<[number, number]>, v: number): number {
  for (let k = 1; k < points.length; k++) {
    const [v0, q0] = points[k - 1];
    const [v1, q1] = points[k];
    if (v <= v1 || k === points.length - 1) return q0 + ((q1 - q0) * (v - v0)) / (v1 - v0);
  }
  return points[0][1];
}
