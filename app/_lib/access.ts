import "server-only";
import { cache } from "react";
import { cookies, headers } from "next/headers";
import { forbidden, notFound, redirect } from "next/navigation";
import { can, type Permission } from "@/lib/roles";
import { SESSION_COOKIE } from "@/services/auth/session";
import { resolveSession, type Member, type SignedInContext } from "@/services/auth/member";
import { PATH_HEADER, safeNextPath, signInPath } from "@/lib/paths";

// THE access contract. Every page, route handler and server action asks here
// who is calling and whether their role allows it:
//
//   pages/layouts   const member = await requirePageMember("members:manage");
//   route handlers  export const GET = route({ permission: "read" }, async ({ member }) => ...);
//   server actions  export const saveX = action({ permission: "part:write", schema }, async (input, member) => ...);
//   records         const part = await loadInWorkspace(member, (workspaceId) => getPartById({ workspaceId, id }));
//
// Workspace isolation: every query that reads or changes a workspace's
// records takes `workspaceId` (from `member.workspace.id`, never from the
// request) and filters by it. A record of another workspace is therefore
// simply not found, and loadInWorkspace answers 404, not 403, so callers
// cannot learn that the id exists elsewhere.
export type { Member, SignedInContext } from "@/services/auth/member";
export type { ActionState } from "@/lib/action-state";
export { route, publicRoute, reply, type RouteCtx, type PublicRouteCtx } from "./access-route";
export { action, publicAction } from "./access-action";
export { loadInWorkspace } from "@/services/records";

/** The signed-in user, their workspaces and current membership; cached per render. */
// Pages cannot set cookies; none needs to: the cookie lives the session's
// absolute lifetime and the database keeps the idle expiry (services/auth/session.ts).
export const getSignedInContext = cache(async (): Promise<SignedInContext | null> => {
  return resolveSession((await cookies()).get(SESSION_COOKIE)?.value);
});

export async function getCurrentMember(): Promise<Member | null> {
  return (await getSignedInContext())?.member ?? null;
}

/** For pages and layouts: signed out -> /sign-in?next=..., role lacks the permission -> forbidden (403). */
export async function requirePageMember(permission: Permission = "read"): Promise<Member> {
  const member = await getCurrentMember();
  if (!member) redirect(signInPath(safeNextPath((await headers()).get(PATH_HEADER))));
  if (!can(member.role, permission)) forbidden();
  return member;
}

/** Pages: the same, answering with the not-found page. */
export async function loadPageInWorkspace<T>(member: Member, load: (workspaceId: string) => Promise<T | null | undefined>): Promise<T> {
  const record = await load(member.workspace.id);
  if (record === null || record === undefined) notFound();
  return record;
}
