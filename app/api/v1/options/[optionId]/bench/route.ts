import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/app/_lib/errors";
import { refuseUnstorableText } from "@/app/_lib/request-guards";
import { readFormLimited } from "@/app/_lib/body-limit";
import { storeBenchUpload } from "@/app/_lib/bench/store";
import { MAX_BENCH_BYTES, benchParamsSchema, benchUploadFieldsSchema } from "@/app/(workspace)/projects/[projectId]/options/[optionId]/bench/schema";
import { getDesignOptionById } from "@/db/queries/options";
import { listBenchRunsByOption } from "@/db/queries/bench";

// GET /api/v1/options/:optionId/bench -> { items } (newest first)
export const GET = route({ permission: "read", params: benchParamsSchema }, async ({ member, params }) => {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
  return { items: await listBenchRunsByOption({ workspaceId: member.workspace.id, optionId: option.id }) };
});

// POST /api/v1/options/:optionId/bench (multipart: "file" a CSV, "revision")
//   -> 201 { run } | 400 with one issue per bad row (nothing stored)
export const POST = route({ permission: "bench:write", params: benchParamsSchema }, async ({ member, params, req }) => {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: params.optionId }));
  const tooLarge = () => new AppError("payload_too_large", `A bench file may be at most ${MAX_BENCH_BYTES / 1024} kB.`);
  if (!(req.headers.get("content-type") ?? "").toLowerCase().startsWith("multipart/form-data"))
    throw new AppError("unsupported_media_type", 'Send the CSV as the multipart form field "file".');
  const form = await readFormLimited(req, MAX_BENCH_BYTES + 64 * 1024, tooLarge); // the limit holds while the body streams
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("bad_request", 'Attach the CSV as the form field "file".', [{ path: "file", message: "choose a CSV file" }]);
  if (file.size > MAX_BENCH_BYTES) throw tooLarge();
  const bytes = new Uint8Array(await file.arrayBuffer());
  refuseUnstorableText({ file: file.name });
  if (bytes.includes(0)) throw new AppError("bad_request", "The file contains NUL bytes; send a CSV text file.", [{ path: "file", message: "contains a NUL (U+0000) character" }]);
  const fields = benchUploadFieldsSchema.safeParse({ revision: form.get("revision") ?? option.latestRevision });
  if (!fields.success) throw new AppError("bad_request", "Check the form.", fields.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })));
  const run = await storeBenchUpload({
    workspaceId: member.workspace.id, optionId: option.id, revision: fields.data.revision, userId: member.user.id,
    filename: file.name, bytes,
  });
  return reply({ run }, 201);
});
