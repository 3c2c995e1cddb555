/**
 * Two-axis sweeps (DOMAIN item 13): one metric of one part over a grid of
 * two of fsw, qgScale, vin, ambient and rGate, with the limit contour and
 * the design point.
 *
 * Speed: at a fixed drive stage (corner, Vin, gate resistors) every loss the
 * budget assembly computes (evaluatePosition.ts `computePosition`) is one of
 *   constant · 1, · fsw, · k·fsw  (k = gate-charge scale)
 * or an overlap edge ½·Vds·Id·min(k·T, ½/fsw)·fsw (hardEdge with its cap), or
 * a gate-transformer magnetizing term min(k/fsw, Ipp,max)²/12·R;
 * only conduction needs the electro-thermal solve. So a "plan" of those
 * coefficients is built once per stage (per grid, or per row/column when
 * vin or rGate is an axis; per cell when both are, which is slower) and each
 * cell costs a few multiply-adds plus the thermal solve of the groups the
 * metric needs, with no allocation.
 * The plan mirrors computePosition term by term; tests/unit/sweep.test.ts
 * checks sampled cells against a full evaluateDesign of the modified design.
 */
import type { Design } from "./schema";
import { LOSS_MECHANISMS, MECH_INDEX as M, type LossMechanism } from "./losses";
import { prepare, NM, type Prepared } from "./evaluateCore";
import { evaluateDesign } from "./evaluate";
import { swingCharge } from "./gateCharge";
import { driveStage } from "./driveStage";
import { eossAt } from "./switching";
import { deadTimeLoss, diodeLoss, rdsAt, rdsSlope, recoveryLoss } from "./conduction";
import { networkScratch, solveNetwork, type NetworkProblem, type NetworkScratch } from "./thermal";
import { cornerWaveform } from "./waveform";
import { MAX_EDGE_FRACTION_OF_PERIOD } from "./policy";

export type SweepAxisKind = "fsw" | "qgScale" | "vin" | "ambient" | "rGate";

export interface SweepAxis {
  axis: SweepAxisKind;
  from: number;
  to: number;
  /** Number of grid values including both ends, ≥ 2. */
  steps: number;
  scale?: "linear" | "log";
  /** qgScale: the position whose MOSFET curve is scaled (omitted = every position). rGate: required. */
  position?: string;
  /**
   * rGate only. "both" (default): the axis value is rOn and rOff keeps its
   * ratio to rOn (or follows rOn when the design has one resistor);
   * "on" / "off": only that resistor, the axis value is its resistance.
   */
  edge?: "both" | "on" | "off";
}

export type SweepMetric = "rise" | "tj" | "loss";

export interface SweepSpec {
  /** Part id ("controller", "Q1", "Q1.npn" …); "all" with metric "loss" = total modelled loss. */
  part: string;
  /** rise: Tj − Ta (K, default); tj: °C; loss: W of `mechanism` or of the whole part. */
  metric?: SweepMetric;
  mechanism?: LossMechanism;
  /** Corner id, or "worst" (default): the part's least-margin corner at the design point. */
  corner?: string;
  x: SweepAxis;
  y: SweepAxis;
  /** Limit in metric units; default the derated Tj limit (tj) or limit − ambient (rise), none for loss. */
  limit?: number;
  /** Compute rows [from, to) only (chunking in a Web Worker); merge with mergeSweepChunks. */
  rows?: { from: number; to: number };
  onProgress?: (fraction: number) => void;
  /** Checked before every row; true stops the sweep and returns the rows done so far. */
  shouldStop?: () => boolean;
}

export interface SweepResult {
  part: string;
  metric: SweepMetric;
  mechanism: LossMechanism | null;
  unit: "K" | "°C" | "W";
  cornerId: string;
  x: SweepAxis & { values: number[] };
  y: SweepAxis & { values: number[] };
  /** z[row][column] for the rows in rowRange; null = thermal runaway (never NaN). */
  z: (number | null)[][];
  rowRange: { from: number; to: number };
  /** False when shouldStop ended the sweep early. */
  complete: boolean;
  /** Constant limit in metric units; null when there is none or it varies along an axis. */
  limit: number | null;
  /** When the ΔT limit varies with an ambient axis: the limit per value of that axis. */
  limitAlong: { axis: "x" | "y"; values: number[] } | null;
  /** Limit contour polylines in axis units; empty unless the grid is complete. */
  contour: ContourPoint[][];
  designPoint: { x: number; y: number; z: number | null; inRange: boolean };
  runawayCells: number;
}

export class SweepSpecError extends Error {}

