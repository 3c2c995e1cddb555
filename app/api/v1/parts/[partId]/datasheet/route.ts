import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { attachDatasheet } from "@/services/parts/service";
import { MAX_DATASHEET_BYTES } from "@/lib/limits";
import { getObjectStream } from "@/services/storage/storage";
import { partParamsSchema } from "@/lib/parts/schema";
import { getPartById } from "@/db/queries/parts";
import { getStoredFileById } from "@/db/queries/files";
import { readMultipartFile } from "@/app/_lib/uploads";

// POST /api/v1/parts/:partId/datasheet (multipart field "file", a PDF up to
// MAX_DATASHEET_BYTES) -> 201 { datasheet }; too big 413, not a PDF 415.
// Replaces the previous datasheet.
export const POST = route({ permission: "part:write", params: partParamsSchema }, async ({ member, params, req }) => {
  const tooLarge = () => new AppError("payload_too_large", `A datasheet may be at most ${MAX_DATASHEET_BYTES / (1024 * 1024)} MB.`);
  const upload = async () => {
    const { file, bytes } = await readMultipartFile(req, { maxBytes: MAX_DATASHEET_BYTES, tooLarge, what: "PDF" });
    return { filename: file.name, bytes };
  };
  const stored = await attachDatasheet(member, { partId: params.partId, upload });
  return reply({ datasheet: { id: stored.id, filename: stored.filename, sizeBytes: stored.sizeBytes, sha256: stored.sha256 } }, 201);
});

// GET /api/v1/parts/:partId/datasheet -> the PDF as an attachment (404 when none or another workspace's)
export const GET = route({ permission: "read", params: partParamsSchema }, async ({ member, params }) => {
  const part = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id: params.partId }));
  if (!part.datasheet) throw new AppError("not_found", "This part has no datasheet.");
  const file = await loadInWorkspace(member, (workspaceId) => getStoredFileById({ workspaceId, id: part.datasheet!.id }));
  const object = await getObjectStream(file.key);
  if (!object) throw new AppError("not_found", "The datasheet file is missing from storage.");
  return new Response(object.stream, {
    headers: {
      "content-type": "application/pdf",
      "content-length": String(object.size ?? file.sizeBytes),
      "content-disposition": `attachment; filename="${file.filename.replace(/"/g, "")}"; filename*=UTF-8''${encodeURIComponent(file.filename)}`,
      "cache-control": "private, no-store",
    },
  });
});
