import { CAUTION_BENCH, CAUTION_HOT, CAUTION_MAINS, CAUTION_TEXT } from "@/lib/cautions";
import { cx } from "./cx";

export { CAUTION_BENCH, CAUTION_HOT, CAUTION_MAINS, CAUTION_TEXT };

function CautionMark({ className }: { className?: string }) {
  // A tilted amber tile with a bar and a dot: plain, and not a copy of a
  // regulated safety sign (those belong on the product, not in the UI).
  return (
    <svg aria-hidden="true" viewBox="0 0 16 16" className={cx("shrink-0", className)}>
      <rect x="2" y="2" width="12" height="12" rx="3" fill="#c48a12" transform="rotate(-8 8 8)" />
      <rect x="7.1" y="4.2" width="1.8" height="5.2" rx="0.9" fill="#1f2a30" />
      <rect x="7.1" y="10.6" width="1.8" height="1.8" rx="0.9" fill="#1f2a30" />
    </svg>
  );
}

export interface CautionProps {
  variant?: "compact" | "full";
  className?: string;
}

/** Safety cautions: "compact" for the page footer, "full" for reports and sign-off. */
export function Caution({ variant = "compact", className }: CautionProps) {
  if (variant === "compact") {
    return (
      <p className={cx("flex items-start gap-2 text-xs leading-relaxed text-ink-faint", className)}>
        <CautionMark className="mt-0.5 size-3.5" />
        <span>
          <span className="font-semibold text-ink-soft">Caution. </span>
          {CAUTION_TEXT}
        </span>
      </p>
    );
  }
  const items = [
    { head: "Estimates", text: CAUTION_BENCH },
    { head: "Mains", text: CAUTION_MAINS },
    { head: "Heat", text: CAUTION_HOT },
  ];
  return (
    <aside
      aria-label="Cautions"
      className={cx("rounded-panel border border-amber-300 bg-amber-50 px-5 py-4 text-sm text-ink", className)}
    >
      <p className="mb-2 flex items-center gap-2 font-semibold">
        <CautionMark className="size-4" />
        Cautions
      </p>
      <ul className="grid gap-2">
        {items.map((i) => (
          <li key={i.head} className="grid gap-x-3 sm:grid-cols-[6rem_1fr]">
            <span className="text-xs font-semibold tracking-wider text-amber-700 uppercase sm:pt-0.5">{i.head}</span>
            <span className="leading-relaxed">{i.text}</span>
          </li>
        ))}
      </ul>
    </aside>
  );
}
