import "server-only";
import crypto from "node:crypto";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";
import { newRecordId } from "@/db/ids";

// stored_file rows: the metadata of an object in the bucket. Every lookup
// takes the workspace id, so another workspace's file is simply not found.
export type StoredFileKind = "datasheet" | "bench" | "report";

export interface StoredFileRecord {
  id: string;
  workspaceId: string;
  key: string;
  filename: string;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  kind: StoredFileKind;
  createdBy: string | null;
  createdAt: string;
}

interface FileRow {
  id: string;
  workspace_id: string;
  key: string;
  filename: string;
  content_type: string;
  size_bytes: string;
  sha256: string;
  kind: StoredFileKind;
  created_by: string | null;
  created_at: Date;
}

function toRecord(r: FileRow): StoredFileRecord {
  return {
    id: r.id,
    workspaceId: r.workspace_id,
    key: r.key,
    filename: r.filename,
    contentType: r.content_type,
    sizeBytes: Number(r.size_bytes),
    sha256: r.sha256,
    kind: r.kind,
    createdBy: r.created_by,
    createdAt: r.created_at.toISOString(),
  };
}

export function newFileId(): string {
  return newRecordId("fil");
}

/** A fresh, unguessable object key under the workspace's prefix: a replaced file never overwrites the old object. */
export function newObjectKey({ workspaceId, kind }: { workspaceId: string; kind: StoredFileKind }): string {
  return `${workspaceId}/${kind}/${crypto.randomUUID()}`;
}

export async function insertStoredFile(
  f: Omit<StoredFileRecord, "createdAt">,
  db: Knex = getDb(),
): Promise<StoredFileRecord> {
  const [row] = await db("stored_file")
    .insert({
      id: f.id,
      workspace_id: f.workspaceId,
      key: f.key,
      filename: f.filename,
      content_type: f.contentType,
      size_bytes: f.sizeBytes,
      sha256: f.sha256,
      kind: f.kind,
      created_by: f.createdBy,
    })
    .returning<FileRow[]>("*");
  return toRecord(row);
}

export async function getStoredFileById({ workspaceId, id }: { workspaceId: string; id: string }, db: Knex = getDb()): Promise<StoredFileRecord | null> {
  const row = await db<FileRow>("stored_file").where({ workspace_id: workspaceId, id }).first();
  return row ? toRecord(row) : null;
}

/** Returns the deleted row's object key (the caller deletes the object after its transaction commits). */
export async function deleteStoredFileById({ workspaceId, id }: { workspaceId: string; id: string }, db: Knex = getDb()): Promise<string | null> {
  const rows = await db("stored_file").where({ workspace_id: workspaceId, id }).delete().returning<{ key: string }[]>(["key"]);
  return rows[0]?.key ?? null;
}
