// Background jobs. (1) Through the app: jobs beyond the synchronous caps run
// to completion on the app server's own workers (instrumentation.ts), and
// another workspace's job is 404. (2) Surviving a restart: the test queues a
// Monte Carlo job in a pg-boss schema of its own (so the app server's
// workers never see it) with the app's enqueue code, starts a worker
// PROCESS running the app's job code, SIGKILLs it mid-run (after some
// batches were checkpointed), starts a second worker process, and checks the
// job completes once, resuming from the checkpoint, with the same numbers a
// single uninterrupted computation gives.
import { spawn, type ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";
import { ORIGIN, type Client } from "./support/http";
import { templateDesign } from "./support/bench";
import { sweepGrid } from "@/models/sweep";
import { monteCarlo } from "@/models/spread";
import { batchSeed, mergeMonteCarlo } from "@/services/jobs/monteCarloMerge";

const ROOT = path.resolve(__dirname, "../..");
const SCHEMA = `pgboss_restart_${crypto.randomBytes(3).toString("hex")}`;
let reviewer: Client, adminB: Client;
let wsA: string, userId: string, optionId: string;
const children: ChildProcess[] = [];

async function until<T>(what: string, probe: () => Promise<T | null | undefined | false>, timeoutMs = 60_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const v = await probe();
    if (v) return v;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`timed out waiting for ${what}`);
}

const jobRow = (id: string) => testDb()("job_result").where({ id }).first();

beforeAll(async () => {
  const a = await createWorkspaceWithRoles("Jobs A", ["designer", "reviewer"]); // starting a job needs job:start (a viewer may not)
  const b = await createWorkspaceWithRoles("Jobs B", ["admin"]);
  wsA = a.workspaceId;
  userId = a.users.reviewer.id;
  const designer = await signedInClient(a.users.designer.email);
  [reviewer, adminB] = await Promise.all([signedInClient(a.users.reviewer.email), signedInClient(b.users.admin.email)]);
  optionId = (await createProjectWithOption(designer)).optionId;
});

afterAll(async () => {
  for (const c of children) if (c.exitCode === null) c.kill("SIGKILL");
  const { stopJobs } = await import("@/services/jobs/queue");
  await stopJobs();
  await testDb().raw(`drop schema if exists ${SCHEMA} cascade`);
  await closeTestDb();
});

async function pollJob(client: Client, id: string): Promise<any> {
  return until(`job ${id}`, async () => {
    const r = await client.get(`/api/v1/jobs/${id}`);
    const job = r.json<{ job: any }>().job;
    if (job.status === "failed") throw new Error(`job failed: ${job.error}`);
    return job.status === "completed" ? job : null;
  });
}

