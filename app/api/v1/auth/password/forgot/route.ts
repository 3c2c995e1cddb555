import { publicRoute } from "@/app/_lib/access";
import { forgotPasswordSchema } from "@/lib/accounts/schema";
import { RESET_REQUESTED_MESSAGE, requestPasswordReset } from "@/services/accounts/password-reset";

// Same answer whether or not the address has an account.
export const POST = publicRoute({ body: forgotPasswordSchema }, async ({ body, member }) => {
  requestPasswordReset(body.email, member?.user.id ?? null);
  return { message: RESET_REQUESTED_MESSAGE };
});
