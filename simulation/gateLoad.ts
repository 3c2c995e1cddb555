// The MOSFET gate as a charge-conserving element: Q(Vgs) through a
// piecewise-linear table, so the current is dQ/dt and a full cycle returns
// every coulomb (no energy is created or lost in the element itself).
import { deckName } from "./bjt";
import { sp } from "./ngspice";

/** Gate load: a linear capacitance, or a pwl Q(Vgs) through (v, q) points, v ascending, q in C. */
export type GateLoad = { kind: "linear"; c: number } | { kind: "curve"; points: Array<[number, number]> };

/** Datasheet gate-charge figures (SI): Qgs to the plateau, Qgd on it, Qg at vTest; ciss below 0 V. */
export interface GateChargeFigures {
  qgs: number;
  qgd: number;
  qg: number;
  vTest: number;
  vpl: number;
  ciss: number;
}

/**
 * The datasheet curve as a table: linear to the plateau, Qgd over a 20 mV
 * ramp (a true step has no finite dQ/dV), linear to Qg at vTest and on with
 * that slope; below 0 V the Ciss slope. Table from vMin to vMax.
 */
export function gateCurve(f: GateChargeFigures, vMin = -25, vMax = 30): GateLoad {
  const above = (f.qg - f.qgs - f.qgd) / (f.vTest - f.vpl - 0.02);
  const pts: Array<[number, number]> = [
    [vMin, f.ciss * vMin],
    [0, 0],
    [f.vpl, f.qgs],
    [f.vpl + 0.02, f.qgs + f.qgd],
    [f.vTest, f.qg],
    [vMax, f.qg + above * (vMax - f.vTest)],
  ];
  return { kind: "curve", points: pts };
}

/** Q at v on the load (C). */
export function chargeAt(load: GateLoad, v: number): number {
  if (load.kind === "linear") return load.c * v;
  const p = load.points;
  let k = 1;
  while (k < p.length - 1 && v > p[k][0]) k++;
  const [v0, q0] = p[k - 1], [v1, q1] = p[k];
  return q0 + ((q1 - q0) * (v - v0)) / (v1 - v0);
}

/** ∫ (v − ref) dQ from a to b along the load (J): the energy the gate holds at b relative to a, seen from ref. */
export function energyOnCurve(load: GateLoad, a: number, b: number, ref = a): number {
  const seg = (c: number, x0: number, x1: number) => (c * ((x1 - ref) ** 2 - (x0 - ref) ** 2)) / 2;
  if (load.kind === "linear") return seg(load.c, a, b);
  const lo = Math.min(a, b), hi = Math.max(a, b);
  let s = 0;
  for (let k = 1; k < load.points.length; k++) {
    const [v0, q0] = load.points[k - 1], [v1, q1] = load.points[k];
    const x0 = Math.max(v0, lo), x1 = Math.min(v1, hi);
    if (x1 > x0) s += seg((q1 - q0) / (v1 - v0), x0, x1);
  }
  return b >= a ? s : -s;
}

/**
 * Deck lines of the load between `node` and ground. The curve is a B-source
 * giving Q (in nC) on an auxiliary node; a 1 nF capacitor then carries
 * dQ/dt, which a second B-source draws from the gate node. The 1 GΩ leak
 * gives the node a DC path.
 */
export function gateElement(node: string, load: GateLoad, tag = "g"): string {
  const n = deckName(node), t = deckName(tag);
  if (load.kind === "linear") return `C${t} ${n} 0 ${sp(load.c)}`;
  const pts = load.points.map(([v, q]) => `${sp(v)},${sp(q * 1e9)}`).join(", ");
  return [
    `B${t}qv ${t}qn 0 V = pwl(v(${n}), ${pts})`,
    `C${t}q ${t}qn ${t}qs 1n`,
    `V${t}qs ${t}qs 0 0`,
    `B${t}i ${n} 0 I = i(V${t}qs)`,
    `R${t}leak ${n} 0 1e9`,
  ].join("\n");
}

/** Swing charge of the load between two gate levels (C). */
export function swingCharge(load: GateLoad, vLow: number, vHigh: number): number {
  return chargeAt(load, vHigh) - chargeAt(load, vLow);
}
