"use client";

import type { Evaluation } from "@/models/evaluate";
import { StatusGlyph, cx, formatSi } from "@/components/ui";
import { junctionRows } from "./shape";

/**
 * The corners as a row of tabs. Each tab carries the corner's tightest
 * junction margin, so the worst corner stands out before it is opened.
 */
export function CornerStrip({ evaluation, selected, onSelect }: { evaluation: Evaluation; selected: string; onSelect: (id: string) => void }) {
  return (
    <div role="tablist" aria-label="Operating corner" className="flex gap-2 overflow-x-auto pb-1">
      {evaluation.corners.map((c) => {
        const tightest = junctionRows(c)[0];
        const active = c.cornerId === selected;
        return (
          <button
            key={c.cornerId}
            type="button"
            role="tab"
            aria-selected={active}
            data-corner={c.cornerId}
            onClick={() => onSelect(c.cornerId)}
            className={cx(
              "flex min-w-44 flex-col items-start gap-1 rounded-md border px-3 py-2 text-left text-sm transition-colors",
              active ? "border-copper-500 bg-copper-50 shadow-panel" : "border-paper-line bg-paper-raised hover:border-copper-300",
            )}
          >
            <span className="font-medium text-ink">{c.label}</span>
            <span className="flex items-center gap-1.5 font-mono text-xs text-ink-soft">
              {tightest && (
                <span className={tightest.status === "over" ? "text-alarm-700" : tightest.status === "close" ? "text-amber-700" : "text-verdigris-700"}>
                  <StatusGlyph status={tightest.status} />
                </span>
              )}
              {tightest ? (tightest.margin === null ? `${tightest.label}: runaway` : `tightest ${formatSi(tightest.margin, "K", 3)}`) : "no junctions"}
              <span aria-hidden="true">·</span>
              {formatSi(c.totalLoss, "W", 3)}
            </span>
          </button>
        );
      })}
    </div>
  );
}
