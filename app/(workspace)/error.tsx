"use client";

import { ErrorNotice } from "@/components/shell/ErrorNotice";

// A workspace page failed to render (e.g. the database went away): the shell
// stays, the page says so and offers a retry.
export default function WorkspaceError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorNotice reset={reset} digest={error.digest} />;
}
