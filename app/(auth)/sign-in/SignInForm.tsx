"use client";
import Link from "next/link";
import { useActionState, useState } from "react";
import { IDLE } from "@/lib/action-state";
import { TextInput } from "@/components/ui/Field";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { StateMessage, fieldError } from "../_components/StateMessage";
import { signInAction } from "./actions";

export function SignInForm({ next }: { next: string }) {
  const [state, formAction] = useActionState(signInAction, IDLE);
  const [email, setEmail] = useState("");
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <StateMessage state={state} />
      <input type="hidden" name="next" value={next} />
      <TextInput name="email" label="E-mail" type="email" autoComplete="email" required value={email} onChange={(e) => setEmail(e.target.value)} error={fieldError(state, "email")} />
      <TextInput name="password" label="Password" type="password" autoComplete="current-password" required error={fieldError(state, "password")} />
      <div className="flex items-center justify-between gap-3">
        <SubmitButton pendingLabel="Signing in…">Sign in</SubmitButton>
        <Link href="/forgot-password" className="text-sm text-copper-700 hover:underline">
          Forgot your password?
        </Link>
      </div>
    </form>
  );
}
