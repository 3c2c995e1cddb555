import "server-only";
import type { Member } from "@/services/auth/member";
import { listDevMailForUser, type DevMailRecord } from "@/db/queries/dev-mailbox";

export { devInboxEnabled } from "./mail";

export const LINK_WITHHELD = "[link withheld: only the recipient may follow it]";
const URL_PATTERN = /https?:\/\/[^\s<>"']+/g;

/**
 * The member's own mail: messages addressed to them, and messages their own
 * actions caused (an invitation they sent). In the latter every link is
 * withheld: a link in someone else's mail (reset, invitation, sign-up) lets
 * its reader act as that person.
 */
export async function listDevMailForMember(member: Member): Promise<DevMailRecord[]> {
  const email = member.user.email.toLowerCase();
  const mail = await listDevMailForUser({ email, userId: member.user.id });
  return mail.map((m) => (m.recipients.includes(email) ? m : { ...m, textBody: m.textBody.replace(URL_PATTERN, LINK_WITHHELD) }));
}
