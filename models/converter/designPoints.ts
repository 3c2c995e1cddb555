/**
 * From the calculator's output at a list of corners to the design
 * document's waveform points (the scheme in models/input/schemaOperating.ts):
 * full-load points in rising Vin for each position, plus, for every other
 * corner, an override with that corner's own values (the document would
 * otherwise scale the full-load currents linearly with load, which a DCM
 * corner does not follow).
 *
 * Field names follow the document's waveform fields after their rename
 * (turnOnVds, turnOnId, turnOffVds, turnOffId; iRms, iAvg, duty unchanged),
 * defined here as plain types so this module needs neither zod nor the schema.
 * The document holds magnitudes (currents ≥ 0): currents are given as
 * absolute values.
 */
import type { OperatingPoint, PositionFigures, Role } from "./types";

export interface DesignWaveformValues {
  turnOnVds: number;
  turnOnId: number;
  turnOffVds: number;
  turnOffId: number;
  iRms: number;
  iAvg: number;
  duty: number;
}

export interface DesignWaveformPoint extends DesignWaveformValues {
  vin: number;
}

export interface DesignPositionWaveforms {
  id: string;
  role: Role;
  label: string;
  conduction: {
    /** "zvs" only when every corner turns the channel on at zero voltage. */
    switching: "hard" | "zvs";
    mode: "channel" | "body-diode";
    /** The longest body-diode conduction before turn-on and after turn-off over the corners, s. */
    deadTimes: [number, number];
    points: DesignWaveformPoint[];
  };
}

export interface DesignCornerWaveforms {
  id: string;
  /** This corner's load over the full load of the points. */
  loadFraction: number;
  /** The switching frequency the corner runs at (computed in boundary mode), Hz. */
  fsw: number;
  outputPower: number;
  /** Per position, the corner's own values when it is not one of the points. */
  waveforms?: Record<string, DesignWaveformValues>;
}

export interface DesignWaveforms {
  positions: DesignPositionWaveforms[];
  corners: DesignCornerWaveforms[];
}

export interface CornerPoint {
  id: string;
  point: OperatingPoint;
}

export type DesignWaveformsResult = { ok: true; waveforms: DesignWaveforms } | { ok: false; message: string };

const REL = 1e-9;
const same = (a: number, b: number) => Math.abs(a - b) <= REL * Math.max(Math.abs(a), Math.abs(b), 1e-30);

/**
 * The document's reading of the edges: an SR whose body diode takes the
 * current after turn-off has Vsd across it at the edge and then recovers
 * against the voltage it blocks next, which is what turnOffVds carries
 * (the evaluator clamps the edge itself to Vsd when t2 > 0).
 */
export function designValues(p: PositionFigures): DesignWaveformValues {
  const diodeCatches = p.role === "synchronous-rectifier" && (p.bodyDiode?.afterOff ?? 0) > 0;
  const body = p.device === "diode";
  return {
    turnOnVds: p.turnOn.vds,
    turnOnId: Math.abs(p.turnOn.id),
    turnOffVds: diodeCatches ? p.blockingAfterConduction : p.turnOff.vds,
    turnOffId: Math.abs(p.turnOff.id),
    iRms: p.iRms,
    // A body-diode position's average is its whole current; a switch's, that of its device.
    iAvg: Math.abs(body ? p.iAvg : p.deviceIAvg),
    duty: p.duty,
  };
}

export function toDesignWaveforms(corners: readonly CornerPoint[]): DesignWaveformsResult {
  if (corners.length === 0) return { ok: false, message: "no corners to map" };
  const ids = corners[0].point.positions.map((p) => p.id).join(",");
  const topology = corners[0].point.topology;
  for (const c of corners)
    if (c.point.topology !== topology || c.point.positions.map((p) => p.id).join(",") !== ids)
      return { ok: false, message: `corner "${c.id}" has another topology or other switch positions than corner "${corners[0].id}"` };
  const fullLoad = Math.max(...corners.map((c) => c.point.iout));
  if (!(fullLoad > 0)) return { ok: false, message: "no corner has a load" };
  const full = corners.filter((c) => same(c.point.iout, fullLoad)).sort((a, b) => a.point.vin - b.point.vin);
  const pointCorners: CornerPoint[] = [];
  for (const c of full) {
    const prev = pointCorners[pointCorners.length - 1];
    if (!prev || !same(prev.point.vin, c.point.vin)) pointCorners.push(c);
    else {
      const differs = c.point.positions.some((p, i) => {
        const a = designValues(p);
        const b = designValues(prev.point.positions[i]);
        return (Object.keys(a) as (keyof DesignWaveformValues)[]).some((k) => !same(a[k], b[k]));
      });
      if (differs) return { ok: false, message: `full-load corners "${prev.id}" and "${c.id}" share Vin ${c.point.vin} V but differ; the document holds one point per Vin at full load` };
    }
  }
  if (pointCorners.length > 20) return { ok: false, message: "more than 20 full-load input voltages: the document holds at most 20 points" };
  const isPoint = new Set(full.map((c) => c.id));
  const positions = corners[0].point.positions.map((p0, i): DesignPositionWaveforms => {
    const all = corners.map((c) => c.point.positions[i]);
    return {
      id: p0.id,
      role: p0.role,
      label: p0.label,
      conduction: {
        switching: all.every((p) => p.turnOn.zeroVoltage) ? "zvs" : "hard",
        mode: p0.device === "diode" ? "body-diode" : "channel",
        deadTimes: [Math.max(...all.map((p) => p.bodyDiode?.beforeOn ?? 0)), Math.max(...all.map((p) => p.bodyDiode?.afterOff ?? 0))],
        points: pointCorners.map((c) => ({ vin: c.point.vin, ...designValues(c.point.positions[i]) })),
      },
    };
  });
  const cornerOut = corners.map((c): DesignCornerWaveforms => {
    const base = { id: c.id, loadFraction: c.point.iout / fullLoad, fsw: c.point.fsw, outputPower: c.point.outputPower };
    if (isPoint.has(c.id)) return base;
    return { ...base, waveforms: Object.fromEntries(c.point.positions.map((p) => [p.id, designValues(p)])) };
  });
  return { ok: true, waveforms: { positions, corners: cornerOut } };
}
