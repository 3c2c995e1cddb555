import { publicRoute } from "@/app/_lib/access";
import { signInSchema } from "@/lib/accounts/schema";
import { signIn } from "@/services/accounts/sign-in";
import { clientAddress } from "@/app/_lib/client-address";

// Wrong e-mail or password -> 401 with one generic message; throttled -> 429.
export const POST = publicRoute({ body: signInSchema }, async ({ body, req }) => {
  const { user, workspaceId } = await signIn({ email: body.email, password: body.password, address: clientAddress(req.headers) });
  return { user, workspaceId };
});
