/**
 * What a topology module hands back: the period's spans plus the
 * converter-level figures it alone knows. Shared helpers for the refusals
 * every topology can give.
 */
import { formatQuantity } from "../quantityFormat";
import { isConflict, solveStage, type StageInput, type StageSolution } from "./dcm";
import type { Timeline } from "./spans";
import type { ConductionMode, ConverterSpec, InductorFigures, OperatingPoint, Refusal } from "./types";

/** The converter-level figures that follow from the solved stage. */
export type StageFields = Pick<OperatingPoint, "mode" | "fsw" | "duty" | "dutyFreewheel" | "k" | "kCrit" | "notes">;

export interface Built extends StageFields {
  timeline: Timeline;
  inductors: InductorFigures[];
  /** Devices whose average currents make up the input current (sign −1: returned to the input). */
  input: { id: string; sign: 1 | -1 }[];
}

/**
 * A solved stage's converter-level figures. A bridge's output stage runs
 * `perSwitch` = 2 stage periods per switching period, with twice the duty.
 */
export function stageFields(st: StageSolution, askedFsw: number, perSwitch = 1): StageFields {
  const fsw = 1 / (st.period * perSwitch);
  return {
    mode: st.mode, fsw, duty: st.d / perSwitch, dutyFreewheel: st.d2, k: st.k, kCrit: st.kCrit,
    notes: boundaryNote(st.mode, fsw, askedFsw),
  };
}

/** Valley and peak of an inductor current that rises by `rise`: about its CCM average, else from zero. */
export function rampEnds(mode: ConductionMode, avgCcm: number, rise: number): [number, number] {
  return mode === "continuous" ? [avgCcm - rise / 2, avgCcm + rise / 2] : [0, rise];
}

/** An inductor conducting (valley → peak → valley) for the fraction `conducting` of its period. */
export function inductor(name: InductorFigures["name"], label: string, valley: number, peak: number, conducting: number): InductorFigures {
  return { name, label, avg: ((peak + valley) / 2) * conducting, peak, valley, ripple: peak - valley };
}

export type BuildResult = Built | Refusal;

export function isRefusal(x: object): x is Refusal {
  return "message" in x && "field" in x;
}

/** The spec as a topology sees it: the efficiency folded into an effective input voltage. */
export interface Context {
  spec: ConverterSpec;
  /**
   * Effective input voltage η·Vin. Losses are lumped as a drop in series with
   * the input, carrying the input current (assumption): the converter is then
   * ideal between η·Vin and the output, so every volt-second and charge
   * balance uses η·Vin and Pin = Vin·Iin = Pout/η holds exactly. Device
   * voltages are reported with the full Vin (the drops really sit in the
   * devices, so blocking voltages are not reduced: an upper bound).
   */
  vinE: number;
  period: number;
  sync: boolean;
  deadTimes: [number, number];
}

export function contextOf(spec: ConverterSpec): Context {
  return {
    spec,
    vinE: spec.efficiency * spec.vin,
    period: 1 / spec.fsw,
    sync: spec.rectifier === "synchronous",
    deadTimes: spec.deadTimes ?? [0, 0],
  };
}

/** Solve a stage, turning a mode conflict into a refusal about the named inductance. */
export function stageOrRefusal(
  s: StageInput,
  field: "filterInductance" | "magnetizingInductance",
  what: string,
  scale = 1,
): StageSolution | Refusal {
  const r = solveStage(s);
  if (!isConflict(r)) return r;
  const l = formatQuantity(r.lCrit * scale, "inductance");
  const ks = `K = 2L/(R·Ts) = ${r.k.toPrecision(3)}, K_crit = ${r.kCrit.toPrecision(3)}`;
  const message =
    r.conflict === "needs-more-inductance"
      ? `at this load ${what} falls to zero every period (${ks}): continuous conduction needs at least ${l} or more load; ` +
        `a synchronous rectifier would have to carry reverse current, which is not modelled. Choose "auto" or "discontinuous"`
      : `at this load ${what} does not fall to zero (${ks}): discontinuous conduction needs less than ${l} or less load. Choose "auto" or "continuous"`;
  return { field, message };
}

/** The switching frequency a stage runs at (boundary mode sets it). */
export function boundaryNote(mode: ConductionMode, fsw: number, asked: number): string[] {
  if (mode !== "boundary" || Math.abs(fsw / asked - 1) < 1e-9) return [];
  return [
    `boundary mode: the switch turns on when the inductor current reaches zero, so the frequency follows from the inductance and load: ` +
      `${formatQuantity(fsw, "frequency")} at this corner (the ${formatQuantity(asked, "frequency")} given is not used)`,
  ];
}
