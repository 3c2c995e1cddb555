import { route } from "@/app/_lib/access";
import { serializePartsCsv } from "@/lib/parts/csv";
import { partListQuerySchema } from "@/lib/parts/schema";
import { listAllPartsByWorkspace } from "@/db/queries/parts";

// GET /api/v1/parts/export?q=&kind=&param=&min=&max=  -> text/csv (the import format; re-imports cleanly)
export const GET = route({ permission: "read", query: partListQuerySchema }, async ({ member, query }) => {
  const parts = await listAllPartsByWorkspace({ workspaceId: member.workspace.id, filter: query });
  const day = new Date().toISOString().slice(0, 10);
  return new Response(`\uFEFF${serializePartsCsv(parts)}`, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="heatsplit-parts-${day}.csv"`,
      "cache-control": "private, no-store",
    },
  });
});
