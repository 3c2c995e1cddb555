import "server-only";
import { AppError } from "@/lib/errors";
import { claimAttempt, deleteGuard, deleteGuardsByPrefix, returnClaim, type ClaimRule } from "@/db/queries/throttle";
import * as P from "@/lib/throttle-policy";

// Password checks, sign-ups and account mails are throttled in auth_guard
// (db/queries/throttle.ts), so the limits hold across app instances. A
// password check claims its slots BEFORE the password is verified: a burst
// sent at once queues on the row and only the first few are checked.
//
// - Per (account, address) pair: PAIR_FREE_FAILURES free failures, then a
//   growing wait. An attacker elsewhere cannot lock the owner out; the pair
//   is cleared when its password is right.
// - Per address: ADDRESS_MAX_FAILURES failures across all accounts per
//   window. A correct password gives its claim back.
// The typed e-mail is used whether or not it has an account, so the answer
// does not reveal which do.

const PAIR: ClaimRule = { limit: Infinity, windowSeconds: P.PAIR_WINDOW_SECONDS, freeClaims: P.PAIR_FREE_FAILURES, firstDelaySeconds: P.PAIR_FIRST_DELAY_SECONDS, maxDelaySeconds: P.PAIR_MAX_DELAY_SECONDS };
const capped = (limit: number, windowSeconds: number): ClaimRule => ({ limit, windowSeconds, freeClaims: Infinity, firstDelaySeconds: 0, maxDelaySeconds: 0 });
const ADDRESS = capped(P.ADDRESS_MAX_FAILURES, P.ADDRESS_WINDOW_SECONDS);
const SIGN_UP = capped(P.SIGN_UPS_PER_ADDRESS, P.SIGN_UP_WINDOW_SECONDS);
const MAIL = capped(P.MAILS_PER_RECIPIENT, P.MAIL_WINDOW_SECONDS);

const pairPrefix = (email: string) => `pair:${email}|`;
const pairBucket = (email: string, address: string) => `${pairPrefix(email)}${address}`;
const addressBucket = (address: string) => `address:${address}`;

export const THROTTLED_MESSAGE = "Too many failed sign-in attempts. Wait a little and try again, or reset your password.";
export const SIGN_UP_THROTTLED_MESSAGE = "Too many sign-ups from this address. Try again later.";

function tooMany(message: string, retryAfterSeconds: number): AppError {
  return new AppError("too_many_requests", message, [], { retryAfterSeconds });
}

export interface PasswordAttempt {
  /** The password was right: the pair is cleared and the address gets its claim back. */
  succeeded(): Promise<void>;
}

/** Claims the address's and the pair's slots for one password check, or throws 429 with Retry-After. */
export async function beginPasswordAttempt({ email, address }: { email: string; address: string }): Promise<PasswordAttempt> {
  const byAddress = await claimAttempt(addressBucket(address), ADDRESS);
  if (!byAddress.ok) throw tooMany(THROTTLED_MESSAGE, byAddress.retryAfterSeconds);
  const byPair = await claimAttempt(pairBucket(email, address), PAIR);
  if (!byPair.ok) {
    await returnClaim(addressBucket(address)); // not checked, so not a failure of this address
    throw tooMany(THROTTLED_MESSAGE, byPair.retryAfterSeconds);
  }
  return {
    async succeeded() {
      await deleteGuard(pairBucket(email, address));
      await returnClaim(addressBucket(address));
    },
  };
}

/** After a password reset the owner starts afresh from every address. */
export async function clearPasswordAttempts(email: string): Promise<void> {
  await deleteGuardsByPrefix(pairPrefix(email));
}

/** Counts one sign-up from this address, or throws 429. */
export async function claimSignUp(address: string): Promise<void> {
  const c = await claimAttempt(`signup:${address}`, SIGN_UP);
  if (!c.ok) throw tooMany(SIGN_UP_THROTTLED_MESSAGE, c.retryAfterSeconds);
}

/** True when another account mail may go to this address now (and counts it). */
export async function takeMailAllowance(email: string): Promise<boolean> {
  return (await claimAttempt(`mail:${email}`, MAIL)).ok;
}
