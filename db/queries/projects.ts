import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import type { ProjectListQuery, ProjectPatch, ProjectStatus, ProjectValues, Topology } from "@/lib/projects/schema";
import { defaultDirection } from "@/lib/projects/schema";
import { newRecordId } from "@/db/ids";

// project rows. Every function takes the workspace id, so a project of
// another workspace is simply not found (callers answer 404).
export interface ProjectOutput {
  label: string;
  voltage: number;
  current: number;
}

export interface ProjectRecord {
  id: string;
  workspaceId: string;
  name: string;
  topology: Topology;
  vinMin: number;
  vinNom: number;
  vinMax: number;
  outputs: ProjectOutput[];
  fsw: number;
  ambientMax: number;
  efficiencyTarget: number | null;
  notes: string;
  status: ProjectStatus;
  createdBy: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface ProjectListItem extends ProjectRecord {
  optionCount: number;
}

interface ProjectRow {
  id: string;
  workspace_id: string;
  name: string;
  topology: Topology;
  vin_min: number;
  vin_nom: number;
  vin_max: number;
  outputs: ProjectOutput[];
  fsw: number;
  ambient_max: number;
  efficiency_target: number | null;
  notes: string;
  status: ProjectStatus;
  created_by: string | null;
  created_at: Date;
  updated_at: Date;
  option_count?: string | number;
}

function toProject(r: ProjectRow): ProjectRecord {
  return {
    id: r.id,
    workspaceId: r.workspace_id,
    name: r.name,
    topology: r.topology,
    vinMin: r.vin_min,
    vinNom: r.vin_nom,
    vinMax: r.vin_max,
    outputs: r.outputs,
    fsw: r.fsw,
    ambientMax: r.ambient_max,
    efficiencyTarget: r.efficiency_target,
    notes: r.notes,
    status: r.status,
    createdBy: r.created_by,
    createdAt: r.created_at.toISOString(),
    updatedAt: r.updated_at.toISOString(),
  };
}

const COLUMNS: Record<keyof ProjectPatch, string> = {
  name: "name",
  topology: "topology",
  vinMin: "vin_min",
  vinNom: "vin_nom",
  vinMax: "vin_max",
  outputs: "outputs",
  fsw: "fsw",
  ambientMax: "ambient_max",
  efficiencyTarget: "efficiency_target",
  notes: "notes",
  status: "status",
};

function toRow(values: ProjectPatch): Record<string, unknown> {
  const row: Record<string, unknown> = {};
  for (const [key, col] of Object.entries(COLUMNS) as [keyof ProjectPatch, string][]) {
    const v = values[key];
    if (v === undefined) continue;
    row[col] = key === "outputs" ? JSON.stringify(v) : v;
  }
  return row;
}

export function newProjectId(): string {
  return newRecordId("prj");
}

export async function insertProject(
  { workspaceId, values, createdBy, id = newProjectId() }: { workspaceId: string; values: ProjectValues; createdBy: string | null; id?: string },
  db: Knex = getDb(),
): Promise<ProjectRecord> {
  const [row] = await db<ProjectRow>("project")
    .insert({ id, workspace_id: workspaceId, created_by: createdBy, status: "concept", notes: "", ...toRow(values) })
    .returning("*");
  return toProject(row);
}

export async function getProjectById({ workspaceId, projectId }: { workspaceId: string; projectId: string }, db: Knex = getDb()): Promise<ProjectRecord | null> {
  const row = await db<ProjectRow>("project").where({ id: projectId, workspace_id: workspaceId }).first();
  return row ? toProject(row) : null;
}

export async function updateProjectById(
  { workspaceId, projectId, patch }: { workspaceId: string; projectId: string; patch: ProjectPatch },
  db: Knex = getDb(),
): Promise<ProjectRecord | null> {
  const [row] = await db<ProjectRow>("project")
    .where({ id: projectId, workspace_id: workspaceId })
    .update({ ...toRow(patch), updated_at: db.fn.now() })
    .returning("*");
  return row ? toProject(row) : null;
}

const SORT_COLUMNS: Record<ProjectListQuery["sort"], string> = {
  name: "p.name",
  topology: "p.topology",
  status: "p.status",
  vin: "p.vin_max",
  fsw: "p.fsw",
  created: "p.created_at",
  updated: "p.updated_at",
};

/** Escapes LIKE wildcards so a search for "50%" means the text "50%". */
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export async function listProjectsByWorkspace(
  { workspaceId, query }: { workspaceId: string; query: ProjectListQuery },
  db: Knex = getDb(),
): Promise<{ items: ProjectListItem[]; total: number }> {
  const base = db("project as p").where("p.workspace_id", workspaceId);
  if (query.status) base.andWhere("p.status", query.status);
  if (query.topology) base.andWhere("p.topology", query.topology);
  if (query.q) base.andWhere((w) => w.whereILike("p.name", likePattern(query.q!)).orWhereILike("p.notes", likePattern(query.q!)));

  const [{ count }] = await base.clone().count<{ count: string }[]>({ count: "*" });
  const dir = query.dir ?? defaultDirection(query.sort);
  const rows = await base
    .clone()
    .select("p.*")
    .select(db.raw("(select count(*) from design_option o where o.project_id = p.id and not o.archived) as option_count"))
    // names sort without regard to case; p.id keeps pages stable on ties
    .orderByRaw(`${query.sort === "name" ? "lower(p.name)" : SORT_COLUMNS[query.sort]} ${dir === "asc" ? "asc" : "desc"}, p.id asc`)
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  return { items: (rows as ProjectRow[]).map((r) => ({ ...toProject(r), optionCount: Number(r.option_count ?? 0) })), total: Number(count) };
}
