import { loadInWorkspace, route } from "@/app/_lib/access";
import { jobParamsSchema } from "@/lib/jobs/schema";
import { publicJob } from "@/services/jobs/view";
import { getJobResultById } from "@/db/queries/jobs";

// GET /api/v1/jobs/:jobId -> { job } with status, progress 0..1, and the
// result once completed (a report: fileUrl to download). Another workspace's job: 404.
export const GET = route({ permission: "read", params: jobParamsSchema }, async ({ member, params }) => {
  const job = await loadInWorkspace(member, (workspaceId) => getJobResultById({ workspaceId, jobId: params.jobId }));
  return { job: publicJob(job, { withResult: true }) };
});
