import "server-only";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/roles";
import type { Member } from "@/services/auth/member";
import { deleteMemberByUser, updateMemberRoleByUser, type MemberChange } from "@/db/queries/members";

const LAST_ADMIN = "A workspace needs at least one admin. Make someone else admin first.";

function check(result: MemberChange): void {
  if (result === "not_found") throw new AppError("not_found", "No such member in this workspace.");
  if (result === "last_admin") throw new AppError("conflict", LAST_ADMIN, [{ path: "role", message: LAST_ADMIN }]);
}

export async function changeMemberRole(member: Member, { userId, role }: { userId: string; role: Role }): Promise<void> {
  check(await updateMemberRoleByUser({ workspaceId: member.workspace.id, userId, role, actor: member.user.id }));
}

export async function removeMember(member: Member, { userId }: { userId: string }): Promise<void> {
  check(await deleteMemberByUser({ workspaceId: member.workspace.id, userId, actor: member.user.id }));
}
