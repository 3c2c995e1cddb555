/**
 * Side-by-side comparison of design options for sign-off: controller
 * temperature and margin, hottest and tightest part, total loss,
 * efficiency, warnings, part count, cost, and how much heat each option
 * moves out of the controller relative to a baseline.
 *
 * "At the worst corner": the baseline controller's worst corner (least
 * margin). Each option is read at that same corner id when it has it,
 * otherwise at its own controller worst corner, so ΔP and ΔTj compare like
 * with like. Negative deltas mean heat left the controller.
 */
import type { Evaluation } from "./evaluate";
import type { CornerResult, JunctionState } from "./evaluateReport";

export interface OptionInput {
  id: string;
  name: string;
  evaluation: Evaluation;
  partCount?: number;
  cost?: number;
}

export interface PartAtCorner {
  partId: string;
  cornerId: string;
  runaway: boolean;
  tj: number | null;
  margin: number | null;
  loss: number;
}

export interface OptionComparison {
  id: string;
  name: string;
  isBaseline: boolean;
  controller: PartAtCorner | null;
  /** Highest Tj of any junction over all corners (runaway counts as hottest). */
  hottest: PartAtCorner | null;
  /** Least margin to a derated limit over all parts and corners. */
  tightest: PartAtCorner | null;
  totalLoss: number;
  totalLossCornerId: string;
  /** Lowest efficiency over corners that state an output power. */
  efficiency: number | null;
  warnings: { total: number; errors: number };
  partCount: number | null;
  cost: number | null;
  vsBaseline: { cornerId: string; controllerPowerDelta: number; controllerTjDelta: number | null } | null;
}

function at(corner: CornerResult, partId: string): PartAtCorner | null {
  const p = corner.parts.find((x) => x.id === partId);
  if (!p) return null;
  const j: JunctionState | null = p.junction;
  return {
    partId, cornerId: corner.cornerId, runaway: j?.runaway ?? false,
    tj: j && !j.runaway ? j.tj : null, margin: j && !j.runaway ? j.margin : null, loss: p.total,
  };
}

const rank = (p: PartAtCorner, key: "tj" | "margin"): number =>
  p.runaway ? Number.POSITIVE_INFINITY : key === "tj" ? (p.tj ?? Number.NEGATIVE_INFINITY) : -(p.margin ?? Number.POSITIVE_INFINITY);

function extreme(e: Evaluation, key: "tj" | "margin", only?: string): PartAtCorner | null {
  let best: PartAtCorner | null = null;
  for (const c of e.corners)
    for (const p of c.parts) {
      if (!p.junction || (only && p.id !== only)) continue;
      const cand = at(c, p.id) as PartAtCorner;
      if (!best || rank(cand, key) > rank(best, key)) best = cand;
    }
  return best;
}

export function compareOptions(list: OptionInput[], baselineId: string): OptionComparison[] {
  const base = list.find((o) => o.id === baselineId) ?? list[0];
  const baseCtl = base ? extreme(base.evaluation, "margin", "controller") : null;
  return list.map((o) => {
    const e = o.evaluation;
    const ctl = extreme(e, "margin", "controller");
    let totalLoss = 0;
    let totalLossCornerId = "";
    let efficiency: number | null = null;
    for (const c of e.corners) {
      if (c.totalLoss >= totalLoss) {
        totalLoss = c.totalLoss;
        totalLossCornerId = c.cornerId;
      }
      if (c.efficiency !== null) efficiency = efficiency === null ? c.efficiency : Math.min(efficiency, c.efficiency);
    }
    let vsBaseline: OptionComparison["vsBaseline"] = null;
    if (baseCtl) {
      const corner = e.corners.find((c) => c.cornerId === baseCtl.cornerId);
      const mine = corner ? at(corner, "controller") : ctl;
      if (mine)
        vsBaseline = {
          cornerId: mine.cornerId,
          controllerPowerDelta: mine.loss - baseCtl.loss,
          controllerTjDelta: mine.tj !== null && baseCtl.tj !== null ? mine.tj - baseCtl.tj : null,
        };
    }
    return {
      id: o.id, name: o.name, isBaseline: o === base, controller: ctl,
      hottest: extreme(e, "tj"), tightest: extreme(e, "margin"),
      totalLoss, totalLossCornerId, efficiency,
      warnings: { total: e.warnings.length, errors: e.warnings.filter((w) => w.severity === "error").length },
      partCount: o.partCount ?? null, cost: o.cost ?? null, vsBaseline,
    };
  });
}
