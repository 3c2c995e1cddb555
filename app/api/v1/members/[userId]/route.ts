import { route } from "@/app/_lib/access";
import { changeRoleSchema, memberParams } from "@/lib/accounts/schema";
import { changeMemberRole, removeMember } from "@/services/members/service";

// Admins change a member's role or remove them; never the last admin (409).
// A user who is not in the admin's workspace is 404.
export const PATCH = route({ permission: "members:manage", params: memberParams, body: changeRoleSchema }, async ({ member, params, body }) => {
  await changeMemberRole(member, { userId: params.userId, role: body.role });
  return { userId: params.userId, role: body.role };
});

export const DELETE = route({ permission: "members:manage", params: memberParams }, async ({ member, params }) => {
  await removeMember(member, { userId: params.userId });
  return undefined;
});
