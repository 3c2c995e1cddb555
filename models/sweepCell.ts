/**
 * Per-cell evaluation of a sweep (models/sweep.ts): the preallocated thermal
 * group solvers (with the one-solve path for linear Rds(on) fits), the
 * kernel allocated once per sweep, and `cell`, which turns a loss plan
 * (sweepPlan.ts) and the cell's fsw, gate-charge scale and ambient into the
 * metric with a few multiply-adds and the thermal solve, without allocation.
 */
import { MECH_INDEX as M } from "./losses";
import { NM, type Prepared } from "./evaluateCore";
import { rdsAt, rdsSlope } from "./conduction";
import { networkScratch, solveNetwork, type NetworkProblem, type NetworkScratch } from "./thermal";
import { MAX_EDGE_FRACTION_OF_PERIOD } from "./policy";
import type { Plan } from "./sweepPlan";
import type { SweepMetric } from "./sweepTypes";

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
export interface Kernel {
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

export function makeKernel(prep: Prepared, metric: SweepMetric, part: number, mech: number): Kernel {
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
export function cell(K: Kernel, plan: Plan, fsw: number, k: number, ambient: number): number {
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
