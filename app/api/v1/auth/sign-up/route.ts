import { publicRoute, reply } from "@/app/_lib/access";
import { signUpSchema } from "@/app/_lib/accounts/schemas";
import { signUp } from "@/app/_lib/accounts/sign-up";

// Creates an account and its workspace (creator = admin) and signs in.
export const POST = publicRoute({ body: signUpSchema }, async ({ body }) => {
  const { user, workspace } = await signUp(body);
  return reply({ user, workspace, role: "admin" }, 201);
});
