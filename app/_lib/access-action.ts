import "server-only";
import { cookies, headers } from "next/headers";
import { unstable_rethrow } from "next/navigation";
import type { z } from "zod";
import { AppError, type AppErrorCode, DATABASE_UNAVAILABLE_MESSAGE, databaseErrorSummary, isDatabaseUnavailable } from "@/lib/errors";
import { can, type Permission } from "@/lib/roles";
import { SESSION_COOKIE, setSessionCookie } from "@/services/auth/session";
import { resolveSession, type Member } from "@/services/auth/member";
import type { ActionState } from "@/lib/action-state";
import { echoesSecret, fieldErrorsOf, originAllowed, refuseUnstorableText, secretValuesOf, zodIssues } from "./request-guards";

// action(): the wrapper every server action goes through, for use with
// useActionState(action, IDLE). The same order as route(): origin (Next
// checks it for actions too; we insist on APP_ORIGIN) -> session
// (authenticate) -> permission (authorise) -> no NUL or lone surrogate
// anywhere -> FormData parsed by the zod schema (validate; use z.coerce for
// non-string fields) -> fn, which calls the feature's service. fn may redirect(); it returns a small state and
// must never put a submitted password or token in it (the wrapper refuses
// such a state anyway).

type Action = (prev: ActionState, formData: FormData) => Promise<ActionState>;

export function action<S extends z.ZodType>(
  opts: { permission: Permission; schema: S },
  fn: (input: z.output<S>, member: Member) => Promise<ActionState>,
): Action {
  return wrap(
    opts.schema,
    (member, signedIn) => {
      if (!member) return signedIn ? failure("You are not a member of any workspace.", {}, "forbidden") : failure("You are signed out. Sign in again and retry.", {}, "unauthenticated");
      if (!can(member.role, opts.permission)) return failure("Your role does not allow this.", {}, "forbidden");
      return null;
    },
    (input, member) => fn(input, member as Member),
  );
}

/** Signed-out flows (sign-in, sign-up, reset, invite): no session needed; fn sees the member if there is one. */
export function publicAction<S extends z.ZodType>(
  opts: { schema: S },
  fn: (input: z.output<S>, ctx: { member: Member | null; headers: Headers }) => Promise<ActionState>,
): Action {
  return wrap(opts.schema, () => null, (input, member, h) => fn(input, { member, headers: h }));
}

function failure(message: string, fieldErrors: Record<string, string> = {}, code: AppErrorCode | "internal" = "internal"): ActionState {
  return { ok: false, message, fieldErrors, code };
}

/** FormData -> plain object; repeated keys become arrays; Next's own $ACTION fields are dropped. */
function formToObject(formData: FormData): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of new Set(formData.keys())) {
    if (key.startsWith("$ACTION")) continue;
    const all = formData.getAll(key);
    out[key] = all.length > 1 ? all : all[0];
  }
  return out;
}

function wrap<S extends z.ZodType>(
  schema: S,
  gate: (member: Member | null, signedIn: boolean) => ActionState | null,
  inner: (input: z.output<S>, member: Member | null, h: Headers) => Promise<ActionState>,
): Action {
  return async (_prev, formData) => {
    const raw = formToObject(formData);
    const secrets = secretValuesOf(raw);
    try {
      const h = await headers();
      if (!originAllowed("POST", h)) return failure("This form was sent from another address. Open Heatsplit at its own address and try again.", {}, "forbidden");
      const ctx = await resolveSession((await cookies()).get(SESSION_COOKIE)?.value);
      if (ctx?.sessionRenewed) await setSessionCookie(ctx.sessionId, ctx.sessionCreatedAt);
      const refused = gate(ctx?.member ?? null, ctx !== null);
      if (refused) return refused;
      refuseUnstorableText(raw);
      const parsed = schema.safeParse(raw);
      if (!parsed.success) return failure("Check the highlighted fields.", fieldErrorsOf(zodIssues(parsed.error)), "bad_request");
      const state = await inner(parsed.data, ctx?.member ?? null, h);
      if (echoesSecret(JSON.stringify(state), secrets)) {
        console.error("server action: state would echo a submitted secret; refused");
        return failure("Something went wrong. Try again.");
      }
      return state;
    } catch (err) {
      unstable_rethrow(err);
      if (err instanceof AppError) return failure(err.message, fieldErrorsOf(err.issues), err.code);
      if (isDatabaseUnavailable(err)) {
        console.error(`server action: database unavailable (${databaseErrorSummary(err)})`);
        return failure(DATABASE_UNAVAILABLE_MESSAGE, {}, "unavailable");
      }
      console.error("server action failed:", err);
      return failure("Something went wrong. Try again.");
    }
  };
}
