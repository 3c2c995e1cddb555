import Link from "next/link";
import { cx } from "./cx";

export interface PaginationProps {
  /** 1-based. */
  page: number;
  pageCount: number;
  /** Path the page links point at, e.g. "/parts". */
  basePath: string;
  /** Other query parameters to keep (filters, sort). */
  searchParams?: Record<string, string | undefined>;
  param?: string;
  label?: string;
}

function hrefFor(basePath: string, searchParams: Record<string, string | undefined>, param: string, page: number) {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(searchParams)) if (v !== undefined && k !== param) q.set(k, v);
  if (page > 1) q.set(param, String(page));
  const s = q.toString();
  return s ? `${basePath}?${s}` : basePath;
}

/** Pages to show: first, last and two around the current one; null = gap. */
export function pageWindow(page: number, pageCount: number): Array<number | null> {
  const wanted = new Set([1, pageCount, page - 1, page, page + 1].filter((p) => p >= 1 && p <= pageCount));
  const sorted = [...wanted].sort((a, b) => a - b);
  const out: Array<number | null> = [];
  sorted.forEach((p, i) => {
    if (i > 0 && p - sorted[i - 1] > 1) out.push(p - sorted[i - 1] === 2 ? p - 1 : null);
    out.push(p);
  });
  return out;
}

const cell = "inline-flex h-8 min-w-8 items-center justify-center rounded-md px-2 text-sm";

export function Pagination({ page, pageCount, basePath, searchParams = {}, param = "page", label = "Pages" }: PaginationProps) {
  if (pageCount <= 1) return null;
  const current = Math.min(Math.max(1, page), pageCount);
  const link = (p: number) => hrefFor(basePath, searchParams, param, p);
  return (
    <nav aria-label={label} className="flex flex-wrap items-center justify-between gap-3 py-3">
      <p className="text-sm text-ink-faint">
        Page <span className="font-mono tabular-nums text-ink">{current}</span> of{" "}
        <span className="font-mono tabular-nums text-ink">{pageCount}</span>
      </p>
      <ul className="flex items-center gap-1">
        <li>
          {current > 1 ? (
            <Link href={link(current - 1)} rel="prev" className={cx(cell, "text-ink-soft hover:bg-paper-sunk hover:text-ink")}>
              Previous
            </Link>
          ) : (
            <span aria-disabled="true" className={cx(cell, "text-ink-faint/60")}>Previous</span>
          )}
        </li>
        {pageWindow(current, pageCount).map((p, i) =>
          p === null ? (
            <li key={`gap-${i}`} aria-hidden="true" className={cx(cell, "text-ink-faint")}>
              …
            </li>
          ) : (
            <li key={p}>
              <Link
                href={link(p)}
                aria-current={p === current ? "page" : undefined}
                aria-label={`Page ${p}`}
                className={cx(
                  cell,
                  "font-mono tabular-nums",
                  p === current ? "bg-ink text-paper" : "text-ink-soft hover:bg-paper-sunk hover:text-ink",
                )}
              >
                {p}
              </Link>
            </li>
          ),
        )}
        <li>
          {current < pageCount ? (
            <Link href={link(current + 1)} rel="next" className={cx(cell, "text-ink-soft hover:bg-paper-sunk hover:text-ink")}>
              Next
            </Link>
          ) : (
            <span aria-disabled="true" className={cx(cell, "text-ink-faint/60")}>Next</span>
          )}
        </li>
      </ul>
    </nav>
  );
}
