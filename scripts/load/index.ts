// `npm run load`: 200 connections for 60 s on loopback against the load
// stack (fresh database), each connection looping over three requests:
// the dashboard data (GET /api/v1/options/:id/budget), an evaluation
// (POST /api/v1/evaluate with a demo document) and a revision save (POST
// /api/v1/options/:id/revisions, each save on an option no other in-flight
// save holds). Prints throughput, latency and errors, then checks the
// revision rows against the 201s: nothing lost, nothing duplicated.
// Exits 0 only when that holds and there were no errors.
import { demoOptions } from "../../models/demo";
import { ORIGIN, WriterPool, auditRevisions, cannon, createOptions, latencyLine, signUp, statusLine } from "./common";

const CONNECTIONS = Number(process.env.LOAD_CONNECTIONS ?? 200);
const DURATION_S = Number(process.env.LOAD_SECONDS ?? 60);
const ACCOUNTS = 4;

async function main(): Promise<void> {
  console.log(`load: setting up ${ACCOUNTS} accounts and ${CONNECTIONS} options at ${ORIGIN}`);
  const accounts = [];
  for (let i = 0; i < ACCOUNTS; i++) accounts.push(await signUp(`load${i}`));
  const perAccount = Math.ceil(CONNECTIONS / ACCOUNTS);
  const optionsByAccount = await Promise.all(accounts.map((a) => createOptions(a, perAccount)));
  const pools = accounts.map((a, i) => new WriterPool(a, optionsByAccount[i]));
  const document = demoOptions[0].input;
  const evaluateBody = JSON.stringify({ design: document });

  // One autocannon instance per account (its cookie); connections split evenly.
  let reads = 0;
  pools.forEach((p) => p.start());
  const runs = await Promise.all(
    accounts.map((a, i) =>
      cannon({
        url: ORIGIN,
        connections: perAccount,
        duration: DURATION_S,
        requests: [
          {
            method: "GET",
            path: "/api/v1/options/_/budget",
            headers: { cookie: a.cookie },
            setupRequest: (req) => ({ ...req, path: `/api/v1/options/${optionsByAccount[i][reads++ % perAccount]}/budget` }),
          },
          { method: "POST", path: "/api/v1/evaluate", headers: { cookie: a.cookie, origin: ORIGIN, "content-type": "application/json" }, body: evaluateBody },
          pools[i].request(document),
        ],
      }),
    ),
  );
  pools.forEach((p) => p.stop());

  const all = { result: runs[0].result, times: runs.flatMap((r) => r.times), statuses: new Map<number, number>() };
  for (const r of runs) for (const [s, n] of r.statuses) all.statuses.set(s, (all.statuses.get(s) ?? 0) + n);
  const socketErrors = runs.reduce((n, r) => n + r.result.errors, 0);
  const timeouts = runs.reduce((n, r) => n + r.result.timeouts, 0);
  const conflicts = pools.reduce((n, p) => n + p.refused409.size, 0);
  const non2xx = [...all.statuses].filter(([s]) => s >= 300).reduce((n, [, c]) => n + c, 0);
  const errors = non2xx - conflicts + socketErrors;

  const acknowledged = new Set(pools.flatMap((p) => [...p.acknowledged]));
  const unanswered = new Set(pools.flatMap((p) => [...p.unanswered()]));
  const audit = await auditRevisions(optionsByAccount.flat(), acknowledged, unanswered);

  console.log(`\n=== load: ${CONNECTIONS} connections, ${DURATION_S} s (budget read, evaluate, revision save) ===`);
  console.log(`throughput/latency: ${latencyLine(all, DURATION_S)}`);
  console.log(`statuses: ${statusLine(all)}; 409 conflicts (correct refusals): ${conflicts}`);
  console.log(`errors: ${errors} (non-2xx other than 409: ${non2xx - conflicts}, socket errors: ${socketErrors}, of which timeouts: ${timeouts})`);
  console.log(`revisions: ${acknowledged.size} acknowledged with 201, ${audit.stored} rows stored, lost ${audit.lost}, duplicated ${audit.duplicated}, refused but stored ${audit.unacknowledged}; ${audit.inFlight} of ${unanswered.size} saves in flight at the stop were committed`);
  const ok = errors === 0 && audit.lost === 0 && audit.duplicated === 0 && audit.unacknowledged === 0 && acknowledged.size > 0;
  console.log(ok ? "load: PASS" : "load: FAIL");
  process.exit(ok ? 0 : 1);
}

main().catch((e: Error) => {
  console.error(`load: ${e.stack ?? e.message}`);
  process.exit(1);
});
