import Papa from "papaparse";
import { loadInWorkspace, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { writeCsv } from "@/lib/csv";
import { getObjectStream } from "@/services/storage/storage";
import { benchRunParamsSchema } from "@/lib/bench/schema";
import { getBenchRunById } from "@/db/queries/bench";
import { getStoredFileById } from "@/db/queries/files";

// GET /api/v1/options/:optionId/bench/:runId/file -> the uploaded CSV (attachment), its rows and
// values as uploaded but written again through the shared CSV writer: every cell quoted, and a note
// someone typed as "=HYPERLINK(...)" reaches the next reader's spreadsheet as text, not as a formula.
export const GET = route({ permission: "read", params: benchRunParamsSchema }, async ({ member, params }) => {
  const run = await loadInWorkspace(member, (workspaceId) => getBenchRunById({ workspaceId, optionId: params.optionId, runId: params.runId }));
  if (!run.fileId) throw new AppError("not_found", "The original file of this run was removed.");
  const file = await loadInWorkspace(member, (workspaceId) => getStoredFileById({ workspaceId, id: run.fileId! }));
  const object = await getObjectStream(file.key);
  if (!object) throw new AppError("not_found", "The file is missing from storage.");
  const text = await new Response(object.stream).text(); // at most MAX_BENCH_BYTES: checked at upload
  const rows = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" }).data;
  return new Response(writeCsv(rows), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${file.filename.replace(/"/g, "")}"`,
      "cache-control": "private, no-store",
    },
  });
});
