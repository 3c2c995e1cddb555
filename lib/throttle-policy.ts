// The throttle's numbers, in a module with no imports so tests and pages can
// read them. Policy, common practice rather than a standard: the OWASP
// Authentication Cheat Sheet asks for throttling that slows an attacker
// without letting anyone lock the owner out (no per-account lock-out),
// growing delays and a limit per source address; the figures are ours.

/** Failures of one (account, address) pair before waits begin. */
export const PAIR_FREE_FAILURES = 3;
/** The wait after the PAIR_FREE_FAILURES-th failure; it doubles with each further one. */
export const PAIR_FIRST_DELAY_SECONDS = 2;
export const PAIR_MAX_DELAY_SECONDS = 15 * 60;
/** Failures of a pair are forgotten this long after the first of them. */
export const PAIR_WINDOW_SECONDS = 60 * 60;

/** Failed password checks from one address, across all accounts, per window. */
export const ADDRESS_MAX_FAILURES = 20;
export const ADDRESS_WINDOW_SECONDS = 15 * 60;

/** Sign-ups (each costs an argon2 hash and a mail) per address per window. */
export const SIGN_UPS_PER_ADDRESS = 10;
export const SIGN_UP_WINDOW_SECONDS = 60 * 60;

/** Account mails (reset links, sign-up links and notices) per recipient per window; more are dropped silently. */
export const MAILS_PER_RECIPIENT = 3;
export const MAIL_WINDOW_SECONDS = 15 * 60;
