import "server-only";
import PgBoss from "pg-boss";
import { AppError } from "@/lib/errors";
import type { JobCreate, JobKind } from "@/lib/jobs/schema";
import { failJobById, insertJobResult, newJobId, type JobRecord } from "@/db/queries/jobs";

// The job queue: pg-boss 10 on the app's PostgreSQL (its own schema). One
// boss per process, started lazily; every app instance works the queues
// (instrumentation.ts), and pg-boss hands each job to one worker (SKIP
// LOCKED), so several instances are safe. A job that dies with its process
// stays "active" until JOB_EXPIRE_SECONDS pass; pg-boss's maintenance then
// puts it back for a retry, and the handler resumes from the checkpoint in
// job_result. Queue names are constants; pg-boss needs each queue created.
export const JOB_QUEUES: Record<JobKind, string> = {
  sweep: "heatsplit-sweep",
  "monte-carlo": "heatsplit-monte-carlo",
  report: "heatsplit-report",
};

/** Policy. Attempts after the first; a crash mid-run costs one. */
export const JOB_RETRY_LIMIT = 3;
const retryDelaySeconds = () => Number(process.env.JOBS_RETRY_DELAY_SECONDS ?? 5);
/** Longest a job may run before it counts as lost (and is retried). Env overrides (here and above) are for tests. */
const expireSeconds = () => Number(process.env.JOBS_EXPIRE_SECONDS ?? 15 * 60);
const maintenanceSeconds = () => Number(process.env.JOBS_MAINTENANCE_SECONDS ?? 30);
/** pg-boss's schema; a test uses its own so the app server's workers leave its jobs alone. */
const bossSchema = () => process.env.JOBS_SCHEMA ?? "pgboss";

const g = globalThis as unknown as { heatsplitBoss?: Promise<PgBoss>; heatsplitWorkers?: Promise<void> };

export function getBoss(): Promise<PgBoss> {
  g.heatsplitBoss ??= (async () => {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error("DATABASE_URL is not set");
    const boss = new PgBoss({ connectionString: url, schema: bossSchema(), max: 4, application_name: "heatsplit-jobs", maintenanceIntervalSeconds: maintenanceSeconds() });
    boss.on("error", (e) => console.error("job queue error:", e));
    await boss.start();
    for (const name of Object.values(JOB_QUEUES))
      await boss.createQueue(name, { name, retryLimit: JOB_RETRY_LIMIT, retryDelay: retryDelaySeconds(), expireInSeconds: expireSeconds() });
    return boss;
  })().catch((e) => {
    g.heatsplitBoss = undefined;
    throw e;
  });
  return g.heatsplitBoss;
}

/** Record the job, then queue it. If queueing fails the row is marked failed, never left waiting. */
export async function enqueueJob({ workspaceId, createdBy, job }: { workspaceId: string; createdBy: string | null; job: JobCreate }): Promise<JobRecord> {
  const record = await insertJobResult({ id: newJobId(), workspaceId, kind: job.kind, payload: job.payload, createdBy });
  try {
    const boss = await getBoss();
    await boss.send(JOB_QUEUES[job.kind], { jobId: record.id }, { retryLimit: JOB_RETRY_LIMIT, retryDelay: retryDelaySeconds(), expireInSeconds: expireSeconds() });
  } catch (e) {
    console.error(`job ${record.id}: could not queue:`, e);
    await failJobById({ jobId: record.id, error: "The job queue is unavailable; try again.", final: true });
    throw new AppError("unavailable", "The job queue is unavailable; try again in a moment.");
  }
  return record;
}

/** Start this process's workers once (idempotent). */
export function startJobWorkers(): Promise<void> {
  g.heatsplitWorkers ??= (async () => {
    const boss = await getBoss();
    const { runJob } = await import("./run");
    for (const name of Object.values(JOB_QUEUES))
      await boss.work<{ jobId: string }>(name, { batchSize: 1, pollingIntervalSeconds: 1, includeMetadata: true }, async ([job]) => {
        await runJob(job.data.jobId, { retryCount: job.retryCount, retryLimit: job.retryLimit });
      });
  })().catch((e) => {
    g.heatsplitWorkers = undefined;
    throw e;
  });
  return g.heatsplitWorkers;
}

/** For scripts and tests: stop polling and close the pool. */
export async function stopJobs(): Promise<void> {
  const boss = await g.heatsplitBoss?.catch(() => undefined);
  g.heatsplitBoss = undefined;
  g.heatsplitWorkers = undefined;
  await boss?.stop({ graceful: false, wait: true });
}
