/**
 * Datasheet blocks of the design document: controller, MOSFET, bipolar
 * transistor, driver IC. Every quantity goes through `qty` (unit strings or
 * SI numbers); objects are strict so a misspelt field is reported.
 * Defaults are for values datasheets often omit (see policy.ts for sources).
 */
import { z } from "zod";
import { qty } from "./units";
import { TOLERANCE_KEYS, type ToleranceKey } from "../tolerance";
import { DATASHEET_DEFAULTS as D } from "../policy";

const partNumber = z.string().min(1).max(80);

/**
 * Relative part spread (0.1 = ±10 %), read by the Monte Carlo helper; the
 * nominal evaluation ignores it.
 */
export const toleranceSchema = z
  .object(Object.fromEntries(TOLERANCE_KEYS.map((k) => [k, qty("ratio", { min: 0, max: 1 })])) as Record<ToleranceKey, ReturnType<typeof qty>>)
  .partial()
  .strict();

export const controllerSchema = z
  .object({
    partNumber: partNumber.optional(),
    cost: qty("cost").optional(),
    vcc: qty("voltage", { gt: 0 }),
    /** Supply current without gate load. */
    iq: qty("current", { min: 0 }),
    /** The built-in driver pin. No current limit given = limited by its resistance only. */
    pin: z
      .object({
        sourceResistance: qty("resistance", { gt: 0 }),
        sinkResistance: qty("resistance", { gt: 0 }),
        sourceCurrentLimit: qty("current", { gt: 0 }).optional(),
        sinkCurrentLimit: qty("current", { gt: 0 }).optional(),
      })
      .strict(),
    rthJA: qty("thermalResistance", { gt: 0 }),
    tjMax: qty("temperature").default(D.tjMax),
    tolerance: toleranceSchema.optional(),
  })
  .strict();

/**
 * Output capacitance at one test Vds: any of Eoss, Qoss and Coss, as the
 * datasheet prints them. The loss needs Eoss(V), so the model uses Eoss when
 * given, else Qoss, else Coss (see eossAt in switching.ts); from Qoss or
 * Coss it is derived assuming an abrupt junction, Coss ∝ 1/√V (Baliga 2nd
 * ed. 2019, MOSFET capacitances; from memory), so
 * Eoss(V) = Eoss(Vt)·(V/Vt)^1.5, Eoss = Qoss·V/3 and Eoss(Vt) = ⅔·Coss(Vt)·Vt².
 * Superjunction parts deviate; give Eoss when the datasheet has it.
 */
export const outputCapacitanceSchema = z
  .object({
    /** ≥ 1 V: the V^1.5 scaling from a lower test voltage is meaningless. */
    vds: qty("voltage", { min: 1 }),
    eoss: qty("energy").optional(),
    qoss: qty("charge").optional(),
    coss: qty("capacitance").optional(),
  })
  .strict()
  .refine((c) => c.eoss !== undefined || c.qoss !== undefined || c.coss !== undefined, {
    message: "give at least one of Eoss, Qoss or Coss at the test voltage",
    path: ["eoss"],
  });

