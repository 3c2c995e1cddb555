import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { enqueueJob } from "@/services/jobs/queue";
import { jobCreateSchema } from "@/lib/jobs/schema";
import { publicJob } from "@/services/jobs/view";
import { parseDesign } from "@/models/schema";
import { SweepSpecError, sweepGrid } from "@/models/sweep";
import { getRevisionByNumber } from "@/db/queries/options";

// POST /api/v1/jobs { kind: "sweep" | "monte-carlo" | "report", payload }
//   -> 202 { job } ; poll GET /api/v1/jobs/:jobId. The payload names an
//   option revision of the caller's workspace (another's: 404). A sweep spec
//   is tried on its first row here, so a bad part or axis is a 400 now rather
//   than a failed job later.
export const POST = route({ permission: "job:start", body: jobCreateSchema }, async ({ member, body }) => {
  const rev = await loadInWorkspace(member, (workspaceId) => getRevisionByNumber({ workspaceId, optionId: body.payload.optionId, revision: body.payload.revision }));
  const parsed = parseDesign(rev.document);
  if (!parsed.ok) throw new AppError("bad_request", `Revision ${rev.revision} does not evaluate; fix it in the editor.`, parsed.issues);
  if (body.kind === "sweep") {
    try {
      sweepGrid(parsed.design, { ...body.payload.spec, rows: { from: 0, to: 1 } });
    } catch (e) {
      if (e instanceof SweepSpecError) throw new AppError("bad_request", e.message, [{ path: "payload.spec", message: e.message }]);
      throw e;
    }
  }
  if (body.kind === "monte-carlo" && body.payload.corner && !["worst", "all"].includes(body.payload.corner) && !parsed.design.corners.some((c) => c.id === body.payload.corner))
    throw new AppError("bad_request", `No corner "${body.payload.corner}" in this design.`, [{ path: "payload.corner", message: "unknown corner id" }]);
  const job = await enqueueJob({ workspaceId: member.workspace.id, createdBy: member.user.id, job: body });
  return reply({ job: publicJob(job) }, 202);
});
