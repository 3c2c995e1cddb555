/**
 * Seeded Monte Carlo over part tolerances (DOMAIN item 12): the junction
 * temperature of every part as a distribution, and the probability that it
 * exceeds its derated limit and its Tj(max).
 *
 * Distribution (common practice): a tolerance "±t" is read as ±3σ of a
 * normal distribution around the datasheet typical value, truncated at ±3σ
 * (no sample outside the stated band): factor = 1 + t·z/3, z ~ N(0,1) on
 * [−3, 3] (rejection sampling, exact shape). Each part draws its own factors
 * independently; parameters of one part that come from one mechanism share
 * one factor (all gate charges of a MOSFET; source and sink resistance of a
 * driver pin; every point of an hFE curve; the whole Rθ chain).
 * Tolerances come from the part's `tolerance` block in the design; a missing
 * entry takes COMMON_PRACTICE_TOLERANCE unless `defaults: "none"`.
 *
 * Per sample the perturbed design is re-evaluated at the chosen corners and
 * each part keeps its hottest corner (runaway at any corner = runaway).
 * Same seed, same design, same options -> identical numbers (models/rng.ts).
 */
import type { Design } from "./input/schema";
import { computeCorner, prepare, type Prepared } from "./evaluateCore";
import { evaluateDesign } from "./evaluate";
import { qgs2 } from "./gateCharge";
import { buildParts } from "./registry";
import { createRng } from "./rng";
import type { PartKind } from "./partIds";

import type { ToleranceKey } from "./tolerance";
export type { ToleranceKey };
export type ToleranceTable = Record<ToleranceKey, number>;

/**
 * Used where a part gives no figure. "common practice", values from memory:
 * datasheet max/typ ratios of roughly 1.2 for Qg and Rds(on), ±10 % for the
 * plateau, 2:1 hFE groups, ±5 % VBE, ±20 % supply current, ±30 % driver
 * output resistance and Rg(int), ±20 % for Rθ of a real board and assembly.
 */
export const COMMON_PRACTICE_TOLERANCE: ToleranceTable = {
  qg: 0.2, rdsOn: 0.2, vpl: 0.1, hfe: 0.5, vbe: 0.05, iq: 0.2, resistance: 0.3, rth: 0.2,
};

/** Truncation of the normal, in σ; the tolerance band is ±TRUNCATION_SIGMA·σ. */
export const TRUNCATION_SIGMA = 3;
/** A factor never drops below this (a ±100 % tolerance would otherwise reach 0). */
const MIN_FACTOR = 0.01;

export interface MonteCarloOptions {
  samples: number;
  seed: number;
  /**
   * Corner id, "all", or "worst" (default): the corners that are the nominal
   * worst corner of at least one junction part.
   */
  corner?: string;
  defaults?: "common-practice" | "none";
}

export interface Percentiles {
  p5: number | null;
  p50: number | null;
  p95: number | null;
  p99: number | null;
  max: number | null;
}

export interface PartSpread {
  id: string;
  label: string;
  kind: PartKind;
  /** Tj of the unperturbed design at the same corners, °C (null = runaway). */
  nominalTj: number | null;
  limit: number;
  tjMax: number;
  /** Tj percentiles, °C; null where the percentile falls among runaway samples. */
  tj: Percentiles;
  /** Fraction of samples above the derated limit / above Tj(max) (runaway counts as above). */
  pOverLimit: number;
  pOverTjMax: number;
  /** Wilson 95 % interval of pOverLimit. */
  pOverLimitCi95: [number, number];
  runaway: number;
}

export interface MonteCarloResult {
  samples: number;
  seed: number;
  cornerIds: string[];
  distribution: string;
  parts: PartSpread[];
  /** Every varied parameter with the tolerance used and where it came from. */
  parameters: { part: string; parameter: ToleranceKey; tolerance: number; source: "design" | "common practice" | "none" }[];
}

interface Slot {
  part: string;
  parameter: ToleranceKey;
  tolerance: number;
  source: "design" | "common practice" | "none";
  apply: (f: number) => void;
}

type Tol = Partial<Record<ToleranceKey, number>> | undefined;

