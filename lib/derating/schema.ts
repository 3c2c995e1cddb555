import { z } from "zod";
import { qty } from "@/models/input/units";
import { PART_TYPES, type PartType } from "@/models/policy";

// The workspace derating policy as the settings form and PUT /api/v1/derating
// send it: the same shape as a design document's derating block, with unit
// strings ("25 K", "80 %", "4 V") or SI numbers. The form posts flat names
// ("tjMargin.mosfet"), which are nested before validation.
export const PART_TYPE_LABELS: Record<PartType, string> = {
  controller: "PWM controller",
  mosfet: "MOSFET",
  bjt: "Buffer BJT",
  driverIc: "Driver IC",
  clamp: "Clamp (Zener)",
};

/** Upper bounds keep typing slips out ("250 K" margin, "40 V" headroom); the table checks the same. */
export const MAX_TJ_MARGIN_K = 200;
export const MAX_HEADROOM_V = 50;

function nestFlat(raw: unknown): unknown {
  if (!raw || typeof raw !== "object" || Array.isArray(raw)) return raw;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(raw as Record<string, unknown>)) {
    const [head, tail] = k.split(".", 2);
    if (tail === undefined) out[k] = v;
    else out[head] = { ...((out[head] as Record<string, unknown>) ?? {}), [tail]: v };
  }
  return out;
}

const margin = () => qty("temperatureDifference", { min: 0, max: MAX_TJ_MARGIN_K });

export const deratingPolicySchema = z.preprocess(
  nestFlat,
  z
    .object({
      tjMargin: z.object(Object.fromEntries(PART_TYPES.map((p) => [p, margin()])) as Record<PartType, ReturnType<typeof margin>>).strict(),
      vgsMaxFraction: qty("ratio", { gt: 0, max: 1 }),
      minHeadroomAbovePlateau: qty("voltage", { min: 0, max: MAX_HEADROOM_V }),
    })
    .strict(),
);
export type DeratingPolicyInput = z.input<typeof deratingPolicySchema>;
export type DeratingPolicy = z.output<typeof deratingPolicySchema>;
