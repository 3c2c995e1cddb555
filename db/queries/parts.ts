import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { PartKind } from "@/lib/parts/kinds";
import type { PartValues } from "@/lib/parts/values";
import type { PartListFilter } from "@/lib/parts/schema";
import { newRecordId } from "@/db/ids";

// The parts library. Every function takes the workspace id, so another
// workspace's part is simply not found (callers answer 404).
export interface PartRecord extends PartValues {
  id: string;
  workspaceId: string;
  datasheet: { id: string; filename: string; sizeBytes: number } | null;
  createdAt: string;
  updatedAt: string;
}

export interface PartPage {
  items: PartRecord[];
  total: number;
  page: number;
  pageSize: number;
  pageCount: number;
}

/** Export and "list all" stop here; a library is far smaller (policy). */
export const MAX_PARTS_PER_LIST = 20_000;

interface PartRow {
  id: string;
  workspace_id: string;
  kind: PartKind;
  manufacturer: string;
  mpn: string;
  description: string;
  params: PartValues["params"];
  tolerance: PartValues["tolerance"];
  unit_cost: string | null;
  datasheet_file_id: string | null;
  datasheet_filename: string | null;
  datasheet_size: string | null;
  created_at: Date;
  updated_at: Date;
}

export function newPartId(): string {
  return newRecordId("prt");
}

function toRecord(r: PartRow): PartRecord {
  return {
    id: r.id,
    workspaceId: r.workspace_id,
    kind: r.kind,
    manufacturer: r.manufacturer,
    mpn: r.mpn,
    description: r.description,
    params: r.params,
    tolerance: r.tolerance,
    unitCost: r.unit_cost === null ? null : Number(r.unit_cost),
    datasheet: r.datasheet_file_id ? { id: r.datasheet_file_id, filename: r.datasheet_filename ?? "datasheet.pdf", sizeBytes: Number(r.datasheet_size ?? 0) } : null,
    createdAt: r.created_at.toISOString(),
    updatedAt: r.updated_at.toISOString(),
  };
}

function baseQuery(db: Knex, workspaceId: string): Knex.QueryBuilder {
  return db("part as p")
    .leftJoin("stored_file as f", "f.id", "p.datasheet_file_id")
    .where("p.workspace_id", workspaceId)
    .select("p.*", "f.filename as datasheet_filename", "f.size_bytes as datasheet_size");
}

/** SQL value of the filtered parameter: a number from params, or hFE interpolated at ic (part_hfe_at). */
function paramExpr(db: Knex, param: NonNullable<PartListFilter["param"]>): Knex.Raw {
  if (param.key === "hfe") return db.raw("part_hfe_at(p.params -> 'hfe', ?::float8)", [param.ic]);
  const path = param.key.split(".");
  return db.raw("(case when jsonb_typeof(p.params #> ?::text[]) = 'number' then (p.params #>> ?::text[])::float8 end)", [path, path]);
}

