/**
 * Sweep axes (models/sweep.ts): the grid values of an axis, its checks
 * against the design, its value at the design point, and the knobs
 * (fsw, gate-charge scale, ambient, Vin, gate resistance) it turns.
 */
import type { Design } from "./input/schema";
import type { Prepared } from "./evaluateCore";
import type { StageKnobs } from "./sweepPlan";
import { SweepSpecError, type SweepAxis } from "./sweepTypes";

export function axisValues(a: SweepAxis): number[] {
  const n = Math.trunc(a.steps);
  if (!(n >= 2 && n <= 2000)) throw new SweepSpecError(`axis ${a.axis}: steps must be 2…2000`);
  if (!Number.isFinite(a.from) || !Number.isFinite(a.to)) throw new SweepSpecError(`axis ${a.axis}: from/to must be finite`);
  const log = a.scale === "log";
  if (log && !(a.from > 0 && a.to > 0)) throw new SweepSpecError(`axis ${a.axis}: a log axis needs positive ends`);
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const t = i / (n - 1);
    out.push(log ? a.from * Math.pow(a.to / a.from, t) : a.from + t * (a.to - a.from));
  }
  return out;
}

/** Axis → the knob it turns; resolved once so the cell loop only reads numbers. */
export interface Knobs {
  fsw: number;
  k: number;
  ambient: number;
  vin: number;
  r: number;
}

export function nominal(axis: SweepAxis, design: Design, ci: number): number {
  const c = design.corners[ci];
  switch (axis.axis) {
    case "fsw": return c.fsw;
    case "ambient": return c.ambient;
    case "vin": return c.vin;
    case "qgScale": return 1;
    case "rGate": {
      const g = design.positions.find((p) => p.id === axis.position)!.gate;
      return axis.edge === "off" ? (g.rTurnOff ?? g.rTurnOn) : g.rTurnOn;
    }
  }
}

export function checkAxis(a: SweepAxis, design: Design, prep: Prepared): void {
  const ids = design.positions.map((p) => p.id);
  if (a.position !== undefined && !ids.includes(a.position))
    throw new SweepSpecError(`axis ${a.axis}: no position "${a.position}" (known: ${ids.join(", ")})`);
  if (a.axis === "rGate") {
    if (a.position === undefined) throw new SweepSpecError("axis rGate: name the position whose gate resistance is swept");
    if (a.edge === "off" && !prep.partIndex.has(`${a.position}.rgOff`))
      throw new SweepSpecError(`axis rGate: position ${a.position} has one gate resistor; sweep edge "both" or "on"`);
  } else if (a.position !== undefined && a.axis !== "qgScale") throw new SweepSpecError(`axis ${a.axis} takes no position`);
  const vals = [a.from, a.to];
  const positive = a.axis === "fsw" || a.axis === "vin";
  if (positive && !vals.every((v) => v > 0)) throw new SweepSpecError(`axis ${a.axis}: values must be > 0`);
  if ((a.axis === "qgScale" || a.axis === "rGate") && !vals.every((v) => v >= 0))
    throw new SweepSpecError(`axis ${a.axis}: values must be ≥ 0`);
}

export const stageAxis = (a: SweepAxis) => a.axis === "vin" || a.axis === "rGate";

export function setKnob(kn: Knobs, a: SweepAxis, v: number): void {
  if (a.axis === "fsw") kn.fsw = v;
  else if (a.axis === "qgScale") kn.k = v;
  else if (a.axis === "ambient") kn.ambient = v;
  else if (a.axis === "vin") kn.vin = v;
  else kn.r = v;
}

export function stageKnobs(design: Design, rAxis: SweepAxis | null, vin: number, r: number): StageKnobs {
  if (!rAxis) return { vin, rGate: null };
  const g = design.positions.find((p) => p.id === rAxis.position)!.gate;
  const edge = rAxis.edge ?? "both";
  const rOn = edge === "off" ? g.rTurnOn : r;
  const rOff = edge === "off" ? r : edge === "on" ? g.rTurnOff : g.rTurnOff === undefined ? undefined : g.rTurnOn > 0 ? (g.rTurnOff * r) / g.rTurnOn : g.rTurnOff;
  return { vin, rGate: { position: rAxis.position!, rOn, rOff } };
}
