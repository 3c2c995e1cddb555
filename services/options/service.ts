import "server-only";
import { AppError } from "@/lib/errors";
import type { OptionPatch } from "@/lib/options/schema";
import { templateDocument } from "@/lib/options/templates";
import type { Member } from "@/services/auth/member";
import { loadInWorkspace } from "@/services/records";
import { getProjectById } from "@/db/queries/projects";
import { getDesignOptionById, insertOptionWithFirstRevision, type OptionRecord, type PartRefs } from "@/db/queries/options";
import { duplicateDesignOption, insertRevisionOnBase, listKnownPartIds } from "@/db/queries/option-revisions";
import { patchOptionLogged } from "@/db/queries/option-changes";
import { getRevisionByNumber } from "@/db/queries/options";
import { updateRevisionNoteByNumber } from "@/db/queries/revision-notes";

// Design options and their revisions: the one door for every change, used
// by the /api/v1 handlers and the project page's server actions alike.
// Inputs arrive validated by the schemas of lib/options/schema.ts.

export interface CreateOptionInput {
  projectId: string;
  name: string;
  summary?: string;
  /** A template key (checked by the schema) or a document, never both. */
  template?: string;
  document?: unknown;
}

export async function createOption(member: Member, input: CreateOptionInput): Promise<OptionRecord> {
  const project = await loadInWorkspace(member, (workspaceId) => getProjectById({ workspaceId, projectId: input.projectId }));
  const document = input.template !== undefined ? templateDocument(input.template) : input.document;
  if (document === undefined) throw new AppError("bad_request", "Check the request body.", [{ path: "template", message: "no such template" }]);
  return insertOptionWithFirstRevision({
    workspaceId: member.workspace.id,
    projectId: project.id,
    name: input.name,
    summary: input.summary,
    document,
    note: input.template !== undefined ? `Started from the "${input.template}" template` : "First revision",
    createdBy: member.user.id,
  });
}

/** A new option whose revision 1 is the source's latest revision. */
export async function duplicateOption(member: Member, input: { optionId: string; name?: string }): Promise<OptionRecord> {
  return loadInWorkspace(member, (workspaceId) =>
    duplicateDesignOption({ workspaceId, optionId: input.optionId, name: input.name, createdBy: member.user.id }),
  );
}

/** Renames and archiving are logged in the activity. */
export async function updateOption(member: Member, input: { optionId: string; patch: OptionPatch }): Promise<OptionRecord> {
  const current = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: input.optionId }));
  const option = await patchOptionLogged({ workspaceId: member.workspace.id, optionId: current.id, patch: input.patch, actor: member.user.id });
  if (!option) throw new AppError("not_found", "Not found.");
  return option;
}

export interface SaveRevisionInput {
  optionId: string;
  baseRevision: number;
  document: unknown;
  partRefs: PartRefs;
  note: string;
}

/** A new revision on top of `baseRevision`; 409 when someone saved after it. Part references must name parts of this workspace. */
export async function saveRevision(member: Member, input: SaveRevisionInput): Promise<{ revision: number; createdAt: string; note: string }> {
  const option = await loadInWorkspace(member, (workspaceId) => getDesignOptionById({ workspaceId, optionId: input.optionId }));
  const refs = Object.entries(input.partRefs);
  const known = await listKnownPartIds({ workspaceId: member.workspace.id, ids: refs.map(([, id]) => id) });
  const unknown = refs.filter(([, id]) => !known.has(id)).map(([path]) => ({ path: `partRefs.${path}`, message: "no such part in this workspace's library" }));
  if (unknown.length) throw new AppError("bad_request", "Check the request body.", unknown);
  const { baseRevision, document, partRefs, note } = input;
  const saved = await insertRevisionOnBase({
    workspaceId: member.workspace.id,
    optionId: option.id,
    baseRevision,
    document,
    partRefs,
    note,
    createdBy: member.user.id,
  });
  if (!saved.ok && saved.reason === "not_found") throw new AppError("not_found", "Not found.");
  if (!saved.ok)
    throw new AppError(
      "conflict",
      `Revision ${saved.latestRevision} was saved after revision ${baseRevision}, which your edits started from. Nothing was saved.`,
    );
  return { revision: saved.revision, createdAt: saved.createdAt, note };
}

/** The only in-place change a revision takes (a draft's note); a revision frozen for review refuses it (409). */
export async function updateRevisionNote(member: Member, input: { optionId: string; revision: number; note: string }) {
  const key = { workspaceId: member.workspace.id, optionId: input.optionId, revision: input.revision };
  const result = await updateRevisionNoteByNumber({ ...key, note: input.note, actor: member.user.id });
  if (result === "not_found") throw new AppError("not_found", "Not found.");
  if (result === "frozen") throw new AppError("conflict", `Revision ${input.revision} is frozen for review and cannot change; save a new revision instead.`);
  return getRevisionByNumber(key);
}
