import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { JobKind, JobStatus } from "@/lib/jobs/schema";
import { newRecordId } from "@/db/ids";

// job_result rows: the app's record of a background job (who asked, state,
// progress, checkpoint, result). Reads for users take the workspace id; the
// worker reads by id alone (it acts for the row's own workspace).
export type { JobStatus };

export interface JobRecord {
  id: string;
  workspaceId: string;
  kind: JobKind;
  status: JobStatus;
  progress: number;
  payload: Record<string, unknown>;
  checkpoint: unknown;
  result: unknown;
  fileId: string | null;
  error: string | null;
  attempts: number;
  createdBy: string | null;
  createdAt: string;
  startedAt: string | null;
  updatedAt: string;
  finishedAt: string | null;
}

interface JobRow {
  id: string;
  workspace_id: string;
  kind: JobKind;
  status: JobStatus;
  progress: number;
  payload: Record<string, unknown>;
  checkpoint: unknown;
  result: unknown;
  file_id: string | null;
  error: string | null;
  attempts: number;
  created_by: string | null;
  created_at: Date;
  started_at: Date | null;
  updated_at: Date;
  finished_at: Date | null;
}

function toJob(r: JobRow): JobRecord {
  return {
    id: r.id, workspaceId: r.workspace_id, kind: r.kind, status: r.status, progress: r.progress, payload: r.payload,
    checkpoint: r.checkpoint, result: r.result, fileId: r.file_id, error: r.error, attempts: r.attempts, createdBy: r.created_by,
    createdAt: r.created_at.toISOString(), startedAt: r.started_at?.toISOString() ?? null, updatedAt: r.updated_at.toISOString(),
    finishedAt: r.finished_at?.toISOString() ?? null,
  };
}

export function newJobId(): string {
  return newRecordId("job");
}

export async function insertJobResult(
  { id, workspaceId, kind, payload, createdBy }: { id: string; workspaceId: string; kind: JobKind; payload: unknown; createdBy: string | null },
  db: Knex = getDb(),
): Promise<JobRecord> {
  const [row] = await db<JobRow>("job_result").insert({ id, workspace_id: workspaceId, kind, payload: JSON.stringify(payload) as never, created_by: createdBy }).returning("*");
  return toJob(row);
}

export async function getJobResultById({ workspaceId, jobId }: { workspaceId: string; jobId: string }, db: Knex = getDb()): Promise<JobRecord | null> {
  const row = await db<JobRow>("job_result").where({ id: jobId, workspace_id: workspaceId }).first();
  return row ? toJob(row) : null;
}

/** The worker's read: the row carries the workspace every further query uses. */
export async function getJobResultForWorkerById({ jobId }: { jobId: string }, db: Knex = getDb()): Promise<JobRecord | null> {
  const row = await db<JobRow>("job_result").where({ id: jobId }).first();
  return row ? toJob(row) : null;
}

export async function markJobStartedById({ jobId }: { jobId: string }, db: Knex = getDb()): Promise<void> {
  await db("job_result").where({ id: jobId }).update({ status: "running", attempts: db.raw("attempts + 1"), started_at: db.raw("coalesce(started_at, now())"), updated_at: db.fn.now(), error: null });
}

/** Progress and the work done so far; a retried attempt resumes from the checkpoint. */
export async function updateJobProgressById({ jobId, progress, checkpoint }: { jobId: string; progress: number; checkpoint?: unknown }, db: Knex = getDb()): Promise<void> {
  const patch: Record<string, unknown> = { progress: Math.min(Math.max(progress, 0), 1), updated_at: db.fn.now() };
  if (checkpoint !== undefined) patch.checkpoint = JSON.stringify(checkpoint);
  await db("job_result").where({ id: jobId }).update(patch);
}

export async function completeJobById({ jobId, result, fileId }: { jobId: string; result: unknown; fileId?: string | null }, db: Knex = getDb()): Promise<void> {
  await db("job_result").where({ id: jobId }).update({
    status: "completed", progress: 1, result: JSON.stringify(result), file_id: fileId ?? null, checkpoint: null, error: null, updated_at: db.fn.now(), finished_at: db.fn.now(),
  });
}

export async function failJobById({ jobId, error, final }: { jobId: string; error: string; final: boolean }, db: Knex = getDb()): Promise<void> {
  await db("job_result").where({ id: jobId }).update({ status: final ? "failed" : "queued", error, updated_at: db.fn.now(), finished_at: final ? db.fn.now() : null });
}
