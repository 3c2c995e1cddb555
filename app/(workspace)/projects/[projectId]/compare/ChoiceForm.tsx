"use client";

import { useActionState } from "react";
import { IDLE } from "@/lib/action-state";
import { FormMessage, Select, SubmitButton, Textarea } from "@/components/ui";
import { chooseOptionAction } from "./actions";

/** The manager's sign-off form: which option, at its latest revision, and why. */
export function ChoiceForm({ projectId, options, preselect }: { projectId: string; options: { id: string; name: string; revision: number }[]; preselect?: string }) {
  const [state, formAction] = useActionState(chooseOptionAction, IDLE);
  const errors = state.ok ? {} : state.fieldErrors;
  return (
    <form action={formAction} className="flex flex-col gap-4" aria-label="Record the chosen option">
      <input type="hidden" name="projectId" value={projectId} />
      <Select
        name="optionId"
        label="Chosen option"
        defaultValue={preselect}
        options={options.map((o) => ({ value: o.id, label: `${o.name} (rev ${o.revision})` }))}
        error={errors.optionId}
      />
      <Textarea name="reason" label="Reason" rows={3} hint="Recorded with your name and the time; earlier choices stay in the history." error={errors.reason} />
      <FormMessage state={state} />
      <div>
        <SubmitButton pendingLabel="Recording…">Record the choice</SubmitButton>
      </div>
    </form>
  );
}
