/**
 * Thermal network and electro-thermal fixed point (DOMAIN item 11).
 *
 * Steady state of a linear thermal network: T_i = Ta + Σ_j Θ_ij·P_j, with
 * Θ_ii the part's own path to ambient (RθJA, or RθJC + RθCS + RθSA, as
 * defined in JEDEC JESD51-2/-12 for a stated board) and Θ_ij (i ≠ j) the
 * mutual heating through the board. Using a datasheet RθJA this way is an
 * approximation: JESD51 θJA belongs to the test board, not to this one.
 *
 * Losses depend on temperature (Rds(on) rises with Tj), so T = Ta + Θ·P(T)
 * is solved by Newton's method on F(T) = T − Ta − Θ·P(T), Jacobian
 * J = I − Θ·diag(dP/dT). Θ ≥ 0 and dP/dT ≥ 0 make J a Z-matrix; a fixed
 * point that the loop can settle at exists exactly when the loop gain
 * ρ(Θ·diag(dP/dT)) < 1, i.e. when J is a nonsingular M-matrix, which is when
 * Gaussian elimination without pivoting meets only positive pivots
 * (Berman & Plemmons, Nonnegative Matrices in the Mathematical Sciences,
 * M-matrix characterisations; from memory). A non-positive pivot, no
 * convergence or a non-finite step is reported as thermal runaway, never
 * as a temperature. With a linear Rds(T) the losses are linear in T and
 * Newton lands on the fixed point in one step.
 *
 * Closed form for one part with P(T) = P0 + k·(T − T0):
 *   T = Ta + Θ·(P0 + k·(T − T0))  ⇒  T·(1 − Θk) = Ta + Θ·(P0 − k·T0)
 *   ⇒  T = (Ta + Θ·(P0 − k·T0)) / (1 − Θ·k),  valid only for Θ·k < 1.
 * For a MOSFET, k = I_rms²·dRds/dT / n and P0 the loss at T0.
 */

export type FixedPoint = { runaway: true } | { runaway: false; tj: number };

export function singlePartFixedPoint({ ambient, theta, p0, k, t0 }: {
  ambient: number; theta: number; p0: number; k: number; t0: number;
}): FixedPoint {
  const gain = theta * k;
  if (!(gain < 1)) return { runaway: true };
  const tj = (ambient + theta * (p0 - k * t0)) / (1 - gain);
  return Number.isFinite(tj) ? { runaway: false, tj } : { runaway: true };
}

export interface NetworkProblem {
  /** Number of nodes. */
  n: number;
  ambient: number;
  /** Row-major n×n: T_i = Ta + Σ_j theta[i·n + j]·P_j. */
  theta: Float64Array | number[];
  /** Loss of node i at its temperature, W. */
  lossAt: (i: number, t: number) => number;
  /** dP_i/dT_i, W/K. */
  slopeAt: (i: number, t: number) => number;
}

const MAX_ITER = 60;

/**
 * Solve the network; temperatures are written to `out` (length n).
 * Returns false for runaway (then `out` is meaningless and must not be shown).
 * `scratch` lets a hot loop reuse its work arrays.
 */
export interface NetworkScratch {
  P: Float64Array;
  G: Float64Array;
  F: Float64Array;
  J: Float64Array;
}

export function networkScratch(n: number): NetworkScratch {
  return { P: new Float64Array(n), G: new Float64Array(n), F: new Float64Array(n), J: new Float64Array(n * n) };
}

export function solveNetwork(p: NetworkProblem, out: Float64Array, scratch: NetworkScratch = networkScratch(p.n)): boolean {
  const { n, ambient, theta } = p;
  const { P, G, F, J } = scratch;
  for (let i = 0; i < n; i++) out[i] = ambient;
  let residual = residualAt(p, out, P, F);
  for (let iter = 0; iter < MAX_ITER; iter++) {
    if (!Number.isFinite(residual)) return false;
    for (let i = 0; i < n; i++) G[i] = p.slopeAt(i, out[i]);
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) J[i * n + j] = (i === j ? 1 : 0) - theta[i * n + j] * G[j];
    // Loop-gain check at every Newton point: a non-positive pivot means ρ ≥ 1.
    if (!eliminate(J, F, n)) return false;
    for (let i = 0; i < n; i++) {
      out[i] -= F[i];
      if (!Number.isFinite(out[i])) return false;
    }
    residual = residualAt(p, out, P, F);
    if (residual < 1e-12) return true;
  }
  return false;
}

/** F = T − Ta − Θ·P(T); returns max |F_i| / (1 + |T_i|). */
function residualAt(p: NetworkProblem, t: Float64Array, P: Float64Array, F: Float64Array): number {
  const { n, theta, ambient } = p;
  for (let i = 0; i < n; i++) P[i] = p.lossAt(i, t[i]);
  let worst = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += theta[i * n + j] * P[j];
    F[i] = t[i] - ambient - s;
    worst = Math.max(worst, Math.abs(F[i]) / (1 + Math.abs(t[i])));
  }
  return worst;
}

/** In-place Gaussian elimination without pivoting; F becomes J⁻¹F. False on a non-positive pivot. */
function eliminate(J: Float64Array, F: Float64Array, n: number): boolean {
  for (let k = 0; k < n; k++) {
    const piv = J[k * n + k];
    if (!(piv > 1e-12)) return false;
    for (let i = k + 1; i < n; i++) {
      const f = J[i * n + k] / piv;
      if (f === 0) continue;
      for (let j = k; j < n; j++) J[i * n + j] -= f * J[k * n + j];
      F[i] -= f * F[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = F[i];
    for (let j = i + 1; j < n; j++) s -= J[i * n + j] * F[j];
    F[i] = s / J[i * n + i];
  }
  return true;
}
