import { route } from "@/app/_lib/access";
import { inviteParams } from "@/lib/accounts/schema";
import { revokeInvite } from "@/services/members/invites";

// Admins withdraw an open invitation (another workspace's -> 404).
export const DELETE = route({ permission: "members:manage", params: inviteParams }, async ({ member, params }) => {
  await revokeInvite(member, params.inviteId);
  return undefined;
});
