import { AppError } from "./errors";

/**
 * The model promises finite numbers everywhere (runaway is a flag, never a
 * number). This guard keeps that promise at the API edge: if a non-finite
 * value ever slipped through, the client gets a 422 naming where, never a
 * NaN or Infinity in JSON (which JSON.stringify would silently turn to null).
 */
export function assertFinite(value: unknown, path = "result"): void {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new AppError("unprocessable", `The model produced a non-finite number at ${path}; please report this design.`);
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((v, i) => assertFinite(v, `${path}.${i}`));
    return;
  }
  if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) assertFinite(v, `${path}.${k}`);
  }
}
