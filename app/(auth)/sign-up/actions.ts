"use server";
import { redirect } from "next/navigation";
import { publicAction } from "@/app/_lib/access";
import { confirmSignUpSchema, signUpSchema } from "@/lib/accounts/schema";
import { SIGN_UP_REQUESTED_MESSAGE, confirmSignUp, requestSignUp } from "@/services/accounts/sign-up";
import { clientAddress } from "@/app/_lib/client-address";

// Same flows as POST /api/v1/auth/sign-up and /api/v1/auth/sign-up/confirm.
export const signUpAction = publicAction({ schema: signUpSchema }, async (input, { member, headers }) => {
  await requestSignUp(input, { address: clientAddress(headers), causedBy: member?.user.id ?? null });
  return { ok: true, message: SIGN_UP_REQUESTED_MESSAGE };
});

export const confirmSignUpAction = publicAction({ schema: confirmSignUpSchema }, async (input) => {
  await confirmSignUp(input.token);
  redirect("/home");
});
