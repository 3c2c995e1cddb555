"use client";
import { useActionState } from "react";
import { IDLE } from "@/lib/action-state";
import { FormMessage, SubmitButton, Textarea, TextInput } from "@/components/ui";
import { decideReviewAction, submitReviewAction } from "./actions";

export function SubmitReviewForm({ optionId, revision }: { optionId: string; revision: number }) {
  const [state, formAction] = useActionState(submitReviewAction, IDLE);
  return (
    <form action={formAction} className="flex flex-col gap-4" aria-label="Submit for review">
      <input type="hidden" name="optionId" value={optionId} />
      <input type="hidden" name="revision" value={revision} />
      <Textarea name="note" label="Note to the reviewer" optional rows={2} hint="What changed, what to look at." error={state.ok ? undefined : state.fieldErrors.note} />
      <FormMessage state={state} />
      <div>
        <SubmitButton pendingLabel="Submitting…">Submit revision {revision} for review</SubmitButton>
      </div>
    </form>
  );
}

export function DecisionForm({ optionId, revision, partIds }: { optionId: string; revision: number; partIds: string[] }) {
  const [state, formAction] = useActionState(decideReviewAction, IDLE);
  const errors = state.ok ? {} : state.fieldErrors;
  return (
    <form action={formAction} className="flex flex-col gap-4" aria-label="Review decision" noValidate>
      <input type="hidden" name="optionId" value={optionId} />
      <input type="hidden" name="revision" value={revision} />
      <Textarea name="body" label="Comment" rows={3} hint="Needed to reject: say what has to change." error={errors.body ?? errors["comments.0.body"]} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextInput name="targetPart" label="About part" optional list="review-part-ids" hint="e.g. Q1, controller" autoComplete="off" error={errors["comments.0.targetPart"]} />
        <TextInput name="targetFigure" label="About figure" optional hint="e.g. Q1 Tj at vin-max" autoComplete="off" error={errors["comments.0.targetFigure"]} />
      </div>
      <datalist id="review-part-ids">
        {partIds.map((id) => (
          <option key={id} value={id} />
        ))}
      </datalist>
      <FormMessage state={state} />
      <div className="flex flex-wrap gap-3">
        <SubmitButton name="decision" value="approved" pendingLabel="Saving…">
          Approve revision {revision}
        </SubmitButton>
        <SubmitButton name="decision" value="rejected" variant="secondary" pendingLabel="Saving…">
          Reject revision {revision}
        </SubmitButton>
      </div>
    </form>
  );
}
