import "server-only";
import type { z } from "zod";
import { AppError, type FieldIssue } from "@/lib/errors";
import { MAX_JSON_BODY_BYTES } from "@/lib/limits";
import { readFormLimited, readTextLimited } from "./body-limit";

// Checks shared by the route() and action() wrappers in access.ts.

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export function appOrigin(): string {
  return process.env.APP_ORIGIN ?? "http://127.0.0.1:3000";
}

/**
 * A state-changing request must come from our own pages: the browser's
 * Origin header has to equal APP_ORIGIN exactly. Cookies are sent with
 * cross-site requests in some cases (SameSite=Lax top-level POSTs from old
 * browsers, subdomains), so this is the CSRF defence, not the cookie.
 */
export function originAllowed(method: string, headers: Headers): boolean {
  if (SAFE_METHODS.has(method.toUpperCase())) return true;
  return headers.get("origin") === appOrigin();
}

export function zodIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }));
}

export function parseWith<S extends z.ZodType>(schema: S, value: unknown, what: string): z.output<S> {
  const r = schema.safeParse(value);
  if (!r.success) throw new AppError("bad_request", `Check the ${what}.`, zodIssues(r.error));
  return r.data;
}

/**
 * PostgreSQL text and jsonb cannot hold U+0000, and refuse a lone UTF-16
 * surrogate (which a JSON escape such as \ud800 can carry); a string with either
 * would fail deep in a query. Refuse it up front as the caller's error,
 * naming where it is. Keys are checked too.
 */
export function refuseUnstorableText(value: unknown, path = ""): void {
  if (typeof value === "string") {
    if (value.includes("\u0000")) throw unstorable(path, "contains a NUL (U+0000) character");
    if (LONE_SURROGATE.test(value)) throw unstorable(path, "contains a lone UTF-16 surrogate (not a character)");
    return;
  }
  if (Array.isArray(value)) return value.forEach((v, i) => refuseUnstorableText(v, path ? `${path}.${i}` : String(i)));
  if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      refuseUnstorableText(k, path);
      refuseUnstorableText(v, path ? `${path}.${k}` : k);
    }
  }
}

const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

function unstorable(path: string, message: string): AppError {
  return new AppError("bad_request", `Text may not contain NUL characters or lone surrogates: ${path || "the body"} ${message}.`, [{ path: path || "(body)", message }]);
}

/** Deepest nesting of arrays and objects any route accepts (the design document needs about ten). */
export const MAX_JSON_DEPTH = 64;

/** True when the JSON text nests deeper than `max`: counted on the text, before parsing, without recursion. */
export function jsonNestsDeeperThan(text: string, max: number): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c) i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      if (++depth > max) return true;
    } else if (c === 0x5d || c === 0x7d) depth--;
  }
  return false;
}

const tooLarge = () => new AppError("payload_too_large", `The request body is too large (at most ${MAX_JSON_BODY_BYTES / 1024} kB).`);

/**
 * The request body as a plain object: JSON for API clients, or an HTML
 * form's fields (urlencoded or multipart; strings, so schemas use z.coerce
 * for numbers) for plain <form method="post"> targets. Read with its limit
 * enforced while it streams (app/_lib/body-limit.ts).
 */
export async function readBody(req: Request): Promise<unknown> {
  const body = await readBodyRaw(req);
  refuseUnstorableText(body);
  return body;
}

async function readBodyRaw(req: Request): Promise<unknown> {
  const type = (req.headers.get("content-type") ?? "").toLowerCase();
  if (type.startsWith("application/x-www-form-urlencoded")) {
    return Object.fromEntries(new URLSearchParams(await readTextLimited(req, MAX_JSON_BODY_BYTES, tooLarge)));
  }
  if (type.startsWith("multipart/form-data")) {
    // Fields only; file uploads have routes of their own with their own limits.
    const form = await readFormLimited(req, MAX_JSON_BODY_BYTES, tooLarge);
    const out: Record<string, unknown> = {};
    for (const key of new Set(form.keys())) {
      const all = form.getAll(key);
      out[key] = all.length > 1 ? all : all[0];
    }
    return out;
  }
  if (!type.startsWith("application/json")) throw new AppError("unsupported_media_type", "Send the body as application/json.");
  const text = await readTextLimited(req, MAX_JSON_BODY_BYTES, tooLarge);
  if (text.trim() === "") return {};
  if (jsonNestsDeeperThan(text, MAX_JSON_DEPTH)) {
    throw new AppError("bad_request", `The body is nested more than ${MAX_JSON_DEPTH} levels deep.`, [{ path: "(body)", message: `nested more than ${MAX_JSON_DEPTH} levels deep` }]);
  }
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new AppError("bad_request", "The body is not valid JSON.");
  }
}

/** First message per field, for forms. */
export function fieldErrorsOf(issues: FieldIssue[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of issues) {
    const key = i.path || "form";
    if (!(key in out)) out[key] = i.message;
  }
  return out;
}

const SECRET_FIELD = /password|token|secret/i;
const MIN_SECRET_LENGTH = 8;

/** Values of secret-named fields in a parsed body or form (at any depth). */
export function secretValuesOf(input: unknown, out: string[] = []): string[] {
  if (input && typeof input === "object") {
    for (const [k, v] of Object.entries(input as Record<string, unknown>)) {
      if (typeof v === "string" && SECRET_FIELD.test(k) && v.length >= MIN_SECRET_LENGTH) out.push(v);
      else if (v && typeof v === "object") secretValuesOf(v, out);
    }
  }
  return out;
}

/** Last line of defence: a response that would echo a submitted secret is refused. */
export function echoesSecret(serialised: string, secrets: string[]): boolean {
  return secrets.some((s) => serialised.includes(s) || serialised.includes(JSON.stringify(s).slice(1, -1)));
}
