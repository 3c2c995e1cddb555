// Paths shared by proxy.ts (which must stay light) and the access checks.

/** Request header in which proxy.ts records the path being rendered (for sign-in's ?next=). */
export const PATH_HEADER = "x-heatsplit-path";

/** Page paths that need a signed-in member; proxy.ts redirects early, every page re-checks. */
export const WORKSPACE_PATH_PREFIXES = ["/home", "/members", "/dev", "/projects", "/parts", "/options", "/settings", "/account"];

export const SIGN_IN_PATH = "/sign-in";

/** A stand-in origin for parsing: whatever resolves to another origin than this is off-site. */
const PARSE_BASE = "http://heatsplit.invalid";

/**
 * Why a ?next= value is refused outright (null when it is acceptable text):
 * control characters (a browser drops tabs and line breaks, so
 * "/\t/evil.example" becomes "//evil.example"), spaces, and anything outside
 * printable ASCII (it could not go into a Location header as it is).
 */
export function nextPathProblem(value: string): string | null {
  if (/[^\x21-\x7e]/.test(value)) return "next must be a path of this site in printable ASCII (no spaces, line breaks, control or non-ASCII characters)";
  return null;
}

/**
 * The redirect target for `value`, or `fallback`: only a path of this
 * origin after the normalisation a browser applies (backslashes read as
 * slashes, dot segments removed, percent-encoded dots decoded), never one
 * that resolves to another host ("//evil.example", "/\\evil.example",
 * "/.//evil.example", "https://...").
 */
export function safeNextPath(value: string | null | undefined, fallback = "/home"): string {
  if (!value || nextPathProblem(value) || !value.startsWith("/")) return fallback;
  let url: URL;
  try {
    url = new URL(value, PARSE_BASE);
  } catch {
    return fallback;
  }
  if (url.origin !== PARSE_BASE || url.pathname.startsWith("//")) return fallback;
  return url.pathname + url.search + url.hash;
}

export function signInPath(next: string): string {
  return `${SIGN_IN_PATH}?next=${encodeURIComponent(safeNextPath(next))}`;
}
