/**
 * The parts CSV, Heatsplit's own layout (documented on the import page):
 *
 *   kind, manufacturer, mpn, description, unit_cost_usd,
 *   param.<key> ... (unit strings such as "47 nC"; hFE as "0.1 A: 220; 1 A: 150"),
 *   tol.<key> ...   (relative spread: "0.1" or "10 %")
 *
 * Old parameter names (design-document version 1, e.g. param.vTest) are
 * read as aliases of the current ones (param.qgVgs); the export writes the
 * current names. Rows are numbered as a spreadsheet shows them: the header
 * is row 1, the first part row 2. Every row is validated; an import writes all rows or none.
 */
import Papa from "papaparse";
import { PART_KIND_DEFS, allParamAliases, allParamKeys, allToleranceKeys, type ParamField } from "./kinds";
import { formatExact, formatHfeCurve, formatVoltSecond, type HfePoint } from "./paramText";
import { validatePartDraft, type PartValues } from "./values";
import { getAt } from "../../models/documentPath";
import { writeCsv } from "../csv";

export const MAX_IMPORT_ROWS = 5000;
export const BASE_COLUMNS = ["kind", "manufacturer", "mpn", "description", "unit_cost_usd"] as const;
export const PARAM_PREFIX = "param.";
export const TOL_PREFIX = "tol.";

const FORMULA_ESCAPE = /^'(?=[=+\-@\t\r])/;

export interface CsvIssue {
  /** Spreadsheet row (header = 1); 0 for the file as a whole. */
  row: number;
  /** Column header the problem is in, or "" for the whole row / file. */
  column: string;
  message: string;
}

export interface CsvRow {
  row: number;
  value: PartValues;
}

export interface CsvParseResult {
  rows: CsvRow[];
  issues: CsvIssue[];
  /** Data rows in the file, valid or not. */
  total: number;
}

/** Issue path of validatePartDraft -> CSV column. */
export function columnOfPath(path: string): string {
  if (path.startsWith("params.")) return PARAM_PREFIX + path.slice("params.".length);
  if (path.startsWith("tolerance.")) return TOL_PREFIX + path.slice("tolerance.".length);
  if (path === "unitCost") return "unit_cost_usd";
  return path;
}

function knownColumns(): Set<string> {
  const params = [...allParamKeys(), ...Object.keys(allParamAliases())];
  return new Set<string>([...BASE_COLUMNS, ...params.map((k) => PARAM_PREFIX + k), ...allToleranceKeys().map((k) => TOL_PREFIX + k)]);
}

/** A CSV row (header -> cell) as a draft for validatePartDraft. */
export function draftOfRow(raw: Record<string, string>) {
  const cells = Object.fromEntries(Object.entries(raw).map(([c, v]) => [c, typeof v === "string" ? v.replace(FORMULA_ESCAPE, "") : v]));
  const params: Record<string, unknown> = {};
  const tolerance: Record<string, unknown> = {};
  for (const [col, v] of Object.entries(cells)) {
    if (col.startsWith(PARAM_PREFIX)) params[col.slice(PARAM_PREFIX.length)] = v;
    else if (col.startsWith(TOL_PREFIX)) tolerance[col.slice(TOL_PREFIX.length)] = v;
  }
  return { kind: cells.kind, manufacturer: cells.manufacturer, mpn: cells.mpn, description: cells.description, unitCost: cells.unit_cost_usd, params, tolerance };
}

export function parsePartsCsv(text: string): CsvParseResult {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: "greedy",
    transformHeader: (h) => h.trim(),
  });
  const issues: CsvIssue[] = [];
  const header = parsed.meta.fields ?? [];
  const known = knownColumns();
  for (const col of header) if (!known.has(col)) issues.push({ row: 1, column: col, message: `unknown column "${col}"` });
  for (const col of ["kind", "manufacturer", "mpn"]) if (!header.includes(col)) issues.push({ row: 1, column: col, message: `the column "${col}" is missing` });
  const seen = new Set(header.filter((c, i) => header.indexOf(c) !== i));
  for (const col of seen) issues.push({ row: 1, column: col, message: `the column "${col}" appears twice` });
  for (const e of parsed.errors) {
    if (e.code === "UndetectableDelimiter") continue;
    issues.push({ row: typeof e.row === "number" ? e.row + 2 : 0, column: "", message: e.message });
  }
  if (parsed.data.length > MAX_IMPORT_ROWS) {
    issues.push({ row: 0, column: "", message: `at most ${MAX_IMPORT_ROWS} parts per file, this one has ${parsed.data.length}` });
    return { rows: [], issues, total: parsed.data.length };
  }
  const rows: CsvRow[] = [];
  const mpnRow = new Map<string, number>();
  parsed.data.forEach((cells, i) => {
    const row = i + 2;
    const usable = Object.fromEntries(Object.entries(cells).filter(([c]) => known.has(c)));
    const r = validatePartDraft(draftOfRow(usable as Record<string, string>));
    if (!r.ok) {
      for (const x of r.issues) issues.push({ row, column: columnOfPath(x.path), message: x.message });
      return;
    }
    const first = mpnRow.get(r.value.mpn);
    if (first !== undefined) {
      issues.push({ row, column: "mpn", message: `part number ${r.value.mpn} is already on row ${first} of this file` });
      return;
    }
    mpnRow.set(r.value.mpn, row);
    rows.push({ row, value: r.value });
  });
  issues.sort((a, b) => a.row - b.row);
  return { rows, issues, total: parsed.data.length };
}

function cellOf(field: ParamField, v: unknown): string {
  if (v === undefined || v === null) return "";
  if (field.type === "hfeCurve") return formatHfeCurve(v as HfePoint[], true);
  if (field.type === "voltSecond") return formatVoltSecond(v as number, true);
  if (field.type === "enum") return String(v);
  return formatExact(v as number, field.dim);
}

type ExportPart = Pick<PartValues, "kind" | "manufacturer" | "mpn" | "description" | "unitCost" | "params" | "tolerance">;

/** The export: only columns some part uses, in a fixed order; reads back through parsePartsCsv unchanged. */
export function serializePartsCsv(parts: readonly ExportPart[]): string {
  const paramCols = allParamKeys().filter((k) => parts.some((p) => getAt(p.params, k) !== undefined));
  const tolCols = allToleranceKeys().filter((k) => parts.some((p) => p.tolerance[k] !== undefined));
  const fields = [...BASE_COLUMNS, ...paramCols.map((k) => PARAM_PREFIX + k), ...tolCols.map((k) => TOL_PREFIX + k)];
  const data = parts.map((p) => {
    const defs = PART_KIND_DEFS[p.kind].fields;
    const row: string[] = [p.kind, p.manufacturer, p.mpn, p.description, p.unitCost === null ? "" : String(p.unitCost)];
    for (const k of paramCols) {
      const f = defs.find((d) => d.key === k);
      row.push(f ? cellOf(f, getAt(p.params, k)) : "");
    }
    for (const k of tolCols) row.push(p.tolerance[k] === undefined ? "" : String(p.tolerance[k]));
    return row;
  });
  // writeCsv quotes every cell and writes a cell starting with = + - @ with a
  // leading apostrophe so a spreadsheet does not run it; draftOfRow strips it again.
  return writeCsv([fields, ...data]);
}
