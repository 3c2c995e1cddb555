import "server-only";
import type { Member } from "../member";
import { listMembersByWorkspace } from "@/db/queries/members";
import { listInvitedEmailsByWorkspace } from "@/db/queries/invites";
import { listDevMailByRecipients, type DevMailRecord } from "@/db/queries/dev-mailbox";

/** The development inbox exists only where HEATSPLIT_DEV_INBOX=1 (local stacks). */
export function devInboxEnabled(): boolean {
  return process.env.HEATSPLIT_DEV_INBOX === "1";
}

/** Mail to the admin's workspace: its members and every address it invited. */
export async function listDevMailForWorkspace(member: Member): Promise<DevMailRecord[]> {
  const [members, invited] = await Promise.all([listMembersByWorkspace(member.workspace.id), listInvitedEmailsByWorkspace(member.workspace.id)]);
  return listDevMailByRecipients([...new Set([...members.map((m) => m.email), ...invited])]);
}
