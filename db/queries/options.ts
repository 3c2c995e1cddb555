import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { newRecordId } from "@/db/ids";

// design_option rows and their numbered option_revision documents. Every
// function takes the workspace id, so another workspace's option is simply
// not found (callers answer 404). Revisions are immutable once written.
export type PartRefs = Record<string, string>;

export interface OptionRecord {
  id: string;
  workspaceId: string;
  projectId: string;
  name: string;
  summary: string;
  latestRevision: number;
  archived: boolean;
  createdBy: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface OptionListItem extends OptionRecord {
  savedAt: string | null;
  savedByName: string | null;
}

export interface RevisionSummary {
  revision: number;
  note: string;
  frozen: boolean;
  createdBy: string | null;
  createdByName: string | null;
  createdAt: string;
}

export interface RevisionRecord extends RevisionSummary {
  optionId: string;
  document: unknown;
  partRefs: PartRefs;
}

interface OptionRow {
  id: string;
  workspace_id: string;
  project_id: string;
  name: string;
  summary: string;
  latest_revision: number;
  archived: boolean;
  created_by: string | null;
  created_at: Date;
  updated_at: Date;
}

function toOption(r: OptionRow): OptionRecord {
  return {
    id: r.id,
    workspaceId: r.workspace_id,
    projectId: r.project_id,
    name: r.name,
    summary: r.summary,
    latestRevision: r.latest_revision,
    archived: r.archived,
    createdBy: r.created_by,
    createdAt: r.created_at.toISOString(),
    updatedAt: r.updated_at.toISOString(),
  };
}

interface RevisionRow {
  option_id: string;
  revision: number;
  document: unknown;
  part_refs: PartRefs;
  note: string;
  frozen: boolean;
  created_by: string | null;
  created_by_name: string | null;
  created_at: Date;
}

function toSummary(r: RevisionRow): RevisionSummary {
  return { revision: r.revision, note: r.note, frozen: r.frozen, createdBy: r.created_by, createdByName: r.created_by_name, createdAt: r.created_at.toISOString() };
}

export function newOptionId(): string {
  return newRecordId("opt");
}

export interface NewOption {
  workspaceId: string;
  projectId: string;
  name: string;
  summary?: string;
  document: unknown;
  partRefs?: PartRefs;
  note?: string;
  createdBy: string | null;
  id?: string;
}

/** A new option and its revision 1, together or not at all. */
export async function insertOptionWithFirstRevision(o: NewOption, db: Knex = getDb()): Promise<OptionRecord> {
  return db.transaction(async (trx) => {
    const [row] = await trx<OptionRow>("design_option")
      .insert({ id: o.id ?? newOptionId(), workspace_id: o.workspaceId, project_id: o.projectId, name: o.name, summary: o.summary ?? "", latest_revision: 1, created_by: o.createdBy })
      .returning("*");
    await trx("option_revision").insert({
      option_id: row.id,
      revision: 1,
      document: JSON.stringify(o.document),
      part_refs: JSON.stringify(o.partRefs ?? {}),
      note: o.note ?? "",
      created_by: o.createdBy,
    });
    await trx("project").where({ id: o.projectId }).update({ updated_at: trx.fn.now() });
    return toOption(row);
  });
}

export async function getDesignOptionById({ workspaceId, optionId }: { workspaceId: string; optionId: string }, db: Knex = getDb()): Promise<OptionRecord | null> {
  const row = await db<OptionRow>("design_option").where({ id: optionId, workspace_id: workspaceId }).first();
  return row ? toOption(row) : null;
}

/** A project's options, newest activity first, with who saved the latest revision. */
export async function listOptionsByProject(
  { workspaceId, projectId, includeArchived = false }: { workspaceId: string; projectId: string; includeArchived?: boolean },
  db: Knex = getDb(),
): Promise<OptionListItem[]> {
  const q = db("design_option as o")
    .leftJoin("option_revision as r", (j) => j.on("r.option_id", "o.id").andOn("r.revision", "o.latest_revision"))
    .leftJoin("auth_user as u", "u.id", "r.created_by")
    .where({ "o.workspace_id": workspaceId, "o.project_id": projectId });
  if (!includeArchived) q.andWhere("o.archived", false);
  const rows = await q
    .orderBy([{ column: "o.updated_at", order: "desc" }, { column: "o.id" }])
    .select<(OptionRow & { saved_at: Date | null; saved_by_name: string | null })[]>("o.*", "r.created_at as saved_at", "u.display_name as saved_by_name");
  return rows.map((r) => ({ ...toOption(r), savedAt: r.saved_at?.toISOString() ?? null, savedByName: r.saved_by_name }));
}

function revisionQuery(db: Knex, { workspaceId, optionId }: { workspaceId: string; optionId: string }) {
  return db("option_revision as r")
    .join("design_option as o", "o.id", "r.option_id")
    .leftJoin("auth_user as u", "u.id", "r.created_by")
    .where({ "o.id": optionId, "o.workspace_id": workspaceId });
}

export async function listRevisionsByOption({ workspaceId, optionId }: { workspaceId: string; optionId: string }, db: Knex = getDb()): Promise<RevisionSummary[]> {
  const rows = await revisionQuery(db, { workspaceId, optionId })
    .orderBy("r.revision", "desc")
    .select<RevisionRow[]>("r.revision", "r.note", "r.frozen", "r.created_by", "r.created_at", "u.display_name as created_by_name");
  return rows.map(toSummary);
}

export async function getRevisionByNumber(
  { workspaceId, optionId, revision }: { workspaceId: string; optionId: string; revision: number },
  db: Knex = getDb(),
): Promise<RevisionRecord | null> {
  const row = await revisionQuery(db, { workspaceId, optionId })
    .andWhere("r.revision", revision)
    .first<RevisionRow | undefined>("r.*", "u.display_name as created_by_name");
  return row ? { ...toSummary(row), optionId: row.option_id, document: row.document, partRefs: row.part_refs ?? {} } : null;
}

export async function updateOptionById(
  { workspaceId, optionId, patch }: { workspaceId: string; optionId: string; patch: { name?: string; summary?: string; archived?: boolean } },
  db: Knex = getDb(),
): Promise<OptionRecord | null> {
  const [row] = await db<OptionRow>("design_option")
    .where({ id: optionId, workspace_id: workspaceId })
    .update({ ...patch, updated_at: db.fn.now() })
    .returning("*");
  return row ? toOption(row) : null;
}
