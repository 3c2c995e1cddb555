"use server";

import { redirect } from "next/navigation";
import { action, loadInWorkspace } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { getProjectById } from "@/db/queries/projects";
import { insertOptionWithFirstRevision } from "@/db/queries/options";
import { duplicateDesignOption } from "@/db/queries/option-revisions";
import { duplicateOptionFormSchema, optionCreateFormSchema } from "@/lib/options/schema";
import { templateDocument } from "@/services/options/templates";

const editorPath = (projectId: string, optionId: string) => `/projects/${projectId}/options/${optionId}`;

export const createOptionAction = action({ permission: "option:write", schema: optionCreateFormSchema }, async (input, member) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: input.projectId }));
  const document = input.template !== undefined ? templateDocument(input.template) : input.document;
  if (document === undefined) throw new AppError("bad_request", "Choose a template.", [{ path: "template", message: "no such template" }]);
  const option = await insertOptionWithFirstRevision({
    workspaceId: member.workspace.id,
    projectId: project.id,
    name: input.name,
    summary: input.summary,
    document,
    note: input.template !== undefined ? `Started from the "${input.template}" template` : "First revision",
    createdBy: member.user.id,
  });
  redirect(editorPath(project.id, option.id));
});

export const duplicateOptionAction = action({ permission: "option:write", schema: duplicateOptionFormSchema }, async (input, member) => {
  const option = await loadInWorkspace(member, (workspaceId) =>
    duplicateDesignOption({ workspaceId, optionId: input.optionId, name: input.name, createdBy: member.user.id }),
  );
  redirect(editorPath(option.projectId, option.id));
});
