import "server-only";
import type { Role } from "@/lib/roles";
import { validateSessionId } from "./session";
import { listMembershipsByUser, type MembershipRecord } from "@/db/queries/workspaces";
import { updateSessionWorkspaceById } from "@/db/queries/sessions";

// Who is asking: the session's user, and their membership in the workspace
// the session works in. Read fresh on every request, so a role change or a
// removal takes effect at once.
export interface Member {
  user: { id: string; email: string; displayName: string };
  workspace: { id: string; name: string };
  role: Role;
  sessionId: string;
  via: "session" | "token";
}

export interface SignedInContext {
  user: Member["user"];
  sessionId: string;
  /** lucia extended the session: the cookie may be re-sent where possible (it already lives the absolute lifetime). */
  sessionRenewed: boolean;
  sessionCreatedAt: Date | null;
  memberships: MembershipRecord[];
  /** null when the user belongs to no workspace (removed from the last one). */
  member: Member | null;
}

export async function resolveSession(sessionId: string | undefined | null): Promise<SignedInContext | null> {
  if (!sessionId) return null;
  const valid = await validateSessionId(sessionId);
  if (!valid) return null;
  const { session, user } = valid;
  const memberships = await listMembershipsByUser(user.id);
  // The session's workspace if the user still belongs to it, else the first.
  const current = memberships.find((m) => m.workspace.id === session.workspaceId) ?? memberships[0] ?? null;
  if (current && current.workspace.id !== session.workspaceId) {
    await updateSessionWorkspaceById({ sessionId: session.id, workspaceId: current.workspace.id });
  }
  const u = { id: user.id, email: user.email, displayName: user.displayName };
  return {
    user: u,
    sessionId: session.id,
    sessionRenewed: session.fresh,
    sessionCreatedAt: session.createdAt,
    memberships,
    member: current ? { user: u, workspace: current.workspace, role: current.role, sessionId: session.id, via: "session" } : null,
  };
}
