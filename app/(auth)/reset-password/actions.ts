"use server";
import { publicAction } from "@/app/_lib/access";
import { resetPasswordSchema } from "@/lib/accounts/schema";
import { resetPassword } from "@/services/accounts/password-reset";

// Same flow as POST /api/v1/auth/password/reset.
export const resetPasswordAction = publicAction({ schema: resetPasswordSchema }, async (input) => {
  await resetPassword(input);
  return { ok: true, message: "Password changed. Every session of your account was signed out; sign in with the new password." };
});
