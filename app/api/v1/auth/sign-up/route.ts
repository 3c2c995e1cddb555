import { publicRoute, reply } from "@/app/_lib/access";
import { signUpSchema } from "@/lib/accounts/schema";
import { SIGN_UP_REQUESTED_MESSAGE, requestSignUp } from "@/services/accounts/sign-up";
import { clientAddress } from "@/app/_lib/client-address";

// Starts a sign-up: 202 { message } whether or not the address has an
// account (a new one gets a link to finish, an existing one a notice), so
// the answer tells nobody which addresses are registered. Throttled per
// client address (429).
export const POST = publicRoute({ body: signUpSchema }, async ({ body, member, req }) => {
  await requestSignUp(body, { address: clientAddress(req.headers), causedBy: member?.user.id ?? null });
  return reply({ message: SIGN_UP_REQUESTED_MESSAGE }, 202);
});
