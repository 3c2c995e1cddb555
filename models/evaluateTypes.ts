/**
 * Shapes shared by the fast evaluation path (evaluateCore.ts and its
 * helpers, and the sweep / spread helpers that reuse a Prepared design).
 */
import type { Design, Position } from "./input/schema";
import { LOSS_MECHANISMS, MECH_INDEX } from "./losses";
import type { GateChargeCurve } from "./gateCharge";
import type { StageResult } from "./driveStage";
import type { HardEdge } from "./switching";
import type { NetworkProblem, NetworkScratch } from "./thermal";
import type { Waveform } from "./waveform";
import type { PartDef, ThermalGroup } from "./registry";

export const NM = LOSS_MECHANISMS.length;
export const M = MECH_INDEX;

/** Sweep knobs on top of a corner. qgScale / rOn / rOff apply to `position` only when given. */
export interface CornerOverrides {
  fsw?: number;
  ambient?: number;
  vin?: number;
  qgScale?: number;
  rOn?: number;
  rOff?: number;
  position?: string;
}

export interface IndexedShare {
  part: number;
  fraction: number;
}

export interface StageMemo {
  corner: number;
  vin: number;
  duty: number;
  rOn: number;
  rOff: number | undefined;
  stage: StageResult;
  on: IndexedShare[];
  off: IndexedShare[];
  drops: { part: number; mech: number; volts: number }[];
  fixed: { part: number; mech: number; watts: number }[];
  mag: { k: number; ippMax: number; parts: { part: number; resistance: number }[] } | null;
}

export interface PositionWork {
  stage: StageResult;
  waveform: Waveform;
  deltaQ: number;
  gatePower: number;
  turnOn: HardEdge | null;
  turnOff: HardEdge | null;
  /** I_rms²/count: conduction = this × Rds(Tj). 0 when not in channel mode. */
  condCoef: number;
}

export interface PreparedPosition {
  position: Position;
  index: number;
  part: number;
  curve: GateChargeCurve;
  qgs2: number;
  /** Waveform at each corner's own Vin. */
  cornerWaveforms: Waveform[];
  memo: StageMemo | null;
  /** Result of the last computation (mutated in place). */
  work: PositionWork;
}

export interface Prepared {
  design: Design;
  parts: PartDef[];
  partIndex: Map<string, number>;
  groups: ThermalGroup[];
  solvers: GroupSolver[];
  positions: PreparedPosition[];
  /** Per part × mechanism, W, for the last computed corner. */
  loss: Float64Array;
  /** Junction temperature per part (meaningful only where junction && !runaway). */
  tj: Float64Array;
  runaway: Uint8Array;
  /** MOSFET node data for the thermal loop. */
  condCoef: Float64Array;
  work: PositionWork[];
  last: { corner: number; fsw: number; ambient: number; vin: number };
  /** False after partRise, which computes only the chosen part's thermal group. */
  complete: boolean;
  /** Thermal group (index into solvers) of each part, −1 for loss buckets. */
  groupOfPart: Int32Array;
  /** Positions whose losses reach each group. */
  groupPositions: number[][];
}


export interface GroupSolver {
  group: ThermalGroup;
  base: Float64Array;
  coef: Float64Array;
  out: Float64Array;
  models: (Position["mosfet"] | null)[];
  problem: NetworkProblem;
  scratch: NetworkScratch;
}

