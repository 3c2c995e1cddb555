// One harness for every converter check: given the calculator's operating
// point and a deck with probes for each switch position, measure the same
// figures in the last simulated period and compare them. Which instant to
// sample comes from the drive schedule the deck imposes (the calculator's
// duty and the dead times); zero-current and zero-voltage figures are
// compared in absolute terms against the position's own scale.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ConverterSpec, OperatingPoint, PositionFigures } from "@/models/converter/types";
import { runNgspice } from "@/simulation/ngspice";
import { BAND, Ratios, STEADY, at, avg, calcPoint, closeTo, deck, edgeSamples, extrapolated, rms } from "./converterDeck";
import { sp } from "@/simulation/ngspice";

export interface Probe {
  /** Channel (or diode) current in the calculator's sign: drain→source for switches, rectifying for rectifiers. */
  current: string;
  /** Body-diode current (positive when it conducts), for MOSFET positions. */
  body?: string;
  /** The voltage the device blocks (drain to source; cathode to anode). */
  vds: string;
  /** Current above which the device counts as conducting for its duty, A (default 0.1 % of its scale). */
  dutyThreshold?: number;
}

export interface Bench {
  title: string;
  circuit: string[];
  probes: Record<string, Probe>;
  /** Output voltage and input current expressions. */
  vout: string;
  iin: string;
  /** Periods simulated; the last one is measured. */
  periods: number;
  /** Further expressions that must be in steady state (e.g. a clamp capacitor's voltage). */
  steady?: Record<string, string>;
}

export type Values = Record<string, number>;

const key = (id: string, what: string) => `${id.toLowerCase()}_${what}`;

export async function runBench(p: OperatingPoint, b: Bench): Promise<Values> {
  const T = 1 / p.fsw;
  const tS = (b.periods - 1) * T;
  const [from, to] = [tS, tS + T];
  const dl = 0.004 * T;
  const lines = [
    avg("vo", b.vout, tS - 10 * T, to),
    avg("vo_early", b.vout, tS - 60 * T, tS - 50 * T),
    avg("iin", b.iin, from, to),
  ];
  for (const [name, expr] of Object.entries(b.steady ?? {}))
    lines.push(avg(`${name}_late`, expr, tS - 10 * T, to), avg(`${name}_early`, expr, tS - 60 * T, tS - 50 * T));
  const mids = midpoints(p, T);
  for (const pos of p.positions) {
    const pr = b.probes[pos.id];
    if (!pr) throw new Error(`no probe for ${pos.id}`);
    const total = pr.body ? `(${pr.current})-(${pr.body})*${pos.role === "synchronous-rectifier" ? -1 : 1}` : pr.current;
    const thr = pr.dutyThreshold ?? 1e-3 * Math.max(Math.abs(pos.turnOn.id), Math.abs(pos.turnOff.id), pos.iRms);
    lines.push(
      avg(key(pos.id, "avg"), pr.current, from, to),
      rms(key(pos.id, "rms"), pr.current, from, to),
      avg(key(pos.id, "duty"), `abs(${pr.current}) gt ${sp(thr)}`, from, to),
      // Blocking voltage: sampled midway between edges, so the leakage spikes of the
      // commutations (the calculator ignores leakage inductance) are left out.
      ...mids.map((t, j) => at(key(pos.id, `vs${j}`), pr.vds, tS + t)),
      ...edgeSamples(key(pos.id, "ion"), pr.current, tS + pos.turnOn.time, 1, dl),
      ...edgeSamples(key(pos.id, "ioff"), pr.current, tS + pos.turnOff.time, -1, dl),
      at(key(pos.id, "von"), pr.vds, tS + pos.turnOn.time - Math.min(dl, (pos.bodyDiode?.beforeOn || Infinity) / 2)),
      at(key(pos.id, "voff"), pr.vds, tS + pos.turnOff.time + Math.min(dl, (pos.bodyDiode?.afterOff || Infinity) / 2)),
    );
    if (pr.body)
      lines.push(
        avg(key(pos.id, "bavg"), pr.body, from, to),
        avg(key(pos.id, "davg"), total, from, to),
        rms(key(pos.id, "drms"), total, from, to),
      );
  }
  // T/1000: the averages over a body-diode window of 1–2 % of the period need its edges resolved.
  const r = await runNgspice(deck(b.title, b.circuit, to + T, T / 1000, lines));
  const values = { ...r.values };
  for (const pos of p.positions) values[key(pos.id, "vmax")] = Math.max(...mids.map((_, j) => values[key(pos.id, `vs${j}`)]));
  return values;
}

/** Instants midway between consecutive edges of any position in the period. */
function midpoints(p: OperatingPoint, T: number): number[] {
  const edges = [0, T, ...p.positions.flatMap((q) => [q.turnOn.time, q.turnOff.time].map((t) => ((t % T) + T) % T))].sort((a, b) => a - b);
  const out: number[] = [];
  for (let k = 1; k < edges.length; k++) if (edges[k] - edges[k - 1] > 0.01 * T) out.push((edges[k] + edges[k - 1]) / 2);
  return out;
}

