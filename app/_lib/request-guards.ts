import "server-only";
import type { z } from "zod";
import { AppError, type FieldIssue } from "./errors";

// Checks shared by the route() and action() wrappers in access.ts.

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
/** Largest body a route accepts through route() (policy; uploads get their own limit and route). */
export const MAX_JSON_BODY_BYTES = 256 * 1024;

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
 * The request body as a plain object: JSON for API clients, or an HTML
 * form's fields (urlencoded or multipart; strings, so schemas use z.coerce
 * for numbers) for plain <form method="post"> targets.
 */
/**
 * PostgreSQL text and jsonb cannot hold U+0000; a string carrying one would
 * fail deep in a query. Refuse it up front as the caller's error, naming
 * where it is.
 */
export function refuseNulBytes(value: unknown, path = ""): void {
  if (typeof value === "string") {
    if (value.includes("\u0000")) throw new AppError("bad_request", "Text may not contain NUL (U+0000) characters.", [{ path: path || "(body)", message: "contains a NUL (U+0000) character" }]);
    return;
  }
  if (Array.isArray(value)) return value.forEach((v, i) => refuseNulBytes(v, path ? `${path}.${i}` : String(i)));
  if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      refuseNulBytes(k, path);
      refuseNulBytes(v, path ? `${path}.${k}` : k);
    }
  }
}

export async function readBody(req: Request): Promise<unknown> {
  const body = await readBodyRaw(req);
  refuseNulBytes(body);
  return body;
}

async function readBodyRaw(req: Request): Promise<unknown> {
  const type = (req.headers.get("content-type") ?? "").toLowerCase();
  const declared = Number(req.headers.get("content-length") ?? 0);
  if (declared > MAX_JSON_BODY_BYTES) throw new AppError("payload_too_large", "The request body is too large.");
  if (type.startsWith("application/x-www-form-urlencoded")) {
    return Object.fromEntries(new URLSearchParams(await readLimitedText(req)));
  }
  if (type.startsWith("multipart/form-data")) {
    // Fields only; file uploads have routes of their own with their own limits.
    if (!declared) throw new AppError("payload_too_large", "Send a Content-Length with multipart bodies.");
    const form = await req.formData();
    const out: Record<string, unknown> = {};
    for (const key of new Set(form.keys())) {
      const all = form.getAll(key);
      out[key] = all.length > 1 ? all : all[0];
    }
    return out;
  }
  if (!type.startsWith("application/json")) throw new AppError("unsupported_media_type", "Send the body as application/json.");
  const text = await readLimitedText(req);
  if (text.trim() === "") return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new AppError("bad_request", "The body is not valid JSON.");
  }
}

async function readLimitedText(req: Request): Promise<string> {
  const text = await req.text();
  if (Buffer.byteLength(text) > MAX_JSON_BODY_BYTES) throw new AppError("payload_too_large", "The request body is too large.");
  return text;
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
