/**
 * Quantities at the edge of the model: unit strings in, SI numbers out.
 *
 * Inside `models/` every number is SI (C, V, A, Ω, F, Hz, s, W, J, K/W),
 * with one deliberate exception: absolute temperatures stay in °C because
 * datasheets, derating policies and reviewers all speak °C. Temperature
 * *differences* (margins, rises) are in K, which has the same size as a
 * degree Celsius, so `tj - ambient` is a rise in K without conversion.
 * Thermal resistance is K/W; "°C/W" is accepted as the same unit, and a
 * `temperatureDifference` ("25 K" or "25 °C") is read as a size in K.
 *
 * Strings are parsed by mathjs `unit()` (only the unit machinery is loaded
 * through `create`, so the browser bundle does not carry all of mathjs).
 * Ratios ("0.45", "45 %") and costs ("1.20 USD", "$1.20") have no mathjs
 * unit and are parsed here.
 */
import { create, unitDependencies, type Unit } from "mathjs";
import { z } from "zod";
import { DIMENSIONS, formatQuantity, type Dimension } from "../quantityFormat";

export { DIMENSIONS, formatQuantity, type Dimension };

const math = create({ unitDependencies });
const unit = (text: string): Unit => math.unit(text) as Unit;
/** The one mathjs unit parser of the app (the units part of mathjs only), for text forms units.ts does not cover (lib/parts/paramText.ts). */
export { unit as parseUnit };

export class QuantityError extends Error {}

/** Spellings people type that mathjs does not know. */
function normalise(text: string): string {
  return text
    .trim()
    .replace(/[µμ]/g, "u")
    .replace(/mΩ/g, "mohm")
    .replace(/kΩ/g, "kohm")
    .replace(/MΩ/g, "Mohm")
    .replace(/[ΩΩ]/g, "ohm")
    .replace(/°\s*C/g, "degC")
    .replace(/°\s*F/g, "degF")
    .replace(/℃/g, "degC")
    .replace(/−/g, "-");
}

const NUMBER = String.raw`[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?`;
const RATIO_RE = new RegExp(`^(${NUMBER})\\s*(%)?$`);
const COST_RE = new RegExp(`^(?:\\$|USD)?\\s*(${NUMBER})\\s*(?:USD)?$`, "i");

function describeGot(value: unknown): string {
  return typeof value === "string" ? JSON.stringify(value) : String(value);
}

function expectedMessage(dim: Dimension, got: unknown): string {
  const info = DIMENSIONS[dim];
  return `expected ${info.noun} (e.g. "${info.example}"), got ${describeGot(got)}`;
}

function checkRange(si: number, dim: Dimension, got: unknown): number {
  const info = DIMENSIONS[dim];
  if (!Number.isFinite(si)) throw new QuantityError(expectedMessage(dim, got));
  if (si < info.min || si > info.max) {
    throw new QuantityError(
      `${info.noun.replace(/^an? /, "")} out of the plausible range ` +
        `${formatQuantity(info.min, dim)} … ${formatQuantity(info.max, dim)}, got ${describeGot(got)}`,
    );
  }
  return si;
}

/**
 * A number is taken as already SI (°C for temperature); a string is parsed
 * with its unit and converted. Throws QuantityError with a plain message.
 */
export function parseQuantity(value: string | number, dim: Dimension): number {
  if (typeof value === "number") return checkRange(value, dim, value);
  if (typeof value !== "string") throw new QuantityError(expectedMessage(dim, value));
  // mathjs parsing costs tens of µs; documents repeat the same strings.
  const key = `${dim}|${value}`;
  const hit = cache.get(key);
  if (hit !== undefined) {
    if (typeof hit === "number") return hit;
    throw new QuantityError(hit.message);
  }
  try {
    const si = parseString(value, dim);
    remember(key, si);
    return si;
  } catch (e) {
    if (e instanceof QuantityError) remember(key, e);
    throw e;
  }
}

const CACHE_LIMIT = 4096;
const cache = new Map<string, number | QuantityError>();

function remember(key: string, v: number | QuantityError): void {
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(key, v);
}

function parseString(value: string, dim: Dimension): number {
  const text = normalise(value);
  if (dim === "ratio") {
    const m = RATIO_RE.exec(text);
    if (!m) throw new QuantityError(expectedMessage(dim, value));
    return checkRange(Number(m[1]) / (m[2] ? 100 : 1), dim, value);
  }
  if (dim === "cost") {
    const m = COST_RE.exec(text);
    if (!m) throw new QuantityError(expectedMessage(dim, value));
    return checkRange(Number(m[1]), dim, value);
  }
  const si = DIMENSIONS[dim].si as string;
  // A bare number in a string is refused: "47" could be C or nC.
  if (text === "" || RATIO_RE.test(text)) throw new QuantityError(expectedMessage(dim, value));
  let parsed: Unit;
  try {
    // A difference or a per-watt figure in °C is the same size as in K; mathjs
    // would otherwise add the 273.15 K offset to "25 degC".
    const kelvinLike = dim === "thermalResistance" || dim === "temperatureDifference";
    parsed = unit(kelvinLike ? text.replace(/degC/g, "K") : text);
  } catch {
    throw new QuantityError(expectedMessage(dim, value));
  }
  if (!parsed.equalBase(unit(si))) throw new QuantityError(expectedMessage(dim, value));
  return checkRange(parsed.toNumber(si), dim, value);
}

export interface QtyOptions {
  /** Inclusive lower bound in SI. */
  min?: number;
  /** Exclusive lower bound in SI (e.g. a frequency must be > 0). */
  gt?: number;
  max?: number;
}

/**
 * zod field for a quantity: a number (SI) or a unit string. The output is
 * always an SI number. The JSON schema (io: "input") shows both forms.
 */
export function qty(dim: Dimension, opts: QtyOptions = {}) {
  const info = DIMENSIONS[dim];
  const input = z.union([z.number(), z.string()]).meta({
    description: `${info.noun.replace(/^an? /, "")}: a number in SI${info.symbol ? ` (${info.symbol})` : ""} or a string with a unit, e.g. "${info.example}"`,
  });
  return input.transform((raw, ctx) => {
    let si: number;
    try {
      si = parseQuantity(raw, dim);
    } catch (e) {
      ctx.issues.push({ code: "custom", message: (e as Error).message, input: raw });
      return z.NEVER;
    }
    const bad =
      (opts.min !== undefined && si < opts.min) ||
      (opts.gt !== undefined && si <= opts.gt) ||
      (opts.max !== undefined && si > opts.max);
    if (bad) {
      const parts: string[] = [];
      if (opts.gt !== undefined) parts.push(`above ${formatQuantity(opts.gt, dim)}`);
      if (opts.min !== undefined) parts.push(`at least ${formatQuantity(opts.min, dim)}`);
      if (opts.max !== undefined) parts.push(`at most ${formatQuantity(opts.max, dim)}`);
      ctx.issues.push({ code: "custom", message: `must be ${parts.join(" and ")}, got ${describeGot(raw)}`, input: raw });
      return z.NEVER;
    }
    return si;
  });
}

