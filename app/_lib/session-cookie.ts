// The session cookie's name and lifetime, in a module light enough for
// proxy.ts (no database, no lucia).
export const SESSION_COOKIE = "heatsplit_session";

const DEFAULT_SESSION_TTL_SECONDS = 30 * 24 * 60 * 60;

/** SESSION_TTL_SECONDS overrides the 30-day default (tests and stricter deployments). */
export function sessionTtlSeconds(): number {
  const n = Number(process.env.SESSION_TTL_SECONDS);
  return Number.isFinite(n) && n > 0 ? n : DEFAULT_SESSION_TTL_SECONDS;
}

/** Secure only when the app is served over https: a plain-http loopback origin would drop it. */
export function sessionCookieSecure(): boolean {
  return (process.env.APP_ORIGIN ?? "").startsWith("https:");
}
