// Measurement lines every drive deck shares: a power vector integrated over
// each edge's window, read back per edge and per period.
import { deckName } from "./bjt";
import { sp, valueOf, type NgspiceResult } from "./ngspice";

/** The on and off windows of one measured period, s. */
export interface EdgeWindows {
  on: [number, number];
  off: [number, number];
}

export interface PerEdge {
  on: number;
  off: number;
}

const range = ([a, b]: [number, number]) => `from=${sp(a)} to=${sp(b)}`;

/** `let` the power and integrate it over both windows (`<name>_on`, `<name>_off`). */
export function energyLines(name: string, power: string, w: EdgeWindows): string {
  const n = deckName(name);
  return `let p_${n} = ${power}
meas tran ${n}_on integ p_${n} ${range(w.on)}
meas tran ${n}_off integ p_${n} ${range(w.off)}`;
}

/** A measurement over one window: `meas tran <name> <what> ... from .. to ..`. */
export function windowLine(name: string, what: string, window: [number, number]): string {
  return `meas tran ${deckName(name)} ${what} ${range(window)}`;
}

export function perEdge(r: NgspiceResult, name: string): PerEdge {
  return { on: valueOf(r, `${name}_on`), off: valueOf(r, `${name}_off`) };
}

export const periodTotal = (e: PerEdge): number => e.on + e.off;

/**
 * A series resistor, or (r = 0) a short made of a 0 V source, so a deck can
 * take a zero resistance without dividing by it.
 */
export function seriesResistor(name: string, a: string, b: string, r: number): string {
  if (!(r >= 0)) throw new Error(`resistance ${name} must be ≥ 0, got ${r}`);
  return r === 0 ? `V${deckName(name)} ${a} ${b} 0` : `R${deckName(name)} ${a} ${b} ${sp(r)}`;
}
