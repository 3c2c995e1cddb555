import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { loadPageInWorkspace, requirePageMember } from "@/app/_lib/access";
import { can } from "@/lib/roles";
import { getProjectById } from "@/db/queries/projects";
import { getDesignOptionById, getRevisionByNumber, listRevisionsByOption } from "@/db/queries/options";
import { OptionEditor } from "./_editor/OptionEditor";

export const metadata: Metadata = { title: "Design option" };

export default async function OptionEditorPage({ params }: { params: Promise<{ projectId: string; optionId: string }> }) {
  const member = await requirePageMember("read");
  const { projectId, optionId } = await params;
  const option = await loadPageInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId }));
  if (option.projectId !== projectId) notFound();
  const workspaceId = member.workspace.id;
  const [project, revision, revisions] = await Promise.all([
    getProjectById({ workspaceId, projectId }),
    getRevisionByNumber({ workspaceId, optionId, revision: option.latestRevision }),
    listRevisionsByOption({ workspaceId, optionId }),
  ]);
  if (!project || !revision) notFound();
  return (
    <OptionEditor
      key={option.id}
      option={option}
      projectName={project.name}
      initial={{ revision: revision.revision, document: revision.document, partRefs: revision.partRefs }}
      revisions={{ latestRevision: option.latestRevision, items: revisions }}
      canWrite={can(member.role, "option:write")}
    />
  );
}
