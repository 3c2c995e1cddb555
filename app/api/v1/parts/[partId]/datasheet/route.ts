import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/app/_lib/errors";
import { MAX_DATASHEET_BYTES, MULTIPART_OVERHEAD_BYTES, replacePartDatasheet } from "@/app/_lib/datasheets";
import { getObjectStream } from "@/app/_lib/storage";
import { partParamsSchema } from "@/app/(workspace)/parts/schema";
import { getPartById } from "@/db/queries/parts";
import { getStoredFileById } from "@/db/queries/files";
import { refuseUnstorableText } from "@/app/_lib/request-guards";
import { readFormLimited } from "@/app/_lib/body-limit";

// POST /api/v1/parts/:partId/datasheet (multipart field "file", a PDF up to
// MAX_DATASHEET_BYTES) -> 201 { datasheet }; too big 413, not a PDF 415.
// Replaces the previous datasheet.
export const POST = route({ permission: "part:write", params: partParamsSchema }, async ({ member, params, req }) => {
  const part = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id: params.partId }));
  const tooLarge = () => new AppError("payload_too_large", `A datasheet may be at most ${MAX_DATASHEET_BYTES / (1024 * 1024)} MB.`);
  if (!(req.headers.get("content-type") ?? "").toLowerCase().startsWith("multipart/form-data"))
    throw new AppError("unsupported_media_type", 'Send the PDF as the multipart form field "file".');
  const file = (await readFormLimited(req, MAX_DATASHEET_BYTES + MULTIPART_OVERHEAD_BYTES, tooLarge)).get("file"); // the limit holds while the body streams
  if (!(file instanceof File)) throw new AppError("bad_request", 'Attach the PDF as the form field "file".');
  if (file.size > MAX_DATASHEET_BYTES) throw tooLarge();
  refuseUnstorableText({ file: file.name });
  const bytes = new Uint8Array(await file.arrayBuffer());
  const stored = await replacePartDatasheet({
    workspaceId: member.workspace.id,
    partId: part.id,
    userId: member.user.id,
    filename: file.name,
    bytes,
    previousFileId: part.datasheet?.id ?? null,
  });
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
