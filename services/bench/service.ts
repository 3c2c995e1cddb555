import "server-only";
import crypto from "node:crypto";
import { getDb } from "@/db/knex";
import { parseDesign } from "@/models/input/schema";
import { correlateBench, type BenchCorrelation } from "@/models/fitDesign";
import { AppError } from "@/lib/errors";
import type { Member } from "@/services/auth/member";
import { loadInWorkspace } from "@/services/records";
import type { ReadUpload } from "@/services/parts/service";
import { loadRevisionEvaluation } from "@/services/evaluation/revision";
import { withDocumentValue } from "@/models/fitDesign";
import { getDesignOptionById } from "@/db/queries/options";
import { insertRevisionOnBase } from "@/db/queries/option-revisions";
import { getBenchRunById } from "@/db/queries/bench";
import { deleteObject, putObject } from "@/services/storage/storage";
import { parseBenchCsv } from "./csv";
import { insertStoredFile, newFileId, newObjectKey } from "@/db/queries/files";
import { getRevisionByNumber } from "@/db/queries/options";
import { insertBenchRunWithReadings, listBenchReadingsByRun, newBenchRunId, type BenchRunRecord } from "@/db/queries/bench";

/**
 * The measured revision's design and document, through the one loader of a
 * stored revision. Readings are compared with the document as written
 * (policy: null): a workspace derating policy changes limits, not
 * temperatures, and the fit proposes values for this document.
 */
async function measuredRevision({ workspaceId, optionId, revision }: { workspaceId: string; optionId: string; revision: number }) {
  const loaded = await loadRevisionEvaluation({ workspaceId, optionId, revision, policy: null });
  if (!loaded) return null;
  if (!loaded.ok) throw new AppError("bad_request", `Revision ${revision} does not evaluate; fix it in the editor first.`, loaded.issues);
  return { design: loaded.design, document: loaded.revision.document };
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
  const measured = await measuredRevision({ workspaceId, optionId, revision });
  if (!measured) throw new AppError("not_found", `This option has no revision ${revision}.`);
  const { design } = measured;
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
  const measured = await measuredRevision({ workspaceId, optionId: run.optionId, revision: run.revision });
  if (!measured) throw new AppError("not_found", "Not found.");
  const readings = await listBenchReadingsByRun({ workspaceId, runId: run.id });
  return { run, document: measured.document, correlation: correlateBench(measured.design, readings) };
}

/** One door for POST /api/v1/options/:optionId/bench: readings against a revision (the latest when none is named). */
export async function uploadBenchRun(member: Member, input: { optionId: string; upload: ReadUpload<{ revision?: number }> }): Promise<BenchRunRecord> {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: input.optionId }));
  const { revision, filename, bytes } = await input.upload();
  return storeBenchUpload({ workspaceId: member.workspace.id, optionId: option.id, revision: revision ?? option.latestRevision, userId: member.user.id, filename, bytes });
}

export interface AcceptedFit {
  revision: number;
  createdAt: string;
  note: string;
  changes: string[];
}

/**
 * A NEW revision (base = the run's revision) whose document carries each
 * chosen part's fitted RθJA (or RθSA of a MOSFET heatsink chain); 409 when
 * the option moved on since the measured revision.
 */
export async function acceptBenchFit(member: Member, input: { optionId: string; runId: string; parts: string[]; note?: string }): Promise<AcceptedFit> {
  const workspaceId = member.workspace.id;
  const run = await loadInWorkspace(member, (ws) => getBenchRunById({ workspaceId: ws, optionId: input.optionId, runId: input.runId }));
  const { document, correlation } = await loadRunCorrelation({ workspaceId, run });
  let next = document;
  const changes: string[] = [];
  const issues = input.parts.flatMap((id, i) => {
    const p = correlation.parts.find((c) => c.part.id === id);
    if (!p?.proposal) return [{ path: `parts.${i}`, message: `no fit for "${id}" in this run` }];
    if ("error" in p.proposal) return [{ path: `parts.${i}`, message: `${id}: ${p.proposal.error}` }];
    next = withDocumentValue(next, p.proposal.path, p.proposal.value);
    changes.push(`${id} ${p.proposal.path.split(".").pop()} ${Number(p.proposal.previous.toPrecision(4))} → ${Number(p.proposal.value.toPrecision(4))} K/W`);
    return [];
  });
  if (issues.length) throw new AppError("bad_request", "Check the request body.", issues);
  if (!parseDesign(next).ok) throw new AppError("bad_request", "The fitted values do not make a valid design.");
  const base = await loadInWorkspace(member, (ws) => getRevisionByNumber({ workspaceId: ws, optionId: run.optionId, revision: run.revision }));
  const note = (input.note ? `${input.note} (${changes.join("; ")})` : `Bench fit from run ${run.id}: ${changes.join("; ")}`).slice(0, 500);
  const saved = await insertRevisionOnBase({ workspaceId, optionId: run.optionId, baseRevision: run.revision, document: next, partRefs: base.partRefs, note, createdBy: member.user.id });
  if (!saved.ok && saved.reason === "not_found") throw new AppError("not_found", "Not found.");
  if (!saved.ok) throw new AppError("conflict", `Revision ${saved.latestRevision} was saved after revision ${run.revision}, which these readings were taken against. Upload them against the latest revision.`);
  return { revision: saved.revision, createdAt: saved.createdAt, note, changes };
}
