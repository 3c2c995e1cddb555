import { route } from "@/app/_lib/access";
import { PERMISSIONS, can, type Permission } from "@/lib/roles";
import { listMembershipsByUser } from "@/db/queries/workspaces";

// Who am I: user, current workspace and role, what the role allows, and the
// other workspaces the session may switch to.
export const GET = route({ permission: "read" }, async ({ member }) => {
  const memberships = await listMembershipsByUser(member.user.id);
  const permissions = (Object.keys(PERMISSIONS) as Permission[]).filter((p) => can(member.role, p));
  return {
    user: member.user,
    workspace: member.workspace,
    role: member.role,
    permissions,
    workspaces: memberships.map((m) => ({ ...m.workspace, role: m.role })),
  };
});
