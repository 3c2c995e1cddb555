"use client";
import { useActionState, useState } from "react";
import { IDLE } from "@/lib/action-state";
import { ROLES, type Role } from "@/lib/roles";
import { Select, TextInput } from "@/components/ui/Field";
import { FormMessage } from "@/components/ui/FormMessage";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { ROLE_LABELS } from "@/components/ui/Badge";
import { inviteMemberAction } from "./actions";

export const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

export function InviteForm() {
  const [state, formAction] = useActionState(inviteMemberAction, IDLE);
  const [email, setEmail] = useState("");
  const [role, setRole] = useState<Role>("designer");
  const errors = state.ok ? {} : state.fieldErrors;
  // A sent invitation clears the address (adjusted while rendering, when the action's state changes).
  const [seen, setSeen] = useState(state);
  if (seen !== state) {
    setSeen(state);
    if (state.ok && state.message) setEmail("");
  }
  return (
    <form
      action={formAction}
      className="flex flex-col gap-4"
      aria-label="Invite a member"
      noValidate
    >
      <FormMessage tone={state.ok ? "success" : "error"} message={state.message} />
      <div className="grid gap-4 sm:grid-cols-[1fr_12rem]">
        <TextInput name="email" label="E-mail" type="email" autoComplete="off" required value={email} onChange={(e) => setEmail(e.target.value)} error={errors.email} />
        <Select name="role" label="Role" options={ROLE_OPTIONS} value={role} onChange={(e) => setRole(e.target.value as Role)} error={errors.role} />
      </div>
      <div>
        <SubmitButton pendingLabel="Sending…">Send invitation</SubmitButton>
      </div>
    </form>
  );
}
