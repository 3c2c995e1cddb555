import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// Attempt counters in auth_guard, one row per bucket. claimAttempt checks
// and counts in ONE statement: INSERT ... ON CONFLICT DO UPDATE ... WHERE
// takes the row lock, so parallel requests for a bucket queue on it and
// each sees the count the one before it left (PostgreSQL manual, INSERT,
// "ON CONFLICT DO UPDATE": the update is atomic with the conflict check).
// When the WHERE refuses, nothing is written and no row comes back.
// Times come from the database clock, shared by every app instance.

export interface ClaimRule {
  /** Claims allowed per window (a cap); Infinity for none. */
  limit: number;
  windowSeconds: number;
  /** Claims before waits begin; Infinity for no waits. */
  freeClaims: number;
  firstDelaySeconds: number;
  maxDelaySeconds: number;
}

export type Claim = { ok: true; attempts: number } | { ok: false; retryAfterSeconds: number };

/** Seconds to wait after the n-th claim of a window: none while free, then doubling from firstDelay, capped. */
export function delayAfter(n: number, rule: ClaimRule): number {
  if (!(n >= rule.freeClaims)) return 0;
  return Math.min(rule.maxDelaySeconds, rule.firstDelaySeconds * 2 ** Math.min(n - rule.freeClaims, 30));
}

const BIG = 2_000_000_000; // stands in for Infinity in SQL integer comparisons
const num = (x: number) => (Number.isFinite(x) ? x : BIG);

export async function claimAttempt(bucket: string, rule: ClaimRule, db: Knex = getDb()): Promise<Claim> {
  const expired = "g.window_start <= now() - make_interval(secs => :window)";
  const next = `(case when ${expired} then 1 else g.attempts + 1 end)`;
  const delay = `(case when ${next} < :free then 0 else least(:maxDelay, :firstDelay * power(2, least(${next} - :free, 30))) end)`;
  const params = { bucket, window: rule.windowSeconds, free: num(rule.freeClaims), firstDelay: rule.firstDelaySeconds, maxDelay: rule.maxDelaySeconds, limit: num(rule.limit), firstWait: delayAfter(1, rule) };
  const r = await db.raw(
    `with claimed as (
       insert into auth_guard as g (bucket, attempts, window_start, retry_at)
       values (:bucket, 1, now(), now() + make_interval(secs => :firstWait))
       on conflict (bucket) do update set
         attempts = ${next},
         window_start = case when ${expired} then now() else g.window_start end,
         retry_at = now() + make_interval(secs => ${delay})
       where ${expired} or (g.attempts < :limit and g.retry_at <= now())
       returning attempts
     )
     select (select attempts from claimed) as attempts,
            (select ceil(extract(epoch from greatest(
                case when g.attempts >= :limit then g.window_start + make_interval(secs => :window) else now() end,
                g.retry_at) - now())) from auth_guard g where g.bucket = :bucket) as wait`,
    params,
  );
  const row = r.rows[0] as { attempts: number | null; wait: string | null };
  if (Math.random() < 0.01) void pruneGuards(db); // old rows go now and then; never on the answer's path
  if (row.attempts !== null) return { ok: true, attempts: row.attempts };
  return { ok: false, retryAfterSeconds: Math.max(1, Number(row.wait ?? 1)) };
}

/** Gives one claim back (an attempt that turned out not to count, e.g. a correct password against the address cap). */
export async function returnClaim(bucket: string, db: Knex = getDb()): Promise<void> {
  await db("auth_guard").where({ bucket }).update({ attempts: db.raw("greatest(attempts - 1, 0)") });
}

export async function deleteGuard(bucket: string, db: Knex = getDb()): Promise<void> {
  await db("auth_guard").where({ bucket }).delete();
}

/** Every bucket starting with `prefix` (starts_with, so "_" and "%" in e-mails are not patterns). */
export async function deleteGuardsByPrefix(prefix: string, db: Knex = getDb()): Promise<void> {
  await db("auth_guard").whereRaw("starts_with(bucket, ?)", [prefix]).delete();
}

async function pruneGuards(db: Knex): Promise<void> {
  await db("auth_guard").where("window_start", "<", db.raw("now() - interval '1 day'")).andWhere("retry_at", "<", db.raw("now()")).delete().catch(() => undefined);
}