export function axisValues(a: SweepAxis): number[] {
  const n = Math.trunc(a.steps);
  if (!(n >= 2 && n <= 2000)) throw new SweepSpecError(`axis ${a.axis}: steps must be 2…2000`);
  if (!Number.isFinite(a.from) || !Number.isFinite(a.to)) throw new SweepSpecError(`axis ${a.axis}: from/to must be finite`);
  const log = a.scale === "log";
  if (log && !(a.from > 0 && a.to > 0)) throw new SweepSpecError(`axis ${a.axis}: a log axis needs positive ends`);
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const t = i / (n - 1);
    out.push(log ? a.from * Math.pow(a.to / a.from, t) : a.from + t * (a.to - a.from));
  }
  return out;
}

/** Coefficients of every (part, mechanism) loss at one drive stage; see the file comment. */
interface Plan {
  c0: Float64Array; // × 1
  cF: Float64Array; // × fsw
  cKF: Float64Array; // × k·fsw
  edgeSlot: Int32Array; // part·NM + mechanism
  edgeW: Float64Array; // ½·Vds·Id
  edgeT: Float64Array; // (Qgs2 + Qgd)/Ig at k = 1
  edgeScaled: Uint8Array;
  // Magnetizing ripple of a gate transformer: min(k/fsw, ippMax)²/12 · R.
  magSlot: Int32Array;
  magK: Float64Array;
  magMax: Float64Array;
  magR: Float64Array;
  condCoef: Float64Array; // per part: I_rms²/n
  // Per-part sums of c0 / cF / cKF over the mechanisms.
  p0: Float64Array;
  pF: Float64Array;
  pKF: Float64Array;
}

interface StageKnobs {
  vin: number;
  /** Gate-resistor override for one position, or null. */
  rGate: { position: string; rOn: number; rOff: number | undefined } | null;
}

function buildPlan(prep: Prepared, ci: number, knobs: StageKnobs, scaled: (id: string) => boolean): Plan {
  const { design } = prep;
  const corner = design.corners[ci];
  const size = prep.parts.length * NM;
  const c0 = new Float64Array(size), cF = new Float64Array(size), cKF = new Float64Array(size);
  const slots: number[] = [], ws: number[] = [], ts: number[] = [], sc: number[] = [];
  const mSlot: number[] = [], mK: number[] = [], mMax: number[] = [], mR: number[] = [];
  const condCoef = new Float64Array(prep.parts.length);
  const part = (id: string) => {
    const i = prep.partIndex.get(id);
    if (i === undefined) throw new Error(`internal: unknown part ${id}`);
    return i;
  };
  c0[M.quiescent] += design.controller.vcc * design.controller.iq;
  for (const pp of prep.positions) {
    const p = pp.position;
    const m = p.mosfet;
    const n = m.count;
    const w = cornerWaveform(p, corner, knobs.vin);
    const mine = knobs.rGate !== null && knobs.rGate.position === p.id;
    const rOn = mine ? knobs.rGate!.rOn : p.gate.rOn;
    const rOff = mine ? knobs.rGate!.rOff : p.gate.rOff;
    const st = driveStage({ controller: design.controller, position: p, positionIndex: pp.index, vin: knobs.vin, duty: w.duty, rOn, rOff });
    const k = scaled(p.id);
    const perK = k ? cKF : cF;
    const dq1 = n * swingCharge(pp.curve, st.vHigh, st.vLow);
    const halfE = 0.5 * dq1 * (st.vHigh - st.vLow);
    for (const s of st.on.shares) perK[part(s.part) * NM + M.gateDrive] += halfE * s.fraction;
    for (const s of st.off.shares) perK[part(s.part) * NM + M.gateDrive] += halfE * s.fraction;
    for (const d of st.drops) perK[part(d.part) * NM + M[d.mechanism]] += d.volts * dq1;
    for (const f of st.fixed) c0[part(f.part) * NM + M[f.mechanism]] += f.watts;
    if (st.magnetizing) {
      for (const q of st.magnetizing.parts) {
        mSlot.push(part(q.part) * NM + M.gateDrive);
        mK.push(st.magnetizing.k);
        mMax.push(st.magnetizing.ippMax);
        mR.push(q.resistance);
      }
    }
    const me = pp.part * NM;
    const edge = (mech: number, vds: number, id: number, iGate: number) => {
      const ig = Math.max(iGate, 1e-9);
      slots.push(me + mech);
      ws.push(0.5 * vds * id);
      ts.push((n * pp.qgs2) / ig + (n * m.qgd) / ig);
      sc.push(k ? 1 : 0);
    };
    const channel = p.conduction.mode === "channel" && p.drive.kind !== "none";
    if (channel) {
      if (p.conduction.switching === "hard") {
        edge(M.turnOn, w.vdsOn, w.idOn, st.on.iPlateau);
        cF[me + M.coss] += n * eossAt(m.outputCapacitance, w.vdsOn);
        cF[me + M.reverseRecovery] += recoveryLoss({ qrr: p.conduction.opposingQrr, v: w.vdsOn, fsw: 1 });
      }
      const srDiodeCatches = p.role === "synchronous-rectifier" && p.conduction.deadTimes[1] > 0;
      edge(M.turnOff, srDiodeCatches ? Math.min(m.vsd, w.vdsOff) : w.vdsOff, w.idOff, st.off.iPlateau);
      const [t1, t2] = p.conduction.deadTimes;
      cF[me + M.diodeConduction] += deadTimeLoss({ idOn: w.idOn, idOff: w.idOff, t1, t2, vsd: m.vsd, rDiode: m.rDiode, count: n, fsw: 1 });
    } else {
      c0[me + M.diodeConduction] += diodeLoss({ iAvg: w.iAvg, iRms: w.iRms, vsd: m.vsd, rDiode: m.rDiode, count: n });
    }
    if (p.role === "synchronous-rectifier" && (!channel || p.conduction.deadTimes[1] > 0))
      cF[me + M.reverseRecovery] += recoveryLoss({ qrr: n * m.qrr, v: w.vdsOff, fsw: 1 });
    condCoef[pp.part] = channel ? (w.iRms * w.iRms) / n : 0;
  }
  const np = prep.parts.length;
  const p0 = new Float64Array(np), pF = new Float64Array(np), pKF = new Float64Array(np);
  for (let i = 0; i < np; i++)
    for (let k = 0; k < NM; k++) {
      p0[i] += c0[i * NM + k];
      pF[i] += cF[i * NM + k];
      pKF[i] += cKF[i * NM + k];
    }
  return {
    c0, cF, cKF, edgeSlot: Int32Array.from(slots), edgeW: Float64Array.from(ws), edgeT: Float64Array.from(ts),
    edgeScaled: Uint8Array.from(sc), magSlot: Int32Array.from(mSlot), magK: Float64Array.from(mK),
    magMax: Float64Array.from(mMax), magR: Float64Array.from(mR), condCoef, p0, pF, pKF,
  };
}

