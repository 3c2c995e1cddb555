"use client";

import { Button, LinkButton } from "@/components/ui";
import { DATABASE_UNAVAILABLE_MESSAGE } from "@/lib/errors";

/**
 * What a page shows when rendering it failed (error.tsx boundaries): the
 * same words the API answers with 503 when the database is away, a retry,
 * and a way home. The cause is in the server log under the digest, never
 * on the page.
 */
export function ErrorNotice({ reset, digest }: { reset: () => void; digest?: string }) {
  return (
    <div className="mx-auto flex max-w-2xl flex-col items-start gap-4 px-4 py-16 sm:px-6" role="alert">
      <p className="font-mono text-sm text-copper-700">500 · the page could not be drawn</p>
      <h1 className="text-3xl font-semibold tracking-tight text-ink">Something went wrong on our side</h1>
      <p className="text-ink-soft">Nothing you entered was lost by this page. If the database was the trouble: {DATABASE_UNAVAILABLE_MESSAGE}</p>
      {digest && <p className="font-mono text-xs text-ink-faint">Reference for the server log: {digest}</p>}
      <div className="flex flex-wrap gap-3">
        <Button variant="primary" onClick={reset}>
          Try again
        </Button>
        <LinkButton href="/home" variant="secondary">
          Back to home
        </LinkButton>
      </div>
    </div>
  );
}
