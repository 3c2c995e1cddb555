"use client";
import Link from "next/link";
import { useActionState } from "react";
import { IDLE } from "@/lib/action-state";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { FormMessage } from "@/components/ui/FormMessage";
import { StateMessage, fieldError } from "../../_components/StateMessage";
import { useFragmentToken } from "../../_components/useFragmentToken";
import { confirmSignUpAction } from "../actions";

export function ConfirmSignUpForm() {
  const token = useFragmentToken();
  const [state, formAction] = useActionState(confirmSignUpAction, IDLE);
  if (token === null) return <p className="text-sm text-ink-soft">Reading the link…</p>;
  if (!token) {
    return (
      <FormMessage tone="error">
        This page needs the link from the e-mail we sent. <Link href="/sign-up" className="underline">Sign up again</Link>.
      </FormMessage>
    );
  }
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <StateMessage state={state} />
      {fieldError(state, "token") && (
        <p className="text-sm">
          <Link href="/sign-in" className="text-copper-700 hover:underline">
            Sign in
          </Link>{" "}
          or{" "}
          <Link href="/sign-up" className="text-copper-700 hover:underline">
            sign up again
          </Link>
        </p>
      )}
      <input type="hidden" name="token" value={token} />
      <SubmitButton pendingLabel="Creating…">Create account and workspace</SubmitButton>
    </form>
  );
}
