import "server-only";
import type { NextRequest } from "next/server";
import { unstable_rethrow } from "next/navigation";
import type { z } from "zod";
import { AppError, DATABASE_RETRY_AFTER_S, DATABASE_UNAVAILABLE_MESSAGE, databaseErrorSummary, isDatabaseUnavailable } from "@/lib/errors";
import { can, type Permission } from "@/lib/roles";
import { SESSION_COOKIE, setSessionCookie } from "@/services/auth/session";
import { resolveSession, type Member } from "@/services/auth/member";
import { resolveBearer } from "@/services/tokens/service";
import { echoesSecret, originAllowed, parseWith, readBody, refuseUnstorableText, secretValuesOf } from "./request-guards";

// route(): the wrapper every route handler goes through, in one order:
// origin check (non-GET without an Authorization header, 403) ->
// authenticate (401) -> permission gate for the role (403) -> read the body
// within its limit (413 while it streams) -> refuse NUL and lone surrogates
// anywhere in body or query (400) -> parse body/query/params (zod, 400; bad
// params 404) -> handler. A caller without the right learns nothing about
// its input. The handler calls the feature's service (services/<feature>/),
// which loads records through workspace-scoped queries (404 for another
// workspace's), applies the record-level rules and acts; the handler returns
// a Response or a plain value (sent as JSON; undefined -> 204; reply(data,
// status) for another status). Plain values and reply() pass the echo guard:
// a response containing a submitted password or token is refused.

class JsonReply {
  constructor(
    readonly data: unknown,
    readonly status: number,
  ) {}
}

export function reply(data: unknown, status = 200): JsonReply {
  return new JsonReply(data, status);
}

type Schema = z.ZodType | undefined;
type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

interface Opts<B extends Schema, Q extends Schema, P extends Schema> {
  body?: B;
  query?: Q;
  /** Validates the dynamic segments; a value that fails is answered 404. */
  params?: P;
}

export interface PublicRouteCtx<TParams, B, Q> {
  member: Member | null;
  body: B;
  query: Q;
  params: TParams;
  req: NextRequest;
}
export interface RouteCtx<TParams, B, Q> extends PublicRouteCtx<TParams, B, Q> {
  member: Member;
}

type NextHandler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;

export function route<TParams = Record<string, string>, B extends Schema = undefined, Q extends Schema = undefined, P extends Schema = undefined>(
  opts: Opts<B, Q, P> & { permission: Permission },
  handler: (ctx: RouteCtx<P extends z.ZodType ? z.output<P> : TParams, Out<B>, Out<Q>>) => Promise<Response | unknown>,
): NextHandler {
  const gate = (member: Member | null, signedIn: boolean) => {
    if (!member) {
      if (signedIn) throw new AppError("forbidden", "You are not a member of any workspace.");
      throw new AppError("unauthenticated", "Sign in first.");
    }
    if (!can(member.role, opts.permission)) throw new AppError("forbidden", "Your role does not allow this.");
  };
  return wrap(opts, gate, handler as (ctx: PublicRouteCtx<unknown, unknown, unknown>) => Promise<unknown>);
}

/** For the signed-out flows (sign-up, sign-in, reset, invite acceptance): same checks minus the session. */
export function publicRoute<TParams = Record<string, string>, B extends Schema = undefined, Q extends Schema = undefined, P extends Schema = undefined>(
  opts: Opts<B, Q, P>,
  handler: (ctx: PublicRouteCtx<P extends z.ZodType ? z.output<P> : TParams, Out<B>, Out<Q>>) => Promise<Response | unknown>,
): NextHandler {
  return wrap(opts, () => undefined, handler as (ctx: PublicRouteCtx<unknown, unknown, unknown>) => Promise<unknown>);
}

function wrap(
  opts: Opts<Schema, Schema, Schema>,
  gate: (member: Member | null, signedIn: boolean) => void,
  handler: (ctx: PublicRouteCtx<unknown, unknown, unknown>) => Promise<unknown>,
): NextHandler {
  return async (req, { params }) => {
    let secrets: string[] = [];
    try {
      // A bearer request carries no ambient credential (no cookie is read for
      // it), so a cross-site page cannot forge one: it skips the Origin check.
      if (!hasAuthorization(req) && !originAllowed(req.method, req.headers)) throw new AppError("forbidden", "Cross-origin request refused.");
      const { member, signedIn } = await authenticate(req);
      gate(member, signedIn);
      const raw = opts.body ? await readBody(req) : undefined;
      secrets = secretValuesOf(raw);
      const body = opts.body ? parseWith(opts.body, raw, "request body") : undefined;
      const rawQuery = Object.fromEntries(req.nextUrl.searchParams);
      refuseUnstorableText(rawQuery); // a NUL in ?q= would otherwise reach PostgreSQL
      const query = opts.query ? parseWith(opts.query, rawQuery, "query") : undefined;
      const p = await params;
      const parsedParams = opts.params ? opts.params.safeParse(p) : { success: true as const, data: p };
      if (!parsedParams.success) throw new AppError("not_found", "Not found.");
      const result = await handler({ member, body, query, params: parsedParams.data, req });
      return toResponse(result, secrets, req);
    } catch (err) {
      unstable_rethrow(err);
      return errorResponse(err, req);
    }
  };
}

function hasAuthorization(req: NextRequest): boolean {
  return req.headers.has("authorization");
}

async function authenticate(req: NextRequest): Promise<{ member: Member | null; signedIn: boolean }> {
  const authorization = req.headers.get("authorization");
  if (authorization) {
    // API tokens (services/tokens/service.ts): a Member with via "token" and the
    // user's current role; the session cookie is ignored for such a request.
    // Unknown, revoked or expired -> 401.
    const member = await resolveBearer(authorization);
    return { member, signedIn: true };
  }
  const ctx = await resolveSession(req.cookies.get(SESSION_COOKIE)?.value);
  if (ctx?.sessionRenewed) await setSessionCookie(ctx.sessionId, ctx.sessionCreatedAt);
  return { member: ctx?.member ?? null, signedIn: ctx !== null };
}

function toResponse(result: unknown, secrets: string[], req: NextRequest): Response {
  if (result instanceof Response) return result;
  if (result === undefined) return new Response(null, { status: 204 });
  const { data, status } = result instanceof JsonReply ? result : { data: result, status: 200 };
  const json = JSON.stringify(data);
  if (echoesSecret(json, secrets)) {
    console.error(`route ${req.method} ${req.nextUrl.pathname}: response would echo a submitted secret; refused`);
    return Response.json({ error: { code: "internal", message: "Something went wrong." } }, { status: 500 });
  }
  return new Response(json, { status, headers: { "content-type": "application/json" } });
}

function errorResponse(err: unknown, req: NextRequest): Response {
  if (err instanceof AppError) {
    const retry = err.extra.retryAfterSeconds;
    const headers = retry ? { "retry-after": String(Math.ceil(retry)) } : undefined;
    return Response.json({ error: { code: err.code, message: err.message, issues: err.issues } }, { status: err.status, headers });
  }
  if (isDatabaseUnavailable(err)) {
    console.error(`route ${req.method} ${req.nextUrl.pathname}: database unavailable (${databaseErrorSummary(err)})`);
    return Response.json(
      { error: { code: "unavailable", message: DATABASE_UNAVAILABLE_MESSAGE, issues: [] } },
      { status: 503, headers: { "retry-after": String(DATABASE_RETRY_AFTER_S) } },
    );
  }
  console.error(`route ${req.method} ${req.nextUrl.pathname} failed:`, err);
  return Response.json({ error: { code: "internal", message: "Something went wrong." } }, { status: 500 });
}
