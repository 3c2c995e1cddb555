/**
 * THE way client components call /api/v1: JSON, a multipart form (uploads)
 * or a CSV text body in, JSON out. A refusal becomes an ApiError carrying
 * the handler's code, message and field issues (the one error shape of
 * lib/errors.ts), so forms place the issues and the editor can tell a
 * conflict (409) apart. After a change the caller refreshes what it shows
 * with useAfterChange() (components/data/useAfterChange.ts).
 */
export interface ApiIssue {
  path: string;
  message: string;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: ApiIssue[] = [],
  ) {
    super(message);
  }
}

export interface ApiRequest {
  method?: string;
  /** Sent as JSON. */
  body?: unknown;
  /** Sent as multipart/form-data (file uploads). */
  form?: FormData;
  /** Sent as text/csv. */
  csv?: string;
}

function encode(init: ApiRequest | undefined): { headers?: Record<string, string>; body?: BodyInit } {
  if (init?.form) return { body: init.form };
  if (init?.csv !== undefined) return { headers: { "content-type": "text/csv" }, body: init.csv };
  if (init?.body !== undefined) return { headers: { "content-type": "application/json" }, body: JSON.stringify(init.body) };
  return {};
}

export async function fetchJson<T>(url: string, init?: ApiRequest): Promise<T> {
  const res = await fetch(url, { method: init?.method ?? "GET", ...encode(init), credentials: "same-origin" });
  const text = await res.text();
  let data: unknown;
  try {
    data = text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    if (res.ok) throw new ApiError(res.status, "bad_response", "The server sent an unreadable answer.");
  }
  if (!res.ok) {
    const err = (data as { error?: { code?: string; message?: string; issues?: ApiIssue[] } } | undefined)?.error;
    throw new ApiError(res.status, err?.code ?? "error", err?.message ?? `The server answered ${res.status}.`, err?.issues ?? []);
  }
  return data as T;
}

/** SWR fetcher. */
export const getJson = <T,>(url: string): Promise<T> => fetchJson<T>(url);

/** First message per path, for fields. */
export function issuesByPath(issues: ApiIssue[], strip = ""): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of issues) {
    const key = strip && i.path.startsWith(strip) ? i.path.slice(strip.length) : i.path || "form";
    out[key] ??= i.message;
  }
  return out;
}
