/**
 * Thermal solve of one coupled group of junctions per corner: the group's
 * constant losses plus I²·Rds(T) for MOSFET nodes, through thermal.ts.
 * Solvers and their scratch arrays are built once per design.
 */
import type { Position } from "./input/schema";
import { rdsAt, rdsSlope } from "./conduction";
import { networkScratch, solveNetwork, type NetworkProblem } from "./thermal";
import type { ThermalGroup } from "./registry";
import { M, NM, type GroupSolver, type Prepared } from "./evaluateTypes";

function mosfetOf(prep: Pick<Prepared, "parts" | "design">, part: number): Position["mosfet"] | null {
  const def = prep.parts[part];
  return def.kind === "mosfet" && def.positionIndex !== null ? prep.design.positions[def.positionIndex].mosfet : null;
}

function baseLoss(prep: Prepared, part: number): number {
  let s = 0;
  for (let k = 0; k < NM; k++) s += prep.loss[part * NM + k];
  return s;
}


/** Built once per group so the hot loop allocates nothing for the thermal solve. */
export function groupSolver(prep: Pick<Prepared, "parts" | "design">, group: ThermalGroup): GroupSolver {
  const n = group.nodes.length;
  const base = new Float64Array(n);
  const coef = new Float64Array(n);
  const models = group.nodes.map((p) => mosfetOf(prep, p));
  const problem: NetworkProblem = {
    n, ambient: 25, theta: group.theta,
    lossAt: (i, t) => { const m = models[i]; return base[i] + (m ? coef[i] * rdsAt(m, t) : 0); },
    slopeAt: (i, t) => { const m = models[i]; return m ? coef[i] * rdsSlope(m, t) : 0; },
  };
  return { group, base, coef, out: new Float64Array(n), models, problem, scratch: networkScratch(n) };
}

/** One node: the same Newton iteration as solveNetwork, without the matrix work. */
function solveSingle(s: GroupSolver, ambient: number): boolean {
  const theta = s.group.theta[0];
  const { lossAt, slopeAt } = s.problem;
  let t = ambient;
  let f = t - ambient - theta * lossAt(0, t);
  for (let iter = 0; iter < 60; iter++) {
    const j = 1 - theta * slopeAt(0, t);
    if (!(j > 1e-12) || !Number.isFinite(f)) return false;
    t -= f / j;
    f = t - ambient - theta * lossAt(0, t);
    if (Math.abs(f) < 1e-12 * (1 + Math.abs(t))) {
      s.out[0] = t;
      return true;
    }
  }
  return false;
}

export function solveGroup(prep: Prepared, s: GroupSolver, ambient: number): boolean {
  const { group: g, base, coef, out, models } = s;
  const n = g.nodes.length;
  for (let i = 0; i < n; i++) {
    base[i] = baseLoss(prep, g.nodes[i]);
    coef[i] = prep.condCoef[g.nodes[i]];
  }
  s.problem.ambient = ambient;
  const ok = n === 1 ? solveSingle(s, ambient) : solveNetwork(s.problem, out, s.scratch);
  for (let i = 0; i < n; i++) {
    const p = g.nodes[i];
    const m = models[i];
    if (ok) prep.tj[p] = out[i];
    else prep.runaway[p] = 1;
    // With no steady state, conduction is shown at the part's Tj(max).
    const t = ok ? out[i] : (prep.parts[p].junction?.tjMax ?? ambient);
    if (m) prep.loss[p * NM + M.conduction] = coef[i] * rdsAt(m, t);
  }
  return ok;
}
