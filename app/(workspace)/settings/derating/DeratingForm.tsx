"use client";
import { useActionState } from "react";
import { IDLE } from "@/lib/action-state";
import { PART_TYPES, type PartType } from "@/models/policy";
import { FormMessage, SubmitButton, TextInput } from "@/components/ui";
import { saveDeratingAction } from "./actions";
import { PART_TYPE_LABELS } from "@/lib/derating/schema";

export interface DeratingFormValues {
  tjMargin: Record<PartType, string>;
  vgsMaxFraction: string;
  minHeadroomAbovePlateau: string;
}

/** Unit-aware fields: "25 K" (or "25 °C" as a difference), "80 %" or 0.8, "4 V". */
export function DeratingForm({ values, editable }: { values: DeratingFormValues; editable: boolean }) {
  const [state, formAction] = useActionState(saveDeratingAction, IDLE);
  const errors = state.ok ? {} : state.fieldErrors;
  return (
    <form action={formAction} className="flex flex-col gap-5" aria-label="Derating policy" noValidate>
      <fieldset className="grid gap-4 sm:grid-cols-3 lg:grid-cols-5" disabled={!editable}>
        <legend className="mb-2 text-sm font-medium">Junction margin below Tj(max), per part type</legend>
        {PART_TYPES.map((p) => (
          <TextInput key={p} name={`tjMargin.${p}`} label={PART_TYPE_LABELS[p]} defaultValue={values.tjMargin[p]} error={errors[`tjMargin.${p}`]} autoComplete="off" />
        ))}
      </fieldset>
      <fieldset className="grid gap-4 sm:grid-cols-2" disabled={!editable}>
        <legend className="mb-2 text-sm font-medium">Gate voltage</legend>
        <TextInput name="vgsMaxFraction" label="Largest |Vgs| as a share of Vgs(max)" hint="e.g. 80 %" defaultValue={values.vgsMaxFraction} error={errors.vgsMaxFraction} autoComplete="off" />
        <TextInput name="minHeadroomAbovePlateau" label="Least drive above the Miller plateau" hint="e.g. 4 V" defaultValue={values.minHeadroomAbovePlateau} error={errors.minHeadroomAbovePlateau} autoComplete="off" />
      </fieldset>
      <FormMessage state={state} />
      {editable && (
        <div>
          <SubmitButton pendingLabel="Saving…">Save policy</SubmitButton>
        </div>
      )}
    </form>
  );
}
