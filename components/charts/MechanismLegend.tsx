import { MECHANISM_COLOURS, MECHANISM_LABELS, type LossMechanism } from "@/lib/palette";

/** The colour key of the loss stack, as plain HTML (no chart library). */
export function MechanismLegend({ keys }: { keys: readonly LossMechanism[] }) {
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1.5 text-xs text-ink-soft" aria-label="Loss mechanisms">
      {keys.map((k) => (
        <li key={k} className="flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block size-2.5 rounded-sm" style={{ background: MECHANISM_COLOURS[k] }} />
          {MECHANISM_LABELS[k]}
        </li>
      ))}
    </ul>
  );
}
