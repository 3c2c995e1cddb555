import "server-only";
import { AppError } from "@/lib/errors";
import type { Member } from "@/services/auth/member";
import { requireSessionMember } from "@/services/tokens/service";
import { listMembershipsByUser, type MembershipRecord } from "@/db/queries/workspaces";
import { updateSessionWorkspaceById } from "@/db/queries/sessions";

/** Points the session at another workspace of the same user; any other id is "not found". */
export async function switchWorkspace(member: Member, workspaceId: string): Promise<MembershipRecord> {
  requireSessionMember(member); // an API token belongs to one workspace
  const target = (await listMembershipsByUser(member.user.id)).find((m) => m.workspace.id === workspaceId);
  if (!target) throw new AppError("not_found", "No such workspace.", [{ path: "workspaceId", message: "You are not a member of that workspace." }]);
  await updateSessionWorkspaceById({ sessionId: member.sessionId, workspaceId });
  return target;
}
