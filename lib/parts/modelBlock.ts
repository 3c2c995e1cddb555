/**
 * A library part as the model's datasheet block, for design options that
 * copy a part: the stored SI params minus library-only figures (polarity,
 * ratings), plus the part number, the unit cost and the tolerances. The
 * result parses with the matching schema of models/input/schemaParts.ts (or the
 * transformer / clamp fields of models/input/schemaDrive.ts), which fills in its
 * own defaults.
 */
import { PART_KIND_DEFS, type PartKind } from "./kinds";
import { type PartParams, type PartValues } from "./values";
import { getAt, setAt } from "../../models/documentPath";

type LibraryPart = Pick<PartValues, "kind" | "mpn" | "unitCost" | "params" | "tolerance">;

function modelParams(kind: PartKind, params: PartParams): Record<string, unknown> {
  let out: Record<string, unknown> = {};
  for (const f of PART_KIND_DEFS[kind].fields) {
    if (f.model === false) continue;
    const v = getAt(params, f.key);
    if (v !== undefined) out = setAt(out, f.key, v) as Record<string, unknown>;
  }
  return out;
}

function withCommon(part: LibraryPart, block: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = { partNumber: part.mpn, ...block };
  if (part.unitCost !== null) out.cost = part.unitCost;
  if (Object.keys(part.tolerance).length) out.tolerance = { ...part.tolerance };
  return out;
}

export function partToModelBlock(part: LibraryPart): Record<string, unknown> {
  const p = modelParams(part.kind, part.params);
  switch (part.kind) {
    case "controller":
    case "mosfet":
    case "bjt":
    case "driver-ic":
      return withCommon(part, p);
    case "gate-transformer": {
      // transformerDriveSchema: turnsRatio, magnetizingInductance, winding resistances
      const out: Record<string, unknown> = { partNumber: part.mpn, ...p };
      if (part.unitCost !== null) out.cost = part.unitCost;
      return out;
    }
    case "zener":
      // clampSchema names the zener by zenerPartNumber / zenerVoltage
      return { zenerPartNumber: part.mpn, zenerVoltage: part.params.vz };
    case "diode":
      // gateSchema.steeringDiode takes only vf
      return { vf: part.params.vf };
  }
}
