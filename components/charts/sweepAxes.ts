/**
 * Sweep axes and the spec the thermal map sends to its worker: plain data
 * and small helpers only, so the dashboard can import them without pulling
 * the model (and its unit parser) into the page's first bundle.
 */
import type { Design } from "@/models/input/schema";
import type { SweepSpec as ModelSweepSpec } from "@/models/sweep";

export const SWEEP_AXES = ["fsw", "qgScale", "vin", "ambient", "rGate"] as const;
export type SweepAxisKey = (typeof SWEEP_AXES)[number];

export const AXIS_INFO: Record<SweepAxisKey, { title: string; unit: string }> = {
  fsw: { title: "Switching frequency (Hz)", unit: "Hz" },
  qgScale: { title: "Gate charge, × datasheet Qg", unit: "×" },
  vin: { title: "Input voltage (V)", unit: "V" },
  ambient: { title: "Ambient (°C)", unit: "°C" },
  rGate: { title: "Gate resistor rTurnOn (Ω)", unit: "Ω" },
};

export interface SweepAxis {
  key: SweepAxisKey;
  from: number;
  to: number;
  steps: number;
}

export interface SweepSpec {
  partId: string;
  cornerId: string;
  /** Position whose gate resistor / gate charge the rGate and qgScale axes change. */
  positionId: string;
  x: SweepAxis;
  y: SweepAxis;
}

/**
 * The model's sweep spec for the map. qgScale on the controller scales every
 * gate it drives; on a part of one position, that position's gate only.
 * rGate always names the position (the controller's map uses the first).
 */
export function toModelSpec(design: Design, spec: SweepSpec): ModelSweepSpec {
  const forController = spec.partId === "controller";
  const axis = (a: SweepAxis) => ({
    axis: a.key,
    from: a.from,
    to: a.to,
    steps: a.steps,
    position: a.key === "rGate" || (a.key === "qgScale" && !forController) ? spec.positionId : undefined,
  });
  return { part: spec.partId, metric: "rise", corner: spec.cornerId, x: axis(spec.x), y: axis(spec.y) };
}
