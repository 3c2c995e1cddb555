"use server";

import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { action } from "@/app/_lib/access";
import { issueApiToken, revokeOwnApiToken } from "@/services/tokens/service";
import { clientAddress } from "@/app/_lib/client-address";
import { tokenCreateSchema, tokenRevokeFormSchema } from "@/lib/tokens/schema";

// The secret goes back once, in the state of the action that made it; the
// page never shows it again (only the SHA-256 is stored).
export const createTokenAction = action({ permission: "token:own", schema: tokenCreateSchema }, async (input, member) => {
  const { token, secret } = await issueApiToken(member, { ...input, address: clientAddress(await headers()) });
  revalidatePath("/settings/tokens");
  return { ok: true, message: `Token "${token.name}" created. Copy it now: it is shown only this once.`, data: { secret } };
});

export const revokeTokenAction = action({ permission: "token:own", schema: tokenRevokeFormSchema }, async (input, member) => {
  const revoked = await revokeOwnApiToken(member, { tokenId: input.id });
  if (!revoked) return { ok: false, message: "No such token.", fieldErrors: {}, code: "not_found" };
  revalidatePath("/settings/tokens");
  return { ok: true, message: "Revoked." };
});
