"use client";

import { useActionState, useState } from "react";
import { FormMessage, Select, SubmitButton, TextInput } from "@/components/ui";
import { IDLE } from "@/lib/action-state";
import type { OptionTemplate } from "@/lib/options/templates";
import { createOptionAction } from "./actions";

export function NewOptionForm({ projectId, templates }: { projectId: string; templates: OptionTemplate[] }) {
  const [state, formAction] = useActionState(createOptionAction, IDLE);
  const [template, setTemplate] = useState("");
  const [name, setName] = useState("");
  const errors = state.ok ? {} : state.fieldErrors;
  const chosen = templates.find((t) => t.key === template);
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      {!state.ok && <FormMessage tone="error" message={state.message} />}
      <input type="hidden" name="projectId" value={projectId} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Select
          name="template"
          label="Start from template"
          placeholder="Choose a template"
          value={template}
          onChange={(e) => {
            const previous = templates.find((t) => t.key === template)?.name ?? "";
            const next = templates.find((t) => t.key === e.target.value);
            if (next && (name === "" || name === previous)) setName(next.name);
            setTemplate(e.target.value);
          }}
          options={templates.map((t) => ({ value: t.key, label: t.name }))}
          error={errors.template}
          hint={chosen?.summary ?? "Invented worked examples for a 36–75 V -> 12 V converter; every value can be changed."}
        />
        <TextInput name="name" label="Option name" value={name} onChange={(e) => setName(e.target.value)} placeholder="e.g. Driver IC, 2 Ω gate" error={errors.name} />
        <TextInput name="summary" label="Summary" optional error={errors.summary} fieldClassName="sm:col-span-2" />
      </div>
      <div>
        <SubmitButton pendingLabel="Creating…">Create option</SubmitButton>
      </div>
    </form>
  );
}
