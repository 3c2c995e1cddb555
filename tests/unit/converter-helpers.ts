// Shared helpers of the operating-point calculator's unit checks.
import { expect } from "vitest";
import { operatingPoint } from "@/models/converter/calculate";
import type { ConverterSpec, OperatingPoint, PositionFigures, Refusal } from "@/models/converter/types";

/** The hand-worked numbers carry six significant figures: agreement to 1e-5 relative. */
export const HAND = 1e-5;

export function pointOf(spec: ConverterSpec): OperatingPoint {
  const r = operatingPoint(spec);
  if (!r.ok) throw new Error(`refused: ${r.refusal.field}: ${r.refusal.message}`);
  return r.point;
}

export function refusalOf(spec: ConverterSpec): Refusal {
  const r = operatingPoint(spec);
  if (r.ok) throw new Error(`expected a refusal, got a ${r.point.mode} operating point`);
  return r.refusal;
}

export function positionOf(p: OperatingPoint, id: string): PositionFigures {
  const q = p.positions.find((x) => x.id === id);
  if (!q) throw new Error(`no position ${id} (have ${p.positions.map((x) => x.id).join(", ")})`);
  return q;
}

/** |actual/expected − 1| ≤ rel, or |actual| ≤ rel when expected is 0. */
export function near(actual: number, expected: number, rel = HAND): void {
  if (expected === 0) expect(Math.abs(actual)).toBeLessThanOrEqual(rel);
  else expect(Math.abs(actual / expected - 1), `${actual} vs ${expected}`).toBeLessThanOrEqual(rel);
}

/** Charge and energy balance every operating point must satisfy (Erickson & Maksimović 3rd ed. ch. 2 and 3). */
export function expectBalances(p: OperatingPoint, spec: ConverterSpec, feeders: string[]): void {
  // Energy: Pin = Vin·Iin from the switch currents equals Pout/η.
  near(p.inputPower, (spec.vout * spec.iout) / spec.efficiency, 1e-9);
  // Output capacitor charge balance: the devices feeding the output (the rectifiers;
  // for a buck also Q1) deliver the load current on average.
  const delivered = feeders.reduce((s, id) => s + positionOf(p, id).deviceIAvg, 0);
  near(delivered, spec.iout, 1e-9);
}
