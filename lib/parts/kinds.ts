/**
 * The part kinds of the library and the datasheet parameters each one keeps.
 * Pure and client-safe: the form, the CSV import/export, the table filter and
 * the server all read these definitions, so a parameter is named once.
 *
 * `key` is the dotted path inside the stored params object, which is shaped
 * like the model's datasheet block (models/input/schemaParts.ts) so a design option
 * can copy it. `model: false` marks library-only figures the model does not
 * read (polarity, ratings); partToModelBlock() leaves them out.
 */
import type { Dimension, QtyOptions } from "@/models/input/units";
import { TOLERANCE_KEYS, type ToleranceKey } from "../../models/tolerance";

export const PART_KINDS = ["controller", "mosfet", "bjt", "driver-ic", "diode", "zener", "gate-transformer"] as const;
export type PartKind = (typeof PART_KINDS)[number];

export const PART_KIND_LABELS: Record<PartKind, string> = {
  controller: "PWM controller",
  mosfet: "MOSFET",
  bjt: "Bipolar transistor",
  "driver-ic": "Gate-driver IC",
  diode: "Diode",
  zener: "Zener diode",
  "gate-transformer": "Gate-drive transformer",
};

export type ParamType =
  | { type: "qty"; dim: Dimension; opts?: QtyOptions }
  /** Volt-seconds ("25 V·µs"): no dimension of models/input/units.ts, parsed in partValues.ts. */
  | { type: "voltSecond" }
  /** hFE(Ic) points written "0.1 A: 220; 1 A: 150". */
  | { type: "hfeCurve" }
  | { type: "enum"; options: readonly string[] };

export type ParamField = ParamType & {
  key: string;
  /** Trade term as shown in headers and labels (Qg, Rds(on), RθJA). */
  label: string;
  required: boolean;
  /** false: a library-only figure, not part of the model block. */
  model?: false;
  hint?: string;
};

/** Labels of the tolerance keys (models/tolerance.ts: relative spread, 0.1 = ±10 %). */
export const TOLERANCE_LABELS: Record<ToleranceKey, string> = {
  qg: "Qg spread",
  rdsOn: "Rds(on) spread",
  vpl: "Vpl spread",
  hfe: "hFE spread",
  vbe: "VBE spread",
  iq: "Iq spread",
  resistance: "Resistance spread",
  rth: "Rθ spread",
};
export type { ToleranceKey };

const q = (key: string, label: string, dim: Dimension, required: boolean, extra: Partial<ParamField> & { opts?: QtyOptions } = {}): ParamField =>
  ({ key, label, required, type: "qty", dim, ...extra }) as ParamField;

const rthJA = (required: boolean) => q("rthJA", "RθJA", "thermalResistance", required, { opts: { gt: 0 } });
const tjMax = q("tjMax", "Tj(max)", "temperature", false, { hint: "default 150 °C" });

export interface KindDefinition {
  fields: ParamField[];
  tolerances: ToleranceKey[];
}

