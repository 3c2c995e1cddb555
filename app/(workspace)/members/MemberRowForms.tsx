"use client";
import { useActionState } from "react";
import { IDLE } from "@/lib/action-state";
import type { Role } from "@/lib/roles";
import { SubmitButton } from "@/components/ui/SubmitButton";
import { ROLE_OPTIONS } from "./InviteForm";
import { changeRoleAction, removeMemberAction, revokeInviteAction } from "./actions";

function RowMessage({ ok, message }: { ok: boolean; message?: string }) {
  if (!message) return null;
  return (
    <p role={ok ? "status" : "alert"} className={ok ? "text-xs text-verdigris-700" : "text-xs font-medium text-alarm-700"}>
      {message}
    </p>
  );
}

export function ChangeRoleForm({ userId, role, name }: { userId: string; role: Role; name: string }) {
  const [state, formAction] = useActionState(changeRoleAction, IDLE);
  return (
    <form action={formAction} className="flex flex-col gap-1">
      <div className="flex items-center gap-2">
        <input type="hidden" name="userId" value={userId} />
        <label className="sr-only" htmlFor={`role-${userId}`}>
          Role of {name}
        </label>
        <select id={`role-${userId}`} name="role" defaultValue={role} className="h-8 rounded-md border border-paper-edge bg-paper-raised px-2 text-sm">
          {ROLE_OPTIONS.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <SubmitButton size="sm" variant="secondary" pendingLabel="Saving…" aria-label={`Save role of ${name}`}>
          Save
        </SubmitButton>
      </div>
      <RowMessage ok={state.ok} message={state.message} />
    </form>
  );
}

export function RemoveMemberForm({ userId, name }: { userId: string; name: string }) {
  const [state, formAction] = useActionState(removeMemberAction, IDLE);
  return (
    <form
      action={formAction}
      onSubmit={(e) => {
        if (!window.confirm(`Remove ${name} from the workspace?`)) e.preventDefault();
      }}
      className="flex flex-col items-end gap-1"
    >
      <input type="hidden" name="userId" value={userId} />
      <SubmitButton size="sm" variant="ghost" pendingLabel="Removing…" aria-label={`Remove ${name}`}>
        Remove
      </SubmitButton>
      <RowMessage ok={state.ok} message={state.message} />
    </form>
  );
}

export function RevokeInviteForm({ inviteId, email }: { inviteId: string; email: string }) {
  const [state, formAction] = useActionState(revokeInviteAction, IDLE);
  return (
    <form action={formAction} className="flex flex-col items-end gap-1">
      <input type="hidden" name="inviteId" value={inviteId} />
      <SubmitButton size="sm" variant="ghost" pendingLabel="Withdrawing…" aria-label={`Withdraw the invitation to ${email}`}>
        Withdraw
      </SubmitButton>
      <RowMessage ok={state.ok} message={state.message} />
    </form>
  );
}
