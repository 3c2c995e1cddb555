import "server-only";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/roles";
import type { Member } from "@/services/auth/member";
import { createToken, hashToken } from "@/services/auth/secrets";
import { appLink, sendMail } from "@/services/mail/mail";
import { getMemberByUser } from "@/db/queries/members";
import { getUserByEmail } from "@/db/queries/accounts";
import { deleteInviteById, getInviteByTokenHash, insertInvite, type InviteRecord } from "@/db/queries/invites";
import type { InviteInput } from "@/lib/accounts/schema";
import { newRecordId } from "@/db/ids";

/** How long an invitation link works (policy). */
export const INVITE_TTL_DAYS = 7;

export const BAD_INVITE = "This invitation is invalid, expired or already used. Ask the workspace admin for a new one.";

export interface InviteSummary {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
}

export async function createInvite(member: Member, { email, role }: InviteInput): Promise<InviteSummary> {
  const existing = await getUserByEmail(email);
  if (existing && (await getMemberByUser({ workspaceId: member.workspace.id, userId: existing.id }))) {
    const msg = "This person is already a member of the workspace.";
    throw new AppError("conflict", msg, [{ path: "email", message: msg }]);
  }
  const { token, tokenHash } = createToken();
  const id = newRecordId("inv");
  const expiresAt = new Date(Date.now() + INVITE_TTL_DAYS * 24 * 3600 * 1000);
  await insertInvite({ id, workspaceId: member.workspace.id, email, role, tokenHash, invitedBy: member.user.id, expiresAt });
  const link = appLink("/invite", { token });
  await sendMail({
    to: email,
    causedBy: member.user.id,
    subject: `${member.user.displayName} invited you to ${member.workspace.name} on Heatsplit`,
    text: `Hello,\n\n${member.user.displayName} invited you to join the workspace "${member.workspace.name}" on Heatsplit as ${role}.\nAccept the invitation here (the link works for ${INVITE_TTL_DAYS} days):\n\n${link}\n\nIf you did not expect this, ignore this message.\n`,
  });
  return { id, email, role, expiresAt: expiresAt.toISOString() };
}

export async function revokeInvite(member: Member, inviteId: string): Promise<void> {
  const deleted = await deleteInviteById({ workspaceId: member.workspace.id, id: inviteId });
  if (!deleted) throw new AppError("not_found", "No such open invitation.");
}

/** An open invite by the token from its link; otherwise a 400 on the token field. */
export async function loadOpenInvite(token: string): Promise<InviteRecord> {
  const invite = await getInviteByTokenHash(hashToken(token));
  if (!invite || invite.acceptedAt || invite.expiresAt.getTime() <= Date.now()) {
    throw new AppError("bad_request", BAD_INVITE, [{ path: "token", message: BAD_INVITE }]);
  }
  return invite;
}

export interface InviteDescription {
  workspaceName: string;
  email: string;
  role: Role;
  hasAccount: boolean;
}

export async function describeInvite(token: string): Promise<InviteDescription> {
  const invite = await loadOpenInvite(token);
  const user = await getUserByEmail(invite.email);
  return { workspaceName: invite.workspaceName, email: invite.email, role: invite.role, hasAccount: user !== null };
}
