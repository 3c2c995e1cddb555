import { publicRoute } from "@/app/_lib/access";
import { resetPasswordSchema } from "@/lib/accounts/schema";
import { resetPassword } from "@/services/accounts/password-reset";

// Sets a new password from a reset link's token; the account is signed out everywhere.
export const POST = publicRoute({ body: resetPasswordSchema }, async ({ body }) => {
  await resetPassword(body);
  return { message: "Password changed. Sign in with the new password." };
});
