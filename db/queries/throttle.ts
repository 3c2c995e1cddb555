import "server-only";
import type { Knex } from "knex";
import { getDb } from "@/db/knex";

// Attempt counters in auth_throttle, one row per bucket and one-minute slot.
// A limit is checked against the sum of the slots inside its window, which
// makes it a sliding window (to a minute) shared by every app instance.
// Times come from the database clock so instances need not agree on theirs.

export async function sumThrottleAttemptsByBucket({ bucket, windowSeconds }: { bucket: string; windowSeconds: number }, db: Knex = getDb()): Promise<number> {
  const row = await db("auth_throttle")
    .where({ bucket })
    .where("window_start", ">", db.raw("now() - make_interval(secs => ?)", [windowSeconds]))
    .sum<{ total: string | null }>({ total: "attempts" })
    .first();
  return Number(row?.total ?? 0);
}

export async function incrementThrottleByBucket({ bucket, keepSeconds }: { bucket: string; keepSeconds: number }, db: Knex = getDb()): Promise<void> {
  await db.raw(
    `insert into auth_throttle (bucket, window_start, attempts) values (?, date_trunc('minute', now()), 1)
     on conflict (bucket, window_start) do update set attempts = auth_throttle.attempts + 1`,
    [bucket],
  );
  await db("auth_throttle").where({ bucket }).where("window_start", "<", db.raw("now() - make_interval(secs => ?)", [keepSeconds])).delete();
}

export async function deleteThrottleByBucket(bucket: string, db: Knex = getDb()): Promise<void> {
  await db("auth_throttle").where({ bucket }).delete();
}
