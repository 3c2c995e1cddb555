"use client";
import Link from "next/link";
import { useActionState } from "react";
import { IDLE } from "@/lib/action-state";
import { PASSWORD_MIN_LENGTH } from "@/lib/password-policy";
import { TextInput } from "@/components/ui/Field";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { FormMessage } from "@/components/ui/FormMessage";
import { StateMessage, fieldError } from "../_components/StateMessage";
import { useFragmentToken } from "../_components/useFragmentToken";
import { resetPasswordAction } from "./actions";

export function ResetPasswordForm() {
  const token = useFragmentToken();
  const [state, formAction] = useActionState(resetPasswordAction, IDLE);
  if (token === null) return <p className="text-sm text-ink-soft">Reading the link…</p>;
  if (!token) {
    return (
      <FormMessage tone="error">
        This page needs the link from the e-mail we sent. <Link href="/forgot-password" className="underline">Ask for a new link</Link>.
      </FormMessage>
    );
  }
  if (state.ok && state.message) {
    return (
      <div className="flex flex-col gap-4">
        <StateMessage state={state} />
        <Link href="/sign-in" className="text-sm font-medium text-copper-700 hover:underline">
          Sign in
        </Link>
      </div>
    );
  }
  const tokenError = fieldError(state, "token");
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <StateMessage state={state} />
      {tokenError && (
        <p className="text-sm">
          <Link href="/forgot-password" className="text-copper-700 hover:underline">
            Ask for a new link
          </Link>
        </p>
      )}
      <input type="hidden" name="token" value={token} />
      <TextInput
        name="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        required
        minLength={PASSWORD_MIN_LENGTH}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={fieldError(state, "password")}
      />
      <SubmitButton pendingLabel="Saving…">Set new password</SubmitButton>
    </form>
  );
}
