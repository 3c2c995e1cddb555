"use client";

import { DATABASE_UNAVAILABLE_MESSAGE } from "@/lib/errors";

// The root layout itself failed: this replaces it, so it brings its own
// <html> and <body> and nothing that needs the layout (fonts, shell).
export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui, sans-serif", margin: "4rem auto", maxWidth: "40rem", padding: "0 1rem", color: "#1f2a30" }}>
        <p style={{ fontFamily: "monospace", color: "#8e4a1f" }}>500 · Heatsplit could not start this page</p>
        <h1>Something went wrong on our side</h1>
        <p>If the database was the trouble: {DATABASE_UNAVAILABLE_MESSAGE}</p>
        {error.digest && <p style={{ fontFamily: "monospace", fontSize: "0.8rem" }}>Reference for the server log: {error.digest}</p>}
        <button type="button" onClick={reset}>
          Try again
        </button>
      </body>
    </html>
  );
}
