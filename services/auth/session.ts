import "server-only";
import { Lucia, TimeSpan, type Session, type User } from "lucia";
import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { cookies } from "next/headers";
import { getPgPool } from "@/db/pg-pool";
import { SESSION_COOKIE, sessionAbsoluteSeconds, sessionCookieMaxAge, sessionCookieSecure, sessionTtlSeconds } from "@/lib/session-cookie";

// Sessions: lucia 3 with its PostgreSQL adapter on auth_user/user_session.
// A session lives SESSION_TTL_SECONDS (default 30 days); lucia extends it
// when less than half is left (the session comes back `fresh`), so an active
// user stays signed in and an idle one is signed out. However active, it
// ends sessionAbsoluteSeconds() after it was created (user_session.created_at):
// validateSessionId refuses it then. The cookie lives exactly that absolute
// lifetime, so it never needs re-sending from pages; the database decides.
export { SESSION_COOKIE };

function createLucia() {
  return new Lucia(new NodePostgresAdapter(getPgPool(), { user: "auth_user", session: "user_session" }), {
    sessionExpiresIn: new TimeSpan(sessionTtlSeconds(), "s"),
    sessionCookie: {
      name: SESSION_COOKIE,
      // httpOnly is lucia's default; SameSite=Lax; Secure when served over https.
      attributes: { secure: sessionCookieSecure(), sameSite: "lax" },
    },
    getSessionAttributes: (attrs) => ({ workspaceId: attrs.workspace_id, createdAt: attrs.created_at ?? null }),
    // Only these columns leave the adapter: never password_hash.
    getUserAttributes: (attrs) => ({ email: attrs.email, displayName: attrs.display_name }),
  });
}

type HeatsplitLucia = ReturnType<typeof createLucia>;

declare module "lucia" {
  interface Register {
    Lucia: HeatsplitLucia;
    // created_at is filled by the database default; never passed on insert
    DatabaseSessionAttributes: { workspace_id: string | null; created_at?: Date };
    DatabaseUserAttributes: { email: string; display_name: string };
  }
}

const globalForLucia = globalThis as unknown as { heatsplitLucia?: HeatsplitLucia };

export function getLucia(): HeatsplitLucia {
  globalForLucia.heatsplitLucia ??= createLucia();
  return globalForLucia.heatsplitLucia;
}

export async function createSignedInSession({ userId, workspaceId }: { userId: string; workspaceId: string | null }): Promise<Session> {
  const session = await getLucia().createSession(userId, { workspace_id: workspaceId });
  await setSessionCookie(session.id, null);
  return session;
}

/** Works in route handlers and server actions; pages cannot set cookies. Lives the rest of the session's absolute lifetime. */
export async function setSessionCookie(sessionId: string, createdAt: Date | null): Promise<void> {
  const c = getLucia().createSessionCookie(sessionId);
  (await cookies()).set(c.name, c.value, { ...c.attributes, maxAge: sessionCookieMaxAge(createdAt) });
}

export async function clearSessionCookie(): Promise<void> {
  const c = getLucia().createBlankSessionCookie();
  (await cookies()).set(c.name, c.value, c.attributes);
}

/** The live session and its user; null when unknown, idle-expired or past its absolute lifetime (then it is deleted). */
export async function validateSessionId(sessionId: string): Promise<{ session: Session; user: User } | null> {
  const { session, user } = await getLucia().validateSession(sessionId);
  if (!session || !user) return null;
  const createdAt = session.createdAt;
  if (createdAt && createdAt.getTime() + sessionAbsoluteSeconds() * 1000 <= Date.now()) {
    await getLucia().invalidateSession(session.id);
    return null;
  }
  return { session, user };
}
