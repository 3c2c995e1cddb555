import { cx } from "@/components/ui/cx";

/** The Heatsplit mark: one stream of drive power splitting three ways. Same drawing as app/icon.svg. */
export function Mark({ className }: { className?: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 32 32" className={cx("shrink-0", className)}>
      <rect width="32" height="32" rx="7" fill="#162026" />
      <g fill="none" strokeLinecap="round" strokeWidth="3">
        <path d="M5 16h7" stroke="#dc9a6c" />
        <path d="M12 16c4 0 5-7 10-7h3" stroke="#dc9a6c" />
        <path d="M12 16h13" stroke="#f7f5f0" />
        <path d="M12 16c4 0 5 7 10 7h3" stroke="#7fbfae" />
      </g>
      <circle cx="12" cy="16" r="2.6" fill="#b8652f" />
    </svg>
  );
}

/** Mark plus name. `tone` picks the text colour for light or dark ground. */
export function Wordmark({ tone = "light", className }: { tone?: "light" | "dark"; className?: string }) {
  return (
    <span className={cx("inline-flex items-center gap-2", className)}>
      <Mark className={cx("size-7", tone === "dark" && "ring-1 ring-white/15 rounded-[7px]")} />
      <span className={cx("text-[1.0625rem] font-semibold tracking-tight", tone === "dark" ? "text-paper" : "text-ink")}>
        Heat<span className={tone === "dark" ? "text-copper-300" : "text-copper-700"}>split</span>
      </span>
    </span>
  );
}
