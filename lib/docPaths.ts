/**
 * The three-way re-apply the editor offers after a save conflict: the
 * user's changes (base -> mine) laid onto the latest revision. Paths are
 * read and written by models/documentPath.ts.
 */
import { getAt, setAt, type Json } from "../models/documentPath";
function isPlainObject(v: Json): v is Record<string, Json> {
  return v !== null && typeof v === "object" && !Array.isArray(v);
}

/**
 * Paths whose value differs between a and b. Objects are compared key by
 * key; arrays of equal length element by element; an array that changed
 * length (a corner or point added) counts as one change of the whole array.
 */
export function changedPaths(a: Json, b: Json, prefix = ""): string[] {
  if (Object.is(a, b)) return [];
  const join = (k: string) => (prefix ? `${prefix}.${k}` : k);
  if (isPlainObject(a) && isPlainObject(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].flatMap((k) => changedPaths(a[k], b[k], join(k)));
  }
  if (Array.isArray(a) && Array.isArray(b) && a.length === b.length) return a.flatMap((x, i) => changedPaths(x, b[i], join(String(i))));
  return [prefix];
}

export interface Reapplied {
  document: Json;
  /** Paths that both sides changed: mine won; the user should look at them. */
  overlaps: string[];
  /** How many of my changes were carried over. */
  applied: number;
}

/** My edits (base -> mine) replayed onto theirs (the latest revision). */
export function reapplyEdits({ base, mine, theirs }: { base: Json; mine: Json; theirs: Json }): Reapplied {
  const mineChanged = changedPaths(base, mine);
  const theirsChanged = changedPaths(base, theirs);
  const overlaps = mineChanged.filter((p) => theirsChanged.some((t) => t === p || t.startsWith(`${p}.`) || p.startsWith(`${t}.`)) && changedPaths(getAt(mine, p), getAt(theirs, p)).length > 0);
  let document = theirs;
  for (const p of mineChanged) document = setAt(document, p, structuredCloneSafe(getAt(mine, p)));
  return { document, overlaps, applied: mineChanged.length };
}

function structuredCloneSafe(v: Json): Json {
  return v === undefined ? undefined : structuredClone(v);
}

/** The same re-apply for a flat map whose keys contain dots (part references). */
export function reapplyFlat<T>({ base, mine, theirs }: { base: Record<string, T>; mine: Record<string, T>; theirs: Record<string, T> }): Record<string, T> {
  const out = { ...theirs };
  for (const k of new Set([...Object.keys(base), ...Object.keys(mine)])) {
    if (Object.is(base[k], mine[k])) continue;
    if (mine[k] === undefined) delete out[k];
    else out[k] = mine[k];
  }
  return out;
}
