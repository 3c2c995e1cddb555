"use client";

import { createContext, useContext } from "react";
import type { PartRefs } from "@/db/queries/options";

/** What every field of the editor needs: read a value, write one, its issue, and whether editing is allowed. */
export interface EditorApi {
  doc: unknown;
  readOnly: boolean;
  /** parseDesign issues (and the server's), by dotted document path. */
  issues: Record<string, string>;
  get(path: string): unknown;
  /** `undefined` removes the field. */
  set(path: string, value: unknown): void;
  partRefs: PartRefs;
  setPartRef(ref: string, partId: string | undefined): void;
}

export const EditorContext = createContext<EditorApi | null>(null);

export function useEditor(): EditorApi {
  const api = useContext(EditorContext);
  if (!api) throw new Error("useEditor outside the option editor");
  return api;
}

/** Issues at `path` or below it (for a block's badge). */
export function issuesUnder(issues: Record<string, string>, path: string): number {
  return Object.keys(issues).filter((p) => p === path || p.startsWith(`${path}.`)).length;
}
