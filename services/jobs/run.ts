import "server-only";
import { AppError } from "@/lib/errors";
import { SweepSpecError } from "@/models/sweep";
import { failJobById, getJobResultForWorkerById, markJobStartedById, type JobRecord } from "@/db/queries/jobs";
import { runMonteCarloJob, runReportJob, runSweepJob } from "./handlers";

// One attempt at one job. Errors the caller made (unknown part, revision
// gone) fail the job at once with their message; anything else is logged
// and rethrown so pg-boss retries, until the last attempt marks it failed.
const HANDLERS: Record<JobRecord["kind"], (job: JobRecord) => Promise<void>> = {
  sweep: runSweepJob,
  "monte-carlo": runMonteCarloJob,
  report: runReportJob,
};

export async function runJob(jobId: string, meta: { retryCount: number; retryLimit: number }): Promise<void> {
  const job = await getJobResultForWorkerById({ jobId });
  if (!job || job.status === "completed" || (job.status === "failed" && job.finishedAt)) return;
  await markJobStartedById({ jobId });
  try {
    await HANDLERS[job.kind]({ ...job, attempts: job.attempts + 1 });
  } catch (e) {
    const userError = e instanceof AppError || e instanceof SweepSpecError;
    const final = userError || meta.retryCount >= meta.retryLimit;
    if (!userError) console.error(`job ${jobId} (${job.kind}) attempt ${meta.retryCount + 1} failed:`, e);
    await failJobById({ jobId, error: userError ? e.message : final ? "The job failed; see the server log." : "An attempt failed; retrying.", final });
    if (!final) throw e;
  }
}
