import { publicRoute } from "@/app/_lib/access";
import { acceptInviteSchema } from "@/lib/accounts/schema";
import { acceptInvite } from "@/services/accounts/accept-invite";
import { clientAddress } from "@/app/_lib/client-address";

// Joins the invited workspace (creating the account if needed) and signs in to it.
export const POST = publicRoute({ body: acceptInviteSchema }, async ({ body, member, req }) =>
  acceptInvite(body, { signedInUserId: member?.user.id ?? null, address: clientAddress(req.headers) }),
);
