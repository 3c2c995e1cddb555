import { loadInWorkspace, reply, route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { readMultipartFile } from "@/app/_lib/uploads";
import { MAX_BENCH_BYTES } from "@/lib/limits";
import { uploadBenchRun } from "@/services/bench/service";
import { benchParamsSchema, benchUploadFieldsSchema } from "@/lib/bench/schema";
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
  const tooLarge = () => new AppError("payload_too_large", `A bench file may be at most ${MAX_BENCH_BYTES / 1024} kB.`);
  const upload = async () => {
    const { form, file, bytes } = await readMultipartFile(req, { maxBytes: MAX_BENCH_BYTES, tooLarge, what: "CSV", missingIssues: [{ path: "file", message: "choose a CSV file" }] });
    if (bytes.includes(0)) throw new AppError("bad_request", "The file contains NUL bytes; send a CSV text file.", [{ path: "file", message: "contains a NUL (U+0000) character" }]);
    const fields = benchUploadFieldsSchema.safeParse({ revision: form.get("revision") ?? undefined });
    if (!fields.success) throw new AppError("bad_request", "Check the form.", fields.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })));
    return { revision: fields.data.revision, filename: file.name, bytes };
  };
  return reply({ run: await uploadBenchRun(member, { optionId: params.optionId, upload }) }, 201);
});
