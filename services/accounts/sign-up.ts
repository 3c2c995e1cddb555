import "server-only";
import { after } from "next/server";
import { AppError } from "@/lib/errors";
import { createSignedInSession } from "@/services/auth/session";
import { hashPassword } from "@/services/auth/passwords";
import { createToken, hashToken } from "@/services/auth/secrets";
import { appLink, sendMail } from "@/services/mail/mail";
import { claimSignUp, takeMailAllowance } from "@/services/auth/throttle";
import { getDb } from "@/db/knex";
import { getUserByEmail, insertUser, type UserRecord } from "@/db/queries/accounts";
import { insertMembership, insertWorkspace, type WorkspaceRecord } from "@/db/queries/workspaces";
import { consumePendingSignUpByTokenHash, deletePendingSignUpsByEmail, insertPendingSignUp } from "@/db/queries/pending-sign-ups";
import { endCurrentSession } from "./sign-in";
import type { SignUpInput } from "@/lib/accounts/schema";
import { newRecordId } from "@/db/ids";

// Sign-up in two steps, so its answer cannot tell whether an address has an
// account: the request always answers SIGN_UP_REQUESTED_MESSAGE at once (only
// the per-address throttle runs first), and afterwards a new address gets a
// link that finishes the sign-up while an address with an account gets a
// notice instead. Both paths hash the password, so they cost the same.

/** How long a sign-up link works (policy). */
export const SIGN_UP_LINK_TTL_SECONDS = 24 * 60 * 60;

export const SIGN_UP_REQUESTED_MESSAGE = "Check your inbox: we have sent a link to finish creating your account and workspace. It works for 24 hours.";

const BAD_LINK = "This sign-up link is invalid, expired or already used. Sign up again, or sign in if you have an account.";

export async function requestSignUp(input: SignUpInput, ctx: { address: string; causedBy: string | null }): Promise<void> {
  await claimSignUp(ctx.address);
  after(() => mailSignUp(input, ctx.causedBy).catch((err: Error) => console.error("sign-up mail failed:", err.message)));
}

async function mailSignUp(input: SignUpInput, causedBy: string | null): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  if (!(await takeMailAllowance(input.email))) return;
  const existing = await getUserByEmail(input.email);
  if (existing) {
    await sendMail({
      to: existing.email,
      causedBy,
      subject: "Someone tried to create a Heatsplit account with your address",
      text: `Hello ${existing.displayName},\n\nSomeone (perhaps you) asked to create a Heatsplit account for ${existing.email}.\nThis address already has a Heatsplit account, so nothing was created or changed.\n\nSign in: ${appLink("/sign-in")}\nForgot your password? ${appLink("/forgot-password")}\n\nIf it was not you, ignore this message.\n`,
    });
    return;
  }
  const { token, tokenHash } = createToken();
  await insertPendingSignUp({ tokenHash, email: input.email, displayName: input.displayName, workspaceName: input.workspaceName, passwordHash, expiresAt: new Date(Date.now() + SIGN_UP_LINK_TTL_SECONDS * 1000) });
  await sendMail({
    to: input.email,
    causedBy,
    subject: "Finish creating your Heatsplit account",
    text: `Hello ${input.displayName},\n\nFollow this link to create your Heatsplit account and the workspace "${input.workspaceName}" (the link works once, for 24 hours):\n\n${appLink("/sign-up/confirm", { token })}\n\nIf you did not ask for this, ignore this message; nothing is created.\n`,
  });
}

/** The mailed link: creates the account and its workspace (the creator is admin) and signs in. */
export async function confirmSignUp(token: string): Promise<{ user: UserRecord; workspace: WorkspaceRecord }> {
  const ids = { user: newRecordId("usr"), workspace: newRecordId("ws") };
  const created = await getDb()
    .transaction(async (trx) => {
      const pending = await consumePendingSignUpByTokenHash(hashToken(token), trx);
      if (!pending) return null;
      await deletePendingSignUpsByEmail(pending.email, trx);
      if (await getUserByEmail(pending.email, trx)) return null; // joined by invitation meanwhile: sign in instead
      const user = await insertUser({ id: ids.user, email: pending.email, displayName: pending.displayName, passwordHash: pending.passwordHash }, trx);
      const workspace = await insertWorkspace({ id: ids.workspace, name: pending.workspaceName }, trx);
      await insertMembership({ workspaceId: workspace.id, userId: user.id, role: "admin" }, trx);
      return { user, workspace };
    })
    .catch((err: { code?: string }) => {
      if (err.code === "23505") return null; // the address got an account in a race
      throw err;
    });
  if (!created) throw new AppError("bad_request", BAD_LINK, [{ path: "token", message: BAD_LINK }]);
  await endCurrentSession();
  await createSignedInSession({ userId: created.user.id, workspaceId: created.workspace.id });
  return created;
}
