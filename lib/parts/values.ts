/**
 * One validation for a part, whatever it came from (JSON API, browser form,
 * CSV row): a draft with raw values (unit strings or SI numbers) in, the
 * stored record (SI numbers, 12 significant digits) or a list of problems
 * out. Datasheet blocks the model knows are checked by the model's own
 * schema (models/input/schemaParts.ts), so a stored part always parses as one.
 * Only the figures the user gave are stored: defaults (Rg(int) 1 Ω, ...) are
 * the model's to fill in, never shown as if read from a datasheet.
 */
import { z } from "zod";
import { qty } from "@/models/input/units";
import { bjtSchema, controllerSchema, driverIcSchema, mosfetSchema } from "@/models/input/schemaParts";
import { PARAM_KEY_ALIASES, PART_KIND_DEFS, PART_KIND_LABELS, TOLERANCE_LABELS, isPartKind, type ParamField, type PartKind, type ToleranceKey } from "./kinds";
import { parseHfeCurve, parseVoltSecond, snap } from "./paramText";
import { getAt, setAt } from "../../models/documentPath";


export const MPN_MAX = 80;
export const MANUFACTURER_MAX = 120;
export const DESCRIPTION_MAX = 500;

export interface PartDraft {
  kind: unknown;
  manufacturer: unknown;
  mpn: unknown;
  description?: unknown;
  unitCost?: unknown;
  /** Keyed by the field key ("qg", "pin.sourceResistance"). */
  params: Record<string, unknown>;
  tolerance: Record<string, unknown>;
}

export type PartParams = Record<string, unknown>;

export interface PartValues {
  kind: PartKind;
  manufacturer: string;
  mpn: string;
  description: string;
  unitCost: number | null;
  params: PartParams;
  tolerance: Partial<Record<ToleranceKey, number>>;
}

/** path: "mpn", "unitCost", "params.<key>", "tolerance.<key>". */
export interface PartIssue {
  path: string;
  message: string;
}

export type PartValidation = { ok: true; value: PartValues } | { ok: false; issues: PartIssue[] };

const MODEL_SCHEMAS: Partial<Record<PartKind, z.ZodType>> = {
  controller: controllerSchema,
  mosfet: mosfetSchema,
  bjt: bjtSchema,
  "driver-ic": driverIcSchema,
};

const toleranceField = qty("ratio", { min: 0, max: 1 });
const costField = qty("cost");

export function isBlank(v: unknown): boolean {
  return v === undefined || v === null || (typeof v === "string" && v.trim() === "");
}

function text(v: unknown): string {
  return typeof v === "string" ? v.trim() : typeof v === "number" ? String(v) : "";
}

function messageOf(e: unknown): string {
  return e instanceof Error ? e.message : "invalid value";
}

/** One field on its own (library-only figures and the kinds the model has no block for). */
function parseOwnField(field: ParamField, raw: unknown): unknown {
  if (field.type === "voltSecond") return parseVoltSecond(raw);
  if (field.type === "hfeCurve") return parseHfeCurve(raw);
  if (field.type === "enum") {
    const v = text(raw).toLowerCase();
    if (!field.options.includes(v)) throw new Error(`expected one of ${field.options.join(", ")}, got ${JSON.stringify(raw)}`);
    return v;
  }
  const r = qty(field.dim, field.opts).safeParse(raw);
  if (!r.success) throw new Error(r.error.issues[0]?.message ?? "invalid value");
  return r.data;
}

/** Raw value as the model schema wants it: hFE text becomes points, enums lower-case, the rest as typed. */
function rawForModel(field: ParamField, raw: unknown): unknown {
  if (field.type === "hfeCurve") return parseHfeCurve(raw);
  if (field.type === "enum") return text(raw).toLowerCase();
  return typeof raw === "string" ? raw.trim() : raw;
}

function snapDeep(v: unknown): unknown {
  if (typeof v === "number") return snap(v);
  if (Array.isArray(v)) return v.map(snapDeep);
  if (v && typeof v === "object") return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, snapDeep(x)]));
  return v;
}

/** Old key names (PARAM_KEY_ALIASES) moved to the current ones; both given is refused. */
function withAliasesResolved(kind: PartKind, raw: Record<string, unknown>, issues: PartIssue[]): Record<string, unknown> {
  const aliases = PARAM_KEY_ALIASES[kind];
  if (!aliases) return raw;
  const out: Record<string, unknown> = { ...raw };
  for (const [old, key] of Object.entries(aliases)) {
    if (isBlank(raw[old])) {
      delete out[old];
      continue;
    }
    if (!isBlank(raw[key])) issues.push({ path: `params.${old}`, message: `${old} is the old name of ${key}; give only one of them` });
    else out[key] = raw[old];
    delete out[old];
  }
  return out;
}

