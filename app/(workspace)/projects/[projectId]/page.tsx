import type { Metadata } from "next";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { getProjectById } from "@/db/queries/projects";
import { listOptionsByProject } from "@/db/queries/options";
import { Badge, LinkButton, PageHeader, Panel } from "@/components/ui";
import { STATUS_LABELS, TOPOLOGY_LABELS } from "@/lib/projects/schema";
import { STATUS_TONES } from "../_components/status";
import { ProjectDetails } from "./ProjectDetails";
import { OptionsTable } from "./OptionsTable";
import { NewOptionForm } from "./NewOptionForm";
import { OPTION_TEMPLATES } from "@/lib/options/templates";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const member = await requirePageMember("read");
  const { projectId } = await params;
  const project = await loadPageInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId }));
  const options = await listOptionsByProject({ workspaceId: member.workspace.id, projectId: project.id });
  const canWriteOptions = can(member.role, "option:write");
  return (
    <>
      <PageHeader
        title={project.name}
        subtitle={`${TOPOLOGY_LABELS[project.topology]} · ${project.vinMin}–${project.vinMax} V in`}
        back={{ href: "/projects", label: "Projects" }}
        meta={<Badge tone={STATUS_TONES[project.status]}>{STATUS_LABELS[project.status]}</Badge>}
        actions={
          <>
            <LinkButton href={`/projects/${project.id}/compare`}>Compare options</LinkButton>
            <LinkButton href={`/projects/${project.id}/activity`}>Activity</LinkButton>
            {canWriteOptions && (
              <LinkButton href="#new-option" variant="primary">
                New option
              </LinkButton>
            )}
          </>
        }
      />
      <div className="flex flex-col gap-6">
        <ProjectDetails project={project} canEdit={can(member.role, "project:write")} />
        <Panel title="Design options" description="Each option is one way of driving the gates; every save is a numbered revision." flush>
          <OptionsTable projectId={project.id} options={options} canWrite={canWriteOptions} />
        </Panel>
        {canWriteOptions && (
          <Panel title="New option" description="Start from one of the worked templates, then edit every element in the editor.">
            <div id="new-option">
              <NewOptionForm projectId={project.id} templates={OPTION_TEMPLATES} />
            </div>
          </Panel>
        )}
      </div>
    </>
  );
}
