// The database restarted under load: a bounded load (budget reads and
// revision saves) runs while PostgreSQL is stopped with SIGINT (fast
// shutdown) and started again on the same data dir. Holds when
//  - every request is answered within the client timeout (no hang),
//  - every failure is a 503 JSON error with code "unavailable" and a
//    Retry-After (the database is away, not the request at fault), with no
//    stack trace or driver detail,
//  - the app answers 2xx again by itself within RECOVERY_S of the restart,
//    and nothing but 2xx/409 after that,
//  - no save acknowledged with a 201 is missing and none is stored twice.
import { ORIGIN, WriterPool, type Hooked, auditRevisions, cannon, createOptions, signUp, statusLine } from "../load/common";
import { demoOptions } from "../../models/demo";

export interface DbControl {
  stop(): Promise<void>;
  start(): Promise<void>;
}

const CONNECTIONS = 20;
const DURATION_S = 40;
const DOWN_AFTER_S = 8;
const DOWN_FOR_S = 6;
const RECOVERY_S = 5;
/** A leak of internals: stack frames, file paths, driver or SQL error text. */
const LEAK = /\bat [\w.<>]+ \(|node_modules|\.ts:\d+|ECONNREFUSED|ECONNRESET|terminating connection|postgres|knex|SQLSTATE|Error:/i;

interface Seen {
  at: number;
  status: number;
  /** error.code of a 5xx JSON answer. */
  code?: string;
  retryAfter?: boolean;
}

/** autocannon hands the headers over as an object keyed by the names as sent. */
function hasHeader(headers: unknown, name: string): boolean {
  if (!headers || typeof headers !== "object") return false;
  return Object.keys(headers).some((k) => k.toLowerCase() === name);
}

export async function runDbRestart(db: DbControl): Promise<{ ok: boolean; lines: string[] }> {
  const account = await signUp("faults-db");
  const optionIds = await createOptions(account, CONNECTIONS);
  const pool = new WriterPool(account, optionIds);
  const seen: Seen[] = [];
  const leaks: string[] = [];
  const observe = (entry: Hooked): Hooked => ({
    ...entry,
    onResponse: (status, body, context, headers) => {
      const entrySeen: Seen = { at: Date.now(), status };
      seen.push(entrySeen);
      if (status >= 500) {
        let code: unknown;
        try {
          code = (JSON.parse(body) as { error?: { code?: unknown } }).error?.code;
        } catch {
          code = undefined;
        }
        if (typeof code !== "string" || LEAK.test(body)) leaks.push(`${status} ${body.slice(0, 200)}`);
        entrySeen.code = typeof code === "string" ? code : undefined;
        entrySeen.retryAfter = hasHeader(headers, "retry-after");
      }
      entry.onResponse?.(status, body, context, headers);
    },
  });

  let reads = 0;
  pool.start();
  const t0 = Date.now();
  const load = cannon({
    url: ORIGIN,
    connections: CONNECTIONS,
    duration: DURATION_S,
    requests: [
      observe({
        method: "GET",
        path: "/api/v1/options/_/budget",
        headers: { cookie: account.cookie },
        setupRequest: (req) => ({ ...req, path: `/api/v1/options/${optionIds[reads++ % optionIds.length]}/budget` }),
      }),
      observe(pool.request(demoOptions[0].input)),
    ],
  });
  await new Promise((r) => setTimeout(r, DOWN_AFTER_S * 1000));
  const downAt = Date.now();
  await db.stop();
  await new Promise((r) => setTimeout(r, DOWN_FOR_S * 1000));
  await db.start();
  const upAt = Date.now();
  const run = await load;
  // let the refresher return leased options, then audit
  await new Promise((r) => setTimeout(r, 1500));
  pool.stop();
  const audit = await auditRevisions(optionIds, pool.acknowledged, pool.unanswered());

  const downFailures = seen.filter((s) => s.at >= downAt && s.at < upAt && s.status >= 500);
  const failedWhileDown = downFailures.length;
  const asUnavailable = downFailures.filter((s) => s.status === 503 && s.code === "unavailable" && s.retryAfter).length;
  const otherFailures = seen.filter((s) => s.status >= 500 && !(s.status === 503 && s.code === "unavailable"));
  const firstOk = seen.find((s) => s.at >= upAt && s.status < 300);
  const recoveredIn = firstOk ? (firstOk.at - upAt) / 1000 : Number.POSITIVE_INFINITY;
  const badAfter = seen.filter((s) => s.at > upAt + RECOVERY_S * 1000 && s.status >= 300 && s.status !== 409).length;
  const slowest = Math.max(0, ...pool.saveTimes);
  const okBefore = seen.filter((s) => s.at < downAt && s.status < 300).length;
  const checks: [string, boolean][] = [
    [`requests answered before the stop: ${okBefore} 2xx`, okBefore > 0],
    [
      `failures while the database was down: ${failedWhileDown}, ${asUnavailable} of them 503 "unavailable" with Retry-After; other 5xx in the whole run: ${otherFailures.length} (${[...new Set(otherFailures.map((s) => `${s.status} ${s.code}`))].join(", ") || "none"}); ${leaks.length} leaks of internals`,
      failedWhileDown > 0 && asUnavailable === failedWhileDown && otherFailures.length === 0 && leaks.length === 0,
    ],
    [
      `no hang: ${run.result.timeouts} timeouts (10 s), ${run.result.errors} socket errors, slowest answered save ${slowest} ms`,
      run.result.timeouts === 0 && run.result.errors === 0 && slowest < 10_000,
    ],
    [`recovered without an app restart ${recoveredIn.toFixed(2)} s after PostgreSQL was back; non-2xx later than ${RECOVERY_S} s: ${badAfter}`, recoveredIn <= RECOVERY_S && badAfter === 0],
    [
      `saves: ${pool.acknowledged.size} acknowledged, ${audit.stored} stored, lost ${audit.lost}, duplicated ${audit.duplicated}, stored although refused ${audit.unacknowledged}, committed while unanswered ${audit.inFlight}`,
      audit.lost === 0 && audit.duplicated === 0 && audit.unacknowledged === 0 && pool.acknowledged.size > 0,
    ],
  ];
  const lines = [
    `load ${CONNECTIONS} connections ${DURATION_S} s; PostgreSQL stopped (SIGINT) at +${((downAt - t0) / 1000).toFixed(1)} s, back at +${((upAt - t0) / 1000).toFixed(1)} s`,
    `statuses: ${statusLine(run)}; saves without an answer within 15 s: ${pool.expiredCount}`,
    ...checks.map(([text, ok]) => `  ${ok ? "PASS" : "FAIL"} ${text}`),
    ...leaks.slice(0, 3).map((l) => `  leaked: ${l}`),
  ];
  return { ok: checks.every(([, ok]) => ok), lines };
}
