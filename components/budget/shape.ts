/**
 * Pure data shaping for the budget dashboard: Evaluation -> what each panel
 * draws. No React, no nivo, no I/O (unit-tested in shape.test.ts). Every
 * number stays SI (W, °C, K, Hz); formatting happens at the leaves.
 */
import type { CornerResult, Evaluation, JunctionState, PartResult, Warning } from "@/models/evaluate";
import { LOSS_MECHANISMS, type LossMechanism } from "@/models/losses";

/**
 * Display policy (our choice, not a standard): a junction within this many
 * kelvin of its derated limit is shown as "near limit". The derated limit
 * itself (Tj max less the design's derating margin) comes from the model.
 */
export const NEAR_LIMIT_BAND_K = 10;

export type JunctionStatus = "ok" | "close" | "over";

export function junctionStatus(j: JunctionState): JunctionStatus {
  if (j.runaway || j.margin < 0) return "over";
  return j.margin < NEAR_LIMIT_BAND_K ? "close" : "ok";
}

export type LossRow = { part: string; label: string; total: number } & Partial<Record<LossMechanism, number>>;

/**
 * One bar per part that carries loss at this corner (total > 0), stacked by
 * the mechanisms that carry loss somewhere, in LOSS_MECHANISMS order. Parts
 * keep the model's order (controller first, then each position's chain).
 */
export function lossBarData(corner: CornerResult): { rows: LossRow[]; keys: LossMechanism[] } {
  const withLoss = corner.parts.filter((p) => p.total > 0);
  const keys = LOSS_MECHANISMS.filter((m) => withLoss.some((p) => p.losses[m] > 0));
  const rows = withLoss.map((p) => {
    const row: LossRow = { part: p.id, label: p.label, total: p.total };
    for (const m of keys) if (p.losses[m] > 0) row[m] = p.losses[m];
    return row;
  });
  return { rows, keys };
}

export interface JunctionRow {
  id: string;
  label: string;
  kind: PartResult["kind"];
  /** °C; null on thermal runaway. */
  tj: number | null;
  limit: number;
  tjMax: number;
  /** K below the derated limit (negative = over); null on runaway. */
  margin: number | null;
  status: JunctionStatus;
  loss: number;
}

/** Junction parts of a corner, tightest margin first (runaway on top). */
export function junctionRows(corner: CornerResult): JunctionRow[] {
  const rows: JunctionRow[] = [];
  for (const p of corner.parts) {
    const j = p.junction;
    if (!j) continue;
    rows.push({
      id: p.id,
      label: p.label,
      kind: p.kind,
      tj: j.runaway ? null : j.tj,
      limit: j.limit,
      tjMax: j.tjMax,
      margin: j.runaway ? null : j.margin,
      status: junctionStatus(j),
      loss: p.total,
    });
  }
  return rows.sort((a, b) => (a.margin ?? Number.NEGATIVE_INFINITY) - (b.margin ?? Number.NEGATIVE_INFINITY));
}

export interface ControllerSplit {
  cornerId: string;
  cornerLabel: string;
  ambient: number;
  /** Vcc·Iq (and driver input currents booked on the controller), W. */
  quiescent: number;
  /** Gate-drive energy burnt in the controller's own output pin, W. */
  gateDrive: number;
  /** Anything else booked on the controller, W (normally 0). */
  other: number;
  total: number;
  tj: number | null;
  limit: number | null;
  tjMax: number | null;
  margin: number | null;
  status: JunctionStatus | null;
}

export function controllerSplit(corner: CornerResult): ControllerSplit | null {
  const c = corner.parts.find((p) => p.kind === "controller");
  if (!c) return null;
  const quiescent = c.losses.quiescent;
  const gateDrive = c.losses.gateDrive;
  const j = c.junction;
  return {
    cornerId: corner.cornerId,
    cornerLabel: corner.label,
    ambient: corner.ambient,
    quiescent,
    gateDrive,
    other: Math.max(0, c.total - quiescent - gateDrive),
    total: c.total,
    tj: j && !j.runaway ? j.tj : null,
    limit: j?.limit ?? null,
    tjMax: j?.tjMax ?? null,
    margin: j && !j.runaway ? j.margin : null,
    status: j ? junctionStatus(j) : null,
  };
}

/** The controller at every corner, in corner order. */
export function controllerByCorner(ev: Evaluation): ControllerSplit[] {
  return ev.corners.map(controllerSplit).filter((c): c is ControllerSplit => c !== null);
}

/** The corner with the least controller margin (runaway counts as least). */
export function worstControllerCorner(ev: Evaluation): ControllerSplit | null {
  const all = controllerByCorner(ev);
  return all.reduce<ControllerSplit | null>((w, c) => (w === null || (c.margin ?? -Infinity) < (w.margin ?? -Infinity) ? c : w), null);
}

/** The editor page with the element to change selected. */
export function editorHref({ projectId, optionId, element }: { projectId: string; optionId: string; element?: string }): string {
  const base = `/projects/${encodeURIComponent(projectId)}/options/${encodeURIComponent(optionId)}`;
  return element ? `${base}?element=${encodeURIComponent(element)}#${encodeURIComponent(element)}` : base;
}

/** Human words for an element path: "positions.0.gate.rTurnOn" -> "Q1 gate · rTurnOn". */
export function elementWords(element: string, positionIds: readonly string[]): string {
  const parts = element.split(".");
  if (parts[0] === "positions" && /^\d+$/.test(parts[1] ?? "")) {
    const id = positionIds[Number(parts[1])] ?? `position ${Number(parts[1]) + 1}`;
    return [id, ...parts.slice(2)].join(" · ");
  }
  if (parts[0] === "corners" && /^\d+$/.test(parts[1] ?? "")) return [`corner ${Number(parts[1]) + 1}`, ...parts.slice(2)].join(" · ");
  return parts.join(" · ");
}

/** Warnings of one corner, errors first; then those of other corners. */
export function warningsFor(ev: Evaluation, cornerId: string): { here: Warning[]; elsewhere: Warning[] } {
  const rank = { error: 0, warning: 1, info: 2 } as const;
  const sorted = [...ev.warnings].sort((a, b) => rank[a.severity] - rank[b.severity]);
  return { here: sorted.filter((w) => w.cornerId === cornerId), elsewhere: sorted.filter((w) => w.cornerId !== cornerId) };
}