export const mosfetSchema = z
  .object({
    partNumber: partNumber.optional(),
    cost: qty("cost").optional(),
    /** Identical devices in parallel, sharing one external gate resistor. */
    count: z.number().int().min(1).max(64).default(1),
    qgs: qty("charge", { gt: 0 }),
    qgd: qty("charge", { min: 0 }),
    qg: qty("charge", { gt: 0 }),
    /** Gate voltage at which the datasheet's Qg figure is specified. */
    qgVgs: qty("voltage", { gt: 0 }).default(D.qgTestVoltage),
    vth: qty("voltage", { min: 0.1 }),
    vpl: qty("voltage", { min: 0.2 }),
    /** Slope of Q(Vgs) below 0 V; default Qgs/Vpl (see gateCharge.ts). */
    ciss: qty("capacitance", { gt: 0 }).optional(),
    /** Internal gate resistance; 0 is allowed (a part whose Rg is lumped into the external resistor). */
    rgInt: qty("resistance", { min: 0 }).default(D.rgInt),
    outputCapacitance: outputCapacitanceSchema.optional(),
    /** This part's own body-diode reverse-recovery charge (used for SRs). */
    qrr: qty("charge").default(0),
    rds25: qty("resistance", { gt: 0 }),
    /** Default rds25 × 1.7 at 125 °C (silicon, see policy.ts). */
    rdsHot: qty("resistance", { gt: 0 }).optional(),
    tHot: qty("temperature", { min: 26 }).default(D.rdsHotTemperature),
    rdsModel: z.enum(["linear", "exponential"]).default("linear"),
    vsd: qty("voltage", { gt: 0, max: 10 }).default(D.vsd),
    rDiode: qty("resistance").default(0),
    vgsMax: qty("voltage", { gt: 0 }).default(D.vgsMax),
    tjMax: qty("temperature").default(D.tjMax),
    /** Junction to ambient directly, or the chain junction-case-sink-ambient. */
    rthJA: qty("thermalResistance", { gt: 0 }).optional(),
    rthJC: qty("thermalResistance").optional(),
    rthCS: qty("thermalResistance").optional(),
    rthSA: qty("thermalResistance").optional(),
    tolerance: toleranceSchema.optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    const issue = (path: string, message: string) => ctx.addIssue({ code: "custom", path: [path], message });
    if (!(m.vth < m.vpl)) issue("vth", "Vth must be below the plateau voltage (vpl)");
    if (!(m.vpl + 0.1 <= m.qgVgs)) issue("vpl", "the plateau Vpl must be at least 0.1 V below the Qg test gate voltage (qgVgs)");
    if (m.qg < m.qgs + m.qgd) issue("qg", "Qg at its test gate voltage must be at least Qgs + Qgd");
    const chain = m.rthJC !== undefined || m.rthCS !== undefined || m.rthSA !== undefined;
    if (m.rthJA === undefined && !chain) issue("rthJA", "give rthJA, or rthJC + rthCS + rthSA");
    if (m.rthJA !== undefined && chain) issue("rthJA", "give either rthJA or the rthJC/rthCS/rthSA chain, not both");
    if (chain && m.rthJA === undefined && (m.rthJC ?? 0) + (m.rthCS ?? 0) + (m.rthSA ?? 0) <= 0)
      issue("rthSA", "the junction-to-ambient chain must add up to more than 0 K/W");
  });

/** One point of the datasheet hFE(Ic) curve. */
export const hfePointSchema = z.object({ ic: qty("current", { gt: 0 }), hfe: z.number().min(1).max(1e5) }).strict();

export const bjtSchema = z
  .object({
    partNumber: partNumber.optional(),
    cost: qty("cost").optional(),
    hfe: z
      .array(hfePointSchema)
      .min(1)
      .max(40)
      .refine((pts) => pts.every((p, i) => i === 0 || p.ic > pts[i - 1].ic), {
        message: "hFE points must be in rising collector current",
      }),
    vbe: qty("voltage", { min: 0, max: 5 }).default(D.vbe),
    vceSat: qty("voltage", { min: 0, max: 5 }).default(D.vceSat),
    icMax: qty("current", { gt: 0 }),
    pMax: qty("power", { gt: 0 }),
    rthJA: qty("thermalResistance", { gt: 0 }),
    tjMax: qty("temperature").default(D.tjMax),
    /** Series base resistor from the controller pin (0 = bases tied to the pin). */
    rBase: qty("resistance").default(0),
    tolerance: toleranceSchema.optional(),
  })
  .strict();

export const driverIcFields = {
  partNumber: partNumber.optional(),
  cost: qty("cost").optional(),
  /** Output high rail; default the controller Vcc. */
  supply: qty("voltage", { gt: 0 }).optional(),
  /** Output low rail (≤ 0, e.g. "-5 V" for a bipolar supply). */
  vNeg: qty("voltage", { max: 0 }).default(0),
  sourceResistance: qty("resistance", { gt: 0 }),
  sinkResistance: qty("resistance", { gt: 0 }),
  sourcePeakCurrent: qty("current", { gt: 0 }).optional(),
  sinkPeakCurrent: qty("current", { gt: 0 }).optional(),
  iq: qty("current", { min: 0 }).default(0),
  /** Input current drawn from the controller pin while high (booked on the controller). */
  inputCurrent: qty("current", { min: 0 }).default(0),
  rthJA: qty("thermalResistance", { gt: 0 }),
  tjMax: qty("temperature").default(D.tjMax),
  tolerance: toleranceSchema.optional(),
};

export const driverIcSchema = z.object(driverIcFields).strict();
