// Bench uploads for the integration tests and the role matrix: multipart
// POSTs with the client's cookies (the small Client speaks JSON and forms only).
import { parseDesign, type Design } from "@/models/input/schema";
import { correlateBench, type BenchReadingInput } from "@/models/fitDesign";
import { ORIGIN, type Client } from "./http";
import { templateInput } from "./projects";

export const BENCH_HEADER = "part_id,corner_id,method,measured_at,temperature,ambient,note";

export async function uploadBench(client: Client, optionId: string, csv: string, opts: { revision?: number; filename?: string } = {}): Promise<{ status: number; json: any; text: string }> {
  const form = new FormData();
  form.set("file", new Blob([csv], { type: "text/csv" }), opts.filename ?? "bench.csv");
  if (opts.revision !== undefined) form.set("revision", String(opts.revision));
  const res = await fetch(new URL(`/api/v1/options/${optionId}/bench`, ORIGIN), { method: "POST", body: form, headers: { cookie: client.cookieHeader(), origin: ORIGIN } });
  const text = await res.text();
  let json: any = null;
  try {
    json = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  return { status: res.status, json, text };
}

export function templateDesign(): Design {
  const r = parseDesign(templateInput());
  if (!r.ok) throw new Error("template does not parse");
  return r.design;
}

/** Readings placed `offsetK` away from the model's own prediction (per part). */
export function readingsAround(design: Design, offsets: Record<string, number>): BenchReadingInput[] {
  const plan: Omit<BenchReadingInput, "temperature">[] = [
    { row: 2, partId: "controller", cornerId: "vnom", method: "ir", surface: "junction", ambient: 25, note: "package top + ΨJT" },
    { row: 3, partId: "controller", cornerId: "vmax", method: "ir", surface: "junction", ambient: 25, note: "" },
    { row: 4, partId: "controller", cornerId: "vmin", method: "thermocouple", surface: "junction", ambient: 40, note: "" },
    { row: 5, partId: "Q1", cornerId: "vmin", method: "thermocouple", surface: "case", ambient: 25, note: "tab, \"K\" type" },
    { row: 6, partId: "Q1", cornerId: "vmax", method: "thermocouple", surface: "case", ambient: 25, note: "" },
  ];
  const zero = plan.map((p) => ({ ...p, temperature: 0 }));
  const predicted = correlateBench(design, zero).parts.flatMap((p) => p.readings);
  return plan.map((p) => {
    const pr = predicted.find((r) => r.row === p.row)!;
    return { ...p, temperature: Math.round((pr.predicted! + (offsets[p.partId] ?? 0)) * 10) / 10 };
  });
}

export function toCsv(readings: BenchReadingInput[]): string {
  const q = (s: string) => (/[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s);
  return [BENCH_HEADER, ...readings.map((r) => [r.partId, r.cornerId, r.method, r.surface, `${r.temperature} °C`, `${r.ambient} °C`, q(r.note)].join(","))].join("\n");
}
