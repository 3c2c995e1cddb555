"use client";
import { useActionState } from "react";
import { IDLE } from "@/lib/action-state";
import { FormMessage, Select, SubmitButton, TextInput } from "@/components/ui";
import { createTokenAction, revokeTokenAction } from "./actions";
import { TOKEN_EXPIRY_CHOICES } from "@/lib/tokens/schema";

const EXPIRY_OPTIONS = TOKEN_EXPIRY_CHOICES.map((d) => ({ value: String(d), label: d === 365 ? "In a year" : `In ${d} days` }));

export function CreateTokenForm() {
  const [state, formAction] = useActionState(createTokenAction, IDLE);
  const errors = state.ok ? {} : state.fieldErrors;
  const secret = state.ok && typeof state.data?.secret === "string" ? state.data.secret : null;
  return (
    <form action={formAction} className="flex flex-col gap-4" aria-label="Create an API token" noValidate>
      <div className="grid gap-4 sm:grid-cols-[1fr_12rem]">
        <TextInput name="name" label="Name" hint="What uses it, e.g. “CI sweep job”." autoComplete="off" required error={errors.name} />
        <Select name="expiresInDays" label="Expires" options={EXPIRY_OPTIONS} defaultValue="90" error={errors.expiresInDays} />
      </div>
      <TextInput name="password" type="password" label="Your password" hint="Making a token needs your password again." autoComplete="current-password" required error={errors.password} />
      <FormMessage state={state} />
      {secret && (
        <div className="rounded-md border border-copper-100 bg-copper-50 p-3">
          <label htmlFor="new-token-secret" className="text-sm font-medium">
            Your new token (shown only now)
          </label>
          <input id="new-token-secret" readOnly value={secret} onFocus={(e) => e.currentTarget.select()} className="mt-1 w-full rounded-md border border-paper-edge bg-paper-raised px-2 py-1 font-mono text-xs" data-testid="new-token-secret" />
        </div>
      )}
      <div>
        <SubmitButton pendingLabel="Creating…">Create token</SubmitButton>
      </div>
    </form>
  );
}

export function RevokeTokenForm({ id, name }: { id: string; name: string }) {
  const [state, formAction] = useActionState(revokeTokenAction, IDLE);
  return (
    <form
      action={formAction}
      onSubmit={(e) => {
        if (!window.confirm(`Revoke the token “${name}”? Scripts using it stop working at once.`)) e.preventDefault();
      }}
    >
      <input type="hidden" name="id" value={id} />
      <SubmitButton size="sm" variant="secondary" pendingLabel="Revoking…" aria-label={`Revoke ${name}`}>
        Revoke
      </SubmitButton>
      {!state.ok && <p role="alert" className="text-xs text-alarm-700">{state.message}</p>}
    </form>
  );
}
