/**
 * Public types of the two-axis sweep (models/sweep.ts): the axis and spec a
 * caller passes, the result it gets back, the contour vertex, and the error
 * thrown for an invalid spec.
 */
import type { LossMechanism } from "./losses";

export type SweepAxisKind = "fsw" | "qgScale" | "vin" | "ambient" | "rGate";

export interface SweepAxis {
  axis: SweepAxisKind;
  from: number;
  to: number;
  /** Number of grid values including both ends, ≥ 2. */
  steps: number;
  scale?: "linear" | "log";
  /** qgScale: the position whose MOSFET curve is scaled (omitted = every position). rGate: required. */
  position?: string;
  /**
   * rGate only. "both" (default): the axis value is rTurnOn and rTurnOff keeps its
   * ratio to rTurnOn (or follows it when the design has one resistor);
   * "on" / "off": only that resistor, the axis value is its resistance.
   */
  edge?: "both" | "on" | "off";
}

export type SweepMetric = "rise" | "tj" | "loss";

export interface SweepSpec {
  /** Part id ("controller", "Q1", "Q1.npn" …); "all" with metric "loss" = total modelled loss. */
  part: string;
  /** rise: Tj − Ta (K, default); tj: °C; loss: W of `mechanism` or of the whole part. */
  metric?: SweepMetric;
  mechanism?: LossMechanism;
  /** Corner id, or "worst" (default): the part's least-margin corner at the design point. */
  corner?: string;
  x: SweepAxis;
  y: SweepAxis;
  /** Limit in metric units; default the derated Tj limit (tj) or limit − ambient (rise), none for loss. */
  limit?: number;
  /** Compute rows [from, to) only (chunking in a Web Worker); merge with mergeSweepChunks. */
  rows?: { from: number; to: number };
  onProgress?: (fraction: number) => void;
  /** Checked before every row; true stops the sweep and returns the rows done so far. */
  shouldStop?: () => boolean;
}

export interface SweepResult {
  part: string;
  metric: SweepMetric;
  mechanism: LossMechanism | null;
  unit: "K" | "°C" | "W";
  cornerId: string;
  x: SweepAxis & { values: number[] };
  y: SweepAxis & { values: number[] };
  /** z[row][column] for the rows in rowRange; null = thermal runaway (never NaN). */
  z: (number | null)[][];
  rowRange: { from: number; to: number };
  /** False when shouldStop ended the sweep early. */
  complete: boolean;
  /** Constant limit in metric units; null when there is none or it varies along an axis. */
  limit: number | null;
  /** When the ΔT limit varies with an ambient axis: the limit per value of that axis. */
  limitAlong: { axis: "x" | "y"; values: number[] } | null;
  /** Limit contour polylines in axis units; empty unless the grid is complete. */
  contour: ContourPoint[][];
  designPoint: { x: number; y: number; z: number | null; inRange: boolean };
  runawayCells: number;
}

export class SweepSpecError extends Error {}

/** A contour vertex in axis units, with its fractional grid index (one of i, j is whole). */
export interface ContourPoint {
  x: number;
  y: number;
  i: number;
  j: number;
}
