import "server-only";
import { AppError } from "@/lib/errors";
import type { Member } from "@/services/auth/member";
import { parsePartsCsv, type CsvIssue } from "@/lib/parts/csv";
import { listPartMpnsByWorkspace, upsertPartsByMpn } from "@/db/queries/partsBulk";

export interface ImportPreview {
  total: number;
  valid: number;
  create: number;
  update: number;
  issues: CsvIssue[];
  rows: { row: number; kind: string; manufacturer: string; mpn: string; action: "create" | "update" }[];
}

export async function previewPartsImport(member: Member, { text }: { text: string }): Promise<ImportPreview> {
  const parsed = parsePartsCsv(text);
  const existing = await listPartMpnsByWorkspace({ workspaceId: member.workspace.id, mpns: parsed.rows.map((r) => r.value.mpn) });
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
export async function commitPartsImport(member: Member, { text }: { text: string }): Promise<{ created: number; updated: number }> {
  const parsed = parsePartsCsv(text);
  if (parsed.issues.length) {
    throw new AppError(
      "bad_request",
      `Nothing imported: ${parsed.issues.length} problem${parsed.issues.length === 1 ? "" : "s"} in the file.`,
      parsed.issues.map((i) => ({ path: `row ${i.row}${i.column ? ` · ${i.column}` : ""}`, message: i.message })),
    );
  }
  if (!parsed.rows.length) throw new AppError("bad_request", "The file has no parts.");
  return upsertPartsByMpn({ workspaceId: member.workspace.id, userId: member.user.id, rows: parsed.rows.map((r) => r.value) });
}