describe("jobs through the app server", () => {
  it("a 300 × 300 sweep (beyond the API's 250 × 250) completes with the model's numbers; another workspace gets 404", async () => {
    const spec = { part: "controller", x: { axis: "fsw" as const, from: 1e5, to: 1e6, steps: 300, scale: "log" as const }, y: { axis: "qgScale" as const, from: 0.5, to: 2, steps: 300 } };
    const r = await reviewer.post("/api/v1/jobs", { kind: "sweep", payload: { optionId, revision: 1, spec } });
    expect(r.status).toBe(202);
    const id = r.json<{ job: { id: string; status: string } }>().job.id;
    expect((await adminB.get(`/api/v1/jobs/${id}`)).status).toBe(404);
    const job = await pollJob(reviewer, id);
    expect(job.progress).toBe(1);
    expect(job.result.complete).toBe(true);
    expect(job.result.z).toHaveLength(300);
    const direct = sweepGrid(templateDesign(), { ...spec, rows: { from: 150, to: 151 } });
    expect(job.result.z[150]).toEqual(direct.z[0]);
    expect(job.result.contour.length).toBeGreaterThanOrEqual(0);
  });

  it("refuses a spec naming an unknown part at once (400), and another workspace's option (404)", async () => {
    const spec = { part: "Q9", x: { axis: "fsw", from: 1e5, to: 1e6, steps: 10 }, y: { axis: "qgScale", from: 0.5, to: 2, steps: 10 } };
    expect((await reviewer.post("/api/v1/jobs", { kind: "sweep", payload: { optionId, revision: 1, spec } })).status).toBe(400);
    expect((await adminB.post("/api/v1/jobs", { kind: "monte-carlo", payload: { optionId, revision: 1, samples: 10, seed: 1 } })).status).toBe(404);
  });

  it("a report job renders a PDF stored in object storage, downloadable by the same workspace only", async () => {
    const r = await reviewer.post("/api/v1/jobs", { kind: "report", payload: { optionId, revision: 1, heatmapSteps: 30 } });
    expect(r.status).toBe(202);
    const job = await pollJob(reviewer, r.json<{ job: { id: string } }>().job.id);
    expect(job.fileUrl).toBe(`/api/v1/jobs/${job.id}/file`);
    const down = await fetch(new URL(job.fileUrl, ORIGIN), { headers: { cookie: reviewer.cookieHeader() } });
    expect(down.status).toBe(200);
    expect(Buffer.from(await down.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");
    expect((await adminB.get(job.fileUrl)).status).toBe(404);
  });
});

describe("a job survives a worker restart", () => {
  it("is resumed from its checkpoint by a new worker process after the first one is killed mid-run", async () => {
    Object.assign(process.env, { JOBS_SCHEMA: SCHEMA, JOBS_EXPIRE_SECONDS: "8", JOBS_MAINTENANCE_SECONDS: "1", JOBS_RETRY_DELAY_SECONDS: "1" });
    const { enqueueJob } = await import("@/services/jobs/queue");
    const samples = 24_000; // 12 batches of 2 000
    const queued = await enqueueJob({ workspaceId: wsA, createdBy: userId, job: { kind: "monte-carlo", payload: { optionId, revision: 1, samples, seed: 42 } } });
    // No worker works this schema yet: the job waits.
    await new Promise((r) => setTimeout(r, 1500));
    expect(await jobRow(queued.id)).toMatchObject({ status: "queued", progress: 0 });

    const startWorker = () => {
      const child = spawn(process.execPath, ["--conditions", "react-server", "--import", "tsx", "tests/integration/support/job-worker.ts"], {
        cwd: ROOT, env: { ...process.env, JOBS_SCHEMA: SCHEMA, JOBS_EXPIRE_SECONDS: "8", JOBS_MAINTENANCE_SECONDS: "1", JOBS_RETRY_DELAY_SECONDS: "1" }, stdio: ["ignore", "inherit", "inherit"],
      });
      children.push(child);
      return child;
    };
    const first = startWorker();
    const partial = await until("first checkpoints", async () => {
      const row = await jobRow(queued.id);
      return row.status === "running" && (row.checkpoint?.batches?.length ?? 0) >= 3 ? row : null;
    });
    first.kill("SIGKILL");
    await new Promise((r) => first.once("exit", r));
    const done = partial.checkpoint.batches.length;
    expect(done).toBeLessThan(12);
    const state = await testDb().raw(`select state from ${SCHEMA}.job where data->>'jobId' = ?`, [queued.id]);
    expect(state.rows[0].state).toBe("active"); // lost with its process; pg-boss expires it after JOBS_EXPIRE_SECONDS

    startWorker();
    const finished = await until("completion after the restart", async () => {
      const row = await jobRow(queued.id);
      if (row.status === "failed") throw new Error(`job failed: ${row.error}`);
      return row.status === "completed" ? row : null;
    }, 90_000);
    expect(finished.attempts).toBe(2);
    expect(finished.result.samples).toBe(samples);
    expect(finished.result.batches).toHaveLength(12);
    expect(finished.result.resumedFromBatch).toBeGreaterThanOrEqual(done);
    // Checkpointed batches (from the killed process) + resumed ones = one uninterrupted computation, exactly.
    const design = templateDesign();
    const uninterrupted = mergeMonteCarlo(42, Array.from({ length: 12 }, (_, b) => monteCarlo(design, { samples: 2000, seed: batchSeed(42, b) })));
    expect(finished.result.parts).toEqual(JSON.parse(JSON.stringify(uninterrupted.parts)));
  }, 150_000);
});
