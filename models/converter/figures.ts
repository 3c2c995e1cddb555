/**
 * Per-position figures from a period's spans: duty, edges, RMS and average
 * currents, body-diode intervals, blocking voltages. A straight-line current
 * segment from i0 to i1 lasting dt contributes dt·(i0 + i1)/2 to the charge
 * and dt·(i0² + i0·i1 + i1²)/3 to the integral of i² (closed form, exact
 * for a straight segment; Erickson & Maksimović 3rd ed. tabulate the same
 * results in their appendix on RMS values of converter waveforms, recalled
 * from memory).
 */
import { runsOf, startTimes, type PositionInfo, type Run, type Span, type Timeline } from "./spans";
import type { BodyDiodeFigures, DiodeInterval, EdgeFigure, PositionFigures } from "./types";

const EPS = 1e-9;

interface Moments {
  time: number;
  charge: number;
  square: number;
}

function moments(spans: readonly Span[], id: string, pick: (s: string) => boolean, abs = false): Moments {
  const m = { time: 0, charge: 0, square: 0 };
  for (const s of spans) {
    const st = s.dev[id];
    if (st.state === "off" || !pick(st.state)) continue;
    const a = abs ? Math.abs(st.i0) : st.i0;
    const b = abs ? Math.abs(st.i1) : st.i1;
    m.time += s.dt;
    m.charge += (s.dt * (a + b)) / 2;
    m.square += (s.dt * (a * a + a * b + b * b)) / 3;
  }
  return m;
}

interface Scales {
  v: number;
  i: number;
}

function scalesOf(t: Timeline): Scales {
  let v = 0;
  let i = 0;
  for (const s of t.spans)
    for (const st of Object.values(s.dev)) {
      if (st.state === "off") v = Math.max(v, Math.abs(st.v));
      else i = Math.max(i, Math.abs(st.i0), Math.abs(st.i1));
    }
  return { v: v || 1, i: i || 1 };
}

function edge(time: number, vds: number, id: number, kind: "on" | "off", sc: Scales): EdgeFigure {
  const zeroVoltage = Math.abs(vds) <= EPS * sc.v;
  const zeroCurrent = Math.abs(id) <= EPS * sc.i;
  const hard = kind === "on" ? !zeroVoltage : !zeroVoltage && !zeroCurrent;
  return { time, vds: zeroVoltage ? 0 : vds, id: zeroCurrent ? 0 : id, zeroVoltage, zeroCurrent, hard };
}

interface RunEdges {
  turnOn: EdgeFigure;
  turnOff: EdgeFigure;
  blockingAfter: number;
}

function runEdges(t: Timeline, p: PositionInfo, run: Run, sc: Scales): RunEdges {
  const n = t.spans.length;
  const starts = startTimes(t.spans);
  const main = p.device === "mosfet" ? "channel" : "diode";
  const inMain = run.spans.filter((k) => t.spans[k].dev[p.id].state === main);
  if (inMain.length === 0) throw new Error(`${p.id}: a conduction interval without channel conduction`);
  const kOn = inMain[0];
  const kOff = inMain[inMain.length - 1];
  const stOn = t.spans[kOn].dev[p.id];
  const stOff = t.spans[kOff].dev[p.id];
  const before = t.spans[(kOn - 1 + n) % n].dev[p.id];
  const after = t.spans[(kOff + 1) % n].dev[p.id];
  const afterRun = t.spans[(run.spans[run.spans.length - 1] + 1) % n].dev[p.id];
  if (stOn.state === "off" || stOff.state === "off" || afterRun.state !== "off") throw new Error("unreachable");
  const vOn = before.state === "off" && !p.natural ? before.v : 0;
  const vOff = after.state === "off" ? after.v : 0;
  return {
    turnOn: edge(starts[kOn], vOn, stOn.i0, "on", sc),
    turnOff: edge(starts[kOff] + t.spans[kOff].dt, vOff, stOff.i1, "off", sc),
    blockingAfter: afterRun.v,
  };
}

function bodyDiode(t: Timeline, id: string, chosen: RunEdges): BodyDiodeFigures | null {
  const starts = startTimes(t.spans);
  const n = t.spans.length;
  const intervals: DiodeInterval[] = [];
  for (let k = 0; k < n; k++) {
    const st = t.spans[k].dev[id];
    if (st.state !== "diode") continue;
    const prev = t.spans[(k - 1 + n) % n].dev[id];
    const last = intervals[intervals.length - 1];
    if (prev.state === "diode" && last && Math.abs(last.start + last.duration - starts[k]) < t.period * EPS) {
      last.duration += t.spans[k].dt;
      last.iEnd = Math.abs(st.i1);
    } else intervals.push({ start: starts[k], duration: t.spans[k].dt, iStart: Math.abs(st.i0), iEnd: Math.abs(st.i1) });
  }
  // An interval running through the end of the period continues at its start.
  if (intervals.length > 1 && intervals[0].start === 0) {
    const tail = intervals[intervals.length - 1];
    if (Math.abs(tail.start + tail.duration - t.period) < t.period * EPS) {
      intervals[0] = { start: tail.start, duration: tail.duration + intervals[0].duration, iStart: tail.iStart, iEnd: intervals[0].iEnd };
      intervals.pop();
    }
  }
  if (intervals.length === 0) return null;
  const m = moments(t.spans, id, (s) => s === "diode", true);
  const endsAt = (iv: DiodeInterval) => (iv.start + iv.duration) % t.period;
  const close = (a: number, b: number) => Math.abs(((a - b + 1.5 * t.period) % t.period) - 0.5 * t.period) < t.period * EPS;
  const before = intervals.find((iv) => close(endsAt(iv), chosen.turnOn.time));
  const after = intervals.find((iv) => close(iv.start, chosen.turnOff.time));
  return {
    intervals,
    beforeOn: before?.duration ?? 0,
    afterOff: after?.duration ?? 0,
    iAvg: m.charge / t.period,
    iRms: Math.sqrt(m.square / t.period),
  };
}

export function positionFigures(t: Timeline, p: PositionInfo): PositionFigures {
  const sc = scalesOf(t);
  const main = p.device === "mosfet" ? "channel" : "diode";
  const m = moments(t.spans, p.id, (s) => s === main);
  const all = moments(t.spans, p.id, () => true);
  const runs = runsOf(t, p.id).map((r) => runEdges(t, p, r, sc));
  // Several conduction intervals (a bridge rectifier in DCM): report the edges of the one with the larger currents.
  const size = (e: RunEdges) => Math.max(Math.abs(e.turnOn.id), Math.abs(e.turnOff.id));
  const chosen = runs.reduce((a, b) => (size(b) > size(a) * (1 + EPS) ? b : a));
  let reverse = 0;
  for (const s of t.spans) {
    const st = s.dev[p.id];
    if (st.state === "off") reverse = Math.max(reverse, st.v);
  }
  return {
    id: p.id,
    role: p.role,
    label: p.label,
    device: p.device,
    duty: m.time / t.period,
    turnOn: chosen.turnOn,
    turnOff: chosen.turnOff,
    iRms: Math.sqrt(m.square / t.period),
    iAvg: m.charge / t.period,
    deviceIRms: Math.sqrt(all.square / t.period),
    deviceIAvg: all.charge / t.period,
    bodyDiode: p.device === "mosfet" ? bodyDiode(t, p.id, chosen) : null,
    reverseVoltage: reverse,
    blockingAfterConduction: chosen.blockingAfter,
    runs: runs.length,
  };
}
