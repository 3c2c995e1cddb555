"use client";

import { useActionState } from "react";
import { FormMessage, SubmitButton } from "@/components/ui";
import { IDLE } from "@/lib/action-state";
import { EMPTY_PROJECT_TEXT, ProjectFields } from "../_components/ProjectFields";
import { createProjectAction } from "./actions";

export function NewProjectForm() {
  const [state, formAction] = useActionState(createProjectAction, IDLE);
  const errors = state.ok ? {} : state.fieldErrors;
  return (
    <form action={formAction} className="flex flex-col gap-5" noValidate>
      {!state.ok && <FormMessage tone="error" message={state.message} />}
      <ProjectFields initial={EMPTY_PROJECT_TEXT} errors={errors} />
      <div>
        <SubmitButton pendingLabel="Creating…">Create project</SubmitButton>
      </div>
    </form>
  );
}
