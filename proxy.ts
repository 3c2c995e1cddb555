import { NextResponse, type NextRequest } from "next/server";
import { PATH_HEADER, WORKSPACE_PATH_PREFIXES, nextPathProblem, signInPath } from "@/lib/paths";
import { SESSION_COOKIE } from "@/lib/session-cookie";

// Coarse work only; every page, handler and action checks access itself.
// - Refuses (400, naming the parameter) query strings a page could not use
//   safely: a NUL anywhere (PostgreSQL text cannot hold one) and a ?next=
//   that is not printable ASCII (it would end up in a Location header).
// - Records the path being rendered in a request header, so a page that
//   finds the visitor signed out can send them to /sign-in?next=<path>.
// - Sends visitors without a session cookie from workspace pages straight
//   to sign-in (the layout would do the same, one render later).
// It never sets the session cookie: it cannot tell a valid session from an
// invalid one (no database here), and re-sending whatever came in would give
// a dead or stolen id a fresh lifetime. The cookie is set at sign-in with the
// session's absolute lifetime (services/auth/session.ts).
export function proxy(req: NextRequest): NextResponse {
  const { pathname, searchParams } = req.nextUrl;
  for (const [key, value] of searchParams) {
    if (key.includes("\u0000") || value.includes("\u0000")) return badQuery(key.replace(/\u0000/g, ""), "contains a NUL (U+0000) character");
  }
  const next = searchParams.get("next");
  const nextProblem = next === null ? null : nextPathProblem(next);
  if (nextProblem) return badQuery("next", nextProblem.replace(/^next /, ""));

  const search = new URLSearchParams(searchParams);
  search.delete("_rsc");
  const path = pathname + (search.size ? `?${search.toString()}` : "");
  const isWorkspacePath = WORKSPACE_PATH_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (isWorkspacePath && !req.cookies.has(SESSION_COOKIE) && req.method === "GET") {
    return NextResponse.redirect(new URL(signInPath(path), req.url));
  }
  const headers = new Headers(req.headers);
  headers.set(PATH_HEADER, path);
  return NextResponse.next({ request: { headers } });
}

function badQuery(name: string, problem: string): NextResponse {
  return new NextResponse(`Bad request: the query parameter "${name}" ${problem}.\n`, { status: 400, headers: { "content-type": "text/plain; charset=utf-8" } });
}

export const config = {
  // Pages only: not the API (route() answers 401 itself), not build assets or files with an extension.
  // Requests with a body (Content-Length or Transfer-Encoding) skip the proxy: Next would otherwise copy
  // the body into memory for it and wait for all of it before anything answers, so an oversized post to a
  // page could not be refused while it streams. Such requests are form posts and server actions, which
  // check for themselves.
  matcher: [
    {
      source: "/((?!api/|_next/static|_next/image|.*\\.[a-zA-Z0-9]+$).*)",
      missing: [
        { type: "header", key: "content-length" },
        { type: "header", key: "transfer-encoding" },
      ],
    },
  ],
};
