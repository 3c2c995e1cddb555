// The session cookie's name and lifetimes, in a module light enough for
// proxy.ts (no database, no lucia).
export const SESSION_COOKIE = "heatsplit_session";

const DEFAULT_SESSION_TTL_SECONDS = 30 * 24 * 60 * 60;
// Policy (common practice for a "stay signed in" web app, our figure): a
// session ends 90 days after sign-in however active it is; the OWASP
// Session Management Cheat Sheet asks for such an absolute timeout besides
// the idle one.
const DEFAULT_SESSION_ABSOLUTE_SECONDS = 90 * 24 * 60 * 60;

function positiveFromEnv(name: string, fallback: number): number {
  const n = Number(process.env[name]);
  return Number.isFinite(n) && n > 0 ? n : fallback;
}

/** Idle lifetime: SESSION_TTL_SECONDS overrides the 30-day default (tests and stricter deployments). */
export function sessionTtlSeconds(): number {
  return positiveFromEnv("SESSION_TTL_SECONDS", DEFAULT_SESSION_TTL_SECONDS);
}

/** Absolute lifetime from sign-in: SESSION_ABSOLUTE_SECONDS overrides the 90-day default. */
export function sessionAbsoluteSeconds(): number {
  return positiveFromEnv("SESSION_ABSOLUTE_SECONDS", DEFAULT_SESSION_ABSOLUTE_SECONDS);
}

/** Seconds the cookie of a session created at `createdAt` may still live (the rest of its absolute lifetime). */
export function sessionCookieMaxAge(createdAt: Date | null, now = Date.now()): number {
  const start = createdAt?.getTime() ?? now;
  return Math.max(0, Math.floor((start + sessionAbsoluteSeconds() * 1000 - now) / 1000));
}

/** Secure only when the app is served over https: a plain-http loopback origin would drop it. */
export function sessionCookieSecure(): boolean {
  return (process.env.APP_ORIGIN ?? "").startsWith("https:");
}
