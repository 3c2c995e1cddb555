"use server";
import { publicAction } from "@/app/_lib/access";
import { forgotPasswordSchema } from "@/lib/accounts/schema";
import { RESET_REQUESTED_MESSAGE, requestPasswordReset } from "@/services/accounts/password-reset";

// Same flow as POST /api/v1/auth/password/forgot; the same answer for every address.
export const forgotPasswordAction = publicAction({ schema: forgotPasswordSchema }, async (input, { member }) => {
  requestPasswordReset(input.email, member?.user.id ?? null);
  return { ok: true, message: RESET_REQUESTED_MESSAGE };
});
