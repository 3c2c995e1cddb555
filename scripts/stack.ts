// The whole local stack in one process tree: PostgreSQL, the fake SMTP and
// S3 services, migrations, the demo seed, the Next.js build and server, and
// (in test mode) the test runners. Every server listens on 127.0.0.1 only.
// Ctrl-C (SIGINT) or SIGTERM stops everything this script started, by PID.
//
//   start  demo stack on the everyday ports, data kept in .data/start
//   test   its own ports and a fresh database in .data/test; runs all tests
//   bench  its own ports and a fresh database in .data/bench; runs benchmarks
//   load   its own ports and a fresh database; 60 s mixed load (scripts/load)
//   faults its own ports and a fresh database; database restart under load,
//          interrupted uploads, unclean stop (scripts/faults)
//   fuzz   its own ports and a fresh database; the fuzz test with FUZZ_RUNS
//          (default 10 000) malformed write requests
// The app's output also goes to .data/<mode>/app.log (security.test.ts
// reads it to check that no secret reaches a log line).
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { startPostgres, stopChild } from "./lib/postgres";
import { migrateAndSeed } from "./lib/migrate";
import { runTestSuites } from "./lib/test-runners";

type Mode = "start" | "test" | "bench" | "load" | "faults" | "fuzz";
const mode = (process.argv[2] ?? "start") as Mode;
const root = path.resolve(__dirname, "..");

const BASE_PORTS: Record<Mode, { pg: number; smtp: number; s3: number; app: number }> = {
  start: { pg: 54329, smtp: 2525, s3: 4569, app: 3000 },
  test: { pg: 54339, smtp: 2535, s3: 4579, app: 3100 },
  bench: { pg: 54349, smtp: 2545, s3: 4589, app: 3200 },
  load: { pg: 54359, smtp: 2555, s3: 4599, app: 3300 },
  faults: { pg: 54369, smtp: 2565, s3: 4609, app: 3400 },
  fuzz: { pg: 54379, smtp: 2575, s3: 4619, app: 3500 },
};

// HEATSPLIT_PORT_OFFSET (a multiple of 1000, default 0) shifts every port, so
// two checkouts on one machine can run their test stacks side by side.
const PORT_OFFSET = Number(process.env.HEATSPLIT_PORT_OFFSET ?? 0);
if (!Number.isInteger(PORT_OFFSET) || PORT_OFFSET < 0 || PORT_OFFSET > 9000) {
  throw new Error("HEATSPLIT_PORT_OFFSET must be an integer from 0 to 9000");
}
const PORTS = Object.fromEntries(
  Object.entries(BASE_PORTS).map(([m, p]) => [m, { pg: p.pg + PORT_OFFSET, smtp: p.smtp + PORT_OFFSET, s3: p.s3 + PORT_OFFSET, app: p.app + PORT_OFFSET }]),
) as typeof BASE_PORTS;

const children: ChildProcess[] = [];
let stopping = false;

function log(msg: string): void {
  console.log(`heatsplit ${mode}: ${msg}`);
}

async function stopAll(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    // reverse order: app, services, then the database (SIGINT = fast shutdown)
    for (const c of [...children].reverse()) {
      await stopChild(c, c === children[0] ? "SIGINT" : "SIGTERM");
    }
  }
  process.exit(code);
}

function run(cmd: string, args: string[], env: NodeJS.ProcessEnv, opts: { quiet?: boolean } = {}): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: root, env, stdio: opts.quiet ? ["ignore", "ignore", "inherit"] : "inherit" });
    children.push(child);
    child.on("exit", (code, signal) => {
      children.splice(children.indexOf(child), 1);
      resolve(code ?? (signal ? 1 : 0));
    });
  });
}

function startLongRunning(name: string, cmd: string, args: string[], env: NodeJS.ProcessEnv, readyText: RegExp): Promise<ChildProcess> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] });
    children.push(child);
    const logFile = fs.createWriteStream(path.join(root, ".data", mode, `${name}.log`), { flags: "a" });
    child.stdout?.pipe(logFile);
    child.stderr?.pipe(logFile);
    let ready = false;
    const onData = (buf: Buffer) => {
      const text = buf.toString();
      if (mode === "start" || !ready) process.stdout.write(`[${name}] ${text}`);
      if (!ready && readyText.test(text)) {
        ready = true;
        resolve(child);
      }
    };
    child.stdout?.on("data", onData);
    child.stderr?.on("data", (b: Buffer) => process.stderr.write(`[${name}] ${b.toString()}`));
    child.on("exit", (code) => {
      if (!ready) reject(new Error(`${name} exited (${code}) before it was ready`));
      else if (!stopping) {
        console.error(`${name} stopped unexpectedly (${code})`);
        void stopAll(1);
      }
    });
  });
}

