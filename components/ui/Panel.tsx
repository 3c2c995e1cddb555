import Link from "next/link";
import type { ReactNode } from "react";
import { cx } from "./cx";

export interface PanelProps {
  title?: ReactNode;
  description?: ReactNode;
  /** Buttons or links at the right of the panel header. */
  actions?: ReactNode;
  /** Heading level of the title; 2 by default (pages own the h1). */
  level?: 2 | 3;
  /** Drop the body padding, e.g. for a table that runs edge to edge. */
  flush?: boolean;
  className?: string;
  children?: ReactNode;
}

/** A raised section of a page with an optional header row. */
export function Panel({ title, description, actions, level = 2, flush, className, children }: PanelProps) {
  const Heading = level === 2 ? "h2" : "h3";
  const hasHeader = title || description || actions;
  return (
    <section className={cx("rounded-panel border border-paper-line bg-paper-raised shadow-panel", className)}>
      {hasHeader && (
        <header className="flex flex-wrap items-start justify-between gap-3 border-b border-paper-line px-5 py-3.5">
          <div className="min-w-0">
            {title && <Heading className="text-base font-semibold text-ink">{title}</Heading>}
            {description && <p className="mt-0.5 text-sm text-ink-soft">{description}</p>}
          </div>
          {actions && <div className="flex shrink-0 flex-wrap items-center gap-2">{actions}</div>}
        </header>
      )}
      <div className={flush ? undefined : "px-5 py-4"}>{children}</div>
    </section>
  );
}

export interface CardProps {
  title: ReactNode;
  /** When set, the whole card is one link (e.g. a project tile). */
  href?: string;
  /** Small line above the title: a code, a date, a kind. */
  eyebrow?: ReactNode;
  /** Badges or quantities along the bottom edge. */
  footer?: ReactNode;
  level?: 2 | 3;
  className?: string;
  children?: ReactNode;
}

export function Card({ title, href, eyebrow, footer, level = 3, className, children }: CardProps) {
  const Heading = level === 2 ? "h2" : "h3";
  const classes = cx(
    "group relative flex flex-col gap-2 rounded-panel border border-paper-line bg-paper-raised p-4 shadow-panel",
    href && "transition-shadow hover:border-copper-300 hover:shadow-lift",
    className,
  );
  return (
    <article className={classes}>
      {eyebrow && <p className="font-mono text-xs tracking-wide text-ink-faint">{eyebrow}</p>}
      <Heading className="text-base font-semibold text-ink">
        {href ? (
          // The stretched ::after makes the whole card clickable while the
          // accessible name stays the title.
          <Link href={href} className="after:absolute after:inset-0 after:rounded-panel group-hover:text-copper-700">
            {title}
          </Link>
        ) : (
          title
        )}
      </Heading>
      {children && <div className="text-sm text-ink-soft">{children}</div>}
      {footer && <div className="mt-auto flex flex-wrap items-center gap-2 pt-2">{footer}</div>}
    </article>
  );
}
