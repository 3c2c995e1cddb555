import "server-only";
import { after } from "next/server";
import { AppError } from "@/lib/errors";
import { getLucia } from "@/services/auth/session";
import { hashPassword } from "@/services/auth/passwords";
import { createToken, hashToken } from "@/services/auth/secrets";
import { appLink, sendMail } from "@/services/mail/mail";
import { clearPasswordAttempts, takeMailAllowance } from "@/services/auth/throttle";
import { getDb } from "@/db/knex";
import { getUserByEmail, getUserById, updateUserPasswordById } from "@/db/queries/accounts";
import { consumePasswordResetByTokenHash, expirePasswordResetsByUser, insertPasswordReset } from "@/db/queries/password-resets";
import { revokeApiTokensByUser } from "@/db/queries/api-tokens";
import type { ResetPasswordInput } from "@/lib/accounts/schema";

/** How long a reset link works (policy). */
export const RESET_LINK_TTL_SECONDS = 60 * 60;

export const RESET_REQUESTED_MESSAGE = "If an account exists for that address, we have sent it a link to choose a new password. The link works for one hour.";

const BAD_LINK = "This link is invalid, expired or already used. Ask for a new one.";

/**
 * Always answers the same, and at once: the lookup, the link and the mail
 * all happen after the response is sent (next/server `after`), so nothing a
 * known address causes can make its answer slower than an unknown one's.
 */
export function requestPasswordReset(email: string, causedBy: string | null): void {
  after(() => sendResetLink(email, causedBy).catch((err: Error) => console.error("password reset mail failed:", err.message)));
}

async function sendResetLink(email: string, causedBy: string | null): Promise<void> {
  const user = await getUserByEmail(email);
  if (!user || !(await takeMailAllowance(email))) return;
  const { token, tokenHash } = createToken();
  await insertPasswordReset({ tokenHash, userId: user.id, expiresAt: new Date(Date.now() + RESET_LINK_TTL_SECONDS * 1000) });
  const link = appLink("/reset-password", { token });
  await sendMail({
    to: user.email,
    causedBy,
    subject: "Choose a new Heatsplit password",
    text: `Hello ${user.displayName},\n\nSomeone (hopefully you) asked to reset the password of your Heatsplit account.\nChoose a new password here (the link works once, for one hour):\n\n${link}\n\nIf you did not ask for this, ignore this message; your password stays as it is.\n`,
  });
}

/**
 * Sets the new password, uses up every open link, revokes the account's API
 * tokens and signs it out everywhere: whoever had the old password, a
 * session or a token is out.
 */
export async function resetPassword({ token, password }: ResetPasswordInput): Promise<void> {
  const passwordHash = await hashPassword(password);
  const userId = await getDb().transaction(async (trx) => {
    const id = await consumePasswordResetByTokenHash(hashToken(token), trx);
    if (!id) return null;
    await updateUserPasswordById({ id, passwordHash }, trx);
    await expirePasswordResetsByUser(id, trx);
    await revokeApiTokensByUser(id, trx);
    return id;
  });
  if (!userId) throw new AppError("bad_request", BAD_LINK, [{ path: "token", message: BAD_LINK }]);
  await getLucia().invalidateUserSessions(userId);
  const user = await getUserById(userId);
  if (user) await clearPasswordAttempts(user.email); // the owner starts afresh from every address
}
