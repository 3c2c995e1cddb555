import type { AppErrorCode } from "./errors";

// The state every server action returns to `useActionState`. Kept apart from
// access.ts (server-only) so client components can import the initial value.
// A refusal carries the same code the route handler's error would (lib/errors.ts),
// so a form and an API client of the same door are told the same thing.
export type ActionState =
  | { ok: true; message?: string; data?: Record<string, unknown> }
  | { ok: false; message: string; fieldErrors: Record<string, string>; code?: AppErrorCode | "internal" };

/** Initial state for useActionState: nothing to show yet. */
export const IDLE: ActionState = { ok: true };
