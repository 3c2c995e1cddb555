import { route } from "@/app/_lib/access";
import { AppError } from "@/lib/errors";
import { revokeOwnApiToken } from "@/services/tokens/service";
import { tokenParamsSchema } from "@/lib/tokens/schema";

// DELETE /api/v1/tokens/:tokenId -> 204; another user's token is not found (404).
export const DELETE = route({ permission: "token:own", params: tokenParamsSchema }, async ({ member, params }) => {
  const revoked = await revokeOwnApiToken(member, params);
  if (!revoked) throw new AppError("not_found", "Not found.");
  return undefined;
});
