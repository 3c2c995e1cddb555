// Dotted keys ("pin.sinkResistance") into the nested params object, both ways.

export function getPath(obj: Record<string, unknown>, key: string): unknown {
  return key.split(".").reduce<unknown>((o, k) => (o && typeof o === "object" ? (o as Record<string, unknown>)[k] : undefined), obj);
}

export function setPath(obj: Record<string, unknown>, key: string, value: unknown): void {
  const parts = key.split(".");
  let o = obj;
  for (const p of parts.slice(0, -1)) o = (o[p] ??= {}) as Record<string, unknown>;
  o[parts[parts.length - 1]] = value;
}

const UNSAFE_KEYS = new Set(["__proto__", "constructor", "prototype"]);

/** Nested params (as stored or sent as JSON) -> field-key map. Arrays (hFE points) stay whole. */
export function flattenParams(params: Record<string, unknown>, prefix = ""): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(params ?? {})) {
    if (UNSAFE_KEYS.has(k)) continue; // a JSON body may carry "__proto__" as an own key
    if (v && typeof v === "object" && !Array.isArray(v)) Object.assign(out, flattenParams(v as Record<string, unknown>, `${prefix}${k}.`));
    else out[`${prefix}${k}`] = v;
  }
  return out;
}
