/**
 * Gate charge curve Q(Vgs) from datasheet points (DOMAIN item 1).
 *
 * Piecewise-linear model of the datasheet "gate charge" plot:
 *  - 0 … Vpl: linear, reaching Qgs at the plateau (a constant Ciss-like
 *    slope Qgs/Vpl; the real curve is slightly concave, ignored);
 *  - at Vpl: a flat plateau worth Qgd (the Miller charge);
 * *  - above Vpl: linear to Qg at its test gate voltage qgVgs, extrapolated beyond;
 *  - below 0 V (negative bias): slope Ciss. With no Ciss given we take
 *    Qgs/Vpl, i.e. the same slope as below the plateau, because at negative
 *    Vgs the channel is off and the gate sees Cgs + Cgd(at high Vds), the
 *    same capacitance the 0 … Vpl segment represents (our assumption;
 *    datasheet Ciss is measured at Vgs = 0 and is usually a little larger).
 * Charges are for one device; multiply by the number in parallel.
 * Reference for the curve's shape: Erickson & Maksimović, Fundamentals of
 * Power Electronics 3rd ed. 2020, MOSFET switching (from memory); Baliga
 * 2nd ed. 2019 on the gate charge characteristic (from memory).
 */

export interface GateChargeCurve {
  qgs: number;
  qgd: number;
  qg: number;
  qgVgs: number;
  vth: number;
  vpl: number;
  ciss?: number;
}

/** Slope of Q(Vgs) below 0 V, F. */
export function negativeSlope(c: GateChargeCurve): number {
  return c.ciss ?? c.qgs / Math.max(c.vpl, 1e-9);
}

/**
 * Q(Vgs), C. A level exactly at Vpl counts Qgs only: the gate has not yet
 * crossed the plateau there.
 */
export function chargeAt(c: GateChargeCurve, vgs: number): number {
  if (vgs <= 0) return negativeSlope(c) * vgs;
  const vpl = Math.max(c.vpl, 1e-9);
  if (vgs <= vpl) return (c.qgs * vgs) / vpl;
  const above = Math.max(c.qg - c.qgs - c.qgd, 0) / Math.max(c.qgVgs - vpl, 1e-9);
  return c.qgs + c.qgd + above * (vgs - vpl);
}

/** Swing charge ΔQ = Q(vHigh) − Q(vLow), C (zero if the swing is reversed). */
export function swingCharge(c: GateChargeCurve, vHigh: number, vLow: number): number {
  if (!(vHigh > vLow)) return 0;
  return chargeAt(c, vHigh) - chargeAt(c, vLow);
}

/** All charges (and Ciss) × k: a bigger or smaller die of the same family. */
export function scaleCurve<T extends GateChargeCurve>(c: T, k: number): T {
  return {
    ...c,
    qgs: c.qgs * k,
    qgd: c.qgd * k,
    qg: c.qg * k,
    ...(c.ciss !== undefined ? { ciss: c.ciss * k } : {}),
  };
}

/** Qgs2: charge from Vth to Vpl, the part of Qgs during which the drain current rises. */
export function qgs2(c: GateChargeCurve): number {
  const vpl = Math.max(c.vpl, 1e-9);
  return (c.qgs * Math.max(vpl - Math.max(c.vth, 0), 0)) / vpl;
}
