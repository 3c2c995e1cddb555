import type { ReactNode } from "react";
import { cx } from "./cx";

export interface EmptyStateProps {
  title: ReactNode;
  children?: ReactNode;
  /** Usually one LinkButton or Button that creates the first item. */
  action?: ReactNode;
  className?: string;
}

/** What a list looks like before it has anything in it. */
export function EmptyState({ title, children, action, className }: EmptyStateProps) {
  return (
    <div
      className={cx(
        "flex flex-col items-center gap-3 rounded-panel border border-dashed border-paper-edge/60 bg-paper-raised/60 px-6 py-10 text-center",
        className,
      )}
    >
      {/* An unpopulated board footprint: pads waiting for a part. */}
      <svg aria-hidden="true" viewBox="0 0 64 40" className="h-10 w-16 text-ink-faint">
        <rect x="14" y="6" width="36" height="28" rx="3" fill="none" stroke="currentColor" strokeWidth="1.5" strokeDasharray="3 3" />
        {[10, 20, 30].map((y) => (
          <g key={y}>
            <rect x="6" y={y - 2} width="8" height="4" rx="1" fill="#dc9a6c" />
            <rect x="50" y={y - 2} width="8" height="4" rx="1" fill="#dc9a6c" />
          </g>
        ))}
      </svg>
      <h2 className="text-base font-semibold text-ink">{title}</h2>
      {children && <div className="max-w-md text-sm text-ink-soft">{children}</div>}
      {action && <div className="mt-1">{action}</div>}
    </div>
  );
}
