/**
 * Reading and writing a design document by dotted path ("positions.0.gate.rTurnOn"),
 * immutably, and the three-way re-apply the editor offers after a save
 * conflict: the user's changes (base -> mine) laid onto the latest revision.
 */
export type Json = unknown;

export function splitPath(path: string): string[] {
  return path === "" ? [] : path.split(".");
}

export function getAt(doc: Json, path: string): Json {
  let cur: Json = doc;
  for (const key of splitPath(path)) {
    if (cur === null || typeof cur !== "object") return undefined;
    cur = (cur as Record<string, Json>)[key];
  }
  return cur;
}

function cloneShallow(node: Json, nextKey: string): Record<string, Json> | Json[] {
  if (Array.isArray(node)) return [...node];
  if (node !== null && typeof node === "object") return { ...(node as Record<string, Json>) };
  return /^\d+$/.test(nextKey) ? [] : {};
}

/** A copy of `doc` with `value` at `path`; `undefined` removes the key (or array element). */
export function setAt(doc: Json, path: string, value: Json): Json {
  const keys = splitPath(path);
  if (keys.length === 0) return value;
  const [head, ...rest] = keys;
  const node = cloneShallow(doc, head);
  const child = setAt((node as Record<string, Json>)[head], rest.join("."), value);
  if (Array.isArray(node)) {
    const i = Number(head);
    if (child === undefined && rest.length === 0) node.splice(i, 1);
    else node[i] = child;
  } else if (child === undefined && rest.length === 0) delete (node as Record<string, Json>)[head];
  else (node as Record<string, Json>)[head] = child;
  return node;
}

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
