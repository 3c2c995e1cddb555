import type { OptionChoiceRecord } from "@/db/queries/choices";

/** Every recorded choice, newest first; the first one is in force. */
export function ChoiceHistory({ history }: { history: OptionChoiceRecord[] }) {
  if (history.length === 0) return <p className="text-sm text-ink-soft">No option has been chosen for this project yet.</p>;
  return (
    <ol className="flex flex-col gap-3" aria-label="Choices, newest first" data-choice-history>
      {history.map((c, i) => (
        <li key={c.id} className={i === 0 ? "rounded-md border border-verdigris-300 bg-verdigris-50 px-3 py-2" : "px-3 text-ink-soft"} data-choice={c.optionId}>
          <p className="text-sm">
            <span className="font-medium text-ink">{c.optionName}</span> <span className="font-mono text-xs">rev {c.revision}</span>
            {i === 0 && <span className="ml-2 text-xs font-semibold text-verdigris-700 uppercase">in force</span>}
          </p>
          <p className="mt-0.5 text-sm">{c.reason}</p>
          <p className="mt-0.5 text-xs text-ink-faint">
            {c.chosenBy.displayName} · <time dateTime={c.chosenAt.toISOString()}>{c.chosenAt.toISOString().slice(0, 16).replace("T", " ")} UTC</time>
          </p>
        </li>
      ))}
    </ol>
  );
}
