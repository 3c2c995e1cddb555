/**
 * Turn the arrays of a computed corner into the report objects: losses by
 * mechanism per part, junction temperatures with margins, per-position gate
 * levels, currents and edge times. Every number is finite; what cannot be a
 * number (Tj of a runaway part) is absent, flagged by `runaway: true`.
 */
import { LOSS_MECHANISMS, type Losses } from "./losses";
import type { PartKind } from "./partIds";
import { NM, type Prepared } from "./evaluateCore";
import { rdsAt } from "./conduction";
import { outputCapacitanceBasis, type OutputCapacitanceBasis } from "./switching";

export type JunctionState =
  | { runaway: false; tj: number; tjMax: number; limit: number; margin: number }
  | { runaway: true; tjMax: number; limit: number };

export interface PartResult {
  id: string;
  label: string;
  kind: PartKind;
  positionId: string | null;
  losses: Losses;
  total: number;
  /** null for loss buckets (resistors, windings). */
  junction: JunctionState | null;
}

export interface EdgeResult {
  /** Current rise/fall time and voltage fall/rise time, s. */
  ti: number;
  tv: number;
  energy: number;
}

export interface PositionResult {
  positionId: string;
  /** Gate levels reached, V. */
  vHigh: number;
  vLow: number;
  /** Swing charge of all parallel devices, C. */
  deltaQ: number;
  /** ΔQ·ΔV·fsw of the gate swing (buffer drops are extra, under `buffer`/`clamp`). */
  gatePower: number;
  iOnPeak: number;
  iOffPeak: number;
  iOnPlateau: number;
  iOffPlateau: number;
  starved: boolean;
  turnOn: EdgeResult | null;
  turnOff: EdgeResult | null;
  /** Rds(on) at the solved Tj, Ω; null on runaway or when the channel is not used. */
  rdsOn: number | null;
  /** Waveform values used at this corner. */
  waveform: { vdsOn: number; idOn: number; vdsOff: number; idOff: number; iRms: number; iAvg: number; duty: number };
  /** Which output-capacitance figure the Eoss estimate used and why; null when the MOSFET gives none. */
  outputCapacitance: OutputCapacitanceBasis | null;
}

export interface CornerResult {
  cornerId: string;
  label: string;
  vin: number;
  ambient: number;
  fsw: number;
  loadFraction: number;
  parts: PartResult[];
  positions: PositionResult[];
  totalLoss: number;
  outputPower: number | null;
  /** Pout / (Pout + modelled losses); null without outputPower. Only the modelled parts count. */
  efficiency: number | null;
  runaway: boolean;
}

function edge(e: { ti: number; tv: number; energy: number } | null): EdgeResult | null {
  return e ? { ti: e.ti, tv: e.tv, energy: e.energy } : null;
}

/** Build the report for the corner last computed by computeCorner. */
export function buildCornerResult(prep: Prepared): CornerResult {
  if (!prep.complete) throw new Error("computeCorner must run before buildCornerResult (partRise computes only one group)");
  const { design, parts } = prep;
  const ci = prep.last.corner;
  const corner = design.corners[ci];
  const partResults: PartResult[] = parts.map((def, i) => {
    const losses = {} as Losses;
    let total = 0;
    LOSS_MECHANISMS.forEach((m, k) => {
      losses[m] = prep.loss[i * NM + k];
      total += losses[m];
    });
    let junction: JunctionState | null = null;
    if (def.junction) {
      const { tjMax, limit } = def.junction;
      junction = prep.runaway[i]
        ? { runaway: true, tjMax, limit }
        : { runaway: false, tj: prep.tj[i], tjMax, limit, margin: limit - prep.tj[i] };
    }
    const positionId = def.positionIndex === null ? null : design.positions[def.positionIndex].id;
    return { id: def.id, label: def.label, kind: def.kind, positionId, losses, total, junction };
  });
  const positions: PositionResult[] = prep.positions.map((pp, i) => {
    const w = prep.work[i];
    const st = w.stage;
    const channel = w.condCoef > 0 || (pp.position.conduction.mode === "channel" && pp.position.drive.kind !== "none");
    return {
      positionId: pp.position.id,
      vHigh: st.vHigh,
      vLow: st.vLow,
      deltaQ: w.deltaQ,
      gatePower: w.gatePower,
      iOnPeak: st.on.iPeak,
      iOffPeak: st.off.iPeak,
      iOnPlateau: st.on.iPlateau,
      iOffPlateau: st.off.iPlateau,
      starved: st.on.starved || st.off.starved,
      turnOn: edge(w.turnOn),
      turnOff: edge(w.turnOff),
      rdsOn: channel && !prep.runaway[pp.part] ? rdsAt(pp.position.mosfet, prep.tj[pp.part]) : null,
      waveform: { ...w.waveform },
      outputCapacitance: outputCapacitanceBasis(pp.position.mosfet.outputCapacitance),
    };
  });
  const totalLoss = partResults.reduce((s, p) => s + p.total, 0);
  const outputPower = corner.outputPower ?? null;
  const efficiency = outputPower !== null && outputPower > 0 ? outputPower / (outputPower + totalLoss) : null;
  return {
    cornerId: corner.id,
    label: corner.label ?? corner.id,
    vin: prep.last.vin,
    ambient: prep.last.ambient,
    fsw: prep.last.fsw,
    loadFraction: corner.loadFraction,
    parts: partResults,
    positions,
    totalLoss,
    outputPower,
    efficiency,
    runaway: partResults.some((p) => p.junction?.runaway === true),
  };
}
