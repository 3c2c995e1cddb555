import { z } from "zod";

// Personal API tokens: what the tokens page's form and POST /api/v1/tokens
// accept. Expiry in whole days from now; blank or absent means no expiry.
export const TOKEN_EXPIRY_CHOICES = [7, 30, 90, 365] as const;
export const MAX_TOKEN_DAYS = 366;

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

export const tokenCreateSchema = z
  .object({
    name: z.string().trim().min(1, "name the token after what uses it, e.g. \"CI sweep job\"").max(80),
    expiresInDays: z.preprocess(blankToUndefined, z.coerce.number().int().min(1, "at least 1 day").max(MAX_TOKEN_DAYS, `at most ${MAX_TOKEN_DAYS} days`).optional()),
  })
  .strict();
export type TokenCreateInput = z.input<typeof tokenCreateSchema>;

export const tokenParamsSchema = z.object({ tokenId: z.string().regex(/^tok_[A-Za-z0-9_-]{8,40}$/) });

/** The revoke button's form. */
export const tokenRevokeFormSchema = z.object({ id: tokenParamsSchema.shape.tokenId }).strict();
