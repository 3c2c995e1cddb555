import { PART_KIND_DEFS, type PartKind } from "@/lib/parts/kinds";
import { formatForInput, formatPercent } from "@/lib/parts/paramText";
import { type PartValues } from "@/lib/parts/values";
import { getAt } from "@/models/documentPath";
import type { PartFormValues } from "./PartForm";

export function emptyFormValues(kind: PartKind = "mosfet"): PartFormValues {
  return { kind, manufacturer: "", mpn: "", description: "", unitCost: "", params: {}, tolerance: {} };
}

/** A stored part (SI) as form text ("47 nC"), 6 significant digits so an untouched field saves unchanged. */
export function formValuesOf(part: PartValues): PartFormValues {
  const params: Record<string, string> = {};
  for (const f of PART_KIND_DEFS[part.kind].fields) {
    const v = getAt(part.params, f.key);
    if (v !== undefined) params[f.key] = formatForInput(f, v);
  }
  const tolerance: Record<string, string> = {};
  for (const [k, v] of Object.entries(part.tolerance)) tolerance[k] = formatPercent(v);
  return {
    kind: part.kind,
    manufacturer: part.manufacturer,
    mpn: part.mpn,
    description: part.description,
    unitCost: part.unitCost === null ? "" : String(part.unitCost),
    params,
    tolerance,
  };
}