/** Preallocated solver for one thermal group (same problem as evaluateCore's). */
interface GroupWork {
  nodes: number[];
  base: Float64Array;
  coef: Float64Array;
  out: Float64Array;
  problem: NetworkProblem;
  scratch: NetworkScratch;
  /**
   * Every MOSFET in the group has the linear Rds(on)(T) fit: losses are affine
   * in T, so the fixed point is one linear solve (see solveAffine).
   */
  affine: boolean;
  theta: Float64Array;
  r25: Float64Array; // per node, 0 for non-MOSFETs
  slope: Float64Array; // dRds/dT of the linear fit
  A: Float64Array;
  rhs: Float64Array;
}

function groupWork(prep: Prepared, gi: number): GroupWork {
  const g = prep.groups[gi];
  const n = g.nodes.length;
  const base = new Float64Array(n), coef = new Float64Array(n);
  const models = g.nodes.map((p) => {
    const def = prep.parts[p];
    return def.kind === "mosfet" && def.positionIndex !== null ? prep.design.positions[def.positionIndex].mosfet : null;
  });
  const problem: NetworkProblem = {
    n, ambient: 25, theta: g.theta,
    lossAt: (i, t) => { const m = models[i]; return base[i] + (m ? coef[i] * rdsAt(m, t) : 0); },
    slopeAt: (i, t) => { const m = models[i]; return m ? coef[i] * rdsSlope(m, t) : 0; },
  };
  const r25 = new Float64Array(n), slope = new Float64Array(n);
  models.forEach((m, i) => {
    if (!m) return;
    r25[i] = m.rds25;
    slope[i] = rdsSlope(m, 25);
  });
  return {
    nodes: g.nodes, base, coef, out: new Float64Array(n), problem, scratch: networkScratch(n),
    affine: models.every((m) => !m || m.rdsModel === "linear"), theta: Float64Array.from(g.theta), r25, slope,
    A: new Float64Array(n * n), rhs: new Float64Array(n),
  };
}

