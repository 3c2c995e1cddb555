"use client";

import { useActionState } from "react";
import { SubmitButton } from "@/components/ui";
import { IDLE } from "@/lib/action-state";
import { duplicateOptionAction } from "./actions";

/** Copies the option's latest revision into a new option and opens it. */
export function DuplicateButton({ optionId, optionName }: { optionId: string; optionName: string }) {
  const [state, formAction] = useActionState(duplicateOptionAction, IDLE);
  return (
    <form action={formAction} className="inline-flex items-center gap-2">
      <input type="hidden" name="optionId" value={optionId} />
      <SubmitButton size="sm" variant="secondary" pendingLabel="Duplicating…" aria-label={`Duplicate ${optionName}`}>
        Duplicate
      </SubmitButton>
      {!state.ok && (
        <span role="alert" className="text-xs text-alarm-700">
          {state.message}
        </span>
      )}
    </form>
  );
}
