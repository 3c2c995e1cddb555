/**
 * Waveform values of a position at a corner (scheme in schemaOperating.ts):
 * linear interpolation in Vin between the position's full-load points,
 * held flat outside them, currents × loadFraction, then the corner's own
 * overrides as given. The document names the edge values turnOnVds,
 * turnOnId, turnOffVds, turnOffId; the evaluation keeps its short names
 * (vdsOn, idOn, vdsOff, idOff) in `Waveform`, which the result reports.
 */
import type { Corner, Position } from "./input/schema";

export interface Waveform {
  vdsOn: number;
  idOn: number;
  vdsOff: number;
  idOff: number;
  iRms: number;
  iAvg: number;
  duty: number;
}

/** The document's waveform fields (schemaOperating.ts). */
export interface WaveformFields {
  turnOnVds: number;
  turnOnId: number;
  turnOffVds: number;
  turnOffId: number;
  iRms: number;
  iAvg: number;
  duty: number;
}

const KEYS = ["vdsOn", "idOn", "vdsOff", "idOff", "iRms", "iAvg", "duty"] as const;
const CURRENTS = new Set<string>(["idOn", "idOff", "iRms", "iAvg"]);
/** Waveform key -> document field. */
const FIELD: Record<(typeof KEYS)[number], keyof WaveformFields> = {
  vdsOn: "turnOnVds", idOn: "turnOnId", vdsOff: "turnOffVds", idOff: "turnOffId", iRms: "iRms", iAvg: "iAvg", duty: "duty",
};

export function waveformAt(points: readonly (WaveformFields & { vin: number })[], vin: number): Waveform {
  const n = points.length;
  const pick = (p: WaveformFields): Waveform => ({
    vdsOn: p.turnOnVds, idOn: p.turnOnId, vdsOff: p.turnOffVds, idOff: p.turnOffId, iRms: p.iRms, iAvg: p.iAvg, duty: p.duty,
  });
  if (n === 1 || vin <= points[0].vin) return pick(points[0]);
  if (vin >= points[n - 1].vin) return pick(points[n - 1]);
  let i = 1;
  while (points[i].vin < vin) i++;
  const a = points[i - 1];
  const b = points[i];
  const t = (vin - a.vin) / (b.vin - a.vin);
  const out = pick(a);
  for (const k of KEYS) out[k] = a[FIELD[k]] + t * (b[FIELD[k]] - a[FIELD[k]]);
  return out;
}

export function cornerWaveform(position: Position, corner: Corner, vin: number = corner.vin): Waveform {
  const w = waveformAt(position.conduction.points, vin);
  for (const k of KEYS) if (CURRENTS.has(k)) w[k] *= corner.loadFraction;
  const over = corner.waveforms?.[position.id];
  if (over) for (const k of KEYS) if (over[FIELD[k]] !== undefined) w[k] = over[FIELD[k]] as number;
  return w;
}
