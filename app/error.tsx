"use client";

import { ErrorNotice } from "@/components/shell/ErrorNotice";

// A page outside the workspace (start page, sign-in, sign-up) failed to render.
export default function RootError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorNotice reset={reset} digest={error.digest} />;
}
