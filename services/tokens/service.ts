import "server-only";
import crypto from "node:crypto";
import { AppError } from "@/lib/errors";
import { hashToken } from "@/services/auth/secrets";
import type { Member } from "@/services/auth/member";
import { checkPassword } from "@/services/accounts/sign-in";
import { getDb } from "@/db/knex";
import { getTokenMemberByHash, insertApiToken, revokeApiTokenById } from "@/db/queries/api-tokens";
import { insertActivity } from "@/db/queries/activity";

// Personal API tokens for scripts and CI: `Authorization: Bearer hs_...`.
// The secret is 32 random bytes behind a recognisable prefix (so secret
// scanners and people can tell what it is); only its SHA-256 is stored.
export const API_TOKEN_PREFIX = "hs_";
const TOKEN_BYTES = 32;
const BEARER = /^Bearer\s+(\S+)\s*$/i;

export function createApiSecret(): { secret: string; tokenHash: string } {
  const secret = `${API_TOKEN_PREFIX}${crypto.randomBytes(TOKEN_BYTES).toString("base64url")}`;
  return { secret, tokenHash: hashToken(secret) };
}

/**
 * The Member a bearer token acts as, with via "token" and the user's
 * current role in the token's workspace. Anything but a live token of a
 * current member -> 401 (one message: no hint whether it existed).
 */
export async function resolveBearer(authorization: string): Promise<Member> {
  const m = BEARER.exec(authorization);
  const secret = m?.[1];
  if (!secret || !secret.startsWith(API_TOKEN_PREFIX) || secret.length > 200) {
    throw new AppError("unauthenticated", "Send a Heatsplit API token as: Authorization: Bearer hs_...");
  }
  const found = await getTokenMemberByHash(hashToken(secret));
  if (!found) throw new AppError("unauthenticated", "This API token is unknown, revoked or expired.");
  return { user: found.user, workspace: found.workspace, role: found.role, sessionId: "", via: "token" };
}

/** For routes that must not be reachable with a token (managing tokens, switching workspace). */
export function requireSessionMember(member: Member): void {
  if (member.via !== "session") throw new AppError("forbidden", "Sign in to do this; API tokens cannot.");
}

const WRONG_PASSWORD = "That is not the password of your account.";

/**
 * Creates a token for the member in their current workspace, after checking
 * their password again (under the sign-in throttle, so this is no way round
 * it); the secret is returned once and never stored. Logged in the activity.
 */
export async function issueApiToken(member: Member, input: { name: string; expiresInDays: number; password: string; address: string }) {
  requireSessionMember(member);
  try {
    await checkPassword({ email: member.user.email, password: input.password, address: input.address });
  } catch (err) {
    if (err instanceof AppError && err.code === "unauthenticated") throw new AppError("bad_request", WRONG_PASSWORD, [{ path: "password", message: WRONG_PASSWORD }]);
    throw err;
  }
  const { secret, tokenHash } = createApiSecret();
  const expiresAt = new Date(Date.now() + input.expiresInDays * 86_400_000);
  const token = await getDb().transaction(async (trx) => {
    const t = await insertApiToken({ userId: member.user.id, workspaceId: member.workspace.id, name: input.name, tokenHash, expiresAt }, trx);
    await insertActivity({ workspaceId: member.workspace.id, projectId: null, actor: member.user.id, action: "token.created", detail: { tokenId: t.id, name: t.name, expiresAt: t.expiresAt } }, trx);
    return t;
  });
  return { token, secret };
}

/** Revokes one of the member's own tokens; false when they have no such token. Logged once, when it happens. */
export async function revokeOwnApiToken(member: Member, { tokenId }: { tokenId: string }): Promise<boolean> {
  requireSessionMember(member);
  return getDb().transaction(async (trx) => {
    const r = await revokeApiTokenById({ userId: member.user.id, workspaceId: member.workspace.id, tokenId }, trx);
    if (r?.revokedNow) await insertActivity({ workspaceId: member.workspace.id, projectId: null, actor: member.user.id, action: "token.revoked", detail: { tokenId, name: r.name } }, trx);
    return r !== null;
  });
}
