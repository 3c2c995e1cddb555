/**
 * Dead times of synchronous rectifiers: the gate comes on t1 after the
 * rectifier starts to conduct and goes off t2 before it stops, so its body
 * diode carries the current for t1 and t2 (ideal diode: no drop, so the
 * converter's volt-seconds and currents do not change).
 *
 * Assumption (common practice for discontinuous-mode controllers): a
 * synchronous rectifier whose current falls to zero is turned off at that
 * zero crossing (diode emulation), so such a conduction interval has no t2.
 */
import { runsOf, splitAt, startTimes, type Timeline } from "./spans";
import type { Refusal } from "./types";

const EPS = 1e-9;

function maxCurrent(t: Timeline, id: string): number {
  let m = 0;
  for (const s of t.spans) {
    const st = s.dev[id];
    if (st.state !== "off") m = Math.max(m, Math.abs(st.i0), Math.abs(st.i1));
  }
  return m;
}

/** True when time x lies in the cyclic interval [a, a + len). */
function within(x: number, a: number, len: number, period: number): boolean {
  const d = (((x - a) % period) + period) % period;
  // x a rounding error below a counts as a.
  return d > period * (1 - EPS) || d < len - period * EPS;
}

export function applyDeadTimes(timeline: Timeline, [t1, t2]: readonly [number, number]): Timeline | Refusal {
  let t = timeline;
  for (const p of timeline.positions) {
    if (p.role !== "synchronous-rectifier" || p.device !== "mosfet") continue;
    const scale = maxCurrent(t, p.id);
    const windows: { a: number; len: number }[] = [];
    for (const run of runsOf(t, p.id)) {
      const last = t.spans[run.spans[run.spans.length - 1]].dev[p.id];
      const endsAtZero = last.state !== "off" && Math.abs(last.i1) <= EPS * scale;
      const tail = endsAtZero ? 0 : t2;
      if (t1 + tail >= run.duration * (1 - EPS)) {
        return {
          field: "deadTimes",
          message:
            `${p.label} (${p.id}) conducts for ${(run.duration * 1e9).toFixed(0)} ns per interval, ` +
            `no longer than its dead times (${((t1 + tail) * 1e9).toFixed(0)} ns): its channel would never turn on; shorten the dead times`,
        };
      }
      if (t1 > 0) windows.push({ a: run.start, len: t1 });
      if (tail > 0) windows.push({ a: run.start + run.duration - tail, len: tail });
    }
    for (const w of windows) t = splitAt(splitAt(t, w.a), w.a + w.len);
    const starts = startTimes(t.spans);
    t = {
      ...t,
      spans: t.spans.map((s, k) => {
        const st = s.dev[p.id];
        if (st.state !== "channel" || !windows.some((w) => within(starts[k], w.a, w.len, t.period))) return s;
        return { ...s, dev: { ...s.dev, [p.id]: { ...st, state: "diode" as const } } };
      }),
    };
  }
  return t;
}
