/**
 * Waveform values of a position at a corner (scheme in schemaOperating.ts):
 * linear interpolation in Vin between the position's full-load points,
 * held flat outside them, currents × loadFraction, then the corner's own
 * overrides as given.
 */
import type { Corner, Position } from "./schema";

export interface Waveform {
  vdsOn: number;
  idOn: number;
  vdsOff: number;
  idOff: number;
  iRms: number;
  iAvg: number;
  duty: number;
}

const KEYS = ["vdsOn", "idOn", "vdsOff", "idOff", "iRms", "iAvg", "duty"] as const;
const CURRENTS = new Set<string>(["idOn", "idOff", "iRms", "iAvg"]);

export function waveformAt(points: readonly (Waveform & { vin: number })[], vin: number): Waveform {
  const n = points.length;
  const pick = (p: Waveform): Waveform => ({
    vdsOn: p.vdsOn, idOn: p.idOn, vdsOff: p.vdsOff, idOff: p.idOff, iRms: p.iRms, iAvg: p.iAvg, duty: p.duty,
  });
  if (n === 1 || vin <= points[0].vin) return pick(points[0]);
  if (vin >= points[n - 1].vin) return pick(points[n - 1]);
  let i = 1;
  while (points[i].vin < vin) i++;
  const a = points[i - 1];
  const b = points[i];
  const t = (vin - a.vin) / (b.vin - a.vin);
  const out = pick(a);
  for (const k of KEYS) out[k] = a[k] + t * (b[k] - a[k]);
  return out;
}

export function cornerWaveform(position: Position, corner: Corner, vin: number = corner.vin): Waveform {
  const w = waveformAt(position.conduction.points, vin);
  for (const k of KEYS) if (CURRENTS.has(k)) w[k] *= corner.loadFraction;
  const over = corner.waveforms?.[position.id];
  if (over) for (const k of KEYS) if (over[k] !== undefined) w[k] = over[k] as number;
  return w;
}
