import { publicRoute, reply } from "@/app/_lib/access";
import { confirmSignUpSchema } from "@/lib/accounts/schema";
import { confirmSignUp } from "@/services/accounts/sign-up";

// The sign-up link's token -> 201 { user, workspace, role }: creates the
// account and its workspace (the creator is admin) and signs in. A used,
// expired or unknown token is a 400 on "token".
export const POST = publicRoute({ body: confirmSignUpSchema }, async ({ body }) => {
  const { user, workspace } = await confirmSignUp(body.token);
  return reply({ user, workspace, role: "admin" }, 201);
});