/** Compare as a ratio when the model figure is not small against its scale, else as a difference. */
function compare(ratios: Ratios, figure: string, model: number, spice: number, band: number, scale: number): void {
  if (Math.abs(model) >= 0.05 * scale) return closeTo(ratios, figure, model, spice, band);
  ratios.addDiff(figure, model, spice, scale);
  expect(Math.abs(spice - model), `${figure}: model ${model} vs ngspice ${spice} (scale ${scale})`).toBeLessThan(band * scale);
}

export interface CheckOptions {
  /** Skip the Vds sample just before turn-on, where the ideal circuit does not determine it (say why at the call). */
  skipTurnOnVds?: boolean;
  /** Skip the Vds sample just after turn-off, likewise. */
  skipTurnOffVds?: boolean;
}

export function checkConverter(ratios: Ratios, label: string, p: OperatingPoint, vout: number, v: Values): void {
  expect(Math.abs(v.vo / v.vo_early - 1), `${label}: not in steady state`).toBeLessThan(STEADY);
  for (const name of Object.keys(v).filter((x) => x.endsWith("_late"))) {
    const base = name.slice(0, -"_late".length);
    expect(Math.abs(v[name] / v[`${base}_early`] - 1), `${label}: ${base} not in steady state`).toBeLessThan(STEADY);
  }
  closeTo(ratios, `${label}: Vout (checks the duty)`, vout, v.vo, BAND.vout);
  closeTo(ratios, `${label}: input current`, p.inputCurrent, v.iin, BAND.current);
}

export function checkPosition(ratios: Ratios, label: string, pos: PositionFigures, v: Values, opts: CheckOptions = {}): void {
  const f = (what: string) => {
    const x = v[key(pos.id, what)];
    if (x === undefined) throw new Error(`no ngspice value ${key(pos.id, what)}`);
    return x;
  };
  const name = (what: string) => `${label}: ${pos.id} ${what}`;
  const iScale = Math.max(pos.deviceIRms, Math.abs(pos.turnOn.id), Math.abs(pos.turnOff.id));
  const vScale = pos.reverseVoltage;
  const { current: C, voltage: V } = BAND;
  compare(ratios, name("duty"), pos.duty, f("duty"), V, 1);
  compare(ratios, name("iAvg"), pos.iAvg, f("avg"), C, iScale);
  compare(ratios, name("iRms"), pos.iRms, f("rms"), C, iScale);
  compare(ratios, name("Id at turn-on"), pos.turnOn.id, extrapolated(v, key(pos.id, "ion")), C, iScale);
  compare(ratios, name("Id at turn-off"), pos.turnOff.id, extrapolated(v, key(pos.id, "ioff")), C, iScale);
  compare(ratios, name("reverse voltage"), pos.reverseVoltage, f("vmax"), V, vScale);
  if (!opts.skipTurnOffVds) compare(ratios, name("Vds after turn-off"), pos.turnOff.vds, f("voff"), V, vScale);
  // A naturally commutated device (a diode, or an SR without t1) has its voltage brought to
  // zero by another switch's edge, which the ideal model makes instantaneous: no sample before.
  const natural = pos.device === "diode" || (pos.role !== "primary" && !(pos.bodyDiode?.beforeOn));
  if (!natural && !opts.skipTurnOnVds) compare(ratios, name("Vds before turn-on"), pos.turnOn.vds, f("von"), V, vScale);
  if (pos.bodyDiode) {
    // Small against the device current but what the dead-time loss is made of: compared on its own scale.
    closeTo(ratios, name("body-diode iAvg"), pos.bodyDiode.iAvg, f("bavg"), BAND.bodyDiode);
    compare(ratios, name("device iAvg"), pos.deviceIAvg, f("davg"), C, iScale);
    compare(ratios, name("device iRms"), pos.deviceIRms, f("drms"), C, iScale);
  }
}

export interface BenchCase {
  spec: ConverterSpec;
  /** The conduction mode the calculator must find. */
  mode: string;
  bench: (spec: ConverterSpec, p: OperatingPoint) => Bench;
  /** What to compare for a position, when not everything as it is (say why at the case). */
  position?: (pos: PositionFigures, p: OperatingPoint) => { pos?: PositionFigures; opts?: CheckOptions };
}

/** Simulate every case once, then compare the converter and each position; print the worst agreement per figure. */
export function benchSuite(name: string, cases: Record<string, BenchCase>): void {
  const ratios = new Ratios();
  const runs: Record<string, { p: OperatingPoint; v: Values }> = {};
  beforeAll(async () => {
    for (const [k, c] of Object.entries(cases)) {
      const p = calcPoint(c.spec);
      runs[k] = { p, v: await runBench(p, c.bench(c.spec, p)) };
    }
  }, 60_000);
  afterAll(() => console.log(`${name}, worst model/ngspice agreement per figure:\n${ratios.worst()}`));
  describe.each(Object.keys(cases))(`${name}, %s: calculator vs ngspice`, (k) => {
    it("mode, steady state, output voltage with the computed duty, input current", () => {
      const { p, v } = runs[k];
      expect(p.mode).toBe(cases[k].mode);
      checkConverter(ratios, k, p, cases[k].spec.vout, v);
    });
    it("each switch position: duty, currents, edges, voltages", () => {
      const { p, v } = runs[k];
      for (const pos of p.positions) {
        const how = cases[k].position?.(pos, p) ?? {};
        checkPosition(ratios, k, how.pos ?? pos, v, how.opts);
      }
    });
  });
}
