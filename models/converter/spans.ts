/**
 * One switching period as a list of spans. Within a span every device is in
 * one state and every current is a straight line (ideal switches and
 * inductors driven by constant voltages make all waveforms piecewise
 * linear: Erickson & Maksimović 3rd ed. 2020, ch. 2, small-ripple and
 * linear-ripple approximations). A current may jump at a span boundary
 * (ideal commutation: leakage inductance ignored).
 */
import type { Role } from "./types";

export type DeviceState =
  /** Blocking `v` volts (positive in the blocking direction). */
  | { state: "off"; v: number }
  /** Conducting through the channel (or, for a diode position, the diode): current i0 → i1. */
  | { state: "channel" | "diode"; i0: number; i1: number };

export interface Span {
  dt: number;
  dev: Record<string, DeviceState>;
}

export interface PositionInfo {
  id: string;
  role: Role;
  label: string;
  device: "mosfet" | "diode";
  /**
   * True when another switch's edge brings this device's voltage to zero
   * before it conducts (a rectifier, a reset diode, an active-clamp switch):
   * its turn-on is then at zero voltage whatever the state before.
   */
  natural: boolean;
}

export interface Timeline {
  period: number;
  positions: PositionInfo[];
  spans: Span[];
}

export const off = (v: number): DeviceState => ({ state: "off", v });
export const on = (i0: number, i1: number): DeviceState => ({ state: "channel", i0, i1 });
export const diode = (i0: number, i1: number): DeviceState => ({ state: "diode", i0, i1 });
/** A rectifier conducts through its channel when synchronous, else as a diode. */
export const conducts = (sync: boolean) => (i0: number, i1: number): DeviceState => (sync ? on(i0, i1) : diode(i0, i1));

/** Drop spans too short to matter (a boundary-mode idle interval of zero length). */
export function dropEmpty(t: Timeline): Timeline {
  return { ...t, spans: t.spans.filter((s) => s.dt > t.period * 1e-12) };
}

/** Start time of each span from the start of the period. */
export function startTimes(spans: readonly Span[]): number[] {
  const out: number[] = [];
  let t = 0;
  for (const s of spans) {
    out.push(t);
    t += s.dt;
  }
  return out;
}

function cut(st: DeviceState, f: number): [DeviceState, DeviceState] {
  if (st.state === "off") return [st, st];
  const mid = st.i0 + (st.i1 - st.i0) * f;
  return [{ ...st, i1: mid }, { ...st, i0: mid }];
}

/** Split the span containing time t (mod period) so that t is a span boundary. */
export function splitAt(t: Timeline, time: number): Timeline {
  const at = ((time % t.period) + t.period) % t.period;
  const starts = startTimes(t.spans);
  const eps = t.period * 1e-12;
  const k = starts.findIndex((s, i) => at > s + eps && at < s + t.spans[i].dt - eps);
  if (k < 0) return t;
  const s = t.spans[k];
  const f = (at - starts[k]) / s.dt;
  const a: Span = { dt: s.dt * f, dev: {} };
  const b: Span = { dt: s.dt * (1 - f), dev: {} };
  for (const [id, st] of Object.entries(s.dev)) [a.dev[id], b.dev[id]] = cut(st, f);
  return { ...t, spans: [...t.spans.slice(0, k), a, b, ...t.spans.slice(k + 1)] };
}

/** A conduction run: the span indices (cyclic, in order) in which a position is not off. */
export interface Run {
  spans: number[];
  start: number;
  duration: number;
}

/** The conduction runs of one position, following the period cyclically. */
export function runsOf(t: Timeline, id: string): Run[] {
  const n = t.spans.length;
  const conducting = (k: number) => t.spans[(k + n) % n].dev[id].state !== "off";
  const first = t.spans.findIndex((_, k) => !conducting(k));
  if (first < 0) throw new Error(`position ${id} never blocks: not a switching position`);
  const starts = startTimes(t.spans);
  const runs: Run[] = [];
  let current: Run | null = null;
  for (let j = 1; j <= n; j++) {
    const k = (first + j) % n;
    if (conducting(k)) {
      if (!current) current = { spans: [], start: starts[k], duration: 0 };
      current.spans.push(k);
      current.duration += t.spans[k].dt;
    } else if (current) {
      runs.push(current);
      current = null;
    }
  }
  return runs;
}

/**
 * Spans between sorted, de-duplicated cut times in (0, period): `describe`
 * gets each span's start a, end b and midpoint m (states are decided at m,
 * currents evaluated at a and b).
 */
export function spansBetween(
  period: number,
  cuts: readonly number[],
  describe: (a: number, b: number, m: number) => Record<string, DeviceState>,
): Span[] {
  const eps = period * 1e-12;
  const times = [0, ...cuts.filter((x) => x > eps && x < period - eps).sort((x, y) => x - y), period];
  const spans: Span[] = [];
  for (let k = 1; k < times.length; k++) {
    const [a, b] = [times[k - 1], times[k]];
    if (b - a > eps) spans.push({ dt: b - a, dev: describe(a, b, (a + b) / 2) });
  }
  return spans;
}
