/**
 * THE reader and writer of dotted paths ("positions.0.gate.rTurnOn",
 * "pin.sinkResistance") into a document or record, immutably: the editor,
 * the what-if, the bench fit, the part records and the CSV all go through
 * these. A numeric segment indexes an array. Pure.
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

const UNSAFE_KEYS = new Set(["__proto__", "constructor", "prototype"]);

/** Nested objects -> a map of dotted paths to leaf values. Arrays (hFE points) stay whole; unsafe keys are dropped. */
export function flattenPaths(value: Record<string, unknown>, prefix = ""): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value ?? {})) {
    if (UNSAFE_KEYS.has(k)) continue; // a JSON body may carry "__proto__" as an own key
    if (v && typeof v === "object" && !Array.isArray(v)) Object.assign(out, flattenPaths(v as Record<string, unknown>, `${prefix}${k}.`));
    else out[`${prefix}${k}`] = v;
  }
  return out;
}
