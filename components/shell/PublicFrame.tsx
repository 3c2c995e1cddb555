import Link from "next/link";
import type { ReactNode } from "react";
import { LinkButton } from "@/components/ui/Button";
import { Caution } from "@/components/ui/Caution";
import { Wordmark } from "./Mark";

/** The signed-out frame (landing, not-found): wordmark, sign-in links, cautions. */
export function PublicFrame({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded-md bg-paper-raised px-4 py-2 text-sm font-medium text-ink shadow-lift focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header className="border-b border-paper-line bg-paper-raised/70">
        <div className="mx-auto flex max-w-6xl items-center justify-between gap-4 px-4 py-3 sm:px-6">
          <Link href="/" className="rounded-md" aria-label="Heatsplit, start page">
            <Wordmark />
          </Link>
          <nav aria-label="Account" className="flex items-center gap-2">
            <LinkButton href="/sign-in" variant="ghost" size="sm">
              Sign in
            </LinkButton>
            <LinkButton href="/sign-up" variant="primary" size="sm">
              Create an account
            </LinkButton>
          </nav>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="flex-1 focus:outline-none">
        {children}
      </main>
      <footer className="border-t border-paper-line bg-paper-sunk/50">
        <div className="mx-auto max-w-6xl px-4 py-4 sm:px-6">
          <Caution variant="compact" />
        </div>
      </footer>
    </div>
  );
}
