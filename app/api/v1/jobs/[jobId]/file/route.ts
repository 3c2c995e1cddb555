import { loadInWorkspace, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { getObjectStream } from "@/services/storage/storage";
import { jobParamsSchema } from "@/lib/jobs/schema";
import { getJobResultById } from "@/db/queries/jobs";
import { getStoredFileById } from "@/db/queries/files";

// GET /api/v1/jobs/:jobId/file -> the file a job produced (a rendered report), as an attachment.
export const GET = route({ permission: "read", params: jobParamsSchema }, async ({ member, params }) => {
  const job = await loadInWorkspace(member, (workspaceId) => getJobResultById({ workspaceId, jobId: params.jobId }));
  if (job.status !== "completed" || !job.fileId) throw new AppError("not_found", "This job has no file (yet).");
  const file = await loadInWorkspace(member, (workspaceId) => getStoredFileById({ workspaceId, id: job.fileId! }));
  const object = await getObjectStream(file.key);
  if (!object) throw new AppError("not_found", "The file is missing from storage.");
  return new Response(object.stream, {
    headers: {
      "content-type": file.contentType,
      "content-disposition": `attachment; filename="${file.filename.replace(/"/g, "")}"`,
      "cache-control": "private, no-store",
    },
  });
});
