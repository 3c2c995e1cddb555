import type { ActionState } from "@/lib/action-state";
import { FormMessage } from "@/components/ui/FormMessage";

/** The banner for an action's outcome; field errors show beside their fields. */
export function StateMessage({ state }: { state: ActionState }) {
  if (state.ok) return <FormMessage tone="success" message={state.message} />;
  return <FormMessage tone="error" message={state.message} />;
}

export function fieldError(state: ActionState, field: string): string | undefined {
  return state.ok ? undefined : state.fieldErrors[field];
}