function escapeLike(s: string): string {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

function applyFilter(db: Knex, qb: Knex.QueryBuilder, filter: PartListFilter): Knex.QueryBuilder {
  if (filter.kind) qb.where("p.kind", filter.kind);
  if (filter.search) {
    const like = `%${escapeLike(filter.search)}%`;
    qb.where((w) => w.whereILike("p.mpn", like).orWhereILike("p.manufacturer", like).orWhereILike("p.description", like));
  }
  if (filter.param) {
    const expr = paramExpr(db, filter.param);
    qb.whereRaw("? is not null", [expr]);
    if (filter.param.min !== null) qb.whereRaw("? >= ?", [expr, filter.param.min]);
    if (filter.param.max !== null) qb.whereRaw("? <= ?", [expr, filter.param.max]);
  }
  return qb;
}

const SORT_COLUMNS = { mpn: "p.mpn", manufacturer: "p.manufacturer", kind: "p.kind", unitCost: "p.unit_cost", updatedAt: "p.updated_at" } as const;

function applySort(db: Knex, qb: Knex.QueryBuilder, filter: PartListFilter): Knex.QueryBuilder {
  const dir = filter.dir === "desc" ? "desc" : "asc";
  if (filter.sort === "param" && filter.param) qb.orderByRaw(`? ${dir} nulls last`, [paramExpr(db, filter.param)]);
  else if (filter.sort !== "param") qb.orderByRaw(`${SORT_COLUMNS[filter.sort]} ${dir} nulls last`);
  return qb.orderBy("p.mpn", "asc").orderBy("p.id", "asc"); // stable pages
}

export async function listPartsByWorkspace({ workspaceId, filter }: { workspaceId: string; filter: PartListFilter }, db: Knex = getDb()): Promise<PartPage> {
  const countQ = applyFilter(db, db("part as p").where("p.workspace_id", workspaceId), filter).count<{ n: string }[]>({ n: "*" });
  const [{ n }] = await countQ;
  const total = Number(n);
  const pageCount = Math.max(1, Math.ceil(total / filter.pageSize));
  const page = Math.min(filter.page, pageCount);
  const rows = await applySort(db, applyFilter(db, baseQuery(db, workspaceId), filter), filter)
    .limit(filter.pageSize)
    .offset((page - 1) * filter.pageSize);
  return { items: (rows as PartRow[]).map(toRecord), total, page, pageSize: filter.pageSize, pageCount };
}

/** Every matching part, for the CSV export (filters apply, pages do not). */
export async function listAllPartsByWorkspace({ workspaceId, filter }: { workspaceId: string; filter: PartListFilter }, db: Knex = getDb()): Promise<PartRecord[]> {
  const rows = await applySort(db, applyFilter(db, baseQuery(db, workspaceId), filter), filter).limit(MAX_PARTS_PER_LIST);
  return (rows as PartRow[]).map(toRecord);
}

export async function getPartById({ workspaceId, id }: { workspaceId: string; id: string }, db: Knex = getDb()): Promise<PartRecord | null> {
  const row = (await baseQuery(db, workspaceId).where("p.id", id).first()) as PartRow | undefined;
  return row ? toRecord(row) : null;
}

function columnsOf(v: PartValues) {
  return {
    kind: v.kind,
    manufacturer: v.manufacturer,
    mpn: v.mpn,
    description: v.description,
    params: JSON.stringify(v.params),
    tolerance: JSON.stringify(v.tolerance),
    unit_cost: v.unitCost,
  };
}

function isUniqueViolation(e: unknown): boolean {
  return (e as { code?: string })?.code === "23505";
}

/** The new part, or "duplicate_mpn" when the workspace already has that part number. */
export async function insertPart({ workspaceId, userId, values }: { workspaceId: string; userId: string; values: PartValues }, db: Knex = getDb()): Promise<PartRecord | "duplicate_mpn"> {
  const id = newPartId();
  try {
    await db("part").insert({ id, workspace_id: workspaceId, created_by: userId, ...columnsOf(values) });
  } catch (e) {
    if (isUniqueViolation(e)) return "duplicate_mpn";
    throw e;
  }
  return (await getPartById({ workspaceId, id }, db)) as PartRecord;
}

/** The updated part, null when not found, "duplicate_mpn" when another part has that part number. */
export async function updatePartById(
  { workspaceId, id, values }: { workspaceId: string; id: string; values: PartValues },
  db: Knex = getDb(),
): Promise<PartRecord | null | "duplicate_mpn"> {
  try {
    const n = await db("part").where({ workspace_id: workspaceId, id }).update({ ...columnsOf(values), updated_at: db.fn.now() });
    if (!n) return null;
  } catch (e) {
    if (isUniqueViolation(e)) return "duplicate_mpn";
    throw e;
  }
  return getPartById({ workspaceId, id }, db);
}

/** Deletes the part; returns its datasheet file id (the caller removes the file) and what it was, or null when not found. */
export async function deletePartById({ workspaceId, id }: { workspaceId: string; id: string }, db: Knex = getDb()): Promise<{ datasheetFileId: string | null; mpn: string; manufacturer: string } | null> {
  const rows = await db("part").where({ workspace_id: workspaceId, id }).delete().returning<{ datasheet_file_id: string | null; mpn: string; manufacturer: string }[]>(["datasheet_file_id", "mpn", "manufacturer"]);
  return rows.length ? { datasheetFileId: rows[0].datasheet_file_id, mpn: rows[0].mpn, manufacturer: rows[0].manufacturer } : null;
}

export async function setPartDatasheetById({ workspaceId, id, fileId }: { workspaceId: string; id: string; fileId: string | null }, db: Knex = getDb()): Promise<boolean> {
  const n = await db("part").where({ workspace_id: workspaceId, id }).update({ datasheet_file_id: fileId, updated_at: db.fn.now() });
  return n > 0;
}
