/**
 * Text forms of part parameters that models/input/units.ts does not cover: the
 * hFE(Ic) curve in one cell, volt-seconds, and an exact ASCII writing of SI
 * numbers for the CSV export (formatQuantity rounds to 3 digits for display;
 * an export must read back to the same number).
 */
import { formatQuantity, parseQuantity, parseUnit as unit, QuantityError, type Dimension } from "@/models/input/units";

/** Stored numbers keep 12 significant digits: unit conversion fuzz (4.7000000000000004e-8) never reaches the database. */
export const STORED_SIGNIFICANT_DIGITS = 12;

export function snap(x: number): number {
  return x === 0 ? 0 : Number(x.toPrecision(STORED_SIGNIFICANT_DIGITS));
}

const PREFIXES: [number, string][] = [
  [1e9, "G"], [1e6, "M"], [1e3, "k"], [1, ""], [1e-3, "m"], [1e-6, "u"], [1e-9, "n"], [1e-12, "p"], [1e-15, "f"],
];

/** ASCII unit per dimension (CSV cells stay plain text for any spreadsheet). */
const ASCII_SYMBOL: Partial<Record<Dimension, string>> = {
  charge: "C", voltage: "V", current: "A", resistance: "ohm", capacitance: "F", inductance: "H",
  frequency: "Hz", time: "s", power: "W", energy: "J",
};

function exactNumber(x: number): string {
  return String(snap(x));
}

function withPrefix(si: number, symbol: string): string {
  if (si === 0) return `0 ${symbol}`;
  const abs = Math.abs(si);
  for (const [scale, prefix] of PREFIXES) {
    const scaled = snap(abs / scale);
    if (scaled >= 1 && scaled < 1000) return `${exactNumber(si / scale)} ${prefix}${symbol}`;
  }
  return `${exactNumber(si)} ${symbol}`;
}

/** 4.7e-8 (charge) -> "47 nC"; reads back through parseQuantity to the same stored number. */
export function formatExact(si: number, dim: Dimension): string {
  if (dim === "ratio" || dim === "cost") return exactNumber(si);
  if (dim === "temperature") return `${exactNumber(si)} degC`;
  if (dim === "temperatureDifference") return `${exactNumber(si)} K`;
  if (dim === "thermalResistance") return `${exactNumber(si)} K/W`;
  return withPrefix(si, ASCII_SYMBOL[dim] ?? "");
}

// ---- volt-seconds -------------------------------------------------------

const VOLT_SECOND_MAX = 1; // 1 V·s is far beyond any gate-drive transformer

/** "25 V·µs", "25 V us", "25Vus", "2.5e-5 V*s" -> 2.5e-5 (V·s). A bare number is refused like any quantity. */
export function parseVoltSecond(value: unknown): number {
  const bad = () => new QuantityError(`expected a volt-second product (e.g. "25 V·µs"), got ${JSON.stringify(value)}`);
  if (typeof value === "number") {
    if (!Number.isFinite(value) || value <= 0 || value > VOLT_SECOND_MAX) throw bad();
    return value;
  }
  if (typeof value !== "string") throw bad();
  const text = value
    .trim()
    .replace(/[µμ]/g, "u")
    .replace(/[·⋅]/g, "*")
    .replace(/V\s*\*?\s*([munp]?s)\b/, "V*$1");
  if (!/[a-zA-Z]/.test(text)) throw bad();
  let si: number;
  try {
    const u = unit(text);
    if (!u.equalBase(unit("V*s"))) throw bad();
    si = u.toNumber("V*s");
  } catch {
    throw bad();
  }
  if (!Number.isFinite(si) || si <= 0 || si > VOLT_SECOND_MAX) throw bad();
  return si;
}

export function formatVoltSecond(si: number, exact = false): string {
  const us = si / 1e-6;
  return exact ? `${exactNumber(us)} V*us` : `${Number(us.toPrecision(3))} V·µs`;
}