/**
 * Fixed point T = Ta + Θ·P(T) with P_i = base_i + coef_i·(R25_i + s_i·(T_i − 25)):
 * (I − Θ·diag(coef·s))·T = Ta + Θ·(base + coef·(R25 − 25·s)). Gaussian elimination
 * without pivoting on the same matrix as thermal.ts's Newton Jacobian, with the same
 * runaway rule (a pivot ≤ 1e-12 means loop gain ≥ 1). Returns 1 solved, 0 runaway,
 * −1 when the Rds floor of conduction.ts would bind (caller falls back to solveNetwork).
 */
function solveAffine(G: GroupWork, ambient: number): number {
  const n = G.nodes.length;
  const { A, rhs, theta, base, coef, r25, slope, out } = G;
  for (let i = 0; i < n; i++) {
    let r = ambient;
    for (let j = 0; j < n; j++) {
      const t = theta[i * n + j];
      r += t * (base[j] + coef[j] * (r25[j] - 25 * slope[j]));
      A[i * n + j] = (i === j ? 1 : 0) - t * coef[j] * slope[j];
    }
    rhs[i] = r;
  }
  for (let k = 0; k < n; k++) {
    const piv = A[k * n + k];
    if (!(piv > 1e-12)) return 0;
    for (let i = k + 1; i < n; i++) {
      const f = A[i * n + k] / piv;
      if (f === 0) continue;
      for (let j = k; j < n; j++) A[i * n + j] -= f * A[k * n + j];
      rhs[i] -= f * rhs[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let v = rhs[i];
    for (let j = i + 1; j < n; j++) v -= A[i * n + j] * out[j];
    out[i] = v / A[i * n + i];
    if (!Number.isFinite(out[i])) return 0;
  }
  for (let i = 0; i < n; i++) if (r25[i] > 0 && !(r25[i] + slope[i] * (out[i] - 25) > 0.1 * r25[i])) return -1;
  return 1;
}

/** Everything one cell needs, allocated once per sweep. */
interface Kernel {
  prep: Prepared;
  metric: SweepMetric;
  /** Metric part index, −1 for "all". */
  part: number;
  /** Mechanism slot offset for a loss metric, −1 for the part total. */
  mech: number;
  groups: GroupWork[];
  /** Position of the metric part in groups[0].nodes, −1 when it has no junction. */
  node: number;
  /** Parts whose losses the metric reads (thermal-group nodes, the metric part; all for "all"). */
  needed: Int32Array;
  neededMask: Uint8Array;
  loss: Float64Array; // per part, non-conduction loss of the current cell (needed parts only)
}

function makeKernel(prep: Prepared, metric: SweepMetric, part: number, mech: number): Kernel {
  const gis: number[] = [];
  if (part < 0) prep.groups.forEach((_, gi) => gis.push(gi));
  else if (prep.groupOfPart[part] >= 0) gis.push(prep.groupOfPart[part]);
  const groups = gis.map((gi) => groupWork(prep, gi));
  const node = part >= 0 && groups.length > 0 ? groups[0].nodes.indexOf(part) : -1;
  const np = prep.parts.length;
  const needed = new Set<number>(groups.flatMap((g) => g.nodes));
  if (part >= 0) needed.add(part);
  else for (let i = 0; i < np; i++) needed.add(i);
  const neededMask = new Uint8Array(np);
  for (const i of needed) neededMask[i] = 1;
  return {
    prep, metric, part, mech, groups, node, needed: Int32Array.from([...needed].sort((a, b) => a - b)), neededMask,
    loss: new Float64Array(np),
  };
}

/** One cell; NaN stands for runaway inside the loop (null at the edge of the module). */
function cell(K: Kernel, plan: Plan, fsw: number, k: number, ambient: number): number {
  const { loss, needed } = K;
  const kf = k * fsw;
  for (let n = 0; n < needed.length; n++) {
    const i = needed[n];
    loss[i] = plan.p0[i] + plan.pF[i] * fsw + plan.pKF[i] * kf;
  }
  const maxT = MAX_EDGE_FRACTION_OF_PERIOD / Math.max(fsw, 1e-9);
  let mechExtra = 0;
  for (let e = 0; e < plan.magSlot.length; e++) {
    const owner = (plan.magSlot[e] / NM) | 0;
    if (!K.neededMask[owner]) continue;
    const a = plan.magK[e] / fsw;
    const ipp = a < plan.magMax[e] ? a : plan.magMax[e];
    const p = ((ipp * ipp) / 12) * plan.magR[e];
    loss[owner] += p;
    if (plan.magSlot[e] === K.mech) mechExtra += p;
  }
  const slots = plan.edgeSlot;
  for (let e = 0; e < slots.length; e++) {
    const owner = (slots[e] / NM) | 0;
    if (!K.neededMask[owner]) continue;
    const t = (plan.edgeScaled[e] ? k : 1) * plan.edgeT[e];
    const p = plan.edgeW[e] * (t < maxT ? t : maxT) * fsw;
    loss[owner] += p;
    if (slots[e] === K.mech) mechExtra += p;
  }
  const groups = K.groups;
  for (let g = 0; g < groups.length; g++) {
    const G = groups[g];
    const nodes = G.nodes;
    for (let i = 0; i < nodes.length; i++) {
      G.base[i] = loss[nodes[i]];
      G.coef[i] = plan.condCoef[nodes[i]];
    }
    const fast = G.affine ? solveAffine(G, ambient) : -1;
    if (fast === 0) return Number.NaN;
    if (fast < 0) {
      G.problem.ambient = ambient;
      if (!solveNetwork(G.problem, G.out, G.scratch)) return Number.NaN;
    }
  }
  if (K.metric === "rise") return groups[0].out[K.node] - ambient;
  if (K.metric === "tj") return groups[0].out[K.node];
  if (K.part < 0) {
    let s = 0;
    for (let i = 0; i < loss.length; i++) s += loss[i];
    for (let g = 0; g < groups.length; g++) for (let i = 0; i < groups[g].nodes.length; i++) s += conduction(K, plan, groups[g], i);
    return s;
  }
  const condHere = K.node >= 0 ? conduction(K, plan, groups[0], K.node) : 0;
  if (K.mech < 0) return loss[K.part] + condHere;
  if (K.mech === K.part * NM + M.conduction) return condHere;
  const s = K.mech;
  return plan.c0[s] + plan.cF[s] * fsw + plan.cKF[s] * kf + mechExtra;
}

function conduction(K: Kernel, plan: Plan, G: GroupWork, i: number): number {
  const def = K.prep.parts[G.nodes[i]];
  if (def.kind !== "mosfet" || def.positionIndex === null) return 0;
  return plan.condCoef[G.nodes[i]] * rdsAt(K.prep.design.positions[def.positionIndex].mosfet, G.out[i]);
}

/** Axis → the knob it turns; resolved once so the cell loop only reads numbers. */
interface Knobs {
  fsw: number;
  k: number;
  ambient: number;
  vin: number;
  r: number;
}

function nominal(axis: SweepAxis, design: Design, ci: number): number {
  const c = design.corners[ci];
  switch (axis.axis) {
    case "fsw": return c.fsw;
    case "ambient": return c.ambient;
    case "vin": return c.vin;
    case "qgScale": return 1;
    case "rGate": {
      const g = design.positions.find((p) => p.id === axis.position)!.gate;
      return axis.edge === "off" ? (g.rOff ?? g.rOn) : g.rOn;
    }
  }
}

function checkAxis(a: SweepAxis, design: Design, prep: Prepared): void {
  const ids = design.positions.map((p) => p.id);
  if (a.position !== undefined && !ids.includes(a.position))
    throw new SweepSpecError(`axis ${a.axis}: no position "${a.position}" (known: ${ids.join(", ")})`);
  if (a.axis === "rGate") {
    if (a.position === undefined) throw new SweepSpecError("axis rGate: name the position whose gate resistance is swept");
    if (a.edge === "off" && !prep.partIndex.has(`${a.position}.rgOff`))
      throw new SweepSpecError(`axis rGate: position ${a.position} has one gate resistor; sweep edge "both" or "on"`);
  } else if (a.position !== undefined && a.axis !== "qgScale") throw new SweepSpecError(`axis ${a.axis} takes no position`);
  const vals = [a.from, a.to];
  const positive = a.axis === "fsw" || a.axis === "vin";
  if (positive && !vals.every((v) => v > 0)) throw new SweepSpecError(`axis ${a.axis}: values must be > 0`);
  if ((a.axis === "qgScale" || a.axis === "rGate") && !vals.every((v) => v >= 0))
    throw new SweepSpecError(`axis ${a.axis}: values must be ≥ 0`);
}

const stageAxis = (a: SweepAxis) => a.axis === "vin" || a.axis === "rGate";

function setKnob(kn: Knobs, a: SweepAxis, v: number): void {
  if (a.axis === "fsw") kn.fsw = v;
  else if (a.axis === "qgScale") kn.k = v;
  else if (a.axis === "ambient") kn.ambient = v;
  else if (a.axis === "vin") kn.vin = v;
  else kn.r = v;
}

function stageKnobs(design: Design, rAxis: SweepAxis | null, vin: number, r: number): StageKnobs {
  if (!rAxis) return { vin, rGate: null };
  const g = design.positions.find((p) => p.id === rAxis.position)!.gate;
  const edge = rAxis.edge ?? "both";
  const rOn = edge === "off" ? g.rOn : r;
  const rOff = edge === "off" ? r : edge === "on" ? g.rOff : g.rOff === undefined ? undefined : g.rOn > 0 ? (g.rOff * r) / g.rOn : g.rOff;
  return { vin, rGate: { position: rAxis.position!, rOn, rOff } };
}

/** Sweep one metric of one part over a two-axis grid. */
export function sweepGrid(design: Design, spec: SweepSpec): SweepResult {
  const prep = prepare(design);
  const metric = spec.metric ?? "rise";
  const all = spec.part === "all";
  if (all && metric !== "loss") throw new SweepSpecError('part "all" needs metric "loss"');
  const part = all ? -1 : prep.partIndex.get(spec.part);
  if (part === undefined) throw new SweepSpecError(`no part "${spec.part}" (known: ${[...prep.partIndex.keys()].join(", ")})`);
  const def = part >= 0 ? prep.parts[part] : null;
  if (metric !== "loss" && !def?.junction) throw new SweepSpecError(`part "${spec.part}" has no junction; sweep its loss`);
  if (spec.mechanism !== undefined && (metric !== "loss" || all || !LOSS_MECHANISMS.includes(spec.mechanism)))
    throw new SweepSpecError("a mechanism applies to the loss of one part");
  if (spec.x.axis === spec.y.axis) throw new SweepSpecError("the two axes must differ");
  checkAxis(spec.x, design, prep);
  checkAxis(spec.y, design, prep);
  const ci = resolveCorner(design, spec.corner, spec.part);
  const corner = design.corners[ci];
  const xs = axisValues(spec.x), ys = axisValues(spec.y);
  const from = Math.max(0, Math.trunc(spec.rows?.from ?? 0));
  const to = Math.min(ys.length, Math.trunc(spec.rows?.to ?? ys.length));
  if (!(to > from)) throw new SweepSpecError(`empty row range ${from}…${to}`);

  const qAxis = [spec.x, spec.y].find((a) => a.axis === "qgScale");
  const scaled = (id: string) => qAxis !== undefined && (qAxis.position === undefined || qAxis.position === id);
  const rAxis = [spec.x, spec.y].find((a) => a.axis === "rGate") ?? null;
  const mech = spec.mechanism !== undefined && part >= 0 ? part * NM + M[spec.mechanism] : -1;
  const K = makeKernel(prep, metric, part, mech);
  const base: Knobs = { fsw: corner.fsw, k: 1, ambient: corner.ambient, vin: corner.vin, r: rAxis ? nominal(rAxis, design, ci) : 0 };
  const planAt = (kn: Knobs) => buildPlan(prep, ci, stageKnobs(design, rAxis, kn.vin, kn.r), scaled);
  const kn: Knobs = { ...base };
  // Plans: one for the grid, or one per column / row for a stage axis (both: per cell, slower).
  const sx = stageAxis(spec.x), sy = stageAxis(spec.y);
  const fixedPlan = !sx && !sy ? planAt(base) : null;
  const colPlans = sx && !sy ? xs.map((v) => (setKnob(kn, spec.x, v), planAt(kn))) : null;

  const nx = xs.length;
  const grid = new Float64Array((to - from) * nx);
  let rowsDone = 0;
  for (let j = from; j < to; j++) {
    if (spec.shouldStop?.()) break;
    Object.assign(kn, base);
    setKnob(kn, spec.y, ys[j]);
    const rowPlan = sy && !sx ? planAt(kn) : null;
    const off = (j - from) * nx;
    for (let i = 0; i < nx; i++) {
      setKnob(kn, spec.x, xs[i]);
      const plan = fixedPlan ?? (colPlans !== null ? colPlans[i] : rowPlan) ?? planAt(kn);
      grid[off + i] = cell(K, plan, kn.fsw, kn.k, kn.ambient);
    }
    rowsDone++;
    spec.onProgress?.(rowsDone / (to - from));
  }
  const complete = rowsDone === to - from;
  let runawayCells = 0;
  const z: (number | null)[][] = [];
  for (let r = 0; r < rowsDone; r++) {
    const row: (number | null)[] = new Array(nx);
    for (let i = 0; i < nx; i++) {
      const v = grid[r * nx + i];
      if (Number.isFinite(v)) row[i] = v;
      else {
        row[i] = null;
        runawayCells++;
      }
    }
    z.push(row);
  }

  const dpv = cell(K, planAt(base), base.fsw, base.k, base.ambient);
  const dx = nominal(spec.x, design, ci), dy = nominal(spec.y, design, ci);
  const within = (v: number, vals: number[]) => v >= Math.min(vals[0], vals[vals.length - 1]) && v <= Math.max(vals[0], vals[vals.length - 1]);
  const lim = limitOf(spec, metric, def?.junction?.limit ?? null, corner.ambient, xs, ys);
  const result: SweepResult = {
    part: spec.part, metric, mechanism: spec.mechanism ?? null, unit: metric === "rise" ? "K" : metric === "tj" ? "°C" : "W",
    cornerId: corner.id, x: { ...spec.x, values: xs }, y: { ...spec.y, values: ys }, z,
    rowRange: { from, to: from + rowsDone }, complete,
    limit: lim.limit, limitAlong: lim.along, contour: [],
    designPoint: { x: dx, y: dy, z: Number.isFinite(dpv) ? dpv : null, inRange: within(dx, xs) && within(dy, ys) },
    runawayCells,
  };
  if (result.complete && from === 0 && to === ys.length) result.contour = contourOf(result);
  return result;
}

function resolveCorner(design: Design, corner: string | undefined, part: string): number {
  if (corner !== undefined && corner !== "worst") {
    const ci = design.corners.findIndex((c) => c.id === corner);
    if (ci < 0) throw new SweepSpecError(`no corner "${corner}" (known: ${design.corners.map((c) => c.id).join(", ")})`);
    return ci;
  }
  const ev = evaluateDesign(design);
  const id = part === "all" ? ev.worstTotal.cornerId : ev.parts.find((p) => p.id === part)?.worstCornerId;
  return Math.max(0, design.corners.findIndex((c) => c.id === id));
}

function limitOf(spec: SweepSpec, metric: SweepMetric, tjLimit: number | null, ambient: number, xs: number[], ys: number[]): {
  limit: number | null; along: SweepResult["limitAlong"];
} {
  if (spec.limit !== undefined) return { limit: spec.limit, along: null };
  if (metric === "loss" || tjLimit === null) return { limit: null, along: null };
  if (metric === "tj") return { limit: tjLimit, along: null };
  if (spec.x.axis === "ambient") return { limit: null, along: { axis: "x", values: xs.map((t) => tjLimit - t) } };
  if (spec.y.axis === "ambient") return { limit: null, along: { axis: "y", values: ys.map((t) => tjLimit - t) } };
  return { limit: tjLimit - ambient, along: null };
}

/** A contour vertex in axis units, with its fractional grid index (one of i, j is whole). */
export interface ContourPoint {
  x: number;
  y: number;
  i: number;
  j: number;
}

function valueAt(values: number[], log: boolean, f: number): number {
  const i0 = Math.min(Math.max(Math.floor(f), 0), values.length - 2);
  const t = f - i0;
  const a = values[i0], b = values[i0 + 1];
  return log ? a * Math.pow(b / a, t) : a + t * (b - a);
}

/** Limit contour of a complete sweep: where z crosses the (possibly per-column/row) limit. */
export function contourOf(r: SweepResult): ContourPoint[][] {
  if (r.limit === null && r.limitAlong === null) return [];
  const nx = r.x.values.length, ny = r.y.values.length;
  const g = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) {
      const lim = r.limit ?? (r.limitAlong!.axis === "x" ? r.limitAlong!.values[i] : r.limitAlong!.values[j]);
      const v = r.z[j][i];
      // Runaway (null) is beyond any limit.
      g[j * nx + i] = v === null ? Number.POSITIVE_INFINITY : v - lim;
    }
  const xLog = r.x.scale === "log", yLog = r.y.scale === "log";
  return limitContour(g, nx, ny).map((line) =>
    line.map(([i, j]) => ({ x: valueAt(r.x.values, xLog, i), y: valueAt(r.y.values, yLog, j), i, j })),
  );
}

/**
 * Marching squares on a row-major field g (ny rows × nx columns) at level 0,
 * "over" meaning g ≥ 0 (+∞ allowed). Returns polylines of fractional
 * [column, row] indices; crossings are interpolated linearly along grid
 * edges (midpoint when one end is infinite); saddles are resolved by the
 * cell's mean. Segments sharing a grid edge are joined into polylines.
 */
export function limitContour(g: Float64Array | number[], nx: number, ny: number): [number, number][][] {
  const H = ny * (nx - 1);
  const hEdge = (i: number, j: number) => j * (nx - 1) + i;
  const vEdge = (i: number, j: number) => H + j * nx + i;
  const over = (v: number) => v >= 0;
  const point = (e: number): [number, number] => {
    const horiz = e < H;
    const i = horiz ? e % (nx - 1) : (e - H) % nx;
    const j = horiz ? Math.floor(e / (nx - 1)) : Math.floor((e - H) / nx);
    const a = g[j * nx + i];
    const b = horiz ? g[j * nx + i + 1] : g[(j + 1) * nx + i];
    const t = Number.isFinite(a) && Number.isFinite(b) ? Math.min(Math.max(a / (a - b), 0), 1) : 0.5;
    return horiz ? [i + t, j] : [i, j + t];
  };
  const segs: number[] = [];
  for (let j = 0; j < ny - 1; j++)
    for (let i = 0; i < nx - 1; i++) {
      const va = g[j * nx + i], vb = g[j * nx + i + 1], vc = g[(j + 1) * nx + i + 1], vd = g[(j + 1) * nx + i];
      const a = over(va), b = over(vb), c = over(vc), d = over(vd);
      const bottom = hEdge(i, j), right = vEdge(i + 1, j), top = hEdge(i, j + 1), left = vEdge(i, j);
      const crossed: number[] = [];
      if (a !== b) crossed.push(bottom);
      if (b !== c) crossed.push(right);
      if (c !== d) crossed.push(top);
      if (d !== a) crossed.push(left);
      if (crossed.length === 2) segs.push(crossed[0], crossed[1]);
      else if (crossed.length === 4) {
        const mean = (va + vb + vc + vd) / 4;
        const centre = Number.isNaN(mean) ? true : over(mean);
        // Cut off the corners that differ from the centre.
        if (a !== centre) segs.push(left, bottom);
        if (b !== centre) segs.push(bottom, right);
        if (c !== centre) segs.push(right, top);
        if (d !== centre) segs.push(top, left);
      }
    }
  return joinSegments(segs).map((chain) => chain.map(point));
}

function joinSegments(segs: number[]): number[][] {
  const n = segs.length / 2;
  const byEdge = new Map<number, number[]>();
  for (let s = 0; s < n; s++)
    for (const e of [segs[2 * s], segs[2 * s + 1]]) {
      const list = byEdge.get(e);
      if (list) list.push(s);
      else byEdge.set(e, [s]);
    }
  const used = new Uint8Array(n);
  const walk = (start: number, fromEdge: number): number[] => {
    const chain = [fromEdge];
    let s = start;
    let e = fromEdge;
    while (s >= 0 && !used[s]) {
      used[s] = 1;
      e = segs[2 * s] === e ? segs[2 * s + 1] : segs[2 * s];
      chain.push(e);
      const next = (byEdge.get(e) ?? []).find((t) => !used[t]);
      s = next === undefined ? -1 : next;
    }
    return chain;
  };
  const lines: number[][] = [];
  // Open lines first (they start on the grid boundary, where an edge has one segment), then loops.
  for (const [e, list] of byEdge) if (list.length === 1 && !used[list[0]]) lines.push(walk(list[0], e));
  for (let s = 0; s < n; s++) if (!used[s]) lines.push(walk(s, segs[2 * s]));
  return lines;
}

/** Join row chunks computed separately (e.g. by Web Workers) and add the contour. */
export function mergeSweepChunks(chunks: SweepResult[]): SweepResult {
  if (chunks.length === 0) throw new SweepSpecError("no chunks to merge");
  const sorted = [...chunks].sort((a, b) => a.rowRange.from - b.rowRange.from);
  const first = sorted[0];
  const z: (number | null)[][] = [];
  let next = first.rowRange.from;
  let runawayCells = 0;
  let complete = true;
  for (const c of sorted) {
    if (c.rowRange.from !== next) throw new SweepSpecError(`chunks leave a gap or overlap at row ${next}`);
    if (c.x.values.length !== first.x.values.length || c.y.values.length !== first.y.values.length || c.part !== first.part)
      throw new SweepSpecError("chunks belong to different sweeps");
    z.push(...c.z);
    next = c.rowRange.to;
    runawayCells += c.runawayCells;
    complete &&= c.complete;
  }
  const merged: SweepResult = { ...first, z, rowRange: { from: first.rowRange.from, to: next }, complete, runawayCells, contour: [] };
  if (complete && merged.rowRange.from === 0 && next === first.y.values.length) merged.contour = contourOf(merged);
  return merged;
}
