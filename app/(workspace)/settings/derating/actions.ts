"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/app/_lib/access";
import { upsertDeratingByWorkspace } from "@/db/queries/derating";
import { deratingPolicySchema } from "@/lib/derating/schema";

export const saveDeratingAction = action({ permission: "derating:write", schema: deratingPolicySchema }, async (input, member) => {
  await upsertDeratingByWorkspace({ workspaceId: member.workspace.id, values: input, updatedBy: member.user.id });
  revalidatePath("/settings/derating");
  return { ok: true, message: "Saved. Every budget and review in this workspace now uses this policy." };
});
