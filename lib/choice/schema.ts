import { z } from "zod";
import { recordIdSchema } from "../projects/schema";

/** The manager's sign-off: one option of the project, at a revision, with the reason. */
export const choiceSchema = z
  .object({
    optionId: recordIdSchema,
    /** Omitted: the option's latest revision at the moment of choosing. */
    revision: z.coerce.number().int().min(1).max(1_000_000).optional(),
    reason: z.string().trim().min(1, "say why this option, in a sentence or two").max(2000),
  })
  .strict();
export type ChoiceInput = z.input<typeof choiceSchema>;

/** The compare page's form posts the project id too. */
export const choiceFormSchema = choiceSchema.extend({ projectId: recordIdSchema });
