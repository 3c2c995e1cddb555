"use server";
import { redirect } from "next/navigation";
import { publicAction } from "@/app/_lib/access";
import { acceptInviteSchema, describeInviteSchema } from "@/lib/accounts/schema";
import { describeInvite } from "@/services/members/invites";
import { acceptInvite } from "@/services/accounts/accept-invite";
import { clientAddress } from "@/app/_lib/client-address";

// Same flows as POST /api/v1/auth/invite/describe and /accept.
export const describeInviteAction = publicAction({ schema: describeInviteSchema }, async (input, { member }) => {
  const invite = await describeInvite(input.token);
  return { ok: true, data: { ...invite, signedInAs: member?.user.email ?? null } };
});

export const acceptInviteAction = publicAction({ schema: acceptInviteSchema }, async (input, { member, headers }) => {
  await acceptInvite(input, { signedInUserId: member?.user.id ?? null, address: clientAddress(headers) });
  redirect("/home");
});