/** The perturbation slots of a design, in a fixed order; each writes nominal × factor into `work`. */
function buildSlots(nominal: Design, work: Design, defaults: "common-practice" | "none"): Slot[] {
  const slots: Slot[] = [];
  const add = (part: string, tol: Tol, parameter: ToleranceKey, apply: (f: number) => void) => {
    const given = tol?.[parameter];
    const tolerance = given ?? (defaults === "none" ? 0 : COMMON_PRACTICE_TOLERANCE[parameter]);
    slots.push({ part, parameter, tolerance, source: given !== undefined ? "design" : defaults === "none" ? "none" : "common practice", apply });
  };
  const nc = nominal.controller, wc = work.controller;
  add("controller", nc.tolerance, "iq", (f) => (wc.iq = nc.iq * f));
  add("controller", nc.tolerance, "resistance", (f) => {
    wc.pin.sourceResistance = nc.pin.sourceResistance * f;
    wc.pin.sinkResistance = nc.pin.sinkResistance * f;
  });
  add("controller", nc.tolerance, "rth", (f) => (wc.rthJA = nc.rthJA * f));
  nominal.positions.forEach((np, i) => {
    const wp = work.positions[i];
    const nm = np.mosfet, wm = wp.mosfet, id = np.id, t = nm.tolerance;
    add(id, t, "qg", (f) => {
      wm.qgs = nm.qgs * f;
      wm.qgd = nm.qgd * f;
      wm.qg = nm.qg * f;
      if (nm.ciss !== undefined) wm.ciss = nm.ciss * f;
    });
    add(id, t, "rdsOn", (f) => {
      wm.rds25 = nm.rds25 * f;
      if (nm.rdsHot !== undefined) wm.rdsHot = nm.rdsHot * f;
    });
    // Vth moves with the plateau (both set by the same threshold implant); kept inside (0, Vpl).
    add(id, t, "vpl", (f) => {
      wm.vpl = Math.min(nm.vpl * f, 0.99 * nm.qgVgs);
      wm.vth = Math.min(Math.max(nm.vth + (wm.vpl - nm.vpl), 0.05), 0.99 * wm.vpl);
    });
    add(id, t, "resistance", (f) => (wm.rgInt = nm.rgInt * f));
    add(id, t, "rth", (f) => {
      for (const k of ["rthJA", "rthJC", "rthCS", "rthSA"] as const) if (nm[k] !== undefined) wm[k] = (nm[k] as number) * f;
    });
    const nd = np.drive, wd = wp.drive;
    if (nd.kind === "bjt-follower" && wd.kind === "bjt-follower") {
      for (const which of ["npn", "pnp"] as const) {
        const nb = nd[which], wb = wd[which], pid = `${id}.${which}`;
        add(pid, nb.tolerance, "hfe", (f) => nb.hfe.forEach((pt, k) => (wb.hfe[k].hfe = Math.max(pt.hfe * f, 1))));
        add(pid, nb.tolerance, "vbe", (f) => (wb.vbe = nb.vbe * f));
        add(pid, nb.tolerance, "rth", (f) => (wb.rthJA = nb.rthJA * f));
      }
    }
    const nDrv = nd.kind === "driver-ic" ? nd : nd.kind === "transformer" ? nd.driver : undefined;
    const wDrv = wd.kind === "driver-ic" ? wd : wd.kind === "transformer" ? wd.driver : undefined;
    if (nDrv && wDrv) {
      const pid = `${id}.driver`;
      add(pid, nDrv.tolerance, "iq", (f) => (wDrv.iq = nDrv.iq * f));
      add(pid, nDrv.tolerance, "resistance", (f) => {
        wDrv.sourceResistance = nDrv.sourceResistance * f;
        wDrv.sinkResistance = nDrv.sinkResistance * f;
      });
      add(pid, nDrv.tolerance, "rth", (f) => (wDrv.rthJA = nDrv.rthJA * f));
    }
    if (nd.kind === "self-driven" && wd.kind === "self-driven" && nd.clamp && wd.clamp) {
      const nClamp = nd.clamp, wClamp = wd.clamp, pid = `${id}.clamp`;
      add(pid, undefined, "vbe", (f) => (wClamp.vbe = nClamp.vbe * f));
      add(pid, undefined, "rth", (f) => (wClamp.rthJA = nClamp.rthJA * f));
    }
  });
  return slots;
}

/**
 * Bring a Prepared object in line with its (mutated) design without
 * rebuilding it: the gate-charge curve copies, the drive-stage memo and the
 * own-path entries of the thermal matrix are the only prepared values the
 * toleranced fields reach (checked against a fresh evaluation in
 * tests/unit/spread.test.ts).
 */
function refresh(prep: Prepared): void {
  for (const pp of prep.positions) {
    const m = pp.position.mosfet, c = pp.curve;
    c.qgs = m.qgs;
    c.qgd = m.qgd;
    c.qg = m.qg;
    c.vth = m.vth;
    c.vpl = m.vpl;
    c.ciss = m.ciss;
    pp.qgs2 = qgs2(c);
    pp.memo = null;
  }
  const fresh = buildParts(prep.design);
  for (let gi = 0; gi < prep.groups.length; gi++) {
    const g = prep.groups[gi];
    const n = g.nodes.length;
    for (let k = 0; k < n; k++) g.theta[k * n + k] = fresh[g.nodes[k]].junction!.theta;
  }
  fresh.forEach((def, i) => {
    if (def.junction && prep.parts[i].junction) prep.parts[i].junction!.theta = def.junction.theta;
  });
}

function resolveCorners(design: Design, corner: string | undefined): number[] {
  if (corner === "all") return design.corners.map((_, i) => i);
  if (corner !== undefined && corner !== "worst") {
    const ci = design.corners.findIndex((c) => c.id === corner);
    if (ci < 0) throw new Error(`no corner "${corner}" (known: ${design.corners.map((c) => c.id).join(", ")})`);
    return [ci];
  }
  const ev = evaluateDesign(design);
  const ids = new Set(ev.parts.filter((p) => p.junction).map((p) => p.worstCornerId));
  return design.corners.map((c, i) => (ids.has(c.id) ? i : -1)).filter((i) => i >= 0);
}

