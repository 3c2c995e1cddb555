"use server";

import { revalidatePath } from "next/cache";
import { action, loadInWorkspace } from "@/app/_lib/access";
import { getProjectById } from "@/db/queries/projects";
import { choiceFormSchema } from "@/lib/choice/schema";
import { recordOptionChoice } from "@/services/choice/service";

export const chooseOptionAction = action({ permission: "option:choose", schema: choiceFormSchema }, async (input, member) => {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: input.projectId }));
  const result = await recordOptionChoice({ member, projectId: project.id, optionId: input.optionId, revision: input.revision, reason: input.reason });
  if (!result.ok) return { ok: false, message: result.message, fieldErrors: Object.fromEntries(result.issues.map((i) => [i.path, i.message])) };
  revalidatePath(`/projects/${project.id}/compare`);
  return { ok: true, message: `Recorded: ${result.choice.optionName} (rev ${result.choice.revision}) is the chosen option.` };
});
