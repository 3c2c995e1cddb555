import type { ReactNode } from "react";

/** The one panel an auth page shows: a heading, a line of context, the form, links below. */
export function AuthCard({ title, intro, children, footer }: { title: string; intro?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <section className="rounded-panel border border-paper-line bg-paper-raised px-6 py-7 shadow-panel">
      <h1 className="text-2xl font-semibold tracking-tight text-ink">{title}</h1>
      {intro && <p className="mt-1.5 text-sm text-ink-soft">{intro}</p>}
      <div className="mt-6">{children}</div>
      {footer && <div className="mt-6 border-t border-paper-line pt-4 text-sm text-ink-soft">{footer}</div>}
    </section>
  );
}
