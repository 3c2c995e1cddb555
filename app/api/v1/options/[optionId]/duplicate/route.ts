import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { duplicateOptionSchema, optionParamsSchema } from "@/lib/options/schema";
import { getDesignOptionById } from "@/db/queries/options";
import { duplicateDesignOption } from "@/db/queries/option-revisions";

// POST /api/v1/options/:optionId/duplicate { name? } -> 201 { option } (revision 1 = the source's latest)
export const POST = route(
  { permission: "option:write", params: optionParamsSchema, body: duplicateOptionSchema },
  async ({ member, params, body }) => {
    const source = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
    const option = await loadInWorkspace(member, (workspaceId) =>
      duplicateDesignOption({ workspaceId, optionId: source.id, name: body.name, createdBy: member.user.id }),
    );
    return reply({ option }, 201);
  },
);
