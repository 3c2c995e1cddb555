import { z } from "zod";
import { PASSWORD_MAX_LENGTH } from "@/lib/password-policy";

// Personal API tokens: what the tokens page's form and POST /api/v1/tokens
// accept. Every token expires, at most a year from now (whole days), and
// making one needs the account's password again: a stolen session alone
// cannot mint a credential that outlives it.
export const TOKEN_EXPIRY_CHOICES = [7, 30, 90, 365] as const;
export const MAX_TOKEN_DAYS = 365;

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

export const tokenCreateSchema = z
  .object({
    name: z.string().trim().min(1, "name the token after what uses it, e.g. \"CI sweep job\"").max(80),
    expiresInDays: z.preprocess(
      blankToUndefined,
      z.coerce.number({ error: "choose when the token expires (at most a year)" }).int().min(1, "at least 1 day").max(MAX_TOKEN_DAYS, `at most ${MAX_TOKEN_DAYS} days`),
    ),
    password: z.string({ error: "enter your password to confirm" }).min(1, "enter your password to confirm").max(PASSWORD_MAX_LENGTH, "enter your password to confirm"),
  })
  .strict();
export type TokenCreateInput = z.input<typeof tokenCreateSchema>;

export const tokenParamsSchema = z.object({ tokenId: z.string().regex(/^tok_[A-Za-z0-9_-]{8,40}$/) });

/** The revoke button's form. */
export const tokenRevokeFormSchema = z.object({ id: tokenParamsSchema.shape.tokenId }).strict();
