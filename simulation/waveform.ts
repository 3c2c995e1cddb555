// Sampled waveforms as ngspice's wrdata writes them (one time column with
// `wr_singlescale`, names in the first line with `wr_vecnames`), and the few
// operations the edge measurements need: crossings, extrema, integrals.

export interface Waveform {
  t: Float64Array;
  cols: Record<string, Float64Array>;
}

export function parseWrdata(text: string, expected: readonly string[]): Waveform {
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== "");
  const head = lines[0]?.trim().split(/\s+/) ?? [];
  if (head[0] !== "time") throw new Error("waveform file has no time column");
  const missing = expected.filter((n) => !head.includes(n));
  if (missing.length) throw new Error(`waveform file lacks ${missing.join(", ")}`);
  const n = lines.length - 1;
  const data = head.map(() => new Float64Array(n));
  for (let r = 0; r < n; r++) {
    const f = lines[r + 1].trim().split(/\s+/);
    if (f.length !== head.length) throw new Error(`waveform row ${r + 1} has ${f.length} fields`);
    for (let c = 0; c < head.length; c++) data[c][r] = Number(f[c]);
  }
  const cols: Record<string, Float64Array> = {};
  head.forEach((name, c) => (cols[name] = data[c]));
  return { t: data[0], cols };
}

/** Index of the first sample at or after time `t0`. */
export function indexAt(t: Float64Array, t0: number): number {
  let lo = 0;
  let hi = t.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (t[mid] < t0) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** y at time t0, linear between samples. */
export function valueAt(t: Float64Array, y: Float64Array, t0: number): number {
  const i = indexAt(t, t0);
  if (i === 0 || t[i] === t0) return y[i];
  const f = (t0 - t[i - 1]) / (t[i] - t[i - 1]);
  return y[i - 1] + f * (y[i] - y[i - 1]);
}

/** First time after `from` at which y crosses `level` going up or down (linear between samples), or NaN. */
export function crossing(t: Float64Array, y: Float64Array, level: number, dir: "up" | "down", from = 0): number {
  for (let i = Math.max(1, indexAt(t, from)); i < t.length; i++) {
    const a = y[i - 1] - level;
    const b = y[i] - level;
    const hit = dir === "up" ? a < 0 && b >= 0 : a > 0 && b <= 0;
    if (hit) return t[i - 1] + ((t[i] - t[i - 1]) * a) / (a - b);
  }
  return Number.NaN;
}

/** Largest value of f(i) over the samples with t in [a, b]. */
export function maxOver(t: Float64Array, f: (i: number) => number, a: number, b: number): number {
  let m = -Infinity;
  for (let i = indexAt(t, a); i < t.length && t[i] <= b; i++) m = Math.max(m, f(i));
  return m;
}

/** Trapezoidal ∫ f dt over the samples with t in [a, b] (both ends on samples of a run that starts at a). */
export function integrate(t: Float64Array, f: (i: number) => number, a: number, b: number): number {
  let s = 0;
  const i0 = indexAt(t, a);
  let prev = f(i0);
  for (let i = i0 + 1; i < t.length && t[i] <= b; i++) {
    const cur = f(i);
    s += 0.5 * (prev + cur) * (t[i] - t[i - 1]);
    prev = cur;
  }
  return s;
}

/**
 * Largest |Δy/Δt| over any interval of length `span` that starts in [a, b]
 * (linear between samples). A fixed span, not neighbouring samples, so the
 * figure does not grow without bound as the time step shrinks at a kink.
 */
export function maxSlope(t: Float64Array, y: Float64Array, a: number, b: number, span: number): number {
  let m = 0;
  for (let i = indexAt(t, a); i < t.length && t[i] <= b; i++) {
    if (t[i] + span > t[t.length - 1]) break;
    m = Math.max(m, Math.abs(valueAt(t, y, t[i] + span) - y[i]) / span);
  }
  return m;
}