/** Hottest Tj over the corners per junction part into `out` (+∞ = runaway). */
function sampleTj(prep: Prepared, corners: number[], junctions: number[], out: Float64Array): void {
  out.fill(Number.NEGATIVE_INFINITY);
  for (const ci of corners) {
    computeCorner(prep, ci);
    for (let k = 0; k < junctions.length; k++) {
      const p = junctions[k];
      const t = prep.runaway[p] ? Number.POSITIVE_INFINITY : prep.tj[p];
      if (t > out[k]) out[k] = t;
    }
  }
}

/** Linear interpolation between order statistics (Hyndman & Fan type 7); sorted ascending. */
function percentile(sorted: Float64Array, q: number): number | null {
  const h = (sorted.length - 1) * q;
  const lo = Math.floor(h), hi = Math.ceil(h);
  const v = sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
  return Number.isFinite(v) ? v : lo === hi && Number.isFinite(sorted[lo]) ? sorted[lo] : null;
}

/** Wilson score interval (Wilson 1927) for k successes in n trials at 95 %. */
export function wilson(k: number, n: number): [number, number] {
  const z = 1.959963984540054;
  const p = k / n, z2n = (z * z) / n;
  const centre = (p + z2n / 2) / (1 + z2n);
  const half = (z * Math.sqrt((p * (1 - p)) / n + z2n / (4 * n))) / (1 + z2n);
  return [k === 0 ? 0 : Math.max(0, centre - half), k === n ? 1 : Math.min(1, centre + half)];
}

function drawInto(slots: Slot[], rng: ReturnType<typeof createRng>): void {
  // Every slot draws every time, so one tolerance changing leaves the others' streams alone.
  for (const slot of slots) slot.apply(Math.max(1 + (slot.tolerance * rng.truncatedNormal(TRUNCATION_SIGMA)) / TRUNCATION_SIGMA, MIN_FACTOR));
}

/** The first `count` perturbed designs of a run (same stream as monteCarlo), for inspection and checks. */
export function monteCarloDesigns(design: Design, opts: Omit<MonteCarloOptions, "samples" | "corner">, count: number): Design[] {
  const work = structuredClone(design);
  const slots = buildSlots(design, work, opts.defaults ?? "common-practice");
  const rng = createRng(opts.seed);
  const out: Design[] = [];
  for (let s = 0; s < count; s++) {
    drawInto(slots, rng);
    out.push(structuredClone(work));
  }
  return out;
}

export function monteCarlo(design: Design, opts: MonteCarloOptions): MonteCarloResult {
  const samples = Math.trunc(opts.samples);
  if (!(samples >= 1 && samples <= 1_000_000)) throw new Error("samples must be 1 … 1 000 000");
  const corners = resolveCorners(design, opts.corner);
  const work = structuredClone(design);
  const slots = buildSlots(design, work, opts.defaults ?? "common-practice");
  const prep = prepare(work);
  const junctions = prep.parts.map((p, i) => (p.junction ? i : -1)).filter((i) => i >= 0);
  const nj = junctions.length;
  const row = new Float64Array(nj);
  sampleTj(prep, corners, junctions, row);
  const nominal = Float64Array.from(row);
  const tj = new Float64Array(nj * samples); // part-major: tj[k·samples + s]
  const rng = createRng(opts.seed);
  for (let s = 0; s < samples; s++) {
    drawInto(slots, rng);
    refresh(prep);
    sampleTj(prep, corners, junctions, row);
    for (let k = 0; k < nj; k++) tj[k * samples + s] = row[k];
  }
  const parts: PartSpread[] = junctions.map((p, k) => {
    const def = prep.parts[p];
    const j = def.junction!;
    const sorted = tj.slice(k * samples, (k + 1) * samples).sort();
    let overLimit = 0, overMax = 0, runaway = 0;
    for (const t of sorted) {
      if (t > j.limit) overLimit++;
      if (t > j.tjMax) overMax++;
      if (t === Number.POSITIVE_INFINITY) runaway++;
    }
    return {
      id: def.id, label: def.label, kind: def.kind, nominalTj: Number.isFinite(nominal[k]) ? nominal[k] : null,
      limit: j.limit, tjMax: j.tjMax,
      tj: { p5: percentile(sorted, 0.05), p50: percentile(sorted, 0.5), p95: percentile(sorted, 0.95), p99: percentile(sorted, 0.99), max: percentile(sorted, 1) },
      pOverLimit: overLimit / samples, pOverTjMax: overMax / samples, pOverLimitCi95: wilson(overLimit, samples), runaway,
    };
  });
  return {
    samples, seed: opts.seed, cornerIds: corners.map((ci) => design.corners[ci].id),
    distribution: `tolerance = ±${TRUNCATION_SIGMA}σ of a normal around the typical value, truncated at ±${TRUNCATION_SIGMA}σ (common practice)`,
    parts, parameters: slots.map(({ part, parameter, tolerance, source }) => ({ part, parameter, tolerance, source })),
  };
}
