import "server-only";
import { AppError } from "@/lib/errors";
import type { JobCreate } from "@/lib/jobs/schema";
import { SweepSpecError, sweepGrid } from "@/models/sweep";
import type { Member } from "@/services/auth/member";
import { loadInWorkspace } from "@/services/records";
import { enqueueJob } from "@/services/jobs/queue";
import { loadRevisionEvaluation } from "@/services/evaluation/revision";
import type { JobRecord } from "@/db/queries/jobs";

/**
 * Queues a sweep, Monte Carlo run or report of an option revision of the
 * member's workspace (another's: 404). A sweep spec is tried on its first
 * row here, so a bad part or axis is a 400 now rather than a failed job later.
 */
export async function startJob(member: Member, job: JobCreate): Promise<JobRecord> {
  const parsed = await loadInWorkspace(member, (workspaceId) =>
    loadRevisionEvaluation({ workspaceId, optionId: job.payload.optionId, revision: job.payload.revision }),
  );
  if (!parsed.ok) throw new AppError("bad_request", `Revision ${parsed.revision.revision} does not evaluate; fix it in the editor.`, parsed.issues);
  if (job.kind === "sweep") {
    try {
      sweepGrid(parsed.design, { ...job.payload.spec, rows: { from: 0, to: 1 } });
    } catch (e) {
      if (e instanceof SweepSpecError) throw new AppError("bad_request", e.message, [{ path: "payload.spec", message: e.message }]);
      throw e;
    }
  }
  if (
    job.kind === "monte-carlo" &&
    job.payload.corner &&
    !["worst", "all"].includes(job.payload.corner) &&
    !parsed.design.corners.some((c) => c.id === job.payload.corner)
  )
    throw new AppError("bad_request", `No corner "${job.payload.corner}" in this design.`, [{ path: "payload.corner", message: "unknown corner id" }]);
  return enqueueJob({ workspaceId: member.workspace.id, createdBy: member.user.id, job });
}
