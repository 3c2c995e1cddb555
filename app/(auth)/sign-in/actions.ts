"use server";
import { redirect } from "next/navigation";
import { publicAction } from "@/app/_lib/access";
import { signInSchema } from "@/lib/accounts/schema";
import { signIn } from "@/services/accounts/sign-in";
import { clientAddress } from "@/app/_lib/client-address";
import { safeNextPath } from "@/lib/paths";

// Same flow as POST /api/v1/auth/sign-in.
export const signInAction = publicAction({ schema: signInSchema }, async (input, { headers }) => {
  const { workspaceId } = await signIn({ email: input.email, password: input.password, address: clientAddress(headers) });
  redirect(workspaceId ? safeNextPath(input.next) : "/sign-in");
});
