"use client";
import { useActionState, useEffect, useState, startTransition } from "react";
import { IDLE, type ActionState } from "@/lib/action-state";
import { PASSWORD_MIN_LENGTH } from "@/lib/password-policy";
import { TextInput } from "@/components/ui/Field";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { ROLE_LABELS } from "@/components/ui/Badge";
import type { Role } from "@/lib/roles";
import { StateMessage, fieldError } from "../_components/StateMessage";
import { useFragmentToken } from "../_components/useFragmentToken";
import { acceptInviteAction, describeInviteAction } from "./actions";

interface Described {
  workspaceName: string;
  email: string;
  role: Role;
  hasAccount: boolean;
  signedInAs: string | null;
}

export function AcceptInviteForm() {
  const token = useFragmentToken();
  const [described, describe] = useActionState(describeInviteAction, IDLE);
  const [state, formAction] = useActionState(acceptInviteAction, IDLE);
  const [displayName, setDisplayName] = useState("");

  useEffect(() => {
    if (!token) return;
    const fd = new FormData();
    fd.set("token", token);
    startTransition(() => describe(fd));
  }, [token, describe]);

  if (token === null) return <p className="text-sm text-ink-soft">Reading the invitation…</p>;
  if (!token) return <StateMessage state={{ ok: false, message: "This page needs the invitation link from your e-mail.", fieldErrors: {} }} />;
  if (!described.ok) return <StateMessage state={described} />;
  const invite = described.data as Described | undefined;
  if (!invite) return <p className="text-sm text-ink-soft">Checking the invitation…</p>;

  const alreadySignedIn = invite.signedInAs === invite.email;
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <p className="text-sm text-ink">
        Join <strong>{invite.workspaceName}</strong> as <strong>{ROLE_LABELS[invite.role]}</strong> with{" "}
        <span className="font-mono">{invite.email}</span>.
      </p>
      <StateMessage state={state as ActionState} />
      <input type="hidden" name="token" value={token} />
      {!invite.hasAccount && (
        <>
          <TextInput name="displayName" label="Your name" autoComplete="name" required value={displayName} onChange={(e) => setDisplayName(e.target.value)} error={fieldError(state, "displayName")} />
          <TextInput
            name="password"
            label="Choose a password"
            type="password"
            autoComplete="new-password"
            minLength={PASSWORD_MIN_LENGTH}
            hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
            required
            error={fieldError(state, "password")}
          />
        </>
      )}
      {invite.hasAccount && !alreadySignedIn && (
        <TextInput name="password" label="Password of your Heatsplit account" type="password" autoComplete="current-password" required error={fieldError(state, "password")} />
      )}
      <SubmitButton pendingLabel="Joining…">{invite.hasAccount ? "Join the workspace" : "Create account and join"}</SubmitButton>
    </form>
  );
}
