import { reply, route } from "@/app/_lib/access";
import { inviteSchema } from "@/lib/accounts/schema";
import { createInvite } from "@/services/members/invites";
import { listOpenInvitesByWorkspace } from "@/db/queries/invites";

// Admins list open invitations and invite by e-mail with a role.
export const GET = route({ permission: "members:manage" }, async ({ member }) => {
  const invites = await listOpenInvitesByWorkspace(member.workspace.id);
  return { invites: invites.map((i) => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt })) };
});

export const POST = route({ permission: "members:manage", body: inviteSchema }, async ({ member, body }) => {
  return reply({ invite: await createInvite(member, body) }, 201);
});
