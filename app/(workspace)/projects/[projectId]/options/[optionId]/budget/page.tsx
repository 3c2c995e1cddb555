import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { loadLatestEvaluation, loadProjectEvaluations } from "@/services/evaluation/revision";
import { can } from "@/lib/roles";
import { getDesignOptionById } from "@/db/queries/options";
import { getProjectById } from "@/db/queries/projects";
import { Badge, Caution, LinkButton, PageHeader, WarningItem, WarningList } from "@/components/ui";
import { BudgetView } from "@/components/budget/BudgetView";
import { ReportLinks } from "@/components/report/ReportLinks";
import { editorHref, worstControllerCorner } from "@/components/budget/shape";

export const metadata: Metadata = { title: "Loss and thermal budget" };

export default async function BudgetPage({ params }: { params: Promise<{ projectId: string; optionId: string }> }) {
  const member = await requirePageMember("read");
  const { projectId, optionId } = await params;
  const project = await loadPageInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId }));
  const option = await loadPageInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId }));
  if (option.projectId !== project.id) notFound();
  const workspaceId = member.workspace.id;
  const budget = await loadLatestEvaluation({ workspaceId, option });
  if (!budget) notFound();
  const editor = editorHref({ projectId: project.id, optionId: option.id });

  const header = (
    <PageHeader
      title={option.name}
      subtitle={`Loss and thermal budget of the gate-drive chain, every corner. ${project.name}.`}
      back={{ href: `/projects/${project.id}`, label: project.name }}
      meta={<Badge tone="info">rev {budget.revision.revision}</Badge>}
      actions={
        <>
          <LinkButton href={`/projects/${project.id}/compare`}>Compare options</LinkButton>
          <LinkButton href={editor}>Open in editor</LinkButton>
        </>
      }
    />
  );

  if (!budget.ok)
    return (
      <>
        {header}
        <WarningList label="Why this revision does not evaluate">
          {budget.issues.map((i) => (
            <WarningItem key={i.path} severity="error" target={{ href: editorHref({ projectId: project.id, optionId: option.id, element: i.path }), label: `Fix ${i.path}` }}>
              {i.message}
            </WarningItem>
          ))}
        </WarningList>
        <Caution className="mt-6" />
      </>
    );

  // What every option of the project does to the controller, for the controller panel.
  const siblings = await loadProjectEvaluations({ workspaceId, projectId: project.id });
  const options = siblings.map(({ option: o, budget: b }) => ({
    optionId: o.id,
    name: o.name,
    current: o.id === option.id,
    worst: b?.ok ? worstControllerCorner(o.id === option.id ? budget.evaluation : b.evaluation) : null,
    href: `/projects/${project.id}/options/${o.id}/budget`,
  }));

  return (
    <>
      {header}
      <ReportLinks optionId={option.id} revision={budget.revision.revision} benchHref={`/projects/${project.id}/options/${option.id}/bench`} />
      <BudgetView
        projectId={project.id}
        optionId={option.id}
        optionName={option.name}
        revision={budget.revision.revision}
        document={budget.revision.document}
        partRefs={budget.revision.partRefs}
        design={budget.design}
        evaluation={budget.evaluation}
        options={options}
        canWrite={can(member.role, "option:write")}
      />
    </>
  );
}
