import Link from "next/link";
import type { ReactNode } from "react";

export interface PageHeaderProps {
  title: ReactNode;
  subtitle?: ReactNode;
  /** Buttons at the right; they wrap under the title on narrow screens. */
  actions?: ReactNode;
  /** A way back up, e.g. { href: "/projects", label: "Projects" }. */
  back?: { href: string; label: string };
  /** Badges beside the title (status, revision). */
  meta?: ReactNode;
}

export function PageHeader({ title, subtitle, actions, back, meta }: PageHeaderProps) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-paper-line pb-4">
      <div className="min-w-0">
        {back && (
          <Link href={back.href} className="mb-1.5 inline-flex items-center gap-1 text-sm text-ink-soft hover:text-copper-700">
            <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3">
              <path d="M7.5 2.5 4 6l3.5 3.5" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
            </svg>
            {back.label}
          </Link>
        )}
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
          {meta}
        </div>
        {subtitle && <p className="mt-1 max-w-3xl text-sm text-ink-soft">{subtitle}</p>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </header>
  );
}
