import "server-only";
import crypto from "node:crypto";
import { getDb } from "@/db/knex";
import { AppError } from "@/lib/errors";
import { MAX_DATASHEET_BYTES } from "@/lib/limits";
import { looksLikePdf, safePdfFilename } from "./pdfCheck";
import { deleteObject, putObject } from "@/services/storage/storage";
import { deleteStoredFileById, insertStoredFile, newFileId, newObjectKey, type StoredFileRecord } from "@/db/queries/files";
import { setPartDatasheetById } from "@/db/queries/parts";


export function checkDatasheet(bytes: Uint8Array): void {
  if (bytes.byteLength > MAX_DATASHEET_BYTES) throw new AppError("payload_too_large", `A datasheet may be at most ${MAX_DATASHEET_BYTES / (1024 * 1024)} MB.`);
  if (!looksLikePdf(bytes)) throw new AppError("unsupported_media_type", "That file is not a PDF (checked by its content, not its name).");
}

/**
 * Nothing half-written: the object goes up first under a fresh key, then the
 * rows change in one transaction; if that fails the new object is deleted.
 * The replaced datasheet's object is deleted only after the commit (a failed
 * delete leaves an unreferenced object, never a row pointing at nothing).
 */
export async function replacePartDatasheet({ workspaceId, partId, userId, filename, bytes, previousFileId }: {
  workspaceId: string;
  partId: string;
  userId: string;
  filename: string | null;
  bytes: Uint8Array;
  previousFileId: string | null;
}): Promise<StoredFileRecord> {
  checkDatasheet(bytes);
  const key = newObjectKey({ workspaceId, kind: "datasheet" });
  await putObject({ key, body: bytes, contentType: "application/pdf" });
  let stored: StoredFileRecord;
  let oldKey: string | null = null;
  try {
    stored = await getDb().transaction(async (trx) => {
      const file = await insertStoredFile(
        {
          id: newFileId(),
          workspaceId,
          key,
          filename: safePdfFilename(filename),
          contentType: "application/pdf",
          sizeBytes: bytes.byteLength,
          sha256: crypto.createHash("sha256").update(bytes).digest("hex"),
          kind: "datasheet",
          createdBy: userId,
        },
        trx,
      );
      if (!(await setPartDatasheetById({ workspaceId, id: partId, fileId: file.id }, trx))) throw new AppError("not_found", "Not found.");
      if (previousFileId) oldKey = await deleteStoredFileById({ workspaceId, id: previousFileId }, trx);
      return file;
    });
  } catch (e) {
    await deleteObject(key).catch((err) => console.error(`datasheet upload: could not remove object ${key} after a failed write:`, err));
    throw e;
  }
  if (oldKey) await removeObjectQuietly(oldKey);
  return stored;
}

export async function removeObjectQuietly(key: string): Promise<void> {
  await deleteObject(key).catch((err) => console.error(`could not delete stored object ${key}:`, err));
}
