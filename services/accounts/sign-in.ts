import "server-only";
import { cookies } from "next/headers";
import { AppError } from "@/lib/errors";
import { getLucia, SESSION_COOKIE, createSignedInSession, clearSessionCookie } from "@/services/auth/session";
import { verifyPassword } from "@/services/auth/passwords";
import { beginPasswordAttempt } from "@/services/auth/throttle";
import { getCredentialsByEmail, type UserRecord } from "@/db/queries/accounts";
import { listMembershipsByUser } from "@/db/queries/workspaces";

export const INVALID_CREDENTIALS = "E-mail or password is wrong.";

/**
 * Checks a password under the sign-in throttle, which counts the attempt
 * before the check (so a parallel burst is checked a few times only). Same
 * answer (and about the same time) for an unknown e-mail and a wrong password.
 */
export async function checkPassword({ email, password, address }: { email: string; password: string; address: string }): Promise<UserRecord> {
  const attempt = await beginPasswordAttempt({ email, address });
  const creds = await getCredentialsByEmail(email);
  const ok = await verifyPassword(creds?.passwordHash ?? null, password);
  if (!creds || !ok) throw new AppError("unauthenticated", INVALID_CREDENTIALS);
  await attempt.succeeded();
  return creds.user;
}

/** Ends the request's current session, if any, before a new one starts (no session fixation). */
export async function endCurrentSession(): Promise<void> {
  const current = (await cookies()).get(SESSION_COOKIE)?.value;
  if (current) await getLucia().invalidateSession(current);
}

export async function signIn(input: { email: string; password: string; address: string }): Promise<{ user: UserRecord; workspaceId: string | null }> {
  const user = await checkPassword(input);
  const memberships = await listMembershipsByUser(user.id);
  const workspaceId = memberships[0]?.workspace.id ?? null;
  await endCurrentSession();
  await createSignedInSession({ userId: user.id, workspaceId });
  return { user, workspaceId };
}

export async function signOut(): Promise<void> {
  await endCurrentSession();
  await clearSessionCookie();
}
