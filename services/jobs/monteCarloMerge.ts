import "server-only";
import { wilson, type MonteCarloResult, type Percentiles } from "@/models/spread";

// A long Monte Carlo run as independent batches (each a seeded monteCarlo()
// call), merged. Exact after merging: sample counts, the fractions over the
// limit and over Tj(max), their Wilson intervals, runaway counts, the
// maximum. Percentiles cannot be merged exactly from batch summaries: p5…p99
// are the sample-weighted means of the batch percentiles (an approximation,
// close for batches of thousands), and the result says so.

/** Batch b's seed: the user's seed spread by a fixed odd constant (golden ratio, 32 bits), so batches differ. */
export function batchSeed(seed: number, batch: number): number {
  return (seed + Math.imul(batch, 0x9e3779b9)) >>> 0;
}

export interface MergedMonteCarlo extends MonteCarloResult {
  batches: { seed: number; samples: number }[];
  percentileMethod: string;
}

export function mergeMonteCarlo(seed: number, batches: MonteCarloResult[]): MergedMonteCarlo {
  const n = batches.reduce((s, b) => s + b.samples, 0);
  const first = batches[0];
  const parts = first.parts.map((p0, k) => {
    const each = batches.map((b) => b.parts[k]);
    const overLimit = each.reduce((s, p, i) => s + Math.round(p.pOverLimit * batches[i].samples), 0);
    const overMax = each.reduce((s, p, i) => s + Math.round(p.pOverTjMax * batches[i].samples), 0);
    const mean = (key: keyof Percentiles): number | null => {
      if (each.some((p) => p.tj[key] === null)) return null;
      return each.reduce((s, p, i) => s + (p.tj[key] as number) * batches[i].samples, 0) / n;
    };
    const maxes = each.map((p) => p.tj.max);
    return {
      ...p0,
      tj: { p5: mean("p5"), p50: mean("p50"), p95: mean("p95"), p99: mean("p99"), max: maxes.some((m) => m === null) ? null : Math.max(...(maxes as number[])) },
      pOverLimit: overLimit / n, pOverTjMax: overMax / n, pOverLimitCi95: wilson(overLimit, n),
      runaway: each.reduce((s, p) => s + p.runaway, 0),
    };
  });
  return {
    ...first, samples: n, seed, parts,
    batches: batches.map((b) => ({ seed: b.seed, samples: b.samples })),
    percentileMethod: "sample-weighted mean of per-batch percentiles (approximate); counts, fractions, intervals and max are exact",
  };
}
