import { publicRoute } from "@/app/_lib/access";
import { describeInviteSchema } from "@/lib/accounts/schema";
import { describeInvite } from "@/services/members/invites";

// What an invitation link is for (workspace, role, whether the address has an account).
// POST, not GET: the token travels in the body, never in a URL or a log line.
export const POST = publicRoute({ body: describeInviteSchema }, async ({ body }) => describeInvite(body.token));
