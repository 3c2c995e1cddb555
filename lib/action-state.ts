// The state every server action returns to `useActionState`. Kept apart from
// access.ts (server-only) so client components can import the initial value.
export type ActionState =
  | { ok: true; message?: string; data?: Record<string, unknown> }
  | { ok: false; message: string; fieldErrors: Record<string, string> };

/** Initial state for useActionState: nothing to show yet. */
export const IDLE: ActionState = { ok: true };
