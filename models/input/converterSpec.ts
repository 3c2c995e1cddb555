/**
 * zod schema for the calculator's input, for the server and the forms (unit
 * strings allowed: "100 kHz", "22 µH"). Kept apart from the calculator so
 * that the browser-side calculator loads neither zod nor the unit parser.
 * The calculator re-checks everything itself (validate.ts).
 */
import { z } from "zod";
import { qty } from "./units";
import { FSW_RANGE_HZ } from "../bounds";
import type { ConverterSpec } from "../converter/types";
import { TOPOLOGIES } from "../converter/validate";

export const converterSpecSchema = z
  .object({
    topology: z.enum(TOPOLOGIES as [ConverterSpec["topology"], ...ConverterSpec["topology"][]]),
    vin: qty("voltage", { gt: 0 }),
    vout: qty("voltage", { gt: 0 }),
    iout: qty("current", { gt: 0 }),
    fsw: qty("frequency", FSW_RANGE_HZ),
    efficiency: qty("ratio", { gt: 0, max: 1 }),
    turnsRatio: qty("ratio", { gt: 0, max: 1e3 }).optional(),
    magnetizingInductance: qty("inductance", { gt: 0, max: 10 }).optional(),
    filterInductance: qty("inductance", { gt: 0, max: 10 }).optional(),
    rectifier: z.enum(["synchronous", "diode"]),
    deadTimes: z.tuple([qty("time", { min: 0 }), qty("time", { min: 0 })]).optional(),
    mode: z.enum(["continuous", "discontinuous", "boundary", "auto"]).default("auto"),
    forwardReset: z.enum(["reset-winding", "active-clamp"]).optional(),
    resetTurnsRatio: qty("ratio", { gt: 0, max: 100 }).optional(),
    dutyMax: qty("ratio", { gt: 0, max: 1 }).optional(),
  })
  .strict();

export type ConverterSpecInput = z.input<typeof converterSpecSchema>;

// The schema's output must be a ConverterSpec (checked by the compiler).
export const asConverterSpec = (x: z.output<typeof converterSpecSchema>): ConverterSpec => x;
