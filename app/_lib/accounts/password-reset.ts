import "server-only";
import { after } from "next/server";
import { AppError } from "../errors";
import { getLucia } from "../auth";
import { hashPassword } from "../passwords";
import { createToken, hashToken } from "../tokens";
import { appLink, sendMail } from "../mail";
import { recordSignInSuccess, takeResetMailAllowance } from "../throttle";
import { getDb } from "@/db/knex";
import { getUserByEmail, getUserById, updateUserPasswordById } from "@/db/queries/accounts";
import { consumePasswordResetByTokenHash, expirePasswordResetsByUser, insertPasswordReset } from "@/db/queries/password-resets";
import type { ResetPasswordInput } from "./schemas";

/** How long a reset link works (policy). */
export const RESET_LINK_TTL_SECONDS = 60 * 60;

export const RESET_REQUESTED_MESSAGE = "If an account exists for that address, we have sent it a link to choose a new password. The link works for one hour.";

const BAD_LINK = "This link is invalid, expired or already used. Ask for a new one.";

/**
 * Always answers the same. The mail is sent after the response (next/server
 * `after`), so the answer takes about as long for an unknown address.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await getUserByEmail(email);
  if (!user || !(await takeResetMailAllowance(email))) return;
  const { token, tokenHash } = createToken();
  await insertPasswordReset({ tokenHash, userId: user.id, expiresAt: new Date(Date.now() + RESET_LINK_TTL_SECONDS * 1000) });
  const link = appLink("/reset-password", { token });
  after(() =>
    sendMail({
      to: user.email,
      subject: "Choose a new Heatsplit password",
      text: `Hello ${user.displayName},\n\nSomeone (hopefully you) asked to reset the password of your Heatsplit account.\nChoose a new password here (the link works once, for one hour):\n\n${link}\n\nIf you did not ask for this, ignore this message; your password stays as it is.\n`,
    }).catch((err: Error) => console.error("password reset mail failed:", err.message)),
  );
}

/** Sets the new password, uses up every open link, and signs the account out everywhere. */
export async function resetPassword({ token, password }: ResetPasswordInput): Promise<void> {
  const passwordHash = await hashPassword(password);
  const userId = await getDb().transaction(async (trx) => {
    const id = await consumePasswordResetByTokenHash(hashToken(token), trx);
    if (!id) return null;
    await updateUserPasswordById({ id, passwordHash }, trx);
    await expirePasswordResetsByUser(id, trx);
    return id;
  });
  if (!userId) throw new AppError("bad_request", BAD_LINK, [{ path: "token", message: BAD_LINK }]);
  await getLucia().invalidateUserSessions(userId);
  const user = await getUserById(userId);
  if (user) await recordSignInSuccess({ email: user.email }); // a locked-out owner gets back in
}
