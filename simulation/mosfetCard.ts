// A vertical power MOSFET as an ngspice VDMOS model card: a fixed name and
// numbers keyed by known VDMOS parameters (ngspice-39 manual, VDMOS section;
// `showmod` lists the same names). The card text is made here from numbers
// only, so nothing typed by a user ever reaches a deck as text (issue 17).
import { sp } from "./ngspice";

/** VDMOS parameters a card may set (lower case, as ngspice's showmod prints them). */
export const VDMOS_PARAMS = [
  // channel: threshold, transconductance, channel-length modulation, mobility reduction,
  // subthreshold slope, triode-region shaping, quasi-saturation
  "vto", "kp", "phi", "lambda", "theta", "ksubthres", "mtriode", "rq", "vq",
  // ohmic resistances (Rg is the internal gate resistance) and drain-source leakage
  "rd", "rs", "rg", "rds",
  // gate capacitances: nonlinear Cgd between cgdmax and cgdmin (shape a), constant Cgs
  "cgdmax", "cgdmin", "a", "cgs",
  // body diode: junction capacitance (the Cds of Coss), current, recovery, breakdown
  "cjo", "vj", "m", "fc", "is", "n", "rb", "tt", "bv", "ibv", "nbv", "eg", "xti",
  "tnom",
] as const;

export type VdmosParam = (typeof VDMOS_PARAMS)[number];

export interface VdmosCard {
  /** Model name: a short fixed identifier, never user text. */
  name: string;
  params: Partial<Record<VdmosParam, number>>;
}

const NAME = /^[a-z][a-z0-9_]{0,15}$/;
const KNOWN = new Set<string>(VDMOS_PARAMS);

/** `.model <name> VDMOS(...)`, refusing unknown parameter names and non-finite values. */
export function modelLine(card: VdmosCard): string {
  if (!NAME.test(card.name)) throw new Error(`model name must match ${NAME.source}`);
  const parts = Object.entries(card.params).map(([k, v]) => {
    if (!KNOWN.has(k)) throw new Error(`unknown VDMOS parameter ${JSON.stringify(k)}`);
    if (typeof v !== "number") throw new Error(`VDMOS parameter ${k} is not a number`);
    return `${k}=${sp(v)}`;
  });
  return `.model ${card.name} VDMOS(${parts.join(" ")})`;
}
