import { route } from "@/app/_lib/access";
import { listMembersByWorkspace } from "@/db/queries/members";

// Admins list the workspace's members (the members page shows the same).
export const GET = route({ permission: "members:manage" }, async ({ member }) => ({
  members: await listMembersByWorkspace(member.workspace.id),
}));
