import { route } from "@/app/_lib/access";
import { readCsvUpload } from "@/app/_lib/uploads";
import { commitPartsImport } from "@/services/parts/import";

// POST /api/v1/parts/import/commit  (the same file as the preview)
//   -> { created, updated }; any problem -> 400 listing every one, nothing written.
// Re-importing a file updates parts by (workspace, mpn) instead of duplicating them.
export const POST = route({ permission: "part:write" }, async ({ member, req }) => {
  return commitPartsImport(member, { text: await readCsvUpload(req) });
});
