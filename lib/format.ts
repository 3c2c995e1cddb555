// Display formatting for engineering quantities. Values arrive in base SI
// units (the models work in SI throughout) and leave as "47 nC", "1.32 W",
// "104.6 °C". Pure: no locale, no Intl, so the server and the browser print
// the same string and hydration never disagrees.

/** Between number and unit: a no-break space, so "47 nC" never wraps. */
export const UNIT_SPACE = "\u00a0";
/** Typographic minus (U+2212): same width as the digits in tabular figures. */
export const MINUS = "\u2212";
/** Shown for NaN and ±Infinity: a model that cannot give a number says so. */
export const NO_VALUE = "\u2014";

const PREFIXES: Record<number, string> = {
  [-15]: "f",
  [-12]: "p",
  [-9]: "n",
  [-6]: "\u00b5",
  [-3]: "m",
  0: "",
  3: "k",
  6: "M",
  9: "G",
  12: "T",
};
const MIN_EXP = -15;
const MAX_EXP = 12;

// Units read in their base form only: temperatures, temperature differences,
// ratios and thermal resistances ("0.45 K/W", never "450 mK/W").
const UNPREFIXED = new Set(["", "°C", "K", "%", "dB", "K/W", "°C/W", "°", "×"]);

export interface SiParts {
  /** The number as printed, with sign, e.g. "−3.2". */
  mantissa: string;
  /** SI prefix, "" when none. */
  prefix: string;
  unit: string;
}

/** Round |x| to `digits` significant figures and print it without exponent. */
function toSignificant(x: number, digits: number): string {
  if (x === 0) return "0";
  const magnitude = Math.floor(Math.log10(x));
  const decimals = digits - 1 - magnitude;
  if (decimals >= 0) return x.toFixed(Math.min(decimals, 20));
  // More integer digits than significant ones: round the integer part too.
  const step = 10 ** -decimals;
  return (Math.round(x / step) * step).toFixed(0);
}

function trimZeros(s: string): string {
  return s.includes(".") ? s.replace(/\.?0+$/, "") : s;
}

// Multiply by an exact power of ten rather than divide by an inexact one
// (1e-9 has no exact binary form; 1e9 does).
function scale(x: number, exp: number): number {
  return exp <= 0 ? x * 10 ** -exp : x / 10 ** exp;
}

export function siParts(value: number, unit: string, digits = 3): SiParts {
  if (!Number.isFinite(value)) return { mantissa: NO_VALUE, prefix: "", unit };
  const d = Math.min(15, Math.max(1, Math.round(digits)));
  const abs = Math.abs(value);
  const prefixable = !UNPREFIXED.has(unit);

  let exp = 0;
  if (prefixable && abs > 0) {
    exp = Math.floor(Math.log10(abs) / 3) * 3;
    exp = Math.min(MAX_EXP, Math.max(MIN_EXP, exp));
  }
  let text = toSignificant(scale(abs, exp), d);
  // log10 can land a hair below an integer, and rounding can carry into the
  // next thousand (999.96 m -> "1000"): step the prefix and print again.
  if (prefixable && abs > 0) {
    if (Number(text) >= 1000 && exp < MAX_EXP) {
      exp += 3;
      text = toSignificant(scale(abs, exp), d);
    } else if (Number(text) < 1 && exp > MIN_EXP && scale(abs, exp - 3) < 1000) {
      exp -= 3;
      text = toSignificant(scale(abs, exp), d);
    }
  }
  text = trimZeros(text);
  const negative = value < 0 && Number(text) !== 0;
  return { mantissa: negative ? MINUS + text : text, prefix: PREFIXES[exp] ?? "", unit };
}

/**
 * Format a value in base SI units with an SI prefix and `digits`
 * significant figures (trailing zeros dropped): formatSi(47e-9, "C") is
 * "47 nC", formatSi(1.3201, "W") is "1.32 W", formatSi(104.62, "°C", 4) is
 * "104.6 °C". Units in UNPREFIXED are never prefixed. The space before the
 * unit is U+00A0.
 */
export function formatSi(value: number, unit: string, digits = 3): string {
  const { mantissa, prefix } = siParts(value, unit, digits);
  const symbol = prefix + unit;
  return symbol ? `${mantissa}${UNIT_SPACE}${symbol}` : mantissa;
}
