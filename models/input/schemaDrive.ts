/**
 * How a gate is driven (a discriminated union on `kind`) and the external
 * gate network. Quantities are SI after parsing.
 */
import { z } from "zod";
import { qty } from "./units";
import { bjtSchema, driverIcFields, driverIcSchema } from "./schemaParts";
import { DATASHEET_DEFAULTS as D } from "../policy";

const partNumber = z.string().min(1).max(80);

/** The controller's own pin drives the gate. */
export const directDriveSchema = z.object({ kind: z.literal("direct") }).strict();

/**
 * NPN/PNP emitter-follower ("totem pole"): the controller pin feeds the tied
 * bases, collectors sit on `supply` (default controller Vcc) and `vNeg`.
 */
export const bjtFollowerSchema = z
  .object({
    kind: z.literal("bjt-follower"),
    npn: bjtSchema,
    pnp: bjtSchema,
    supply: qty("voltage", { gt: 0 }).optional(),
    vNeg: qty("voltage", { max: 0 }).default(0),
  })
  .strict();

export const driverIcDriveSchema = z.object({ kind: z.literal("driver-ic"), ...driverIcFields }).strict();

/**
 * Gate-drive transformer. `turnsRatio` n = Nsec/Npri. The primary is driven
 * by the controller pin, or by `driver` when given. "ac-coupled" has a DC
 * blocking capacitor (swing +nV(1−D), −nV·D); "dc-restored" has local rails
 * on the secondary, so the gate sees vPos and vNeg whatever the duty.
 */
export const transformerDriveSchema = z
  .object({
    kind: z.literal("transformer"),
    mode: z.enum(["ac-coupled", "dc-restored"]),
    partNumber: partNumber.optional(),
    cost: qty("cost").optional(),
    turnsRatio: qty("ratio", { gt: 0, max: 100 }),
    driver: driverIcSchema.optional(),
    vPos: qty("voltage", { gt: 0 }).optional(),
    vNeg: qty("voltage", { max: 0 }).optional(),
    primaryResistance: qty("resistance").default(0),
    secondaryResistance: qty("resistance").default(0),
    /** Optional: adds the magnetizing-current loss in the primary path. */
    magnetizingInductance: qty("inductance", { gt: 0 }).optional(),
  })
  .strict()
  .superRefine((t, ctx) => {
    if (t.mode === "dc-restored" && (t.vPos === undefined || t.vNeg === undefined))
      ctx.addIssue({ code: "custom", path: ["vPos"], message: "a dc-restored transformer needs vPos and vNeg" });
  });

/**
 * Winding of a self-driven SR. "vin": the gate sees k·Vin when on and
 * −kNeg·Vin when off (the reset swing of a forward converter only roughly
 * scales with Vin; give per-topology values). "vout": a winding referenced
 * to the output (e.g. on the output inductor) gives fixed vHigh / vLow.
 */
export const windingSchema = z.discriminatedUnion("ref", [
  z.object({ ref: z.literal("vin"), k: qty("ratio", { gt: 0, max: 10 }), kNeg: qty("ratio", { min: 0, max: 10 }).default(0) }).strict(),
  z.object({ ref: z.literal("vout"), vHigh: qty("voltage", { gt: 0 }), vLow: qty("voltage", { max: 0 }).default(0) }).strict(),
]);

/**
 * Zener-referenced clamp: an NPN follower whose base sits on a zener biased
 * from the winding. Gate high level = min(V_winding, Vz) − VBE.
 */
export const clampSchema = z
  .object({
    partNumber: partNumber.optional(),
    zenerPartNumber: partNumber.optional(),
    cost: qty("cost").optional(),
    zenerVoltage: qty("voltage", { gt: 0 }),
    zenerBiasCurrent: qty("current", { min: 0 }),
    vbe: qty("voltage", { min: 0, max: 5 }).default(D.vbe),
    icMax: qty("current", { gt: 0 }).optional(),
    pMax: qty("power", { gt: 0 }).optional(),
    rthJA: qty("thermalResistance", { gt: 0 }),
    tjMax: qty("temperature").default(D.tjMax),
  })
  .strict();

export const selfDrivenSchema = z
  .object({
    kind: z.literal("self-driven"),
    winding: windingSchema,
    windingResistance: qty("resistance").default(0),
    clamp: clampSchema.optional(),
  })
  .strict();

/** Gate not driven (a body-diode rectifier). */
export const noDriveSchema = z.object({ kind: z.literal("none") }).strict();

export const driveSchema = z.discriminatedUnion("kind", [
  directDriveSchema,
  bjtFollowerSchema,
  driverIcDriveSchema,
  transformerDriveSchema,
  selfDrivenSchema,
  noDriveSchema,
]);

/**
 * External gate network. Without a steering diode the turn-on edge goes
 * through rTurnOn and the turn-off edge through rTurnOff (split driver
 * outputs; rTurnOff defaults to rTurnOn = one resistor). With a steering
 * diode we take the common layout "rTurnOff in series with the diode, both
 * across rTurnOn": turn-off sees rTurnOn ∥ rTurnOff, and the diode's Vf
 * offsets the rTurnOff branch (its Thevenin equivalent, see driveCommon.ts).
 */
export const gateSchema = z
  .object({
    rTurnOn: qty("resistance"),
    rTurnOff: qty("resistance").optional(),
    steeringDiode: z.object({ vf: qty("voltage", { min: 0, max: 5 }).default(D.steeringDiodeVf) }).strict().optional(),
    cost: qty("cost").optional(),
  })
  .strict();
