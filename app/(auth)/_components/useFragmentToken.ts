"use client";
import { useSyncExternalStore } from "react";

// E-mailed links carry their secret in the URL fragment (#token=...), which
// browsers never send to the server, so it stays out of access logs, Referer
// headers and the server-rendered HTML. Read only in the browser.
function subscribe(onChange: () => void): () => void {
  window.addEventListener("hashchange", onChange);
  return () => window.removeEventListener("hashchange", onChange);
}

function read(): string {
  return new URLSearchParams(window.location.hash.slice(1)).get("token") ?? "";
}

/** The token from the fragment; null during server rendering and hydration. */
export function useFragmentToken(): string | null {
  return useSyncExternalStore(subscribe, read, () => null);
}
