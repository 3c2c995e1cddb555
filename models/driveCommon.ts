/**
 * Shared pieces of the drive-stage models: the result shape every stage
 * returns (gate-referred, independent of fsw and of the gate charge, so a
 * sweep over those can reuse it) and the series-path arithmetic.
 */
import type { LossMechanism } from "./losses";
import type { Design, Position } from "./input/schema";

/** Fraction of one edge's ½·ΔQ·ΔV energy burnt in a part. */
export interface Share {
  part: string;
  fraction: number;
}

export interface EdgePath {
  shares: Share[];
  /** Gate current at the start of the edge (full swing across the path), A. */
  iPeak: number;
  /** Gate current while the gate sits on the Miller plateau, A (sets edge times). */
  iPlateau: number;
  /** Series resistance of the path as seen by the gate, Ω (effective, incl. current limits). */
  rTotal: number;
  /** True when a buffer's gain collapse (hFE(Ic)) cut the plateau current. */
  starved: boolean;
  /** Buffer hFE at the edge's peak current, if a buffer is in the path. */
  hfe: number | null;
  /** hFE the resistors alone would have allowed (peak of the curve), for messages. */
  hfeNominal: number | null;
  /**
   * The edge's gate-referred source, for models that integrate the edge over
   * the gate-charge curve: gate current i(v) = min(iLimit, (drive − |v − v0|)/r)
   * where v0 is the gate level the edge starts from (vLow for turn-on, vHigh
   * for turn-off) and drive the volts across the path at the start of the edge.
   */
  source: GateSource;
}

export interface GateSource {
  /** Volts across the whole path at the start of the edge (full swing, less any steering-diode offset). */
  drive: number;
  /** Series resistance of the path as the gate sees it, Ω (Rg(int)/count included). */
  r: number;
  /** Current ceiling of the source, A (∞ when none). */
  iLimit: number;
}

/** Energy per cycle = volts × ΔQ, burnt in a part beyond the resistive split. */
export interface Drop {
  part: string;
  mechanism: LossMechanism;
  volts: number;
}

export interface FixedLoss {
  part: string;
  mechanism: LossMechanism;
  watts: number;
}

/** Magnetizing current of a gate transformer: Ipp = min(k / fsw, ippMax), triangular. */
export interface Magnetizing {
  k: number;
  /** The ramp cannot exceed what the primary's series resistance lets through. */
  ippMax: number;
  parts: { part: string; resistance: number }[];
}

export interface TransistorCheck {
  part: string;
  icPeak: number;
  icMax: number | null;
  pMax: number | null;
  element: string;
}

export interface StageResult {
  /** Gate levels actually reached, V. */
  vHigh: number;
  vLow: number;
  on: EdgePath;
  off: EdgePath;
  drops: Drop[];
  fixed: FixedLoss[];
  magnetizing: Magnetizing | null;
  transistors: TransistorCheck[];
  /** Winding voltage before any clamp (self-driven), V. */
  windingHigh: number | null;
  /** Input element to change if the gate levels are wrong, e.g. "positions.1.drive". */
  levelElement: string;
}

export interface StageContext {
  controller: Design["controller"];
  position: Position;
  positionIndex: number;
  /** Corner input voltage and this switch's duty. */
  vin: number;
  duty: number;
  /** External gate resistors gate.rTurnOn / gate.rTurnOff (possibly overridden by a sweep). */
  rOn: number;
  rOff: number | undefined;
}

export interface PathElement {
  part: string;
  r: number;
}

/**
 * The external gate network and Rg(int). Parallel devices share the external
 * resistor and each has its own Rg(int): Rg(int)/count in the path.
 * Rg(int) may be 0. A steering-diode turn-off (rTurnOff + diode across
 * rTurnOn) is written as two pseudo-series elements whose sum is
 * rTurnOn ∥ rTurnOff and whose ratio is the energy ratio of the parallel
 * branches (power ∝ conductance).
 */
export function gateElements(ctx: StageContext): { on: PathElement[]; off: PathElement[]; offOffset: number } {
  const id = ctx.position.id;
  const internal = { part: id, r: ctx.position.mosfet.rgInt / ctx.position.mosfet.count };
  const on = [{ part: `${id}.rgOn`, r: ctx.rOn }, internal];
  const diode = ctx.position.gate.steeringDiode;
  if (!diode) {
    const off = ctx.rOff === undefined ? { part: `${id}.rgOn`, r: ctx.rOn } : { part: `${id}.rgOff`, r: ctx.rOff };
    return { on, off: [off, internal], offOffset: 0 };
  }
  const rOff = ctx.rOff ?? 0;
  const sum = ctx.rOn + rOff;
  const rPar = sum > 0 ? (ctx.rOn * rOff) / sum : 0;
  const off = [
    { part: `${id}.rgOn`, r: sum > 0 ? (rPar * rOff) / sum : 0 },
    { part: `${id}.rgOff`, r: sum > 0 ? (rPar * ctx.rOn) / sum : 0 },
    internal,
  ];
  // Thevenin of "0 V through rTurnOn" ∥ "Vf through rTurnOff".
  return { on, off, offOffset: sum > 0 ? (diode.vf * ctx.rOn) / sum : diode.vf };
}

/**
 * One edge through series elements; elements[0] is the source (pin, driver,
 * transformer) that may be current-limited. A limited source is modelled as
 * a resistor that gives the same peak current (common practice for a
 * current-limited driver), so its energy share grows accordingly.
 * A path with no resistance at all (a stiff winding, 0 Ω external and
 * internal gate resistance) still burns ½·ΔQ·ΔV per edge (a capacitor
 * charged from a step loses that whatever the resistance, closed form):
 * it is booked on the last element, the switch's own gate.
 */
export function seriesEdge(
  elements: PathElement[],
  { peakDrive, plateauDrive, limit }: { peakDrive: number; plateauDrive: number; limit: number },
): EdgePath {
  let rGiven = 0;
  for (const e of elements) rGiven += Math.max(e.r, 0);
  const rSum = Math.max(rGiven, 1e-6);
  const peak = Math.max(peakDrive, 0);
  const iRes = peak / rSum;
  const iPeak = Math.min(iRes, limit);
  const iPlateau = Math.min(Math.max(plateauDrive, 0) / rSum, limit);
  // Fractions as r·I/V so a tiny current limit cannot turn them into ∞/∞.
  const limited = iPeak < iRes && peak > 0;
  const g = limited ? iPeak / peak : 1 / rSum;
  const shares = elements.map((e) => ({ part: e.part, fraction: Math.max(e.r, 0) * g }));
  if (limited) shares[0].fraction = Math.max(1 - (rSum - Math.max(elements[0].r, 0)) * g, 0);
  else if (rGiven <= 0 && shares.length > 0) shares[shares.length - 1].fraction = 1;
  const rTotal = limited ? Math.min(peak / Math.max(iPeak, 1e-300), 1e15) : rSum;
  return { shares, iPeak, iPlateau, rTotal, starved: false, hfe: null, hfeNominal: null, source: { drive: peak, r: rSum, iLimit: limit } };
}

export const NO_LIMIT = Number.POSITIVE_INFINITY;

export function zeroEdge(): EdgePath {
  return { shares: [], iPeak: 0, iPlateau: 0, rTotal: 0, starved: false, hfe: null, hfeNominal: null, source: { drive: 0, r: 1e-6, iLimit: 0 } };
}
