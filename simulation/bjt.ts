// A bipolar transistor as SI numbers: the Gummel–Poon parameters ngspice's
// BJT level 1 reads, and the `.model` line built from them. Nothing typed by
// a user reaches the text: names are checked, every value is a finite number.
import { sp } from "./ngspice";

export interface GummelPoon {
  is: number; // saturation current, A
  bf: number; // ideal forward beta
  nf: number;
  ikf: number; // forward knee current (high-injection roll-off), A
  ise: number; // B-E leakage saturation current (low-current beta droop), A
  ne: number;
  br: number; // ideal reverse beta
  ikr: number;
  vaf: number; // forward Early voltage, V
  rb: number; // base resistance, Ω
  re: number;
  rc: number;
  cje: number; // zero-bias B-E depletion capacitance, F
  vje: number;
  mje: number;
  cjc: number; // zero-bias B-C depletion capacitance, F
  vjc: number;
  mjc: number;
  tf: number; // forward transit time, s
  tr: number; // reverse transit time, s
}

export interface BjtCard {
  name: string;
  polarity: "npn" | "pnp";
  gp: GummelPoon;
}

const NAME = /^[a-z][a-z0-9_]{0,15}$/;

// SPICE spelling of each field; FC is left at its default 0.5 (depletion
// capacitance linearised above half the built-in voltage).
const KEYS: Array<[keyof GummelPoon, string]> = [
  ["is", "IS"], ["bf", "BF"], ["nf", "NF"], ["ikf", "IKF"], ["ise", "ISE"], ["ne", "NE"], ["br", "BR"],
  ["ikr", "IKR"], ["vaf", "VAF"], ["rb", "RB"], ["re", "RE"], ["rc", "RC"], ["cje", "CJE"], ["vje", "VJE"],
  ["mje", "MJE"], ["cjc", "CJC"], ["vjc", "VJC"], ["mjc", "MJC"], ["tf", "TF"], ["tr", "TR"],
];

/** Checked deck-safe name for an element or model. */
export function deckName(name: string): string {
  if (!NAME.test(name)) throw new Error(`not a deck-safe name: ${JSON.stringify(name)}`);
  return name;
}

/** The `.model` line of a card. */
export function bjtModel(card: BjtCard): string {
  const params = KEYS.map(([k, s]) => `${s}=${sp(card.gp[k])}`).join(" ");
  return `.model ${deckName(card.name)} ${card.polarity.toUpperCase()}(${params})`;
}

/** Sign that turns an NPN deck into the PNP one (voltages and currents reversed). */
export function polaritySign(card: BjtCard): 1 | -1 {
  return card.polarity === "npn" ? 1 : -1;
}

/** SPICE depletion capacitance at junction voltage v (reverse bias negative), FC = 0.5 linearisation above. */
export function depletionCapacitance(c0: number, vj: number, m: number, v: number): number {
  const fc = 0.5;
  if (v < fc * vj) return c0 / Math.pow(1 - v / vj, m);
  return (c0 / Math.pow(1 - fc, 1 + m)) * (1 - fc * (1 + m) + (m * v) / vj);
}

/** Charge on a depletion capacitance from 0 V to v (v below FC·vj, e.g. any reverse bias), C. */
export function depletionCharge(c0: number, vj: number, m: number, v: number): number {
  if (v > 0.5 * vj) throw new Error("depletionCharge: forward bias beyond FC·VJ is not covered");
  return ((c0 * vj) / (1 - m)) * (1 - Math.pow(1 - v / vj, 1 - m));
}
