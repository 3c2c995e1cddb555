// A tiny HTTP client for integration tests: one cookie jar per client (one
// browser), manual redirects, the app's own Origin on state-changing calls.
export const ORIGIN = process.env.APP_ORIGIN ?? "http://127.0.0.1:3100";

export interface Reply {
  status: number;
  headers: Headers;
  text: string;
  json: <T = Record<string, unknown>>() => T;
  location: string | null;
}

export interface RequestOptions {
  json?: unknown;
  form?: Record<string, string>;
  /** A multipart body (its boundary goes in the content type fetch sets). */
  formData?: FormData;
  headers?: Record<string, string>;
  /** Origin header for non-GET requests; null sends none. Defaults to APP_ORIGIN. */
  origin?: string | null;
}

export class Client {
  /** Every response (status line, headers and body) any client received, for the no-echo checks. */
  static readonly responseLog: string[] = [];
  readonly cookies = new Map<string, string>();

  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  async request(method: string, path: string, opts: RequestOptions = {}): Promise<Reply> {
    const headers: Record<string, string> = { ...opts.headers };
    if (this.cookies.size) headers.cookie = this.cookieHeader();
    const origin = opts.origin === undefined ? ORIGIN : opts.origin;
    if (method !== "GET" && method !== "HEAD" && origin) headers.origin = origin;
    let body: string | FormData | undefined;
    if (opts.json !== undefined) {
      headers["content-type"] = "application/json";
      body = JSON.stringify(opts.json);
    } else if (opts.formData) {
      body = opts.formData;
    } else if (opts.form) {
      headers["content-type"] = "application/x-www-form-urlencoded";
      body = new URLSearchParams(opts.form).toString();
    }
    const res = await fetch(new URL(path, ORIGIN), { method, headers, body, redirect: "manual" });
    for (const c of res.headers.getSetCookie()) this.storeCookie(c);
    const text = await res.text();
    const headerText = [...res.headers].filter(([k]) => k !== "set-cookie").map(([k, v]) => `${k}: ${v}`).join("\n");
    Client.responseLog.push(`${method} ${path} -> ${res.status}\n${headerText}\n\n${text}`);
    return {
      status: res.status,
      headers: res.headers,
      text,
      json: <T,>() => JSON.parse(text) as T,
      location: res.headers.get("location"),
    };
  }

  get(path: string, opts?: RequestOptions): Promise<Reply> {
    return this.request("GET", path, opts);
  }

  post(path: string, json?: unknown, opts: RequestOptions = {}): Promise<Reply> {
    return this.request("POST", path, { ...opts, json: json ?? {} });
  }

  private storeCookie(setCookie: string): void {
    const [pair, ...attrs] = setCookie.split(";");
    const eq = pair.indexOf("=");
    const name = pair.slice(0, eq).trim();
    const value = pair.slice(eq + 1).trim();
    const expired = attrs.some((a) => /^\s*max-age=0\s*$/i.test(a)) || value === "";
    if (expired) this.cookies.delete(name);
    else this.cookies.set(name, value);
  }
}

export const SESSION_COOKIE = "heatsplit_session";

/** Path part of a redirect target (absolute or relative). */
export function locationPath(reply: Reply): string | null {
  if (!reply.location) return null;
  const u = new URL(reply.location, ORIGIN);
  return u.pathname + u.search;
}
