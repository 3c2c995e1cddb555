/**
 * JSON calls to /api/v1 from client components. A refusal becomes an
 * ApiError carrying the handler's code, message and field issues, so forms
 * can place the issues and the editor can tell a conflict (409) apart.
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

export async function fetchJson<T>(url: string, init?: { method?: string; body?: unknown }): Promise<T> {
  const res = await fetch(url, {
    method: init?.method ?? "GET",
    headers: init?.body !== undefined ? { "content-type": "application/json" } : undefined,
    body: init?.body !== undefined ? JSON.stringify(init.body) : undefined,
    credentials: "same-origin",
  });
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
