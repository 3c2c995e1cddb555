/**
 * Bench correlation: measured temperatures against the model, and a
 * least-squares correction of each part's own thermal resistance.
 *
 * A measurement of part i at one corner is modelled as (thermal.ts)
 *   T_j = Ta + Rθ·P + c,   c = Σ_{j≠i} Θ_ij·P_j  (heating by coupled parts)
 * with P the part's modelled loss and c both taken from the model at that
 * corner, evaluated at the bench's ambient, and HELD FIXED during the fit.
 * A case (package) reading is compared with T_case = T_j − P·RθJC.
 * Minimising Σ (T_meas − (Ta + Rθ·P + c − [case]·P·RθJC))² over Rθ is a
 * least-squares line through the origin in P:
 *   Rθ_fit = Σ P·(T_meas − Ta − c + [case]·P·RθJC) / Σ P².
 * Assumptions, stated: P does not move with the measured temperature (the
 * Rds(on)(Tj) feedback is ignored inside the fit; re-evaluating the fitted
 * design closes that loop), and the couplings and RθJC are right. For a
 * MOSFET set of n in parallel, Rθ is the network value (per device ÷ n).
 */
export type Surface = "junction" | "case";

/** Default acceptance band between model and bench, K (our choice; thermocouple error alone is ±1–2 K, from memory). */
export const CORRELATION_BAND_K = 5;

export interface FitPoint {
  cornerId: string;
  /** Bench ambient, °C. */
  ambient: number;
  /** The part's modelled loss at this corner, W. */
  power: number;
  /** Heating by coupled parts at this corner, K. */
  coupling: number;
  /** Junction-to-case resistance in the network (per device ÷ count), K/W; 0 for junction readings. */
  rthJC: number;
  surface: Surface;
  /** Measured temperature, °C. */
  measured: number;
}

export interface FitResidual {
  cornerId: string;
  measured: number;
  fitted: number;
  /** measured − fitted, K. */
  residual: number;
}

export interface ThermalFit {
  /** Fitted own-path resistance (network value), K/W. */
  rth: number;
  residuals: FitResidual[];
  rmsResidual: number;
  maxAbsResidual: number;
}

/** Surface temperature the thermal model gives for a part, °C. */
export function surfaceTemperature(p: Omit<FitPoint, "measured" | "cornerId">, rth: number): number {
  const tj = p.ambient + rth * p.power + p.coupling;
  return p.surface === "case" ? tj - p.power * p.rthJC : tj;
}

/** Below this Σ P² (W²) there is no power to fit against: 1 mW on one point. */
const MIN_SUM_P2 = 1e-6;

/** Least-squares Rθ over the points; null when they carry (almost) no power. */
export function fitThermalResistance(points: FitPoint[]): ThermalFit | null {
  let num = 0;
  let den = 0;
  for (const p of points) {
    const caseTerm = p.surface === "case" ? p.power * p.rthJC : 0;
    num += p.power * (p.measured - p.ambient - p.coupling + caseTerm);
    den += p.power * p.power;
  }
  if (!(den > MIN_SUM_P2) || !Number.isFinite(num)) return null;
  const rth = num / den;
  const residuals = points.map((p) => {
    const fitted = surfaceTemperature(p, rth);
    return { cornerId: p.cornerId, measured: p.measured, fitted, residual: p.measured - fitted };
  });
  const sq = residuals.reduce((s, r) => s + r.residual * r.residual, 0);
  return {
    rth,
    residuals,
    rmsResidual: Math.sqrt(sq / residuals.length),
    maxAbsResidual: residuals.reduce((m, r) => Math.max(m, Math.abs(r.residual)), 0),
  };
}
