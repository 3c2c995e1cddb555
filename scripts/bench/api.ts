// API latency on loopback, bounded in time: POST /api/v1/evaluate with the
// demo design at 20 connections (target p95 < 25 ms), plus the dashboard
// data route when a seeded option exists. Runs against the bench stack.
import autocannon from "autocannon";
import crypto from "node:crypto";
import { demoOptions } from "../../models/demo";

const ORIGIN = process.env.APP_ORIGIN ?? "http://127.0.0.1:3200";
const TARGET_P95_MS = 25;
const DURATION_S = 10;

async function signUp(): Promise<string> {
  const email = `bench.${crypto.randomBytes(4).toString("hex")}@example.test`;
  const res = await fetch(`${ORIGIN}/api/v1/auth/sign-up`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: ORIGIN },
    body: JSON.stringify({ displayName: "Bench Runner", email, password: crypto.randomBytes(12).toString("hex"), workspaceName: "Bench" }),
  });
  if (res.status !== 201) throw new Error(`sign-up for the bench failed: ${res.status} ${await res.text()}`);
  const cookie = res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  return cookie;
}

/** Runs autocannon and keeps every response time, so p95 is exact. */
function run(opts: autocannon.Options): Promise<{ result: autocannon.Result; times: number[] }> {
  const times: number[] = [];
  return new Promise((resolve, reject) => {
    const instance = autocannon(opts, (err, result) => (err ? reject(err) : resolve({ result, times })));
    instance.on("response", (_client: unknown, _status: number, _bytes: number, responseTime: number) => {
      times.push(responseTime);
    });
  });
}

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return Number.NaN;
  const i = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
  return Math.round(sorted[i] * 100) / 100;
}

export async function runApiBench(): Promise<{ ok: boolean; lines: string[] }> {
  const cookie = await signUp();
  const body = JSON.stringify({ design: demoOptions[0].input });
  // warm-up so the first compile of the route and the JIT are not measured
  await run({ url: `${ORIGIN}/api/v1/evaluate`, method: "POST", connections: 4, amount: 200, headers: { cookie, origin: ORIGIN, "content-type": "application/json" }, body });
  const { result: r, times } = await run({
    url: `${ORIGIN}/api/v1/evaluate`,
    method: "POST",
    connections: 20,
    duration: DURATION_S,
    headers: { cookie, origin: ORIGIN, "content-type": "application/json" },
    body,
  });
  times.sort((a, b) => a - b);
  const p95 = percentile(times, 95);
  const errors = r.errors + r.non2xx;
  const ok = p95 < TARGET_P95_MS && errors === 0;
  return {
    ok,
    lines: [
      `evaluate API, 20 connections, ${DURATION_S} s: ${r.requests.average.toFixed(0)} req/s, p50 ${percentile(times, 50)} ms, p95 ${p95} ms, p99 ${percentile(times, 99)} ms, errors ${errors}`,
      `  target p95 < ${TARGET_P95_MS} ms: ${ok ? "PASS" : "FAIL"}`,
    ],
  };
}
