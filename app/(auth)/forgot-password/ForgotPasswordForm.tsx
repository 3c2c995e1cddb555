"use client";
import { useActionState, useState } from "react";
import { IDLE } from "@/lib/action-state";
import { TextInput } from "@/components/ui/Field";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { StateMessage, fieldError } from "../_components/StateMessage";
import { forgotPasswordAction } from "./actions";

export function ForgotPasswordForm() {
  const [state, formAction] = useActionState(forgotPasswordAction, IDLE);
  const [email, setEmail] = useState("");
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <StateMessage state={state} />
      <TextInput name="email" label="E-mail" type="email" autoComplete="email" required value={email} onChange={(e) => setEmail(e.target.value)} error={fieldError(state, "email")} />
      <SubmitButton pendingLabel="Sending…">Send me a link</SubmitButton>
    </form>
  );
}
