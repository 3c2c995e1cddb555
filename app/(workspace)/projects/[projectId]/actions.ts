"use server";

import { redirect } from "next/navigation";
import { action } from "@/app/_lib/access";
import { duplicateOptionFormSchema, optionCreateFormSchema } from "@/lib/options/schema";
import { createOption, duplicateOption } from "@/services/options/service";

// The project page's forms: the same doors as POST /api/v1/projects/:projectId/options
// and POST /api/v1/options/:optionId/duplicate; both open the new option's editor.
const editorPath = (option: { projectId: string; id: string }) => `/projects/${option.projectId}/options/${option.id}`;

export const createOptionAction = action({ permission: "option:write", schema: optionCreateFormSchema }, async (input, member) => {
  redirect(editorPath(await createOption(member, input)));
});

export const duplicateOptionAction = action({ permission: "option:write", schema: duplicateOptionFormSchema }, async (input, member) => {
  redirect(editorPath(await duplicateOption(member, input)));
});
