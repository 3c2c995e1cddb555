"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/app/_lib/access";
import { choiceFormSchema } from "@/lib/choice/schema";
import { chooseOption } from "@/services/choice/service";

// The compare page's sign-off form: the same door as POST /api/v1/projects/:projectId/choice.
export const chooseOptionAction = action({ permission: "option:choose", schema: choiceFormSchema }, async (input, member) => {
  const choice = await chooseOption(member, input);
  revalidatePath(`/projects/${input.projectId}/compare`);
  return { ok: true, message: `Recorded: ${choice.optionName} (rev ${choice.revision}) is the chosen option.` };
});
