import { AppError } from "./errors";

/**
 * The model promises finite numbers everywhere (runaway is a flag, never a
 * number). This guard keeps that promise at the API edge: if a non-finite
 * value ever slipped through, the client gets a 422 naming where, never a
 * NaN or Infinity in JSON (which JSON.stringify would silently turn to null).
 *
 * It runs on every evaluation answer, so the walk builds no path strings;
 * only when it finds a bad number does it walk again to name the place.
 */
export function assertFinite(value: unknown, path = "result"): void {
  if (allFinite(value)) return;
  throw new AppError("unprocessable", `The model produced a non-finite number at ${whereNotFinite(value, path)}; please report this design.`);
}

function allFinite(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (value === null || typeof value !== "object") return true;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (!allFinite(value[i])) return false;
    return true;
  }
  for (const k in value) if (Object.hasOwn(value, k) && !allFinite((value as Record<string, unknown>)[k])) return false;
  return true;
}

function whereNotFinite(value: unknown, path: string): string {
  if (value !== null && typeof value === "object")
    for (const [k, v] of Object.entries(value)) if (!allFinite(v)) return whereNotFinite(v, `${path}.${k}`);
  return path;
}
