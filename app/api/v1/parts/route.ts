import { reply, route } from "@/app/_lib/access";
import { partBodySchema, partListQuerySchema } from "@/lib/parts/schema";
import { listPartsByWorkspace } from "@/db/queries/parts";
import { createPart } from "@/services/parts/service";

// GET /api/v1/parts?q=&kind=&param=&min=&max=&ic=&sort=&dir=&page=&pageSize=
//   -> { items, total, page, pageSize, pageCount }
export const GET = route({ permission: "read", query: partListQuerySchema }, async ({ member, query }) => {
  return listPartsByWorkspace({ workspaceId: member.workspace.id, filter: query });
});

// POST /api/v1/parts { kind, manufacturer, mpn, description?, unitCost?, params, tolerance? } -> 201 { part }
// Quantities as unit strings ("47 nC") or SI numbers; stored as SI.
export const POST = route({ permission: "part:write", body: partBodySchema }, async ({ member, body }) => reply({ part: await createPart(member, body) }, 201));
