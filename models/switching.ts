/**
 * Switching loss of a hard-switched MOSFET with a clamped inductive load
 * (DOMAIN item 7).
 *
 * With an inductive load clamped by a diode, at turn-on the drain current
 * rises to Id at full Vds (gate climbing Vth → Vpl, charge Qgs2), then Vds
 * falls while the gate sits on the Miller plateau (charge Qgd); turn-off
 * runs the same in reverse. With a constant gate current I on the plateau:
 *   t_i ≈ Qgs2 / I,  t_v = Qgd / I,  E = ½·Vds·Id·(t_i + t_v)  per edge,
 * the linear-ramp overlap (Erickson & Maksimović, Fundamentals of Power
 * Electronics 3rd ed. 2020, ch. 4 "switching loss" with a clamped inductive
 * load; Mohan, Undeland & Robbins 3rd ed. 2003, ch. 2 and ch. 22 gate-drive
 * discussion; recalled from memory, the ½·V·I·t form is theirs, using
 * Qgs2/I for the current-rise time is the common datasheet-application
 * practice). The gate current changes during t_i (it is larger below the
 * plateau); taking the plateau current for both intervals slightly
 * overestimates t_i.
 * At hard turn-on the switch also dumps its own Eoss into the channel and
 * carries the reverse recovery of the commutated diode at full Vds (≈ Qrr·Vds,
 * the usual first-order estimate; the recovery also lengthens t_i, ignored).
 * Soft (ZVS) turn-on: Vds is already ~0, so the turn-on terms drop out.
 */
import { MAX_EDGE_FRACTION_OF_PERIOD } from "./policy";

export interface HardEdge {
  /** Current rise (turn-on) / fall (turn-off) time, s. */
  ti: number;
  /** Voltage fall (turn-on) / rise (turn-off) time, s. */
  tv: number;
  /** V–I overlap energy, J. */
  energy: number;
  /** True when the edge had to be capped at MAX_EDGE_FRACTION_OF_PERIOD of the period. */
  capped: boolean;
}

export function hardEdge({ vds, id, iGate, qgd, qgs2, fsw }: {
  vds: number; id: number; iGate: number; qgd: number; qgs2: number; fsw: number;
}): HardEdge {
  const ig = Math.max(iGate, 1e-9);
  let ti = qgs2 / ig;
  let tv = qgd / ig;
  const maxTime = MAX_EDGE_FRACTION_OF_PERIOD / Math.max(fsw, 1e-9);
  const capped = ti + tv > maxTime;
  if (capped) {
    const k = maxTime / (ti + tv);
    ti *= k;
    tv *= k;
  }
  return { ti, tv, energy: 0.5 * vds * id * (ti + tv), capped };
}

export interface OutputCapacitance {
  /** Test Vds of the figures. */
  vds: number;
  eoss?: number;
  qoss?: number;
  coss?: number;
}

export type OutputCapacitanceFigure = "eoss" | "qoss" | "coss";

/** Which datasheet figure the Eoss(V) estimate starts from, and why (reported per position). */
export interface OutputCapacitanceBasis {
  figure: OutputCapacitanceFigure;
  reason: string;
}

/**
 * Eoss is what the loss needs, so it wins when given; Qoss comes next (one
 * conversion, Eoss = Qoss·V/3), Coss last (Eoss = ⅔·Coss·V²), both under
 * the Coss ∝ V^−½ assumption of schemaParts.ts.
 */
export function outputCapacitanceBasis(oc: OutputCapacitance | undefined): OutputCapacitanceBasis | null {
  if (!oc) return null;
  const given = (["eoss", "qoss", "coss"] as const).filter((k) => oc[k] !== undefined);
  const others = (skip: string) => given.filter((k) => k !== skip).map((k) => k.charAt(0).toUpperCase() + k.slice(1));
  const also = (skip: string) => (others(skip).length ? ` (${others(skip).join(" and ")} also given, not needed)` : "");
  if (oc.eoss !== undefined) return { figure: "eoss", reason: `Eoss is the energy the loss needs, used as given${also("eoss")}` };
  if (oc.qoss !== undefined)
    return { figure: "qoss", reason: `no Eoss given: Eoss = Qoss·Vds/3, assuming Coss ∝ Vds^-1/2${also("qoss")}` };
  if (oc.coss !== undefined) return { figure: "coss", reason: "no Eoss or Qoss given: Eoss = ⅔·Coss·Vds², assuming Coss ∝ Vds^-1/2" };
  return null;
}

/**
 * Eoss at V for one device, scaled from the datasheet figure assuming an
 * abrupt junction, Coss ∝ V^−½ (see schemaParts.ts): Eoss ∝ V^1.5.
 * The figure used is the one outputCapacitanceBasis names.
 */
export function eossAt(oc: OutputCapacitance | undefined, v: number): number {
  if (!oc || !(v > 0)) return 0;
  const atTest = oc.eoss ?? (oc.qoss !== undefined ? (oc.qoss * oc.vds) / 3 : ((oc.coss ?? 0) * 2 * oc.vds * oc.vds) / 3);
  return atTest * Math.pow(v / oc.vds, 1.5);
}
