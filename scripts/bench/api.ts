// API latency on loopback, bounded in time: POST /api/v1/evaluate with the
// demo design at 20 connections (target p95 < 25 ms). Runs against the bench
// stack. Beside the target it prints what bounds it on this machine:
//  - one connection: the latency of a single request with nobody queueing;
//  - the framework's floor: Next's own 405 answer on the same route at 20
//    connections (no code of ours runs);
//  - the model's floor: in-process CPU time of parse + evaluate + finite
//    check + JSON per request, and what Little's law makes of it (L = λW;
//    J. D. C. Little, Operations Research 9, 1961; recalled from memory):
//    a closed loop of N connections on one core waits at least N × that
//    time on average.
import autocannon from "autocannon";
import { demoOptions } from "../../models/demo";
import { signUp } from "../load/common";
import { parseDesign } from "../../models/input/schema";
import { evaluateDesign } from "../../models/evaluate";
import { assertFinite } from "../../lib/finite";

const ORIGIN = process.env.APP_ORIGIN ?? "http://127.0.0.1:3200";
const TARGET_P95_MS = 25;
const DURATION_S = 10;

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
  const { cookie } = await signUp("bench");
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

  const single = await run({ url: `${ORIGIN}/api/v1/evaluate`, method: "POST", connections: 1, duration: 5, headers: { cookie, origin: ORIGIN, "content-type": "application/json" }, body });
  single.times.sort((a, b) => a - b);
  const floor = await run({ url: `${ORIGIN}/api/v1/evaluate`, method: "GET", connections: 20, duration: 5 });
  floor.times.sort((a, b) => a - b);
  const modelMs = modelCostMs(body);
  return {
    ok,
    lines: [
      `evaluate API, 20 connections, ${DURATION_S} s: ${r.requests.average.toFixed(0)} req/s, p50 ${percentile(times, 50)} ms, p95 ${p95} ms, p99 ${percentile(times, 99)} ms, errors ${errors}`,
      `  target p95 < ${TARGET_P95_MS} ms: ${ok ? "PASS" : "FAIL"}`,
      `evaluate API, 1 connection, 5 s: ${single.result.requests.average.toFixed(0)} req/s, p50 ${percentile(single.times, 50)} ms, p95 ${percentile(single.times, 95)} ms`,
      `framework floor, Next's own 405 on the route, 20 connections, 5 s: ${floor.result.requests.average.toFixed(0)} req/s, p50 ${percentile(floor.times, 50)} ms, p95 ${percentile(floor.times, 95)} ms`,
      `model floor, in process: ${modelMs.toFixed(2)} ms CPU per request (parse, evaluate, check, JSON); at 20 connections on one core the mean wait is at least 20 × ${modelMs.toFixed(2)} = ${(20 * modelMs).toFixed(1)} ms (Little's law)`,
    ],
  };
}

/** Median in-process cost of what the route computes for one request body. */
function modelCostMs(body: string): number {
  const samples: number[] = [];
  for (let i = 0; i < 300; i++) {
    const t0 = performance.now();
    const parsed = parseDesign((JSON.parse(body) as { design: unknown }).design);
    if (!parsed.ok) throw new Error("the bench design does not parse");
    const evaluation = evaluateDesign(parsed.design);
    assertFinite({ evaluation });
    JSON.stringify({ evaluation, comparison: null });
    if (i >= 50) samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  return samples[Math.floor(samples.length / 2)];
}