// ---- hFE(Ic) curve ------------------------------------------------------

export interface HfePoint {
  ic: number;
  hfe: number;
}

/**
 * "0.1 A: 220; 1 A: 150; 3 A: 60" -> points in SI. Ic needs its unit (mA or
 * A); hFE is a plain number. Rising Ic and the gain range are checked by the
 * model's bjtSchema afterwards.
 */
export function parseHfeCurve(value: unknown): HfePoint[] {
  if (Array.isArray(value)) {
    return value.map((p, i) => {
      const o = (p ?? {}) as { ic?: unknown; hfe?: unknown };
      if (typeof o.hfe !== "number") throw new QuantityError(`point ${i + 1}: hfe must be a number`);
      return { ic: parseQuantity(o.ic as string | number, "current"), hfe: o.hfe };
    });
  }
  if (typeof value !== "string") throw new QuantityError('expected hFE points like "0.1 A: 220; 1 A: 150"');
  const pieces = value.split(/[;|]/).map((s) => s.trim()).filter(Boolean);
  if (pieces.length === 0) throw new QuantityError('expected hFE points like "0.1 A: 220; 1 A: 150"');
  return pieces.map((piece, i) => {
    const m = /^(.+?)\s*[:=]\s*([-+]?\d+(?:\.\d+)?(?:[eE][-+]?\d+)?)$/.exec(piece);
    if (!m) throw new QuantityError(`point ${i + 1} ("${piece}"): write it as "<Ic with unit>: <hFE>", e.g. "1 A: 150"`);
    let ic: number;
    try {
      ic = parseQuantity(m[1], "current");
    } catch (e) {
      throw new QuantityError(`point ${i + 1}: ${(e as Error).message}`);
    }
    return { ic, hfe: Number(m[2]) };
  });
}

export function formatHfeCurve(points: readonly HfePoint[], exact = false): string {
  return points
    .map((p) => `${exact ? formatExact(p.ic, "current") : formatDisplayCurrent(p.ic)}: ${exact ? exactNumber(p.hfe) : Number(p.hfe.toPrecision(3))}`)
    .join("; ");
}

function formatDisplayCurrent(a: number): string {
  return a >= 1 ? `${Number(a.toPrecision(3))} A` : `${Number((a * 1000).toPrecision(3))} mA`;
}

// ---- display and form values ------------------------------------------

type FieldLike =
  | { type: "qty"; dim: Dimension }
  | { type: "voltSecond" }
  | { type: "hfeCurve" }
  | { type: "enum" };

/** Table and detail display (3 significant digits, SI prefixes, Ω and µ). */
export function formatParamValue(field: FieldLike, v: unknown): string {
  if (v === undefined || v === null) return "—";
  if (field.type === "hfeCurve") return formatHfeCurve(v as HfePoint[]);
  if (field.type === "voltSecond") return formatVoltSecond(v as number);
  if (field.type === "enum") return String(v).toUpperCase();
  return formatQuantity(v as number, field.dim);
}

/** The value put back into a form field: 6 significant digits, so saving an untouched field never changes it. */
export function formatForInput(field: FieldLike, v: unknown): string {
  if (v === undefined || v === null) return "";
  if (field.type === "hfeCurve")
    return (v as HfePoint[]).map((p) => `${formatQuantity(p.ic, "current", 6)}: ${Number(p.hfe.toPrecision(6))}`).join("; ");
  if (field.type === "voltSecond") return `${Number((Number(v) / 1e-6).toPrecision(6))} V·µs`;
  if (field.type === "enum") return String(v);
  if (field.dim === "ratio") return String(Number(Number(v).toPrecision(6)));
  return formatQuantity(v as number, field.dim, 6);
}

/** Tolerance (0.1) as a form value ("10 %"). */
export function formatPercent(v: number | undefined): string {
  return v === undefined ? "" : `${Number((v * 100).toPrecision(6))} %`;
}
