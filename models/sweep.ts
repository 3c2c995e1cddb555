/**
 * Two-axis sweeps (DOMAIN item 13): one metric of one part over a grid of
 * two of fsw, qgScale, vin, ambient and rGate, with the limit contour and
 * the design point. This is the public entry; the parts live in
 *   sweepTypes.ts    spec, result and error types
 *   sweepKnobs.ts    axis values, checks and the knobs an axis turns
 *   sweepPlan.ts     loss coefficients at one drive stage
 *   sweepCell.ts     thermal solve and metric of one cell
 *   sweepContour.ts  limit contour (marching squares)
 *
 * Speed: a plan of loss coefficients (sweepPlan.ts) is built once per stage
 * (per grid, or per row/column when vin or rGate is an axis; per cell when
 * both are, which is slower) and each cell costs a few multiply-adds plus
 * the thermal solve of the groups the metric needs, with no allocation.
 * The plan mirrors computePosition term by term; tests/unit/sweep.test.ts
 * checks sampled cells against a full evaluateDesign of the modified design.
 */
import type { Design } from "./input/schema";
import { LOSS_MECHANISMS, MECH_INDEX as M } from "./losses";
import { prepare, NM } from "./evaluateCore";
import { evaluateDesign } from "./evaluate";
import { buildPlan } from "./sweepPlan";
import { cell, makeKernel } from "./sweepCell";
import { axisValues, checkAxis, nominal, setKnob, stageAxis, stageKnobs, type Knobs } from "./sweepKnobs";
import { contourOf } from "./sweepContour";
import { SweepSpecError, type SweepMetric, type SweepResult, type SweepSpec } from "./sweepTypes";

export type { ContourPoint, SweepAxis, SweepAxisKind, SweepMetric, SweepResult, SweepSpec } from "./sweepTypes";
export { SweepSpecError } from "./sweepTypes";
export { axisValues } from "./sweepKnobs";
export { contourOf, limitContour } from "./sweepContour";

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
