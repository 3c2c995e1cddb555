/**
 * Limit contour of a sweep (models/sweep.ts): marching squares at the limit
 * level over the result grid, segments joined into polylines, vertices
 * mapped back to axis units.
 */
import type { ContourPoint, SweepResult } from "./sweepTypes";

function valueAt(values: number[], log: boolean, f: number): number {
  const i0 = Math.min(Math.max(Math.floor(f), 0), values.length - 2);
  const t = f - i0;
  const a = values[i0], b = values[i0 + 1];
  return log ? a * Math.pow(b / a, t) : a + t * (b - a);
}

/** Limit contour of a complete sweep: where z crosses the (possibly per-column/row) limit. */
export function contourOf(r: SweepResult): ContourPoint[][] {
  if (r.limit === null && r.limitAlong === null) return [];
  const nx = r.x.values.length, ny = r.y.values.length;
  const g = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) {
      const lim = r.limit ?? (r.limitAlong!.axis === "x" ? r.limitAlong!.values[i] : r.limitAlong!.values[j]);
      const v = r.z[j][i];
      // Runaway (null) is beyond any limit.
      g[j * nx + i] = v === null ? Number.POSITIVE_INFINITY : v - lim;
    }
  const xLog = r.x.scale === "log", yLog = r.y.scale === "log";
  return limitContour(g, nx, ny).map((line) =>
    line.map(([i, j]) => ({ x: valueAt(r.x.values, xLog, i), y: valueAt(r.y.values, yLog, j), i, j })),
  );
}

/**
 * Marching squares on a row-major field g (ny rows × nx columns) at level 0,
 * "over" meaning g ≥ 0 (+∞ allowed). Returns polylines of fractional
 * [column, row] indices; crossings are interpolated linearly along grid
 * edges (midpoint when one end is infinite); saddles are resolved by the
 * cell's mean. Segments sharing a grid edge are joined into polylines.
 */
export function limitContour(g: Float64Array | number[], nx: number, ny: number): [number, number][][] {
  const H = ny * (nx - 1);
  const hEdge = (i: number, j: number) => j * (nx - 1) + i;
  const vEdge = (i: number, j: number) => H + j * nx + i;
  const over = (v: number) => v >= 0;
  const point = (e: number): [number, number] => {
    const horiz = e < H;
    const i = horiz ? e % (nx - 1) : (e - H) % nx;
    const j = horiz ? Math.floor(e / (nx - 1)) : Math.floor((e - H) / nx);
    const a = g[j * nx + i];
    const b = horiz ? g[j * nx + i + 1] : g[(j + 1) * nx + i];
    const t = Number.isFinite(a) && Number.isFinite(b) ? Math.min(Math.max(a / (a - b), 0), 1) : 0.5;
    return horiz ? [i + t, j] : [i, j + t];
  };
  const segs: number[] = [];
  for (let j = 0; j < ny - 1; j++)
    for (let i = 0; i < nx - 1; i++) {
      const va = g[j * nx + i], vb = g[j * nx + i + 1], vc = g[(j + 1) * nx + i + 1], vd = g[(j + 1) * nx + i];
      const a = over(va), b = over(vb), c = over(vc), d = over(vd);
      const bottom = hEdge(i, j), right = vEdge(i + 1, j), top = hEdge(i, j + 1), left = vEdge(i, j);
      const crossed: number[] = [];
      if (a !== b) crossed.push(bottom);
      if (b !== c) crossed.push(right);
      if (c !== d) crossed.push(top);
      if (d !== a) crossed.push(left);
      if (crossed.length === 2) segs.push(crossed[0], crossed[1]);
      else if (crossed.length === 4) {
        const mean = (va + vb + vc + vd) / 4;
        const centre = Number.isNaN(mean) ? true : over(mean);
        // Cut off the corners that differ from the centre.
        if (a !== centre) segs.push(left, bottom);
        if (b !== centre) segs.push(bottom, right);
        if (c !== centre) segs.push(right, top);
        if (d !== centre) segs.push(top, left);
      }
    }
  return joinSegments(segs).map((chain) => chain.map(point));
}

function joinSegments(segs: number[]): number[][] {
  const n = segs.length / 2;
  const byEdge = new Map<number, number[]>();
  for (let s = 0; s < n; s++)
    for (const e of [segs[2 * s], segs[2 * s + 1]]) {
      const list = byEdge.get(e);
      if (list) list.push(s);
      else byEdge.set(e, [s]);
    }
  const used = new Uint8Array(n);
  const walk = (start: number, fromEdge: number): number[] => {
    const chain = [fromEdge];
    let s = start;
    let e = fromEdge;
    while (s >= 0 && !used[s]) {
      used[s] = 1;
      e = segs[2 * s] === e ? segs[2 * s + 1] : segs[2 * s];
      chain.push(e);
      const next = (byEdge.get(e) ?? []).find((t) => !used[t]);
      s = next === undefined ? -1 : next;
    }
    return chain;
  };
  const lines: number[][] = [];
  // Open lines first (they start on the grid boundary, where an edge has one segment), then loops.
  for (const [e, list] of byEdge) if (list.length === 1 && !used[list[0]]) lines.push(walk(list[0], e));
  for (let s = 0; s < n; s++) if (!used[s]) lines.push(walk(s, segs[2 * s]));
  return lines;
}
