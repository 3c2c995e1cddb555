import "server-only";
import { AppError } from "./errors";
import { deleteThrottleByBucket, incrementThrottleByBucket, sumThrottleAttemptsByBucket } from "@/db/queries/throttle";

// Sign-in throttling. Failed password checks are counted per account (the
// e-mail typed, whether or not it has an account, so the answer does not
// reveal which do) and per client address, in auth_throttle so the limits
// hold across app instances. Policy (common practice, not from a standard):
export const THROTTLE_WINDOW_SECONDS = 15 * 60;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 20;
/** Password-reset mails per e-mail address in the same window (silently capped). */
export const MAX_RESET_MAILS_PER_ACCOUNT = 3;
const KEEP_SECONDS = 24 * 60 * 60;

export const THROTTLED_MESSAGE = "Too many failed sign-in attempts. Wait 15 minutes and try again, or reset your password.";

const accountBucket = (email: string) => `account:${email}`;
const addressBucket = (address: string) => `address:${address}`;
const resetBucket = (email: string) => `reset:${email}`;

/** Throws 429 when either limit is already reached; call before checking the password. */
export async function assertSignInAllowed({ email, address }: { email: string; address: string }): Promise<void> {
  const [byAccount, byAddress] = await Promise.all([
    sumThrottleAttemptsByBucket({ bucket: accountBucket(email), windowSeconds: THROTTLE_WINDOW_SECONDS }),
    sumThrottleAttemptsByBucket({ bucket: addressBucket(address), windowSeconds: THROTTLE_WINDOW_SECONDS }),
  ]);
  if (byAccount >= MAX_FAILURES_PER_ACCOUNT || byAddress >= MAX_FAILURES_PER_ADDRESS) {
    throw new AppError("too_many_requests", THROTTLED_MESSAGE);
  }
}

export async function recordSignInFailure({ email, address }: { email: string; address: string }): Promise<void> {
  await incrementThrottleByBucket({ bucket: accountBucket(email), keepSeconds: KEEP_SECONDS });
  await incrementThrottleByBucket({ bucket: addressBucket(address), keepSeconds: KEEP_SECONDS });
}

/** A correct password clears the account's count; the address keeps its count. */
export async function recordSignInSuccess({ email }: { email: string }): Promise<void> {
  await deleteThrottleByBucket(accountBucket(email));
}

/** True when another reset mail may go to this address now (and counts it). */
export async function takeResetMailAllowance(email: string): Promise<boolean> {
  const sent = await sumThrottleAttemptsByBucket({ bucket: resetBucket(email), windowSeconds: THROTTLE_WINDOW_SECONDS });
  if (sent >= MAX_RESET_MAILS_PER_ACCOUNT) return false;
  await incrementThrottleByBucket({ bucket: resetBucket(email), keepSeconds: KEEP_SECONDS });
  return true;
}
