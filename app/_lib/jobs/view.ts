import type { JobRecord } from "@/db/queries/jobs";

// What a caller sees of a job: never the payload's internals beyond what
// they sent, never the checkpoint, and the result only when asked.
export interface PublicJob {
  id: string;
  kind: JobRecord["kind"];
  status: JobRecord["status"];
  progress: number;
  error: string | null;
  attempts: number;
  createdAt: string;
  updatedAt: string;
  finishedAt: string | null;
  fileUrl: string | null;
  result?: unknown;
}

export function publicJob(j: JobRecord, { withResult = false }: { withResult?: boolean } = {}): PublicJob {
  return {
    id: j.id, kind: j.kind, status: j.status, progress: j.progress, error: j.error, attempts: j.attempts,
    createdAt: j.createdAt, updatedAt: j.updatedAt, finishedAt: j.finishedAt,
    fileUrl: j.status === "completed" && j.fileId ? `/api/v1/jobs/${j.id}/file` : null,
    ...(withResult && j.status === "completed" ? { result: j.result } : {}),
  };
}
