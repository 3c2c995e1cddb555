import "server-only";
import crypto from "node:crypto";

// Secrets sent by e-mail (invite and reset links) are 32 random bytes; only
// their SHA-256 is stored, so a database leak does not hand out live links.
const TOKEN_BYTES = 32;

export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token, "utf8").digest("hex");
}

export function createToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(TOKEN_BYTES).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

