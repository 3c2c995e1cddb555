"use client";
import { useState } from "react";
import { ApiError, fetchJson } from "@/lib/api-client";
import type { PublicJob } from "@/lib/jobs/schema";
import { buttonClasses } from "@/components/ui/Button";
import { JobProgress } from "./JobProgress";

/** Budget page: the revision's review report (PDF), its figures (CSV), a finer report as a background job, and the bench page. */
export function ReportLinks({ optionId, revision, benchHref }: { optionId: string; revision: number; benchHref?: string }) {
  const base = `/api/v1/options/${optionId}/revisions/${revision}/report`;
  const [jobId, setJobId] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  async function renderLarge() {
    setProblem(null);
    try {
      const r = await fetchJson<{ job: PublicJob }>("/api/v1/jobs", { method: "POST", body: { kind: "report", payload: { optionId, revision, heatmapSteps: 120 } } });
      setJobId(r.job.id);
    } catch (e) {
      setProblem(e instanceof ApiError ? e.message : "Could not start the job.");
    }
  }

  return (
    <div className="mb-6 grid gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <a className={buttonClasses({ variant: "secondary", size: "sm" })} href={`${base}?format=pdf`} download>Review report (PDF)</a>
        <a className={buttonClasses({ variant: "secondary", size: "sm" })} href={`${base}?format=csv`} download>Budget figures (CSV)</a>
        <button type="button" className={buttonClasses({ variant: "ghost", size: "sm" })} onClick={renderLarge} disabled={jobId !== null}>Fine heatmap report (background)</button>
        {benchHref && <a className={buttonClasses({ variant: "ghost", size: "sm" })} href={benchHref}>Bench correlation</a>}
      </div>
      {jobId && <JobProgress jobId={jobId} label="Rendering the report" />}
      {problem && <p role="alert" className="text-sm text-alarm-700">{problem}</p>}
    </div>
  );
}
