"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/app/_lib/access";
import { deratingPolicySchema } from "@/lib/derating/schema";
import { saveDeratingPolicy } from "@/services/derating/policy";

// The settings form: the same door as PUT /api/v1/derating.
export const saveDeratingAction = action({ permission: "derating:write", schema: deratingPolicySchema }, async (input, member) => {
  await saveDeratingPolicy(member, input);
  revalidatePath("/settings/derating");
  return { ok: true, message: "Saved. Every budget and review in this workspace now uses this policy." };
});
