/**
 * Pure geometry for the chart overlays: maps axis values to pixels through
 * the cell centres a chart has already laid out, and turns polylines into
 * SVG path data. No React, no nivo: unit-tested on its own.
 */

export interface Point {
  x: number;
  y: number;
}

/**
 * A piecewise-linear map from axis values to pixel positions, built from the
 * centres of the cells along that axis. Sweep axes may be spaced unevenly
 * (log-spaced fsw), so a single linear scale would misplace a contour;
 * between two centres we interpolate, beyond the ends we extrapolate with
 * the nearest segment (a contour may end half a cell outside the centres).
 */
export function centreScale(values: readonly number[], centres: readonly number[]): (v: number) => number {
  if (values.length !== centres.length || values.length === 0) throw new Error("centreScale needs one centre per axis value");
  if (values.length === 1) {
    const c = centres[0];
    return () => c;
  }
  const descending = values[0] > values[values.length - 1];
  const vs = descending ? [...values].reverse() : [...values];
  const cs = descending ? [...centres].reverse() : [...centres];
  return (v: number) => {
    let i = 0;
    while (i < vs.length - 2 && v > vs[i + 1]) i++;
    const span = vs[i + 1] - vs[i];
    const t = span === 0 ? 0 : (v - vs[i]) / span;
    return cs[i] + t * (cs[i + 1] - cs[i]);
  };
}

function round(n: number): string {
  // Two decimals are well below a pixel; fewer characters in the DOM.
  const r = Math.round(n * 100) / 100;
  return Object.is(r, -0) ? "0" : String(r);
}

/** "M x y L x y ..." for one polyline; empty string for fewer than two points. */
export function polylinePath(points: readonly Point[], closed = false): string {
  const finite = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  if (finite.length < 2) return "";
  const [first, ...rest] = finite;
  return `M${round(first.x)} ${round(first.y)}` + rest.map((p) => `L${round(p.x)} ${round(p.y)}`).join("") + (closed ? "Z" : "");
}

/** Map polylines given in axis values to one SVG path in pixels. */
export function contourPath(
  lines: readonly (readonly Point[])[],
  mapX: (v: number) => number,
  mapY: (v: number) => number,
): string {
  return lines
    .map((line) => polylinePath(line.map((p) => ({ x: mapX(p.x), y: mapY(p.y) }))))
    .filter(Boolean)
    .join(" ");
}

/** Evenly pick at most `max` tick values from a list, always keeping both ends. */
export function thinTicks<T>(values: readonly T[], max: number): T[] {
  if (values.length <= max || max < 2) return [...values];
  const step = (values.length - 1) / (max - 1);
  const out: T[] = [];
  for (let i = 0; i < max; i++) out.push(values[Math.round(i * step)]);
  return [...new Set(out)];
}

function hexToRgb(hex: string): [number, number, number] {
  const h = hex.replace("#", "");
  return [0, 2, 4].map((i) => parseInt(h.slice(i, i + 2), 16)) as [number, number, number];
}

/** Evenly spaced colour stops as an interpolator on t in [0, 1] (clamped). */
export function rampInterpolator(stops: readonly string[]): (t: number) => string {
  const rgb = stops.map(hexToRgb);
  return (t: number) => {
    const c = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0)) * (rgb.length - 1);
    const i = Math.min(rgb.length - 2, Math.floor(c));
    const f = c - i;
    const mix = rgb[i].map((a, k) => Math.round(a + f * (rgb[i + 1][k] - a)));
    return `rgb(${mix[0]}, ${mix[1]}, ${mix[2]})`;
  };
}
