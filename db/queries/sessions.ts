import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// The session attribute lucia does not manage itself: which workspace the
// session works in. Creation, validation and deletion go through lucia.
export async function updateSessionWorkspaceById({ sessionId, workspaceId }: { sessionId: string; workspaceId: string }, db: Knex = getDb()): Promise<void> {
  await db("user_session").where({ id: sessionId }).update({ workspace_id: workspaceId });
}