async function main(): Promise<void> {
  process.on("SIGINT", () => void stopAll(130));
  process.on("SIGTERM", () => void stopAll(143));
  const ports = PORTS[mode];
  if (!ports) throw new Error(`unknown mode ${mode}`);
  const dataRoot = path.join(root, ".data", mode);
  const fresh = mode !== "start";

  log(`starting PostgreSQL on 127.0.0.1:${ports.pg}`);
  const pgHandle = await startPostgres({ root: dataRoot, port: ports.pg, fresh, dbName: `heatsplit_${mode}` });
  children.push(pgHandle.child);

  const origin = `http://127.0.0.1:${ports.app}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    DATABASE_URL: pgHandle.url,
    DATABASE_ADMIN_URL: pgHandle.adminUrl,
    SMTP_URL: `smtp://127.0.0.1:${ports.smtp}`,
    MAIL_FROM: "Heatsplit <no-reply@heatsplit.invalid>",
    FAKE_SMTP_PORT: String(ports.smtp),
    FAKE_S3_PORT: String(ports.s3),
    FAKE_S3_DIR: path.join(dataRoot, "s3"),
    S3_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
    S3_BUCKET: "heatsplit-files",
    S3_REGION: "us-east-1",
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    APP_ORIGIN: origin,
    HEATSPLIT_DEV_INBOX: "1",
    HEATSPLIT_MODE: mode,
    PG_BIN_PORT: String(ports.pg),
    NEXT_DIST_DIR: mode === "start" ? ".next" : `.next-${mode}`,
    NEXT_TELEMETRY_DISABLED: "1",
  };

  log(`starting fake SMTP (127.0.0.1:${ports.smtp}) and S3 (127.0.0.1:${ports.s3})`);
  await startLongRunning("services", process.execPath, ["scripts/services.mjs"], env, /services ready/);

  log("migrating the database");
  await migrateAndSeed({ url: pgHandle.url, seedDemo: mode === "start" });

  const argv = process.argv.slice(3);
  const needsApp = mode !== "test" || !argv.includes("--suites") || /integration|browser/.test(argv[argv.indexOf("--suites") + 1] ?? "");
  if (!needsApp) {
    const ok = await runTestSuites({ env, origin, root, argv });
    return stopAll(ok ? 0 : 1);
  }

  // HEATSPLIT_REUSE_BUILD=1 serves the mode's last build (while iterating on a script, not on the app)
  const reuse = process.env.HEATSPLIT_REUSE_BUILD === "1" && fs.existsSync(path.join(root, env.NEXT_DIST_DIR!, "BUILD_ID"));
  log(reuse ? "reusing the last build (HEATSPLIT_REUSE_BUILD=1)" : "building the app (next build)");
  const buildCode = reuse ? 0 : await run(path.join(root, "node_modules/.bin/next"), ["build"], { ...env, NODE_ENV: "production" });
  if (buildCode !== 0) {
    console.error("next build failed");
    return stopAll(1);
  }

  const app = await startLongRunning(
    "app",
    path.join(root, "node_modules/.bin/next"),
    ["start", "--hostname", "127.0.0.1", "--port", String(ports.app)],
    { ...env, NODE_ENV: "production" },
    /Ready|started server|Local:/i,
  );

  if (mode === "start") {
    printSignIns(origin);
    return; // serve until Ctrl-C
  }
  if (mode === "test") {
    // the body-limit tests read the server's resident memory from /proc/<pid>
    const ok = await runTestSuites({ env: { ...env, HEATSPLIT_APP_PID: String(app.pid) }, origin, root, argv });
    return stopAll(ok ? 0 : 1);
  }
  if (mode === "bench" || mode === "load") {
    const code = await run(process.execPath, ["--import", "tsx", `scripts/${mode}/index.ts`], { ...env, NODE_ENV: "production" });
    return stopAll(code);
  }
  if (mode === "fuzz") {
    const vitestArgs = ["run", "--project", "integration", "tests/integration/fuzz-writes.test.ts"];
    const code = await run(path.join(root, "node_modules/.bin/vitest"), vitestArgs, { ...env, NODE_ENV: "test", FUZZ_RUNS: process.env.FUZZ_RUNS ?? "10000", FUZZ_SEED: process.env.FUZZ_SEED ?? "random" });
    return stopAll(code);
  }
  if (mode === "faults") {
    // In-process, so the database this script started can be stopped and
    // started again on the same data dir while the app keeps running.
    Object.assign(process.env, env);
    const { runFaults } = await import("./faults/index");
    const restartDb = {
      stop: () => stopChild(children[0], "SIGINT"),
      start: async () => {
        const again = await startPostgres({ root: dataRoot, port: ports.pg, fresh: false, dbName: `heatsplit_${mode}` });
        children[0] = again.child;
      },
    };
    const ok = await runFaults({ env, origin, db: restartDb });
    return stopAll(ok ? 0 : 1);
  }
}

function printSignIns(origin: string): void {
  const file = path.join(root, "db", "seeds", "demo-users.json");
  const users = JSON.parse(fs.readFileSync(file, "utf8")) as { email: string; role: string }[];
  const pw = "heatsplit-demo";
  console.log(`\nHeatsplit is serving on ${origin}\n\nDemo sign-ins (password for all: ${pw}):`);
  for (const u of users) console.log(`  ${u.role.padEnd(9)} ${u.email}`);
  console.log(`\nDevelopment inbox (each member's own mail): ${origin}/dev/inbox\nPress Ctrl-C to stop everything.\n`);
}

main().catch((e: Error) => {
  console.error(`heatsplit ${mode}: ${e.message}`);
  void stopAll(1);
});
