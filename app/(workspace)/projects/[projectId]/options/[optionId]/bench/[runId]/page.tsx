import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { loadRunCorrelation } from "@/services/bench/service";
import { getDesignOptionById } from "@/db/queries/options";
import { getProjectById } from "@/db/queries/projects";
import { getBenchRunById } from "@/db/queries/bench";
import { Badge, Caution, LinkButton, PageHeader } from "@/components/ui";
import { CorrelationTable } from "./CorrelationTable";
import { AcceptFit } from "./AcceptFit";

export const metadata: Metadata = { title: "Bench run" };

export default async function BenchRunPage({ params }: { params: Promise<{ projectId: string; optionId: string; runId: string }> }) {
  const member = await requirePageMember("read");
  const { projectId, optionId, runId } = await params;
  const project = await loadPageInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId }));
  const option = await loadPageInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId }));
  if (option.projectId !== project.id) notFound();
  const run = await loadPageInWorkspace(member, (workspaceId) => getBenchRunById({ workspaceId, optionId, runId }));
  const { correlation } = await loadRunCorrelation({ workspaceId: member.workspace.id, run });
  const base = `/projects/${project.id}/options/${option.id}`;
  const fittable = correlation.parts.filter((p) => p.proposal && !("error" in p.proposal)).map((p) => ({
    id: p.part.id, label: p.part.label, outsideBand: p.outsideBand,
    ...(p.proposal as { path: string; value: number; previous: number }),
  }));

  return (
    <>
      <PageHeader
        title={`Bench run ${run.id}`}
        subtitle={`${run.rowCount} readings against revision ${run.revision} of ${option.name}; predicted at each corner with the bench's ambient.`}
        back={{ href: `${base}/bench`, label: "Bench runs" }}
        meta={<Badge tone="info">rev {run.revision}</Badge>}
        actions={<LinkButton href={`/api/v1/options/${option.id}/bench/${run.id}/file`}>Original CSV</LinkButton>}
      />
      <div className="grid gap-6">
        {correlation.parts.map((p) => <CorrelationTable key={p.part.id} part={p} bandK={correlation.bandK} />)}
        {can(member.role, "option:review") ? (
          <AcceptFit optionId={option.id} runId={run.id} revision={run.revision} latestRevision={option.latestRevision} parts={fittable} />
        ) : (
          <p className="text-sm text-ink-soft">A reviewer may accept the fitted resistances into the option as a new revision.</p>
        )}
        <Caution />
      </div>
    </>
  );
}
