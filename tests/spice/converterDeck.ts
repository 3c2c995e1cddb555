// Building blocks of the ideal-switch converter decks that check the
// operating-point calculator. Only numbers go into a deck (through sp()):
// no text from a spec or a user. Switches are voltage-controlled with
// Ron = 1 mΩ, diodes a steep exponential (N = 0.08: ~40 mV at a few amps),
// so the circuit is close to the calculator's ideal one; what remains
// (these drops, the output ripple) sets the agreement bands.
import { expect } from "vitest";
import { operatingPoint } from "@/models/converter/calculate";
import type { ConverterSpec, OperatingPoint } from "@/models/converter/types";
import { sp } from "@/simulation/ngspice";

export const MODELS = [
  ".model SWM SW(VT=0.5 VH=0 RON=1m ROFF=1e8)",
  ".model DI D(IS=1e-8 N=0.08 RS=0.1m)",
  ".options reltol=1e-4 abstol=1e-9 vntol=1e-6 method=gear",
].join("\n");

/** Gate command rise/fall time, s: short against every interval of the period. */
const EDGE = 1e-9;

/** A control source high (switch closed) from tOn to tOff within each period (tOff may wrap past T). */
export function gate(name: string, node: string, tOn: number, tOff: number, period: number): string {
  const start = ((tOn % period) + period) % period;
  const width = (((tOff - tOn) % period) + period) % period;
  // The switch closes when the command crosses VT = 0.5, i.e. EDGE/2 after the ramp starts
  // (at t = 0 it closes EDGE/2 late rather than a period late).
  const delay = Math.max(0, start - EDGE / 2);
  return `V${name} ${node} 0 PULSE(0 1 ${sp(delay)} ${sp(EDGE)} ${sp(EDGE)} ${sp(width - EDGE)} ${sp(period)})`;
}

/** A MOSFET position: switch + series sense source (channel) and antiparallel body diode with its own sense. */
export function mosfet(id: string, drain: string, source: string, ctl: string): string {
  return [
    `S${id} ${drain} ${id}_c ${ctl} 0 SWM`,
    `Vi${id} ${id}_c ${source} DC 0`,
    `D${id} ${id}_b ${drain} DI`,
    `Vb${id} ${source} ${id}_b DC 0`,
  ].join("\n");
}

/** A diode position with its sense source (current anode → cathode). */
export function diodePos(id: string, anode: string, cathode: string): string {
  return [`D${id} ${anode} ${id}_a DI`, `Vi${id} ${id}_a ${cathode} DC 0`].join("\n");
}

// `meas` reads vectors, not expressions: each measurement first names its expression with `let`.
const named = (name: string, expr: string) => `let x_${name} = ${expr}`;

/** Measurement lines over a window [from, to], or at one instant. */
export const avg = (name: string, expr: string, from: number, to: number) =>
  `${named(name, expr)}\nmeas tran ${name} avg x_${name} from=${sp(from)} to=${sp(to)}`;
export const rms = (name: string, expr: string, from: number, to: number) =>
  `${named(name, expr)}\nmeas tran ${name} rms x_${name} from=${sp(from)} to=${sp(to)}`;
export const at = (name: string, expr: string, t: number) => `${named(name, expr)}\nmeas tran ${name} find x_${name} at=${sp(t)}`;
/** The first time after `from` that expr crosses `level` going up (rise) or down (fall). */
export const when = (name: string, expr: string, level: number, dir: "rise" | "fall", from: number) =>
  `${named(name, expr)}\nmeas tran ${name} when x_${name}=${sp(level)} ${dir}=1 from=${sp(from)}`;

/**
 * Two samples after (or before) an edge, for extrapolating the current to
 * the edge itself: i(edge) ≈ 2·i(δ) − i(2δ) removes the ramp's slope.
 */
export function edgeSamples(name: string, expr: string, t: number, side: 1 | -1, delta: number): string[] {
  return [at(`${name}_1`, expr, t + side * delta), at(`${name}_2`, expr, t + 2 * side * delta)];
}

export function extrapolated(values: Record<string, number>, name: string): number {
  const a = values[`${name}_1`.toLowerCase()];
  const b = values[`${name}_2`.toLowerCase()];
  if (a === undefined || b === undefined) throw new Error(`no samples ${name}`);
  return 2 * a - b;
}

export function deck(title: string, circuit: string[], tstop: number, tmax: number, control: string[]): string {
  return [
    title,
    ...circuit,
    MODELS,
    `.tran ${sp(tmax / 2)} ${sp(tstop)} 0 ${sp(tmax)} uic`,
    ".control",
    "run",
    ...control,
    ".endc",
    ".end",
  ].join("\n");
}

/**
 * model/ngspice agreement kept for the report: the ratio for figures of
 * size, the difference over the position's scale for figures that are zero
 * in the model (zero-current or zero-voltage edges). The worst per figure
 * is printed at the end of a file.
 */
export class Ratios {
  private rows: { figure: string; ratio?: number; relDiff?: number }[] = [];
  add(figure: string, model: number, spice: number): number {
    this.rows.push({ figure, ratio: model / spice });
    return model / spice;
  }
  addDiff(figure: string, model: number, spice: number, scale: number): void {
    this.rows.push({ figure, relDiff: (model - spice) / scale });
  }
  worst(): string {
    const by = new Map<string, { figure: string; err: number; text: string }>();
    for (const r of this.rows) {
      const key = r.figure.replace(/^[^:]*: (Q|SR|D)\d /, "$1 ").replace(/^[^:]*: /, "");
      const err = r.ratio !== undefined ? Math.abs(r.ratio - 1) : Math.abs(r.relDiff ?? 0);
      const text = r.ratio !== undefined ? `ratio ${r.ratio.toFixed(4)}` : `difference ${((r.relDiff ?? 0) * 100).toFixed(2)} % of scale`;
      const old = by.get(key);
      if (!old || err > old.err) by.set(key, { figure: r.figure, err, text });
    }
    return [...by.values()].map((x) => `${x.figure}: ${x.text}`).join("\n");
  }
}

/**
 * Bands (model/ngspice) shared by the converter checks. The simulated
 * circuit loses about 1 % (diode drops ~40 mV against outputs of 5 V and
 * up, Ron 1 mΩ), so its output settles up to ~1 % low and its input
 * current ~1 % high; currents sampled at an edge are extrapolated from two
 * samples 0.4 % and 0.8 % of a period away. Hence 3 % for currents, 2 %
 * for voltages and duty, 5 % for small body-diode averages (a dead time of
 * 1–2 % of the period, where the integration steps weigh most). The output
 * voltage, which checks the calculator's duty (the decks run open loop on
 * it), gets 1 %: the drops above conduct for part of the period only and
 * stay under 1 % of the outputs used (3.3 V and up); a duty 2 % off moves
 * the output by more than that.
 */
export const BAND = { current: 0.03, voltage: 0.02, vout: 0.01, bodyDiode: 0.05 } as const;

/** Steady state: the output average over two windows 50 periods apart agrees within 0.2 %. */
export const STEADY = 0.002;

export function calcPoint(spec: ConverterSpec): OperatingPoint {
  const r = operatingPoint(spec);
  if (!r.ok) throw new Error(r.refusal.message);
  return r.point;
}

export function closeTo(ratios: Ratios, figure: string, model: number, spice: number, band: number): void {
  const r = ratios.add(figure, model, spice);
  expect(Math.abs(r - 1), `${figure}: model ${model} vs ngspice ${spice}`).toBeLessThan(band);
}
