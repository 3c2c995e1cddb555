import "server-only";
import { AppError } from "./errors";
import { readFormLimited, readTextLimited } from "./body-limit";
import { parsePartsCsv, type CsvIssue } from "./partCsv";
import { listPartMpnsByWorkspace, upsertPartsByMpn } from "@/db/queries/partsBulk";

/** Largest CSV accepted (policy): 5 000 parts with every column is about 2 MB. */
export const MAX_IMPORT_BYTES = 4 * 1024 * 1024;

/** Multipart framing around the file: boundaries and part headers (policy). */
const MULTIPART_SLACK_BYTES = 64 * 1024;

/**
 * The CSV of an import request: the raw body as text/csv, or the `file`
 * field of a multipart form. The size limit holds while the body streams in
 * (app/_lib/body-limit.ts), then again on the file itself.
 */
export async function readCsvUpload(req: Request): Promise<string> {
  const type = (req.headers.get("content-type") ?? "").toLowerCase();
  let text: string;
  if (type.startsWith("multipart/form-data")) {
    const file = (await readFormLimited(req, MAX_IMPORT_BYTES + MULTIPART_SLACK_BYTES, tooLarge)).get("file");
    if (!(file instanceof Blob)) throw new AppError("bad_request", "Attach the CSV file as the form field \"file\".");
    if (file.size > MAX_IMPORT_BYTES) throw tooLarge();
    text = await file.text();
  } else if (type.startsWith("text/csv") || type.startsWith("text/plain")) {
    text = await readTextLimited(req, MAX_IMPORT_BYTES, tooLarge);
  } else {
    throw new AppError("unsupported_media_type", "Send the CSV as text/csv or as a multipart form field \"file\".");
  }
  if (!text.trim()) throw new AppError("bad_request", "The file is empty.");
  const nul = text.indexOf("\u0000");
  if (nul >= 0) {
    const row = text.slice(0, nul).split("\n").length;
    throw new AppError("bad_request", "The file contains a NUL (U+0000) character; is it really a CSV text file?", [{ path: `row ${row}`, message: "contains a NUL (U+0000) character" }]);
  }
  return text;
}

function tooLarge(): AppError {
  return new AppError("payload_too_large", `An import file may be at most ${MAX_IMPORT_BYTES / (1024 * 1024)} MB.`);
}

export interface ImportPreview {
  total: number;
  valid: number;
  create: number;
  update: number;
  issues: CsvIssue[];
  rows: { row: number; kind: string; manufacturer: string; mpn: string; action: "create" | "update" }[];
}

export async function previewPartsImport({ workspaceId, text }: { workspaceId: string; text: string }): Promise<ImportPreview> {
  const parsed = parsePartsCsv(text);
  const existing = await listPartMpnsByWorkspace({ workspaceId, mpns: parsed.rows.map((r) => r.value.mpn) });
  const rows = parsed.rows.map((r) => ({
    row: r.row,
    kind: r.value.kind,
    manufacturer: r.value.manufacturer,
    mpn: r.value.mpn,
    action: existing.has(r.value.mpn) ? ("update" as const) : ("create" as const),
  }));
  const update = rows.filter((r) => r.action === "update").length;
  return { total: parsed.total, valid: rows.length, create: rows.length - update, update, issues: parsed.issues, rows };
}

/** All rows or none: any problem anywhere in the file refuses the whole import (400 with every problem listed). */
export async function commitPartsImport({ workspaceId, userId, text }: { workspaceId: string; userId: string; text: string }): Promise<{ created: number; updated: number }> {
  const parsed = parsePartsCsv(text);
  if (parsed.issues.length) {
    throw new AppError(
      "bad_request",
      `Nothing imported: ${parsed.issues.length} problem${parsed.issues.length === 1 ? "" : "s"} in the file.`,
      parsed.issues.map((i) => ({ path: `row ${i.row}${i.column ? ` · ${i.column}` : ""}`, message: i.message })),
    );
  }
  if (!parsed.rows.length) throw new AppError("bad_request", "The file has no parts.");
  return upsertPartsByMpn({ workspaceId, userId, rows: parsed.rows.map((r) => r.value) });
}
