import { PART_KIND_DEFS, fieldOf, type PartKind } from "@/lib/parts/kinds";
import { formatParamValue } from "@/lib/parts/paramText";
import { type PartParams } from "@/lib/parts/values";
import { getAt } from "@/models/documentPath";

/** The figures a table row shows per kind: what an engineer scans for first. */
const SUMMARY_KEYS: Record<PartKind, string[]> = {
  controller: ["vcc", "pin.sourceResistance", "pin.sinkResistance", "rthJA"],
  mosfet: ["qg", "rds25", "vpl", "vdsMax"],
  bjt: ["polarity", "hfe", "icMax"],
  "driver-ic": ["sourceResistance", "sinkResistance", "sourcePeakCurrent", "rthJA"],
  diode: ["vf", "vrrm", "trr"],
  zener: ["vz", "pzMax", "rthJA"],
  "gate-transformer": ["turnsRatio", "voltSecond", "isolationVoltage"],
};

export function summaryOf(kind: PartKind, params: PartParams): { label: string; text: string }[] {
  return SUMMARY_KEYS[kind].flatMap((key) => {
    const f = fieldOf(kind, key);
    const v = getAt(params, key);
    return f && v !== undefined ? [{ label: f.label, text: formatParamValue(f, v) }] : [];
  });
}

/** The filtered parameter's value for the extra table column. */
export function paramText(kind: PartKind, params: PartParams, key: string): string {
  const f = PART_KIND_DEFS[kind].fields.find((x) => x.key === key);
  const v = getAt(params, key);
  return f && v !== undefined ? formatParamValue(f, v) : "—";
}
