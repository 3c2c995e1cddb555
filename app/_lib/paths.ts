// Paths shared by proxy.ts (which must stay light) and the access checks.

/** Request header in which proxy.ts records the path being rendered (for sign-in's ?next=). */
export const PATH_HEADER = "x-heatsplit-path";

/** Page paths that need a signed-in member; proxy.ts redirects early, every page re-checks. */
export const WORKSPACE_PATH_PREFIXES = ["/home", "/members", "/dev", "/projects", "/parts", "/options", "/settings", "/account"];

export const SIGN_IN_PATH = "/sign-in";

/** Only same-site relative paths may be a redirect target (no //evil.example). */
export function safeNextPath(value: string | null | undefined, fallback = "/home"): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return fallback;
  return value;
}

export function signInPath(next: string): string {
  return `${SIGN_IN_PATH}?next=${encodeURIComponent(safeNextPath(next))}`;
}
