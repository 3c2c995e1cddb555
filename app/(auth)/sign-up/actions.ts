"use server";
import { redirect } from "next/navigation";
import { publicAction } from "@/app/_lib/access";
import { signUpSchema } from "@/app/_lib/accounts/schemas";
import { signUp } from "@/app/_lib/accounts/sign-up";

// Same flow as POST /api/v1/auth/sign-up.
export const signUpAction = publicAction({ schema: signUpSchema }, async (input) => {
  await signUp(input);
  redirect("/home");
});
