"use client";

import { useCallback, useMemo, useState } from "react";
import { parseDesign } from "@/models/input/schema";
import type { PartRefs } from "@/db/queries/options";
import { ApiError, fetchJson, issuesByPath } from "@/lib/api-client";
import { getAt, setAt } from "@/models/documentPath";
import { reapplyEdits, reapplyFlat } from "@/lib/docPaths";

export interface Snapshot {
  revision: number;
  document: unknown;
  partRefs: PartRefs;
}

export interface Conflict {
  message: string;
  latest: Snapshot | null;
}

export type Notice = { tone: "success" | "error"; text: string } | null;

/** Blocks the model refuses when left empty; removing their last field removes the block. */
const PRUNE_WHEN_EMPTY = new Set(["outputCapacitance", "tolerance"]);

function pruneEmpty(doc: unknown, path: string): unknown {
  const keys = path.split(".");
  for (let n = keys.length - 1; n > 0; n--) {
    const parent = keys.slice(0, n).join(".");
    const node = getAt(doc, parent);
    if (!PRUNE_WHEN_EMPTY.has(keys[n - 1]) || !node || typeof node !== "object" || Object.keys(node).length > 0) break;
    doc = setAt(doc, parent, undefined);
  }
  return doc;
}

/**
 * The editor's state: the revision the edits started from (base), the
 * document and part references being edited, issues, and the save with its
 * conflict handling. A refused save never touches the edits.
 */
export function useOptionEditor({ optionId, initial }: { optionId: string; initial: Snapshot }) {
  const [base, setBase] = useState<Snapshot>(initial);
  const [doc, setDoc] = useState<unknown>(initial.document);
  const [partRefs, setPartRefs] = useState<PartRefs>(initial.partRefs);
  const [serverIssues, setServerIssues] = useState<Record<string, string>>({});
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [saving, setSaving] = useState(false);
  const [notice, setNotice] = useState<Notice>(null);

  const parsed = useMemo(() => parseDesign(doc), [doc]);
  const issues = useMemo(() => ({ ...serverIssues, ...(parsed.ok ? {} : issuesByPath(parsed.issues)) }), [parsed, serverIssues]);
  const dirty = useMemo(() => JSON.stringify(doc) !== JSON.stringify(base.document) || JSON.stringify(partRefs) !== JSON.stringify(base.partRefs), [doc, partRefs, base]);

  const set = useCallback((path: string, value: unknown) => {
    setDoc((d: unknown) => (value === undefined ? pruneEmpty(setAt(d, path, undefined), path) : setAt(d, path, value)));
    setServerIssues({});
  }, []);
  const setPartRef = useCallback((ref: string, id: string | undefined) => {
    setPartRefs((r) => {
      const next = { ...r };
      if (id === undefined) delete next[ref];
      else next[ref] = id;
      return next;
    });
  }, []);

  async function fetchLatest(): Promise<Snapshot | null> {
    try {
      const r = await fetchJson<{ revision: { revision: number; document: unknown; partRefs: PartRefs } | null }>(`/api/v1/options/${optionId}`);
      return r.revision ? { revision: r.revision.revision, document: r.revision.document, partRefs: r.revision.partRefs } : null;
    } catch {
      return null;
    }
  }

  async function save(note: string): Promise<number | null> {
    setSaving(true);
    setNotice(null);
    try {
      const r = await fetchJson<{ revision: { revision: number } }>(`/api/v1/options/${optionId}/revisions`, {
        method: "POST",
        body: { baseRevision: base.revision, document: doc, partRefs, note },
      });
      setBase({ revision: r.revision.revision, document: doc, partRefs });
      setNotice({ tone: "success", text: `Saved as revision ${r.revision.revision}.` });
      return r.revision.revision;
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) setConflict({ message: e.message, latest: await fetchLatest() });
      else if (e instanceof ApiError && e.status === 400) {
        setServerIssues(issuesByPath(e.issues, "document."));
        setNotice({ tone: "error", text: `Not saved: ${e.issues.length || "some"} value${e.issues.length === 1 ? "" : "s"} to correct (marked below).` });
      } else setNotice({ tone: "error", text: e instanceof Error ? `Not saved: ${e.message}` : "Not saved." });
      return null;
    } finally {
      setSaving(false);
    }
  }

  /** After a conflict: my edits (base -> mine) replayed onto the latest revision; still unsaved. */
  function reapplyOntoLatest(latest: Snapshot) {
    const d = reapplyEdits({ base: base.document, mine: doc, theirs: latest.document });
    setBase(latest);
    setDoc(d.document);
    setPartRefs(reapplyFlat({ base: base.partRefs, mine: partRefs, theirs: latest.partRefs }));
    setConflict(null);
    const overlap = d.overlaps.length ? ` Both of you changed ${d.overlaps.join(", ")}: your values are kept there, check them.` : "";
    setNotice({ tone: "success", text: `Your ${d.applied} change${d.applied === 1 ? "" : "s"} are now on top of revision ${latest.revision}, not yet saved.${overlap}` });
  }

  function loadSnapshot(s: Snapshot, asBase: boolean) {
    if (asBase) setBase(s);
    setDoc(s.document);
    setPartRefs(s.partRefs);
    setConflict(null);
    setServerIssues({});
  }

  return { base, doc, setDoc, partRefs, issues, parsedOk: parsed.ok, dirty, set, setPartRef, save, saving, conflict, reapplyOntoLatest, loadSnapshot, notice, setNotice, fetchLatest };
}
