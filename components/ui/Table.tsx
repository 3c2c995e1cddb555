import Link from "next/link";
import type { HTMLAttributes, ReactNode, TdHTMLAttributes, ThHTMLAttributes } from "react";
import { cx } from "./cx";

export interface TableProps {
  /** Every table is named; pass captionHidden to keep it for screen readers only. */
  caption: ReactNode;
  captionHidden?: boolean;
  /** Tighter rows for dense corner-by-corner results. */
  dense?: boolean;
  className?: string;
  children: ReactNode;
}

export function Table({ caption, captionHidden, dense, className, children }: TableProps) {
  return (
    <div className={cx("overflow-x-auto rounded-panel border border-paper-line bg-paper-raised", className)}>
      <table className={cx("w-full border-collapse text-sm", dense ? "[&_td]:py-1.5 [&_th]:py-1.5" : "[&_td]:py-2.5 [&_th]:py-2")}>
        <caption
          className={
            captionHidden ? "sr-only" : "border-b border-paper-line px-4 py-2.5 text-left text-sm font-semibold text-ink"
          }
        >
          {caption}
        </caption>
        {children}
      </table>
    </div>
  );
}

export function THead({ className, ...rest }: HTMLAttributes<HTMLTableSectionElement>) {
  return <thead className={cx("bg-paper-sunk/60", className)} {...rest} />;
}

export function TBody({ className, ...rest }: HTMLAttributes<HTMLTableSectionElement>) {
  return <tbody className={cx("divide-y divide-paper-line", className)} {...rest} />;
}

export function Tr({ className, ...rest }: HTMLAttributes<HTMLTableRowElement>) {
  return <tr className={cx("hover:bg-copper-50/40", className)} {...rest} />;
}

export type SortDirection = "ascending" | "descending";

export interface ThProps extends Omit<ThHTMLAttributes<HTMLTableCellElement>, "onClick"> {
  numeric?: boolean;
  /** Direction when the table is sorted by this column; omit otherwise. */
  sorted?: SortDirection;
  /** Server-side sorting: link to the same page with the new sort order. */
  sortHref?: string;
  /** Client-side sorting (inside a client component only). */
  onSort?: () => void;
}

function SortMark({ sorted }: { sorted?: SortDirection }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 8 12" className="h-3 w-2 shrink-0">
      <path d="M4 1 7 4.5H1z" fill="currentColor" opacity={sorted === "ascending" ? 1 : 0.28} />
      <path d="M4 11 1 7.5h6z" fill="currentColor" opacity={sorted === "descending" ? 1 : 0.28} />
    </svg>
  );
}

export function Th({ numeric, sorted, sortHref, onSort, className, children, scope = "col", ...rest }: ThProps) {
  const sortable = sortHref !== undefined || onSort !== undefined;
  const inner = sortable ? (
    sortHref !== undefined ? (
      <Link href={sortHref} className={cx("inline-flex items-center gap-1.5 hover:text-ink", numeric && "flex-row-reverse")}>
        {children}
        <SortMark sorted={sorted} />
      </Link>
    ) : (
      <button
        type="button"
        onClick={onSort}
        className={cx("inline-flex items-center gap-1.5 hover:text-ink", numeric && "flex-row-reverse")}
      >
        {children}
        <SortMark sorted={sorted} />
      </button>
    )
  ) : (
    children
  );
  return (
    <th
      scope={scope}
      aria-sort={sortable ? (sorted ?? "none") : undefined}
      className={cx(
        "border-b border-paper-line px-4 text-xs font-semibold tracking-wide text-ink-soft",
        numeric ? "text-right" : "text-left",
        sorted && "text-ink",
        className,
      )}
      {...rest}
    >
      {inner}
    </th>
  );
}

export interface TdProps extends TdHTMLAttributes<HTMLTableCellElement> {
  /** Right-aligned tabular figures, for numbers and Quantity cells. */
  numeric?: boolean;
}

export function Td({ numeric, className, ...rest }: TdProps) {
  return (
    <td
      className={cx("px-4 align-top text-ink", numeric && "text-right font-mono tabular-nums whitespace-nowrap", className)}
      {...rest}
    />
  );
}
