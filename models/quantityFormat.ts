/**
 * The dimensions the model knows, with their SI display symbol and
 * plausibility bounds, and the SI-prefix formatter. No dependencies, so the
 * evaluator (warnings speak in quantities) and the browser bundle can use it
 * without the mathjs unit parser, which lives in ./units.ts.
 */
export type Dimension =
  | "charge"
  | "voltage"
  | "current"
  | "resistance"
  | "capacitance"
  | "inductance"
  | "frequency"
  | "time"
  | "temperature"
  | "temperatureDifference"
  | "power"
  | "energy"
  | "thermalResistance"
  | "ratio"
  | "cost";

interface DimensionInfo {
  /** mathjs unit the SI number is read in; null for ratio and cost. */
  si: string | null;
  /** Symbol used for display. */
  symbol: string;
  /** Example shown in error messages and the JSON schema. */
  example: string;
  /** Article + noun for messages ("a charge"). */
  noun: string;
  /**
   * Plausibility bounds in SI. They keep absurd inputs (1e300 V) out of the
   * model so every product of inputs stays a finite double; they are far
   * wider than any gate-drive design needs.
   */
  min: number;
  max: number;
}

export const DIMENSIONS: Record<Dimension, DimensionInfo> = {
  charge: { si: "C", symbol: "C", example: "47 nC", noun: "a charge", min: 0, max: 1e-2 },
  voltage: { si: "V", symbol: "V", example: "12 V", noun: "a voltage", min: -1e4, max: 1e4 },
  current: { si: "A", symbol: "A", example: "2 A", noun: "a current", min: -1e4, max: 1e4 },
  resistance: { si: "ohm", symbol: "Ω", example: "4.7 Ω", noun: "a resistance", min: 0, max: 1e9 },
  capacitance: { si: "F", symbol: "F", example: "2.2 nF", noun: "a capacitance", min: 0, max: 1 },
  inductance: { si: "H", symbol: "H", example: "200 µH", noun: "an inductance", min: 0, max: 1e3 },
  frequency: { si: "Hz", symbol: "Hz", example: "250 kHz", noun: "a frequency", min: 0, max: 1e9 },
  time: { si: "s", symbol: "s", example: "50 ns", noun: "a time", min: 0, max: 1e3 },
  temperature: { si: "degC", symbol: "°C", example: "85 °C", noun: "a temperature", min: -273.15, max: 1000 },
  temperatureDifference: { si: "K", symbol: "K", example: "25 K", noun: "a temperature difference", min: -1000, max: 1000 },
  power: { si: "W", symbol: "W", example: "1.5 W", noun: "a power", min: 0, max: 1e6 },
  energy: { si: "J", symbol: "J", example: "3 µJ", noun: "an energy", min: 0, max: 1e3 },
  thermalResistance: { si: "K/W", symbol: "K/W", example: "12 K/W", noun: "a thermal resistance", min: 0, max: 1e5 },
  ratio: { si: null, symbol: "", example: "0.45 or 45 %", noun: "a ratio", min: -1e6, max: 1e6 },
  cost: { si: null, symbol: "USD", example: "0.35 USD", noun: "a cost", min: 0, max: 1e7 },
};

const PREFIXES: [number, string][] = [
  [1e9, "G"], [1e6, "M"], [1e3, "k"], [1, ""], [1e-3, "m"], [1e-6, "µ"], [1e-9, "n"], [1e-12, "p"], [1e-15, "f"],
];

function trimNumber(x: number, digits: number): string {
  return String(Number(x.toPrecision(digits)));
}

/** Display an SI number with an SI prefix: 4.7e-8 C -> "47 nC". */
export function formatQuantity(si: number, dim: Dimension, digits = 3): string {
  if (!Number.isFinite(si)) return "—";
  const info = DIMENSIONS[dim];
  if (dim === "ratio") return trimNumber(si, digits);
  if (dim === "cost") return `${si.toFixed(2)} USD`;
  if (dim === "temperature") return `${trimNumber(si, digits)} °C`;
  if (dim === "thermalResistance") return `${trimNumber(si, digits)} K/W`;
  if (dim === "temperatureDifference") return `${trimNumber(si, digits)} K`;
  if (si === 0) return `0 ${info.symbol}`;
  const abs = Math.abs(si);
  for (const [scale, prefix] of PREFIXES) {
    // Round first so 999.96 shows as "1 k", not "1000".
    const rounded = Number((abs / scale).toPrecision(digits));
    if (rounded >= 1 && rounded < 1000) return `${trimNumber(si / scale, digits)} ${prefix}${info.symbol}`;
  }
  return `${si.toExponential(digits - 1)} ${info.symbol}`;
}
