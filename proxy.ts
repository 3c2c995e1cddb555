import { NextResponse, type NextRequest } from "next/server";
import { PATH_HEADER, WORKSPACE_PATH_PREFIXES, signInPath } from "@/app/_lib/paths";
import { SESSION_COOKIE, sessionCookieSecure, sessionTtlSeconds } from "@/app/_lib/session-cookie";

// Coarse work only; every page, handler and action checks access itself.
// - Records the path being rendered in a request header, so a page that
//   finds the visitor signed out can send them to /sign-in?next=<path>.
// - Sends visitors without a session cookie from workspace pages straight
//   to sign-in (the layout would do the same, one render later).
// - Re-sends the session cookie on page loads so its lifetime follows the
//   session's, which lucia extends in the database while the user is active
//   (pages cannot set cookies themselves). The database stays authoritative.
export function proxy(req: NextRequest): NextResponse {
  const { pathname, searchParams } = req.nextUrl;
  const search = new URLSearchParams(searchParams);
  search.delete("_rsc");
  const path = pathname + (search.size ? `?${search.toString()}` : "");
  const sessionId = req.cookies.get(SESSION_COOKIE)?.value;

  const isWorkspacePath = WORKSPACE_PATH_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (isWorkspacePath && !sessionId && req.method === "GET") {
    return NextResponse.redirect(new URL(signInPath(path), req.url));
  }

  const headers = new Headers(req.headers);
  headers.set(PATH_HEADER, path);
  const res = NextResponse.next({ request: { headers } });
  if (sessionId && req.method === "GET") {
    res.cookies.set(SESSION_COOKIE, sessionId, {
      httpOnly: true,
      sameSite: "lax",
      secure: sessionCookieSecure(),
      path: "/",
      maxAge: sessionTtlSeconds(),
    });
  }
  return res;
}

export const config = {
  // Pages only: not the API (route() answers 401 itself), not build assets or files with an extension.
  matcher: ["/((?!api/|_next/static|_next/image|.*\\.[a-zA-Z0-9]+$).*)"],
};
