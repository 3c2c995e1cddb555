import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { BenchReadingInput } from "@/models/fitDesign";
import { newRecordId } from "@/db/ids";

// bench_run rows (one uploaded CSV against one option revision) and their
// bench_reading rows. Every lookup takes the workspace id, so another
// workspace's run is simply not found.
export interface BenchRunRecord {
  id: string;
  workspaceId: string;
  optionId: string;
  revision: number;
  fileId: string | null;
  rowCount: number;
  createdBy: string | null;
  createdByName: string | null;
  createdAt: string;
}

interface RunRow {
  id: string;
  workspace_id: string;
  option_id: string;
  revision: number;
  file_id: string | null;
  row_count: number;
  created_by: string | null;
  created_by_name?: string | null;
  created_at: Date;
}

interface ReadingRow {
  row_number: number;
  part_id: string;
  corner_id: string;
  method: "thermocouple" | "ir";
  measured_at: "case" | "junction";
  temperature: number;
  ambient: number;
  note: string;
}

function toRun(r: RunRow): BenchRunRecord {
  return {
    id: r.id, workspaceId: r.workspace_id, optionId: r.option_id, revision: r.revision, fileId: r.file_id, rowCount: r.row_count,
    createdBy: r.created_by, createdByName: r.created_by_name ?? null, createdAt: r.created_at.toISOString(),
  };
}

export function newBenchRunId(): string {
  return newRecordId("bnr");
}

/** The run and all its readings in one statement batch (call inside the upload's transaction). */
export async function insertBenchRunWithReadings(
  { id, workspaceId, optionId, revision, fileId, createdBy, readings }: { id: string; workspaceId: string; optionId: string; revision: number; fileId: string; createdBy: string; readings: BenchReadingInput[] },
  db: Knex = getDb(),
): Promise<BenchRunRecord> {
  const [row] = await db<RunRow>("bench_run")
    .insert({ id, workspace_id: workspaceId, option_id: optionId, revision, file_id: fileId, row_count: readings.length, created_by: createdBy })
    .returning("*");
  const rows = readings.map((r) => ({
    run_id: id, row_number: r.row, part_id: r.partId, corner_id: r.cornerId, method: r.method, measured_at: r.surface,
    temperature: r.temperature, ambient: r.ambient, note: r.note,
  }));
  for (let i = 0; i < rows.length; i += 500) await db("bench_reading").insert(rows.slice(i, i + 500));
  return toRun(row);
}

function runQuery(db: Knex, workspaceId: string) {
  return db("bench_run as b").leftJoin("auth_user as u", "u.id", "b.created_by").where("b.workspace_id", workspaceId);
}

export async function listBenchRunsByOption({ workspaceId, optionId }: { workspaceId: string; optionId: string }, db: Knex = getDb()): Promise<BenchRunRecord[]> {
  const rows = await runQuery(db, workspaceId)
    .andWhere("b.option_id", optionId)
    .orderBy([{ column: "b.created_at", order: "desc" }, { column: "b.id" }])
    .select<RunRow[]>("b.*", "u.display_name as created_by_name");
  return rows.map(toRun);
}

export async function getBenchRunById({ workspaceId, optionId, runId }: { workspaceId: string; optionId: string; runId: string }, db: Knex = getDb()): Promise<BenchRunRecord | null> {
  const row = await runQuery(db, workspaceId).andWhere({ "b.option_id": optionId, "b.id": runId }).first<RunRow | undefined>("b.*", "u.display_name as created_by_name");
  return row ? toRun(row) : null;
}

export async function listBenchReadingsByRun({ workspaceId, runId }: { workspaceId: string; runId: string }, db: Knex = getDb()): Promise<BenchReadingInput[]> {
  const rows = await db("bench_reading as r")
    .join("bench_run as b", "b.id", "r.run_id")
    .where({ "b.workspace_id": workspaceId, "r.run_id": runId })
    .orderBy("r.row_number")
    .select<ReadingRow[]>("r.*");
  return rows.map((r) => ({ row: r.row_number, partId: r.part_id, cornerId: r.corner_id, method: r.method, surface: r.measured_at, temperature: r.temperature, ambient: r.ambient, note: r.note }));
}
