// One typed error for everything the app refuses on purpose. The code maps
// to an HTTP status and a user-facing message; causes are logged, never shown.
export type AppErrorCode = "bad_request" | "unauthenticated" | "forbidden" | "not_found" | "conflict" | "too_many_requests" | "payload_too_large" | "unsupported_media_type" | "unprocessable" | "unavailable";

/** The HTTP status of each refusal (route answers; a server action's state carries the code). */
export const STATUS_OF_CODE: Readonly<Record<AppErrorCode, number>> = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  unprocessable: 422,
  too_many_requests: 429,
  unavailable: 503,
};

export interface FieldIssue {
  path: string;
  message: string;
}

export class AppError extends Error {
  readonly status: number;
  constructor(
    readonly code: AppErrorCode,
    message: string,
    readonly issues: FieldIssue[] = [],
    /** For a 429: seconds until a retry may succeed (sent as Retry-After). */
    readonly extra: { retryAfterSeconds?: number } = {},
  ) {
    super(message);
    this.status = STATUS_OF_CODE[code];
  }
}

// PostgreSQL SQLSTATEs of a server that is going away or not accepting
// connections yet (class 08 connection exception; 57P01-57P03 operator
// intervention: admin/crash shutdown, cannot connect now; PostgreSQL manual,
// appendix A, recalled from memory), and the socket errors of a refused or
// broken connection.
const DB_DOWN_CODES = new Set(["08000", "08001", "08003", "08004", "08006", "57P01", "57P02", "57P03", "ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "ENOTCONN"]);
const DB_DOWN_MESSAGES = [/Connection terminated/i, /timeout exceeded when trying to connect/i, /Timeout acquiring a connection/i, /Client has encountered a connection error/i];

/** True when `err` says the database cannot be reached right now (not a bug in the request or the query). */
export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (!err || typeof err !== "object" || depth > 3) return false;
  const e = err as { code?: unknown; message?: unknown; errors?: unknown; cause?: unknown };
  if (typeof e.code === "string" && DB_DOWN_CODES.has(e.code)) return true;
  if (typeof e.message === "string" && DB_DOWN_MESSAGES.some((re) => re.test(e.message as string))) return true;
  if (Array.isArray(e.errors) && e.errors.some((x) => isDatabaseUnavailable(x, depth + 1))) return true; // AggregateError of a refused connect
  return isDatabaseUnavailable(e.cause, depth + 1);
}

/** For the log line: the driver's code, else its message (never shown to the client). */
export function databaseErrorSummary(err: unknown): string {
  const e = err as { code?: unknown; message?: unknown } | null;
  return typeof e?.code === "string" ? e.code : String(e?.message ?? err);
}

export const DATABASE_UNAVAILABLE_MESSAGE = "The database cannot be reached just now; nothing was saved. Try again in a few seconds.";
/** Seconds a client should wait before retrying a 503 (Retry-After). */
export const DATABASE_RETRY_AFTER_S = 5;
