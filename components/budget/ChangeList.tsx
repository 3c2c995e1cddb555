import type { Warning } from "@/models/evaluate";
import { WarningItem, WarningList } from "@/components/ui";
import { editorHref, elementWords } from "./shape";

/** Warnings in plain words, each linking to the element to change in the editor. */
export function ChangeList({
  warnings,
  label,
  projectId,
  optionId,
  positionIds,
  cornerLabels,
}: {
  warnings: readonly Warning[];
  label: string;
  projectId: string;
  optionId: string;
  positionIds: readonly string[];
  cornerLabels: Record<string, string>;
}) {
  if (warnings.length === 0) return <p className="px-1 text-sm text-ink-soft">Nothing to change here: every check passed.</p>;
  return (
    <WarningList label={label}>
      {warnings.map((w, i) => (
        <WarningItem
          key={`${w.code}-${w.partId}-${w.cornerId}-${i}`}
          severity={w.severity}
          code={`${w.code} · ${cornerLabels[w.cornerId] ?? w.cornerId}`}
          target={{ href: editorHref({ projectId, optionId, element: w.element }), label: `Change ${elementWords(w.element, positionIds)}` }}
        >
          {w.message}
        </WarningItem>
      ))}
    </WarningList>
  );
}
