/**
 * What the editor shows for each element of the design document: field
 * descriptors keyed by the document's own names (models/schema*.ts). The
 * datasheet blocks reuse the parts library's definitions (one naming of
 * every parameter), minus library-only figures the model's strict schemas
 * would refuse.
 */
import type { Dimension } from "@/models/input/units";
import { PART_KIND_DEFS, type PartKind } from "@/lib/parts/kinds";

export type EditorField =
  | { key: string; label: string; type: "qty"; dim: Dimension; required?: boolean; hint?: string }
  | { key: string; label: string; type: "enum"; options: readonly string[]; required?: boolean; hint?: string }
  | { key: string; label: string; type: "text"; required?: boolean; hint?: string }
  | { key: string; label: string; type: "int"; min: number; max: number; required?: boolean; hint?: string };

export interface ColumnDef {
  key: string;
  label: string;
  type: "qty" | "text";
  dim?: Dimension;
}

const text = (key: string, label: string, required = false): EditorField => ({ key, label, type: "text", required });
const qty = (key: string, label: string, dim: Dimension, required = false, hint?: string): EditorField => ({ key, label, type: "qty", dim, required, hint });
const choice = (key: string, label: string, options: readonly string[], required = false): EditorField => ({ key, label, type: "enum", options, required });

const COMMON = [text("partNumber", "Part number"), qty("cost", "Unit cost", "cost")];

/** The library kind's model fields (qty and enum) in the editor's terms. */
function fromLibrary(kind: PartKind, skip: string[] = []): EditorField[] {
  return PART_KIND_DEFS[kind].fields
    .filter((f) => f.model !== false && !skip.includes(f.key))
    .flatMap((f): EditorField[] => {
      if (f.type === "qty") return [{ key: f.key, label: f.label, type: "qty", dim: f.dim, required: f.required, hint: f.hint }];
      if (f.type === "enum") return [{ key: f.key, label: f.label, type: "enum", options: f.options, required: f.required, hint: f.hint }];
      return [];
    });
}

export const CONTROLLER_FIELDS: EditorField[] = [...COMMON, ...fromLibrary("controller")];

export const MOSFET_FIELDS: EditorField[] = [
  ...COMMON,
  { key: "count", label: "Devices in parallel", type: "int", min: 1, max: 64, hint: "share one gate resistor" },
  ...fromLibrary("mosfet"),
];

export const BJT_FIELDS: EditorField[] = [...COMMON, ...fromLibrary("bjt", ["hfe"]), qty("rBase", "Base resistor", "resistance", false, "0 = bases tied to the pin")];
export const HFE_COLUMNS: ColumnDef[] = [
  { key: "ic", label: "Ic", type: "qty", dim: "current" },
  { key: "hfe", label: "hFE", type: "qty", dim: "ratio" },
];

export const DRIVER_IC_FIELDS: EditorField[] = [...COMMON, ...fromLibrary("driver-ic")];

export const FOLLOWER_FIELDS: EditorField[] = [qty("supply", "Collector supply", "voltage", false, "default the controller Vcc"), qty("vNeg", "Negative rail", "voltage")];

export const TRANSFORMER_FIELDS: EditorField[] = [
  choice("mode", "Coupling", ["ac-coupled", "dc-restored"], true),
  ...COMMON,
  qty("turnsRatio", "Turns ratio Nsec/Npri", "ratio", true),
  qty("vPos", "V+ at the gate", "voltage", false, "dc-restored: local rail"),
  qty("vNeg", "V− at the gate", "voltage", false, "dc-restored: ≤ 0"),
  qty("primaryResistance", "Primary resistance", "resistance"),
  qty("secondaryResistance", "Secondary resistance", "resistance"),
  qty("magnetizingInductance", "Magnetising inductance", "inductance"),
];

export const WINDING_FIELDS: Record<"vin" | "vout", EditorField[]> = {
  vin: [qty("k", "Gate V / Vin when on (k)", "ratio", true), qty("kNeg", "Reverse swing / Vin (kNeg)", "ratio")],
  vout: [qty("vHigh", "Gate high level", "voltage", true), qty("vLow", "Gate low level", "voltage")],
};
export const SELF_DRIVEN_FIELDS: EditorField[] = [qty("windingResistance", "Winding resistance", "resistance")];

