import { route } from "@/app/_lib/access";
import { inviteParams } from "@/app/_lib/accounts/schemas";
import { revokeInvite } from "@/app/_lib/accounts/invites";

// Admins withdraw an open invitation (another workspace's -> 404).
export const DELETE = route({ permission: "members:manage", params: inviteParams }, async ({ member, params }) => {
  await revokeInvite(member, params.inviteId);
  return undefined;
});
