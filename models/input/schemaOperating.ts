/**
 * Operating conditions: the waveform each switch sees, and the corners.
 *
 * Corner scheme (one rule, documented for users):
 *  1. A position lists waveform `points`, each at an input voltage `vin`,
 *     all at full load. At a corner the values are interpolated linearly in
 *     Vin between neighbouring points and held flat outside the range.
 *  2. Currents (turnOnId, turnOffId, iRms, iAvg) are multiplied by the corner's
 *     `loadFraction` (a CCM converter's currents scale with load; voltages
 *     and duty are taken as load-independent, which ignores the small duty
 *     shift from losses).
 *  3. `corners[].waveforms[positionId]` overrides any value at that corner,
 *     as given (not scaled): use it for a light-load DCM corner or a
 *     measured waveform.
 */
import { z } from "zod";
import { qty } from "./units";
import { AMBIENT_RANGE_C, FSW_RANGE_HZ } from "../bounds";

export const waveformFields = {
  /** Drain-source voltage just before the turn-on edge. */
  turnOnVds: qty("voltage", { min: 0 }),
  /** Drain current just after the turn-on edge. */
  turnOnId: qty("current", { min: 0 }),
  /** Drain-source voltage the switch rises to at turn-off. */
  turnOffVds: qty("voltage", { min: 0 }),
  /** Drain current at the turn-off edge. */
  turnOffId: qty("current", { min: 0 }),
  /** RMS of the channel current over the whole switching period. */
  iRms: qty("current", { min: 0 }),
  /** Average of the current through the device (for diode conduction). */
  iAvg: qty("current", { min: 0 }),
  /** Conduction fraction of the period; for a primary switch its duty D. */
  duty: qty("ratio", { min: 0, max: 1 }),
};

export const waveformPointSchema = z.object({ vin: qty("voltage", { gt: 0 }), ...waveformFields }).strict();
export const waveformOverrideSchema = z.object(waveformFields).partial().strict();

export const conductionSchema = z
  .object({
    switching: z.enum(["hard", "zvs"]).default("hard"),
    /** "channel": the gate is driven; "body-diode": the device is used as a diode only. */
    mode: z.enum(["channel", "body-diode"]).default("channel"),
    /**
     * Body-diode conduction before the channel turns on (t1) and after it
     * turns off (t2), e.g. the dead times of a synchronous rectifier.
     */
    deadTimes: z.tuple([qty("time"), qty("time")]).default([0, 0]),
    /**
     * Reverse-recovery charge of the diode this switch hard-commutates at
     * its turn-on (e.g. the SR body diode seen by the primary switch).
     */
    opposingQrr: qty("charge").default(0),
    points: z
      .array(waveformPointSchema)
      .min(1)
      .max(20)
      .refine((pts) => pts.every((p, i) => i === 0 || p.vin > pts[i - 1].vin), {
        message: "waveform points must be in rising vin",
      }),
  })
  .strict();

export const cornerSchema = z
  .object({
    id: z.string().min(1).max(40),
    label: z.string().max(120).optional(),
    vin: qty("voltage", { gt: 0 }),
    ambient: qty("temperature", AMBIENT_RANGE_C),
    /** 1 Hz … 100 MHz: outside that range the switching models mean nothing. */
    fsw: qty("frequency", FSW_RANGE_HZ),
    loadFraction: qty("ratio", { min: 0, max: 10 }).default(1),
    /** Power delivered to the load (for efficiency of the modelled losses). */
    outputPower: qty("power").optional(),
    waveforms: z.record(z.string(), waveformOverrideSchema).optional(),
  })
  .strict();
