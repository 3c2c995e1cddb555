import Link from "next/link";
import type { ReactNode } from "react";
import { cx } from "./cx";

export type WarningSeverity = "info" | "warning" | "error";

export const SEVERITY_LABELS: Record<WarningSeverity, string> = {
  info: "Note",
  warning: "Warning",
  error: "Error",
};

const level: Record<WarningSeverity, number> = { info: 1, warning: 2, error: 3 };
const colour: Record<WarningSeverity, string> = {
  info: "text-slateblue-500",
  warning: "text-amber-500",
  error: "text-alarm-500",
};

/**
 * Severity as a three-step level meter: one, two or three filled bars. The
 * count carries the meaning without colour; the colour repeats it.
 */
export function SeverityIcon({ severity, className }: { severity: WarningSeverity; className?: string }) {
  const n = level[severity];
  return (
    <svg aria-hidden="true" viewBox="0 0 16 16" className={cx("size-4 shrink-0", colour[severity], className)}>
      {[0, 1, 2].map((i) => (
        <rect
          key={i}
          x={1.5 + i * 5}
          y={10 - i * 4}
          width="3.5"
          height={4.5 + i * 4}
          rx="1"
          fill={i < n ? "currentColor" : "none"}
          stroke="currentColor"
          strokeWidth={i < n ? 0 : 1.1}
          opacity={i < n ? 1 : 0.55}
        />
      ))}
    </svg>
  );
}

export interface WarningItemProps {
  severity: WarningSeverity;
  /** Short headline in plain words, e.g. "Gate current starved by buffer gain". */
  title?: ReactNode;
  /** What happened and what to do, in plain words. */
  children?: ReactNode;
  /** The element the warning is about: links to where it is edited. */
  target?: { href: string; label: string };
  /** Stable code of the check (for filters and reports), shown small. */
  code?: string;
}

export function WarningItem({ severity, title, children, target, code }: WarningItemProps) {
  return (
    <li className="flex gap-3 px-4 py-3">
      <SeverityIcon severity={severity} className="mt-0.5" />
      <div className="min-w-0 flex-1 text-sm">
        <p className="text-ink">
          <span className="sr-only">{SEVERITY_LABELS[severity]}: </span>
          {title && <span className="font-medium">{title}</span>}
          {title && children ? " " : null}
          {children && <span className={title ? "text-ink-soft" : undefined}>{children}</span>}
        </p>
        {(target || code) && (
          <p className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-xs">
            {target && (
              <Link href={target.href} className="font-medium text-copper-700 underline decoration-copper-300 underline-offset-2 hover:decoration-copper-700">
                {target.label}
              </Link>
            )}
            {code && <code className="font-mono text-ink-faint">{code}</code>}
          </p>
        )}
      </div>
    </li>
  );
}

export interface WarningListProps {
  /** Accessible name of the list, e.g. "Checks for option B at Vin max". */
  label: string;
  className?: string;
  children: ReactNode;
}

export function WarningList({ label, className, children }: WarningListProps) {
  return (
    <ul
      aria-label={label}
      className={cx("divide-y divide-paper-line rounded-panel border border-paper-line bg-paper-raised", className)}
    >
      {children}
    </ul>
  );
}
