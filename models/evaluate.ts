/**
 * Budget assembly: every loss by mechanism, every junction, every corner.
 *
 * Entry point: `evaluateDesign(design, { corners? })` → `Evaluation`.
 *
 * Building blocks for sweeps and Monte Carlo (all pure, no I/O):
 *  - `prepare(design)` → `Prepared`: part list, thermal groups, waveforms
 *    per corner and preallocated work arrays. Prepare once per design.
 *  - `computeCorner(prep, cornerIndex, overrides?)` → boolean (false =
 *    thermal runaway somewhere): fills `prep.loss` (part × mechanism, W, in
 *    LOSS_MECHANISMS order), `prep.tj`, `prep.runaway`. Overrides
 *    (`CornerOverrides`): fsw, ambient, vin, and qgScale / rOn / rOff
 *    (restricted to one `position` id when given). Drive-stage results are
 *    reused while vin, duty and gate resistors stay the same, so an
 *    fsw × Qg sweep only redoes charge, switching and the thermal solve.
 *  - `partRise(prep, cornerIndex, partIndex, overrides?)` → Tj − Ta in K, or
 *    null on runaway / for a part without a junction. `partIndexOf(prep, id)`
 *    gives the index ("Q1", "controller", "Q1.npn" …).
 *  - `buildCornerResult(prep)` → the full `CornerResult` of the last
 *    computed corner; `cornerWarnings(prep, result)` its warnings.
 * A Prepared object is mutable scratch space: one per concurrent user.
 *
 * Model chain per corner and position: waveform (waveform.ts) → drive stage
 * levels/paths (driveStage.ts) → swing charge (gateCharge.ts) → gate energy
 * split (gatePower.ts rule) → switching edges (switching.ts) → conduction
 * (conduction.ts) → electro-thermal network (thermal.ts).
 */
import type { Design } from "./input/schema";
import { computeCorner, prepare, type Prepared } from "./evaluateCore";
import { buildCornerResult, type CornerResult, type JunctionState } from "./evaluateReport";
import { cornerWarnings, type Warning } from "./warnings";
import type { PartKind } from "./partIds";

export { prepare, computeCorner, partRise, NM, type Prepared, type CornerOverrides } from "./evaluateCore";
export { buildCornerResult } from "./evaluateReport";
export type { CornerResult, PartResult, PositionResult, EdgeResult, JunctionState } from "./evaluateReport";
export { cornerWarnings, type Warning, type WarningCode } from "./warnings";

export interface PartWorst {
  id: string;
  label: string;
  kind: PartKind;
  positionId: string | null;
  /** Corner with the least margin (junction parts) or the most loss (buckets). */
  worstCornerId: string;
  junction: JunctionState | null;
  /** Loss at the worst corner, W. */
  loss: number;
  /** Largest loss over the corners, W, and where. */
  maxLoss: number;
  maxLossCornerId: string;
}

export interface Evaluation {
  designName: string;
  corners: CornerResult[];
  parts: PartWorst[];
  warnings: Warning[];
  /** Corner with the largest total modelled loss. */
  worstTotal: { cornerId: string; totalLoss: number };
  runaway: boolean;
}

export function partIndexOf(prep: Prepared, id: string): number {
  const i = prep.partIndex.get(id);
  if (i === undefined) throw new Error(`no part "${id}" in this design (known: ${[...prep.partIndex.keys()].join(", ")})`);
  return i;
}

function severity(j: JunctionState | null): number {
  if (!j) return 0;
  return j.runaway ? Number.POSITIVE_INFINITY : -j.margin;
}

export function evaluateDesign(design: Design, opts: { corners?: string[] } = {}): Evaluation {
  const prep = prepare(design);
  const wanted = opts.corners ? new Set(opts.corners) : null;
  const corners: CornerResult[] = [];
  const warnings: Warning[] = [];
  design.corners.forEach((c, ci) => {
    if (wanted && !wanted.has(c.id)) return;
    computeCorner(prep, ci);
    const r = buildCornerResult(prep);
    corners.push(r);
    warnings.push(...cornerWarnings(prep, r));
  });
  const parts: PartWorst[] = prep.parts.map((def, i) => {
    let worst = corners[0];
    let maxLossCorner = corners[0];
    for (const r of corners) {
      const a = r.parts[i];
      const b = worst?.parts[i];
      if (b && (def.junction ? severity(a.junction) > severity(b.junction) : a.total > b.total)) worst = r;
      if (maxLossCorner && a.total > maxLossCorner.parts[i].total) maxLossCorner = r;
    }
    const w = worst?.parts[i];
    return {
      id: def.id, label: def.label, kind: def.kind, positionId: w?.positionId ?? null,
      worstCornerId: worst?.cornerId ?? "", junction: w?.junction ?? null, loss: w?.total ?? 0,
      maxLoss: maxLossCorner?.parts[i].total ?? 0, maxLossCornerId: maxLossCorner?.cornerId ?? "",
    };
  });
  let worstTotal = { cornerId: corners[0]?.cornerId ?? "", totalLoss: corners[0]?.totalLoss ?? 0 };
  for (const r of corners) if (r.totalLoss > worstTotal.totalLoss) worstTotal = { cornerId: r.cornerId, totalLoss: r.totalLoss };
  return { designName: design.name, corners, parts, warnings, worstTotal, runaway: corners.some((r) => r.runaway) };
}
