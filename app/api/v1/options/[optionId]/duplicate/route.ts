import { reply, route } from "@/app/_lib/access";
import { duplicateOptionSchema, optionParamsSchema } from "@/lib/options/schema";
import { duplicateOption } from "@/services/options/service";

// POST /api/v1/options/:optionId/duplicate { name? } -> 201 { option } (revision 1 = the source's latest)
export const POST = route({ permission: "option:write", params: optionParamsSchema, body: duplicateOptionSchema }, async ({ member, params, body }) =>
  reply({ option: await duplicateOption(member, { optionId: params.optionId, name: body.name }) }, 201),
);