export const PART_KIND_DEFS: Record<PartKind, KindDefinition> = {
  controller: {
    fields: [
      q("vcc", "Vcc", "voltage", true, { hint: "supply the driver pin swings to" }),
      q("iq", "Iq", "current", true, { hint: "supply current without gate load" }),
      q("pin.sourceResistance", "Pin source resistance", "resistance", true),
      q("pin.sinkResistance", "Pin sink resistance", "resistance", true),
      q("pin.sourceCurrentLimit", "Pin source current limit", "current", false),
      q("pin.sinkCurrentLimit", "Pin sink current limit", "current", false),
      rthJA(true),
      tjMax,
    ],
    tolerances: ["iq", "resistance", "rth"],
  },
  mosfet: {
    fields: [
      q("vdsMax", "Vds(max)", "voltage", false, { model: false, opts: { gt: 0 } }),
      q("qg", "Qg", "charge", true),
      q("qgs", "Qgs", "charge", true),
      q("qgd", "Qgd", "charge", true),
      q("qgVgs", "Qg test Vgs", "voltage", false, { hint: "default 10 V" }),
      q("vth", "Vth", "voltage", true),
      q("vpl", "Vpl (Miller plateau)", "voltage", true),
      q("ciss", "Ciss", "capacitance", false),
      q("rgInt", "Rg(int)", "resistance", false, { hint: "default 1 Ω; 0 allowed" }),
      q("rds25", "Rds(on) at 25 °C", "resistance", true),
      q("rdsHot", "Rds(on) hot", "resistance", false, { hint: "default 1.7 × Rds(on) at 125 °C" }),
      q("tHot", "Rds(on) hot temperature", "temperature", false),
      { key: "rdsModel", label: "Rds(on)(T) fit", type: "enum", options: ["linear", "exponential"], required: false },
      q("qrr", "Qrr (body diode)", "charge", false),
      q("vsd", "Vsd", "voltage", false),
      q("rDiode", "Body-diode resistance", "resistance", false),
      q("vgsMax", "Vgs(max)", "voltage", false, { hint: "default 20 V" }),
      tjMax,
      rthJA(false),
      q("rthJC", "RθJC", "thermalResistance", false),
      q("rthCS", "RθCS", "thermalResistance", false),
      q("rthSA", "RθSA", "thermalResistance", false),
      q("outputCapacitance.vds", "Coss/Qoss/Eoss test Vds", "voltage", false, { hint: "give any of Eoss, Qoss, Coss at it" }),
      q("outputCapacitance.eoss", "Eoss", "energy", false),
      q("outputCapacitance.qoss", "Qoss", "charge", false),
      q("outputCapacitance.coss", "Coss", "capacitance", false),
    ],
    tolerances: ["qg", "rdsOn", "vpl", "rth"],
  },
  bjt: {
    fields: [
      { key: "polarity", label: "Polarity", type: "enum", options: ["npn", "pnp"], required: true, model: false },
      { key: "hfe", label: "hFE(Ic)", type: "hfeCurve", required: true, hint: 'points in rising Ic, e.g. "0.1 A: 220; 1 A: 150"' },
      q("vbe", "VBE", "voltage", false),
      q("vceSat", "VCE(sat)", "voltage", false),
      q("icMax", "Ic(max)", "current", true),
      q("pMax", "P(max)", "power", true),
      rthJA(true),
      tjMax,
    ],
    tolerances: ["hfe", "vbe", "rth"],
  },
  "driver-ic": {
    fields: [
      q("supply", "Output supply", "voltage", false, { hint: "default the controller Vcc" }),
      q("vNeg", "Negative rail", "voltage", false),
      q("sourceResistance", "Source resistance", "resistance", true),
      q("sinkResistance", "Sink resistance", "resistance", true),
      q("sourcePeakCurrent", "Source peak current", "current", false),
      q("sinkPeakCurrent", "Sink peak current", "current", false),
      q("iq", "Iq", "current", false),
      q("inputCurrent", "Input current", "current", false),
      rthJA(true),
      tjMax,
    ],
    tolerances: ["resistance", "iq", "rth"],
  },
  diode: {
    fields: [
      q("vf", "Vf", "voltage", true, { opts: { gt: 0, max: 5 } }),
      q("ifTest", "If at Vf", "current", false, { opts: { gt: 0 } }),
      q("vrrm", "Vrrm", "voltage", false, { opts: { gt: 0 } }),
      q("trr", "trr", "time", false, { opts: { min: 0 } }),
      q("qrr", "Qrr", "charge", false, { opts: { min: 0 } }),
      rthJA(true),
      q("tjMax", "Tj(max)", "temperature", false),
    ],
    tolerances: ["rth"],
  },
  zener: {
    fields: [
      q("vz", "Vz", "voltage", true, { opts: { gt: 0 } }),
      q("izTest", "Iz at Vz", "current", false, { opts: { gt: 0 } }),
      q("pzMax", "Pz(max)", "power", true, { opts: { gt: 0 } }),
      rthJA(true),
      q("tjMax", "Tj(max)", "temperature", false),
    ],
    tolerances: ["rth"],
  },
  "gate-transformer": {
    fields: [
      q("turnsRatio", "Turns ratio Nsec/Npri", "ratio", true, { opts: { gt: 0, max: 100 } }),
      q("magnetizingInductance", "Magnetising inductance", "inductance", false, { opts: { gt: 0 } }),
      q("leakageInductance", "Leakage inductance", "inductance", false, { model: false, opts: { min: 0 } }),
      { key: "voltSecond", label: "Volt-second rating", type: "voltSecond", required: true, model: false, hint: 'e.g. "25 V·µs"' },
      q("isolationVoltage", "Isolation rating", "voltage", false, { model: false, opts: { gt: 0 }, hint: "test voltage as the datasheet states it" }),
      q("primaryResistance", "Primary resistance", "resistance", false, { opts: { min: 0 } }),
      q("secondaryResistance", "Secondary resistance", "resistance", false, { opts: { min: 0 } }),
    ],
    tolerances: ["resistance"],
  },
};

/**
 * Parameter keys of design-document version 1 (models/schemaUpgrade.ts),
 * still accepted as aliases of the current keys (CSV columns, API params)
 * because users keep files in the old names; exports write the new ones.
 */
export const PARAM_KEY_ALIASES: Partial<Record<PartKind, Readonly<Record<string, string>>>> = {
  mosfet: { vTest: "qgVgs", "outputCapacitance.vTest": "outputCapacitance.vds" },
};

/** Every alias key of any kind -> the current key (the CSV columns), first kind wins. */
export function allParamAliases(): Record<string, string> {
  return Object.assign({}, ...PART_KINDS.map((k) => PARAM_KEY_ALIASES[k] ?? {}).reverse());
}

export function isPartKind(value: unknown): value is PartKind {
  return typeof value === "string" && (PART_KINDS as readonly string[]).includes(value);
}

export function fieldOf(kind: PartKind, key: string): ParamField | undefined {
  return PART_KIND_DEFS[kind].fields.find((f) => f.key === key);
}

/** Every parameter key of any kind (the CSV columns), in first-seen order. */
export function allParamKeys(): string[] {
  return [...new Set(PART_KINDS.flatMap((k) => PART_KIND_DEFS[k].fields.map((f) => f.key)))];
}

export function allToleranceKeys(): ToleranceKey[] {
  return [...TOLERANCE_KEYS];
}
