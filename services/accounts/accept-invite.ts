import "server-only";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/roles";
import { createSignedInSession } from "@/services/auth/session";
import { hashPassword } from "@/services/auth/passwords";
import { PASSWORD_MIN_LENGTH } from "@/lib/password-policy";

import { getDb } from "@/db/knex";
import { getUserByEmail, insertUser } from "@/db/queries/accounts";
import { markInviteAcceptedById } from "@/db/queries/invites";
import { insertMembership } from "@/db/queries/workspaces";
import { getMemberByUser } from "@/db/queries/members";
import { BAD_INVITE, loadOpenInvite } from "@/services/members/invites";
import { checkPassword, endCurrentSession } from "./sign-in";
import type { AcceptInviteInput } from "@/lib/accounts/schema";
import { newRecordId } from "@/db/ids";

export interface AcceptedInvite {
  workspace: { id: string; name: string };
  role: Role;
  newAccount: boolean;
}

/**
 * A new person chooses a name and password; someone with an account proves
 * it with their password (under the sign-in throttle) unless they are
 * already signed in as the invited address. Either way they join with the
 * invited role (an existing membership keeps its role) and are signed in to
 * that workspace.
 */
export async function acceptInvite(
  input: AcceptInviteInput,
  ctx: { signedInUserId: string | null; address: string },
): Promise<AcceptedInvite> {
  const invite = await loadOpenInvite(input.token);
  const existing = await getUserByEmail(invite.email);
  let userId: string;
  let newUser: { id: string; displayName: string; passwordHash: string } | null = null;
  if (existing) {
    if (existing.id !== ctx.signedInUserId) {
      if (!input.password) throw fieldError("password", "Enter the password of your Heatsplit account.");
      await checkPassword({ email: invite.email, password: input.password, address: ctx.address });
    }
    userId = existing.id;
  } else {
    if (!input.displayName) throw fieldError("displayName", "Enter your name.");
    if (!input.password || input.password.length < PASSWORD_MIN_LENGTH) {
      throw fieldError("password", `Use at least ${PASSWORD_MIN_LENGTH} characters.`);
    }
    newUser = { id: newRecordId("usr"), displayName: input.displayName, passwordHash: await hashPassword(input.password) };
    userId = newUser.id;
  }
  await getDb().transaction(async (trx) => {
    if (!(await markInviteAcceptedById(invite.id, trx))) throw fieldError("token", BAD_INVITE);
    if (newUser) await insertUser({ ...newUser, email: invite.email }, trx);
    await insertMembership({ workspaceId: invite.workspaceId, userId, role: invite.role }, trx);
  });
  await endCurrentSession();
  await createSignedInSession({ userId, workspaceId: invite.workspaceId });
  const membership = await getMemberByUser({ workspaceId: invite.workspaceId, userId });
  return { workspace: { id: invite.workspaceId, name: invite.workspaceName }, role: membership?.role ?? invite.role, newAccount: newUser !== null };
}

function fieldError(path: string, message: string): AppError {
  return new AppError("bad_request", message, [{ path, message }]);
}
