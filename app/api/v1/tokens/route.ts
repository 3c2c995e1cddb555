import { reply, route } from "@/app/_lib/access";
import { issueApiToken, requireSessionMember } from "@/app/_lib/api-tokens";
import { tokenCreateSchema } from "@/app/(workspace)/settings/tokens/schema";
import { listApiTokensByUser } from "@/db/queries/api-tokens";

// Personal API tokens of the signed-in user in the current workspace.
// Session only: a token cannot list or mint tokens.

// GET /api/v1/tokens -> { items } (never the secret or its hash)
export const GET = route({ permission: "token:own" }, async ({ member }) => {
  requireSessionMember(member);
  return { items: await listApiTokensByUser({ userId: member.user.id, workspaceId: member.workspace.id }) };
});

// POST /api/v1/tokens { name, expiresInDays? } -> 201 { token, secret } (the secret this once)
export const POST = route({ permission: "token:own", body: tokenCreateSchema }, async ({ member, body }) => {
  const { token, secret } = await issueApiToken(member, body);
  return reply({ token, secret }, 201);
});
