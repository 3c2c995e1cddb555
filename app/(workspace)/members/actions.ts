"use server";
import { revalidatePath } from "next/cache";
import { action } from "@/app/_lib/access";
import { changeRoleFormSchema, inviteSchema, removeMemberFormSchema, revokeInviteFormSchema } from "@/lib/accounts/schema";
import { createInvite, revokeInvite } from "@/services/members/invites";
import { changeMemberRole, removeMember } from "@/services/members/service";
import { ROLE_LABELS } from "@/components/ui/Badge";

// The members page's forms; the same flows as /api/v1/invites and /api/v1/members/[userId].
export const inviteMemberAction = action({ permission: "members:manage", schema: inviteSchema }, async (input, member) => {
  await createInvite(member, input);
  revalidatePath("/members");
  return { ok: true, message: `Invitation sent to ${input.email} as ${ROLE_LABELS[input.role]}.` };
});

export const changeRoleAction = action({ permission: "members:manage", schema: changeRoleFormSchema }, async (input, member) => {
  await changeMemberRole(member, input);
  revalidatePath("/members");
  return { ok: true, message: `Role changed to ${ROLE_LABELS[input.role]}.` };
});

export const removeMemberAction = action({ permission: "members:manage", schema: removeMemberFormSchema }, async (input, member) => {
  await removeMember(member, input);
  revalidatePath("/members");
  return { ok: true, message: "Member removed." };
});

export const revokeInviteAction = action({ permission: "members:manage", schema: revokeInviteFormSchema }, async (input, member) => {
  await revokeInvite(member, input.inviteId);
  revalidatePath("/members");
  return { ok: true, message: "Invitation withdrawn." };
});
