// One typed error for everything the app refuses on purpose. The code maps
// to an HTTP status and a user-facing message; causes are logged, never shown.
export type AppErrorCode = "bad_request" | "unauthenticated" | "forbidden" | "not_found" | "conflict" | "too_many_requests" | "payload_too_large" | "unsupported_media_type" | "unprocessable" | "unavailable";

const STATUS: Record<AppErrorCode, number> = {
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
  ) {
    super(message);
    this.status = STATUS[code];
  }
}
