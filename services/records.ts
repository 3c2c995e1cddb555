import "server-only";
import { AppError } from "@/lib/errors";
import type { Member } from "@/services/auth/member";

/**
 * Every record a service or handler loads goes through a workspace-scoped
 * query (the workspace id comes from the member, never from the request),
 * so another workspace's record is simply not found: 404, never 403.
 */
export async function loadInWorkspace<T>(member: Member, load: (workspaceId: string) => Promise<T | null | undefined>): Promise<T> {
  const record = await load(member.workspace.id);
  if (record === null || record === undefined) throw new AppError("not_found", "Not found.");
  return record;
}
