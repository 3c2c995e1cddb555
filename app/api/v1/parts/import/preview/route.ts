import { route } from "@/app/_lib/access";
import { readCsvUpload } from "@/app/_lib/uploads";
import { previewPartsImport } from "@/services/parts/import";

// POST /api/v1/parts/import/preview  (body: text/csv, or multipart field "file")
//   -> { total, valid, create, update, issues: [{ row, column, message }], rows }
// Validates every row; writes nothing.
export const POST = route({ permission: "part:write" }, async ({ member, req }) => {
  return previewPartsImport(member, { text: await readCsvUpload(req) });
});
