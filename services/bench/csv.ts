import "server-only";
import Papa from "papaparse";
import type { Design } from "@/models/input/schema";
import { benchParts } from "@/models/fitDesign";
import type { BenchReadingInput } from "@/models/fitDesign";
import { BENCH_COLUMNS, MAX_BENCH_ROWS, REQUIRED_BENCH_COLUMNS, benchRowSchema } from "@/lib/bench/schema";
import type { FieldIssue } from "@/lib/errors";

// Bench CSV -> validated readings, all or nothing: every problem of every
// row is collected (row numbers are file lines, header = line 1) and the
// caller writes nothing unless the list is empty.
export type BenchParse = { ok: true; readings: BenchReadingInput[] } | { ok: false; issues: FieldIssue[] };

export function parseBenchCsv(text: string, design: Design): BenchParse {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: "greedy", transformHeader: (h) => h.trim() });
  const issues: FieldIssue[] = [];
  const header = parsed.meta.fields ?? [];
  const known = new Set<string>(BENCH_COLUMNS);
  for (const h of header) if (!known.has(h)) issues.push({ path: "header", message: `unknown column "${h}" (columns: ${BENCH_COLUMNS.join(", ")})` });
  for (const c of REQUIRED_BENCH_COLUMNS) if (!header.includes(c)) issues.push({ path: "header", message: `missing column "${c}"` });
  if (issues.length) return { ok: false, issues };
  if (parsed.data.length === 0) return { ok: false, issues: [{ path: "rows", message: "the file has no readings" }] };
  if (parsed.data.length > MAX_BENCH_ROWS) return { ok: false, issues: [{ path: "rows", message: `at most ${MAX_BENCH_ROWS} readings per file` }] };
  for (const e of parsed.errors) if (e.type !== "FieldMismatch" || e.code === "TooManyFields") issues.push({ path: `rows.${(e.row ?? 0) + 2}`, message: e.message });

  const parts = new Map(benchParts(design).map((p) => [p.id, p]));
  const corners = new Set(design.corners.map((c) => c.id));
  const readings: BenchReadingInput[] = [];
  parsed.data.forEach((raw, i) => {
    const line = i + 2;
    const r = benchRowSchema.safeParse(Object.fromEntries(Object.entries(raw).filter(([k]) => known.has(k)).map(([k, v]) => [k, v ?? ""])));
    if (!r.success) {
      for (const is of r.error.issues) issues.push({ path: `rows.${line}.${is.path.join(".") || "row"}`, message: `row ${line}: ${is.message}` });
      return;
    }
    const row = r.data;
    const part = parts.get(row.part_id);
    if (!part) issues.push({ path: `rows.${line}.part_id`, message: `row ${line}: no part "${row.part_id}" with a junction in this revision (known: ${[...parts.keys()].join(", ")})` });
    if (!corners.has(row.corner_id)) issues.push({ path: `rows.${line}.corner_id`, message: `row ${line}: no corner "${row.corner_id}" (known: ${[...corners].join(", ")})` });
    if (part && row.measured_at === "case" && part.rthJC === null)
      issues.push({ path: `rows.${line}.measured_at`, message: `row ${line}: "${part.id}" has only an RθJA, so a case reading cannot be compared; convert it to a junction estimate (e.g. with ΨJT) or give the part an RθJC` });
    if (row.temperature < row.ambient - 2)
      issues.push({ path: `rows.${line}.temperature`, message: `row ${line}: a dissipating part below ambient (${row.temperature} °C < ${row.ambient} °C) is a swapped column or a bad probe` });
    readings.push({ row: line, partId: row.part_id, cornerId: row.corner_id, method: row.method, surface: row.measured_at, temperature: row.temperature, ambient: row.ambient, note: row.note });
  });
  return issues.length ? { ok: false, issues } : { ok: true, readings };
}
