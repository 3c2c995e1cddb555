import "server-only";
import type { JobRecord } from "@/db/queries/jobs";
import type { PublicJob } from "@/lib/jobs/schema";

// The public view of a job record (PublicJob in lib/jobs/schema.ts).
export function publicJob(j: JobRecord, { withResult = false }: { withResult?: boolean } = {}): PublicJob {
  return {
    id: j.id, kind: j.kind, status: j.status, progress: j.progress, error: j.error, attempts: j.attempts,
    createdAt: j.createdAt, updatedAt: j.updatedAt, finishedAt: j.finishedAt,
    fileUrl: j.status === "completed" && j.fileId ? `/api/v1/jobs/${j.id}/file` : null,
    ...(withResult && j.status === "completed" ? { result: j.result } : {}),
  };
}
