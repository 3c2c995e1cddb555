/**
 * Continuous or discontinuous conduction, and the duty in each, for the
 * three basic converter families. Source: Erickson & Maksimović,
 * Fundamentals of Power Electronics, 3rd ed. (2020), ch. 5 (the
 * discontinuous conduction mode), Table 5.2 and the derivations beside it:
 *
 *   K = 2L / (R·Ts), R = V/I the load resistance seen by the stage.
 *   CCM when K > Kcrit(D), D the CCM duty at the required conversion ratio M:
 *     buck        Kcrit = 1 − D        DCM: M = 2 / (1 + √(1 + 4K/D²)),  D2 = K·M/D
 *     boost       Kcrit = D(1 − D)²    DCM: M = (1 + √(1 + 4D²/K)) / 2, D2 = K·M/D
 *     buck-boost  Kcrit = (1 − D)²     DCM: M = D/√K (magnitude),        D2 = √K
 * The DCM relations are solved here for D at the required M:
 *     buck D = M·√(K/(1 − M)), boost D = √(K·M·(M − 1)), buck-boost D = M·√K.
 * D2 is the fraction of Ts in which the rectifier carries the decaying
 * inductor current; D + D2 < 1 in DCM, = 1 at the boundary.
 *
 * Boundary ("critical conduction") operation: the controller starts the
 * next period when the inductor current reaches zero, so the switching
 * period follows from K = Kcrit: Ts = 2L/(R·Kcrit).
 */
import type { ConductionMode } from "./types";

export type Family = "buck" | "boost" | "buck-boost";

/** Relative tolerance within which K = Kcrit counts as the boundary. */
const BOUNDARY_TOL = 1e-9;

export function ccmDuty(f: Family, m: number): number {
  if (f === "buck") return m;
  if (f === "boost") return 1 - 1 / m;
  return m / (1 + m);
}

export function kCritical(f: Family, d: number): number {
  if (f === "buck") return 1 - d;
  if (f === "boost") return d * (1 - d) ** 2;
  return (1 - d) ** 2;
}

function dcmDuty(f: Family, m: number, k: number): number {
  if (f === "buck") return m * Math.sqrt(k / (1 - m));
  if (f === "boost") return Math.sqrt(k * m * (m - 1));
  return m * Math.sqrt(k);
}

function dcmD2(f: Family, m: number, d: number, k: number): number {
  return f === "buck-boost" ? Math.sqrt(k) : (k * m) / d;
}

export interface StageInput {
  family: Family;
  /** Conversion ratio the stage must give (output over its effective source voltage). */
  m: number;
  /** Load resistance seen by the stage, Ω. */
  r: number;
  /** Its inductance, H. */
  l: number;
  /** Its switching period, s (ignored in boundary mode). */
  period: number;
  mode: ConductionMode | "auto";
}

export interface StageSolution {
  mode: ConductionMode;
  d: number;
  d2: number;
  k: number;
  kCrit: number;
  period: number;
}

/** The mode asked for cannot hold: the inductance at the boundary and which side it must be on. */
export interface StageConflict {
  conflict: "needs-more-inductance" | "needs-less-inductance";
  lCrit: number;
  k: number;
  kCrit: number;
}

export function solveStage(s: StageInput): StageSolution | StageConflict {
  const dc = ccmDuty(s.family, s.m);
  const kCrit = kCritical(s.family, dc);
  if (s.mode === "boundary") {
    const period = (2 * s.l) / (s.r * kCrit);
    return { mode: "boundary", d: dc, d2: 1 - dc, k: kCrit, kCrit, period };
  }
  const k = (2 * s.l) / (s.r * s.period);
  const lCrit = (kCrit * s.r * s.period) / 2;
  const rel = k / kCrit - 1;
  const found: ConductionMode = Math.abs(rel) <= BOUNDARY_TOL ? "boundary" : rel > 0 ? "continuous" : "discontinuous";
  if (s.mode === "continuous" && found === "discontinuous") return { conflict: "needs-more-inductance", lCrit, k, kCrit };
  if (s.mode === "discontinuous" && found === "continuous") return { conflict: "needs-less-inductance", lCrit, k, kCrit };
  if (found === "discontinuous") {
    const d = dcmDuty(s.family, s.m, k);
    return { mode: found, d, d2: dcmD2(s.family, s.m, d, k), k, kCrit, period: s.period };
  }
  return { mode: found, d: dc, d2: 1 - dc, k, kCrit, period: s.period };
}

export function isConflict(x: StageSolution | StageConflict): x is StageConflict {
  return "conflict" in x;
}
