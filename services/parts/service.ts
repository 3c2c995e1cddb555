import "server-only";
import { AppError } from "@/lib/errors";
import { validatePartDraft, type PartValues } from "@/lib/parts/values";
import { flattenPaths } from "@/models/documentPath";
import type { PartPatch } from "@/lib/parts/schema";
import type { Member } from "@/services/auth/member";
import { loadInWorkspace } from "@/services/records";
import { removeObjectQuietly, replacePartDatasheet } from "@/services/parts/datasheets";
import { getDb } from "@/db/knex";
import { deletePartById, getPartById, insertPart, updatePartById, type PartRecord } from "@/db/queries/parts";
import { deleteStoredFileById, type StoredFileRecord } from "@/db/queries/files";
import { insertActivity } from "@/db/queries/activity";

// The parts library: the one door for every change to a part, used by the
// /api/v1/parts handlers (the part pages call them from the browser).
const duplicate = (message: string) => new AppError("conflict", message, [{ path: "mpn", message: "this part number is already in the library" }]);

export async function createPart(member: Member, values: PartValues): Promise<PartRecord> {
  const part = await insertPart({ workspaceId: member.workspace.id, userId: member.user.id, values });
  if (part === "duplicate_mpn") throw duplicate(`A part ${values.mpn} is already in the library.`);
  return part;
}

/** Given params replace the stored ones and are checked, with the kind, as a whole; logged in the activity. */
export async function updatePart(member: Member, input: { partId: string; patch: PartPatch }): Promise<PartRecord> {
  const current = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id: input.partId }));
  const { patch } = input;
  const r = validatePartDraft({
    kind: patch.kind ?? current.kind,
    manufacturer: patch.manufacturer ?? current.manufacturer,
    mpn: patch.mpn ?? current.mpn,
    description: patch.description ?? current.description,
    unitCost: patch.unitCost === undefined ? current.unitCost : patch.unitCost,
    params: flattenPaths(patch.params ?? current.params),
    tolerance: patch.tolerance ?? current.tolerance,
  });
  if (!r.ok) throw new AppError("bad_request", "Check the request body.", r.issues);
  const workspaceId = member.workspace.id;
  return getDb().transaction(async (trx) => {
    const updated = await updatePartById({ workspaceId, id: current.id, values: r.value }, trx);
    if (updated === "duplicate_mpn") throw duplicate(`Another part is already numbered ${r.value.mpn}.`);
    if (!updated) throw new AppError("not_found", "Not found.");
    const detail = {
      partId: current.id,
      mpn: updated.mpn,
      manufacturer: updated.manufacturer,
      ...(updated.mpn !== current.mpn ? { previousMpn: current.mpn } : {}),
    };
    await insertActivity({ workspaceId, projectId: null, actor: member.user.id, action: "part.updated", detail }, trx);
    return updated;
  });
}

/** The part and its datasheet go; logged in the activity. */
export async function deletePart(member: Member, input: { partId: string }): Promise<void> {
  const workspaceId = member.workspace.id;
  const objectKey = await getDb().transaction(async (trx) => {
    const gone = await deletePartById({ workspaceId, id: input.partId }, trx);
    if (!gone) throw new AppError("not_found", "Not found.");
    await insertActivity(
      {
        workspaceId,
        projectId: null,
        actor: member.user.id,
        action: "part.deleted",
        detail: { partId: input.partId, mpn: gone.mpn, manufacturer: gone.manufacturer },
      },
      trx,
    );
    return gone.datasheetFileId ? deleteStoredFileById({ workspaceId, id: gone.datasheetFileId }, trx) : null;
  });
  if (objectKey) await removeObjectQuietly(objectKey);
}

/** An uploaded file, read (within its limit) only once the record it is for was found: nobody streams a body at another workspace's record. */
export type ReadUpload<T = object> = () => Promise<T & { filename: string | null; bytes: Uint8Array }>;

/** Stores a PDF (checked by content) as the part's datasheet, replacing the previous one. */
export async function attachDatasheet(member: Member, input: { partId: string; upload: ReadUpload }): Promise<StoredFileRecord> {
  const part = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id: input.partId }));
  const { filename, bytes } = await input.upload();
  return replacePartDatasheet({
    workspaceId: member.workspace.id,
    partId: part.id,
    userId: member.user.id,
    filename,
    bytes,
    previousFileId: part.datasheet?.id ?? null,
  });
}
