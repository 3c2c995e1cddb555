"use server";

import { redirect } from "next/navigation";
import { action } from "@/app/_lib/access";
import { insertProject } from "@/db/queries/projects";
import { projectInputSchema } from "@/lib/projects/schema";

export const createProjectAction = action({ permission: "project:write", schema: projectInputSchema }, async (input, member) => {
  const project = await insertProject({ workspaceId: member.workspace.id, values: input, createdBy: member.user.id });
  redirect(`/projects/${project.id}`);
});