export const CLAMP_FIELDS: EditorField[] = [
  text("partNumber", "Clamp transistor"),
  text("zenerPartNumber", "Zener"),
  qty("cost", "Clamp cost", "cost"),
  qty("zenerVoltage", "Vz", "voltage", true),
  qty("zenerBiasCurrent", "Zener bias current", "current", true),
  qty("vbe", "VBE", "voltage"),
  qty("icMax", "Ic(max)", "current"),
  qty("pMax", "P(max)", "power"),
  qty("rthJA", "RθJA", "thermalResistance", true),
  qty("tjMax", "Tj(max)", "temperature"),
];

export const GATE_FIELDS: EditorField[] = [
  qty("rTurnOn", "Rg turn-on (rTurnOn)", "resistance", true),
  qty("rTurnOff", "Rg turn-off (rTurnOff)", "resistance", false, "default rTurnOn (one resistor)"),
  qty("cost", "Resistor cost", "cost"),
];

export const POSITION_FIELDS: EditorField[] = [
  text("id", "Position id", true),
  choice("role", "Role", ["primary", "synchronous-rectifier", "other"], true),
  text("label", "Label"),
];

export const CONDUCTION_FIELDS: EditorField[] = [
  choice("switching", "Switching", ["hard", "zvs"]),
  choice("mode", "Conduction", ["channel", "body-diode"]),
  qty("deadTimes.0", "Dead time before turn-on", "time"),
  qty("deadTimes.1", "Dead time after turn-off", "time"),
  qty("opposingQrr", "Qrr of the diode it commutates", "charge"),
];
export const POINT_COLUMNS: ColumnDef[] = [
  { key: "vin", label: "Vin", type: "qty", dim: "voltage" },
  { key: "turnOnVds", label: "Vds at turn-on", type: "qty", dim: "voltage" },
  { key: "turnOnId", label: "Id at turn-on", type: "qty", dim: "current" },
  { key: "turnOffVds", label: "Vds at turn-off", type: "qty", dim: "voltage" },
  { key: "turnOffId", label: "Id at turn-off", type: "qty", dim: "current" },
  { key: "iRms", label: "I rms", type: "qty", dim: "current" },
  { key: "iAvg", label: "I avg", type: "qty", dim: "current" },
  { key: "duty", label: "Duty", type: "qty", dim: "ratio" },
];

export const CORNER_COLUMNS: ColumnDef[] = [
  { key: "id", label: "Corner", type: "text" },
  { key: "label", label: "Label", type: "text" },
  { key: "vin", label: "Vin", type: "qty", dim: "voltage" },
  { key: "loadFraction", label: "Load", type: "qty", dim: "ratio" },
  { key: "ambient", label: "Ambient", type: "qty", dim: "temperature" },
  { key: "fsw", label: "fsw", type: "qty", dim: "frequency" },
  { key: "outputPower", label: "Output power", type: "qty", dim: "power" },
];

export const COUPLING_COLUMNS: ColumnDef[] = [
  { key: "from", label: "From part", type: "text" },
  { key: "to", label: "To part", type: "text" },
  { key: "theta", label: "Θ (K/W)", type: "qty", dim: "thermalResistance" },
];

export const DOCUMENT_FIELDS: EditorField[] = [text("name", "Design name", true), text("description", "Description")];

export const DERATING_FIELDS: EditorField[] = [
  qty("vgsMaxFraction", "Max |Vgs| / Vgs(max)", "ratio"),
  qty("minHeadroomAbovePlateau", "Min drive above Vpl", "voltage"),
  qty("tjMargin.controller", "Tj margin: controller", "temperatureDifference"),
  qty("tjMargin.mosfet", "Tj margin: MOSFETs", "temperatureDifference"),
  qty("tjMargin.bjt", "Tj margin: BJTs", "temperatureDifference"),
  qty("tjMargin.driverIc", "Tj margin: driver ICs", "temperatureDifference"),
  qty("tjMargin.clamp", "Tj margin: clamps", "temperatureDifference"),
];

export const DRIVE_KINDS = ["direct", "bjt-follower", "driver-ic", "transformer", "self-driven", "none"] as const;
export type DriveKind = (typeof DRIVE_KINDS)[number];
export const DRIVE_KIND_LABELS: Record<DriveKind, string> = {
  direct: "Controller pin (direct)",
  "bjt-follower": "Discrete BJT follower",
  "driver-ic": "Gate-driver IC",
  transformer: "Gate-drive transformer",
  "self-driven": "Self-driven winding",
  none: "Not driven (body diode)",
};