function validateParams(kind: PartKind, rawGiven: Record<string, unknown>, issues: PartIssue[]): PartParams {
  const def = PART_KIND_DEFS[kind];
  const given = withAliasesResolved(kind, rawGiven, issues);
  let params: PartParams = {};
  let modelInput: Record<string, unknown> = {};
  const modelKeys: ParamField[] = [];
  const issue = (key: string, message: string) => issues.push({ path: `params.${key}`, message });
  for (const key of Object.keys(given)) {
    if (!isBlank(given[key]) && !def.fields.some((f) => f.key === key)) issue(key, `not a parameter of a ${PART_KIND_LABELS[kind]}`);
  }
  const modelSchema = MODEL_SCHEMAS[kind];
  for (const field of def.fields) {
    const raw = given[field.key];
    if (isBlank(raw)) {
      if (field.required) issue(field.key, `${field.label} is required`);
      continue;
    }
    try {
      if (modelSchema && field.model !== false) {
        modelInput = setAt(modelInput, field.key, rawForModel(field, raw)) as Record<string, unknown>;
        modelKeys.push(field);
      } else params = setAt(params, field.key, parseOwnField(field, raw)) as PartParams;
    } catch (e) {
      issue(field.key, messageOf(e));
    }
  }
  if (modelSchema && !issues.some((i) => modelKeys.some((f) => i.path === `params.${f.key}`))) {
    const r = modelSchema.safeParse(modelInput);
    if (!r.success) {
      for (const i of r.error.issues) {
        const path = i.path.map(String);
        // hfe.2.ic -> the hfe field, with the point named in the message
        const joined = path.join(".");
        const field =
          modelKeys.find((f) => joined === f.key || joined.startsWith(`${f.key}.`)) ??
          PART_KIND_DEFS[kind].fields.find((f) => f.key.startsWith(`${joined}.`));
        const key = field?.key ?? path.join(".");
        const point = field?.type === "hfeCurve" && typeof i.path[1] === "number" ? `point ${i.path[1] + 1}: ` : "";
        if (!issues.some((x) => x.path === `params.${key}`)) issue(key || "form", `${point}${i.message}`);
      }
    } else {
      const out = r.data as Record<string, unknown>;
      for (const f of modelKeys) params = setAt(params, f.key, getAt(out, f.key)) as PartParams;
    }
  }
  return snapDeep(params) as PartParams;
}

function validateTolerance(kind: PartKind, given: Record<string, unknown>, issues: PartIssue[]): PartValues["tolerance"] {
  const allowed = PART_KIND_DEFS[kind].tolerances;
  const out: PartValues["tolerance"] = {};
  for (const [key, raw] of Object.entries(given)) {
    if (isBlank(raw)) continue;
    if (!(key in TOLERANCE_LABELS) || !allowed.includes(key as ToleranceKey)) {
      issues.push({ path: `tolerance.${key}`, message: `not a tolerance of a ${PART_KIND_LABELS[kind]} (allowed: ${allowed.join(", ")})` });
      continue;
    }
    const r = toleranceField.safeParse(typeof raw === "string" ? raw.trim() : raw);
    if (r.success) out[key as ToleranceKey] = snap(r.data);
    else issues.push({ path: `tolerance.${key}`, message: r.error.issues[0]?.message ?? "invalid" });
  }
  return out;
}

export function validatePartDraft(draft: PartDraft): PartValidation {
  const issues: PartIssue[] = [];
  const kind = text(draft.kind);
  if (!isPartKind(kind)) return { ok: false, issues: [{ path: "kind", message: `choose a kind (${Object.keys(PART_KIND_DEFS).join(", ")}), got ${JSON.stringify(draft.kind ?? "")}` }] };
  const manufacturer = text(draft.manufacturer);
  const mpn = text(draft.mpn);
  const description = text(draft.description);
  if (!manufacturer) issues.push({ path: "manufacturer", message: "the manufacturer is required" });
  else if (manufacturer.length > MANUFACTURER_MAX) issues.push({ path: "manufacturer", message: `at most ${MANUFACTURER_MAX} characters` });
  if (!mpn) issues.push({ path: "mpn", message: "the part number is required" });
  else if (mpn.length > MPN_MAX) issues.push({ path: "mpn", message: `at most ${MPN_MAX} characters` });
  if (description.length > DESCRIPTION_MAX) issues.push({ path: "description", message: `at most ${DESCRIPTION_MAX} characters` });
  let unitCost: number | null = null;
  if (!isBlank(draft.unitCost)) {
    const r = costField.safeParse(typeof draft.unitCost === "string" ? draft.unitCost.trim() : draft.unitCost);
    if (r.success) unitCost = snap(r.data);
    else issues.push({ path: "unitCost", message: r.error.issues[0]?.message ?? "invalid cost" });
  }
  const params = validateParams(kind, draft.params ?? {}, issues);
  const tolerance = validateTolerance(kind, draft.tolerance ?? {}, issues);
  if (issues.length) return { ok: false, issues };
  return { ok: true, value: { kind, manufacturer, mpn, description, unitCost, params, tolerance } };
}
