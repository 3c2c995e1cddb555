"use client";
import { useActionState, useState } from "react";
import { IDLE } from "@/lib/action-state";
import { PASSWORD_MIN_LENGTH } from "@/lib/password-policy";
import { TextInput } from "@/components/ui/Field";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { StateMessage, fieldError } from "../_components/StateMessage";
import { signUpAction } from "./actions";

export function SignUpForm() {
  const [state, formAction] = useActionState(signUpAction, IDLE);
  const [values, setValues] = useState({ displayName: "", email: "", workspaceName: "" });
  const bind = (name: keyof typeof values) => ({
    name,
    value: values[name],
    onChange: (e: React.ChangeEvent<HTMLInputElement>) => setValues((v) => ({ ...v, [name]: e.target.value })),
    error: fieldError(state, name),
  });
  // the same answer for every address: the rest happens through the mailed link
  if (state.ok && state.message) return <StateMessage state={state} />;
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <StateMessage state={state} />
      <TextInput label="Your name" autoComplete="name" required {...bind("displayName")} />
      <TextInput label="E-mail" type="email" autoComplete="email" required {...bind("email")} />
      <TextInput
        name="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        required
        minLength={PASSWORD_MIN_LENGTH}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a good one.`}
        error={fieldError(state, "password")}
      />
      <TextInput label="Workspace name" hint="Your team or company; you can invite colleagues next." required {...bind("workspaceName")} />
      <SubmitButton pendingLabel="Sending…">Create account and workspace</SubmitButton>
    </form>
  );
}
