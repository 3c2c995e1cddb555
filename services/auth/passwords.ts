import "server-only";
import { hash, verify } from "@node-rs/argon2";

// Argon2id with the OWASP Password Storage Cheat Sheet's first listed
// parameter set (m = 19 MiB, t = 2, p = 1); the demo seed uses the same.
const ARGON2 = { algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2);
}

// Verifying against this when the account does not exist keeps the answer
// time about the same, so timing does not tell which e-mails have accounts.
let dummyHash: Promise<string> | undefined;

export async function verifyPassword(passwordHash: string | null, password: string): Promise<boolean> {
  if (passwordHash === null) {
    dummyHash ??= hashPassword("not-a-real-password-for-timing");
    await verify(await dummyHash, password).catch(() => false);
    return false;
  }
  return verify(passwordHash, password).catch(() => false);
}
