"use client";
import useSWR from "swr";
import { getJson } from "@/lib/api-client";
import type { PublicJob } from "@/lib/jobs/schema";

/** Polls a background job once a second until it ends; shows a progress bar, then the outcome. */
export function JobProgress({ jobId, label }: { jobId: string; label: string }) {
  const { data, error } = useSWR<{ job: PublicJob }>(`/api/v1/jobs/${jobId}`, getJson, {
    refreshInterval: (latest) => (latest && (latest.job.status === "completed" || latest.job.status === "failed") ? 0 : 1000),
  });
  const job = data?.job;
  const pct = Math.round((job?.progress ?? 0) * 100);
  return (
    <div className="grid gap-1.5 text-sm" aria-live="polite">
      <div className="flex items-center justify-between gap-3">
        <span className="font-medium text-ink">{label}</span>
        <span className="font-mono text-xs text-ink-soft">{job ? `${job.status} · ${pct} %` : "…"}</span>
      </div>
      <div role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} className="h-2 overflow-hidden rounded-full bg-paper-sunk">
        <div className={job?.status === "failed" ? "h-full bg-alarm-700" : "h-full bg-copper-700 transition-[width]"} style={{ width: `${pct}%` }} />
      </div>
      {job?.status === "completed" && job.fileUrl && (
        <a className="font-medium text-copper-700 hover:underline" href={job.fileUrl}>Download the result</a>
      )}
      {job?.error && <span className={job.status === "failed" ? "text-alarm-700" : "text-ink-soft"}>{job.error}</span>}
      {error && <span className="text-alarm-700">Could not read the job&apos;s state.</span>}
    </div>
  );
}
