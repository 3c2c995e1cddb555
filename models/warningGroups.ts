/**
 * The same warning raised at several corners, told once: reports list one
 * entry per (code, part, element) with the corners it holds at, keeping the
 * most severe wording (first raised among equals). Pure.
 */
import type { Warning } from "./warnings";

export interface WarningGroup {
  code: Warning["code"];
  severity: Warning["severity"];
  partId: string;
  element: string;
  /** The message of the most severe occurrence (its corner named in it). */
  message: string;
  /** Every corner where it was raised, in the order of the evaluation. */
  cornerIds: string[];
}

const RANK: Record<Warning["severity"], number> = { error: 2, warning: 1, info: 0 };

export function groupWarnings(warnings: readonly Warning[]): WarningGroup[] {
  const groups = new Map<string, WarningGroup>();
  for (const w of warnings) {
    const key = `${w.code}|${w.partId}|${w.element}`;
    const g = groups.get(key);
    if (!g) {
      groups.set(key, { code: w.code, severity: w.severity, partId: w.partId, element: w.element, message: w.message, cornerIds: [w.cornerId] });
      continue;
    }
    if (!g.cornerIds.includes(w.cornerId)) g.cornerIds.push(w.cornerId);
    if (RANK[w.severity] > RANK[g.severity]) Object.assign(g, { severity: w.severity, message: w.message });
  }
  return [...groups.values()].sort((a, b) => RANK[b.severity] - RANK[a.severity]);
}
