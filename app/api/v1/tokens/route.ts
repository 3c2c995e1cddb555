import { reply, route } from "@/app/_lib/access";
import { issueApiToken, requireSessionMember } from "@/services/tokens/service";
import { clientAddress } from "@/app/_lib/client-address";
import { tokenCreateSchema } from "@/lib/tokens/schema";
import { listApiTokensByUser } from "@/db/queries/api-tokens";

// Personal API tokens of the signed-in user in the current workspace.
// Session only: a token cannot list or mint tokens.

// GET /api/v1/tokens -> { items } (never the secret or its hash)
export const GET = route({ permission: "token:own" }, async ({ member }) => {
  requireSessionMember(member);
  return { items: await listApiTokensByUser({ userId: member.user.id, workspaceId: member.workspace.id }) };
});

// POST /api/v1/tokens { name, expiresInDays (1-365), password } -> 201 { token, secret } (the secret this once)
// A wrong password is a 400 on "password", counted by the sign-in throttle.
export const POST = route({ permission: "token:own", body: tokenCreateSchema }, async ({ member, body, req }) => {
  const { token, secret } = await issueApiToken(member, { ...body, address: clientAddress(req.headers) });
  return reply({ token, secret }, 201);
});
