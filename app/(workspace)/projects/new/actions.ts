"use server";

import { redirect } from "next/navigation";
import { action } from "@/app/_lib/access";
import { projectInputSchema } from "@/lib/projects/schema";
import { createProject } from "@/services/projects/service";

// The new-project form: the same door as POST /api/v1/projects.
export const createProjectAction = action({ permission: "project:write", schema: projectInputSchema }, async (input, member) => {
  redirect(`/projects/${(await createProject(member, input)).id}`);
});
