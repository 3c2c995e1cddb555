import "server-only";
import crypto from "node:crypto";
import { getDb } from "@/db/knex";
import { parseDesign } from "@/models/schema";
import { correlateBench, type BenchCorrelation } from "@/models/fitDesign";
import { AppError } from "@/lib/errors";
import { deleteObject, putObject } from "../storage/storage";
import { parseBenchCsv } from "./csv";
import { insertStoredFile, newFileId, newObjectKey } from "@/db/queries/files";
import { getRevisionByNumber } from "@/db/queries/options";
import { insertBenchRunWithReadings, listBenchReadingsByRun, newBenchRunId, type BenchRunRecord } from "@/db/queries/bench";

function revisionDesign(document: unknown, revision: number) {
  const parsed = parseDesign(document);
  if (!parsed.ok) throw new AppError("bad_request", `Revision ${revision} does not evaluate; fix it in the editor first.`, parsed.issues);
  return parsed.design;
}

function safeCsvFilename(name: string | null): string {
  const base = (name ?? "").split(/[\\/]/).pop()?.replace(/[^\w .()-]+/g, "_").trim() ?? "";
  return base ? (base.toLowerCase().endsWith(".csv") ? base : `${base}.csv`).slice(0, 120) : "bench.csv";
}

/**
 * Validate every row against the revision's parts and corners first; only a
 * clean file is stored. The object goes up under a fresh key, then the file,
 * run and reading rows are written in one transaction; a failed write
 * deletes the object again, so nothing is half-stored.
 */
export async function storeBenchUpload({ workspaceId, optionId, revision, userId, filename, bytes }: {
  workspaceId: string; optionId: string; revision: number; userId: string; filename: string | null; bytes: Uint8Array;
}): Promise<BenchRunRecord> {
  const rev = await getRevisionByNumber({ workspaceId, optionId, revision });
  if (!rev) throw new AppError("not_found", `This option has no revision ${revision}.`);
  const design = revisionDesign(rev.document, revision);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("unsupported_media_type", "The file is not UTF-8 text (save the sheet as CSV UTF-8).");
  }
  const parsed = parseBenchCsv(text, design);
  if (!parsed.ok) throw new AppError("bad_request", `The file has ${parsed.issues.length} problem(s); nothing was stored.`, parsed.issues);
  const key = newObjectKey({ workspaceId, kind: "bench" });
  await putObject({ key, body: bytes, contentType: "text/csv" });
  try {
    return await getDb().transaction(async (trx) => {
      const file = await insertStoredFile(
        {
          id: newFileId(), workspaceId, key, filename: safeCsvFilename(filename), contentType: "text/csv", sizeBytes: bytes.byteLength,
          sha256: crypto.createHash("sha256").update(bytes).digest("hex"), kind: "bench", createdBy: userId,
        },
        trx,
      );
      return insertBenchRunWithReadings({ id: newBenchRunId(), workspaceId, optionId, revision, fileId: file.id, createdBy: userId, readings: parsed.readings }, trx);
    });
  } catch (e) {
    await deleteObject(key).catch((err) => console.error(`bench upload: could not remove object ${key} after a failed write:`, err));
    throw e;
  }
}

export interface RunCorrelation {
  run: BenchRunRecord;
  document: unknown;
  correlation: BenchCorrelation;
}

/** Predicted vs measured and the fit for a stored run, against the revision it was measured on. */
export async function loadRunCorrelation({ workspaceId, run }: { workspaceId: string; run: BenchRunRecord }): Promise<RunCorrelation> {
  const rev = await getRevisionByNumber({ workspaceId, optionId: run.optionId, revision: run.revision });
  if (!rev) throw new AppError("not_found", "Not found.");
  const readings = await listBenchReadingsByRun({ workspaceId, runId: run.id });
  return { run, document: rev.document, correlation: correlateBench(revisionDesign(rev.document, run.revision), readings) };
}
