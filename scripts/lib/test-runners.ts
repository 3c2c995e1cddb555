// The test phase of `npm test`: vitest (unit, ngspice, integration) and then
// Playwright in Debian's chromium against the app server the stack started.
// Each runner prints its own report; the last line sums their counts.
import { spawn } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

interface Counts {
  passed: number;
  failed: number;
  skipped: number;
}

function runTool(root: string, cmd: string, args: string[], env: NodeJS.ProcessEnv): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: root, env, stdio: "inherit" });
    child.on("exit", (code) => resolve(code ?? 1));
  });
}

function readVitest(file: string): Counts | undefined {
  if (!fs.existsSync(file)) return undefined;
  const j = JSON.parse(fs.readFileSync(file, "utf8")) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
  return { passed: j.numPassedTests, failed: j.numFailedTests, skipped: j.numPendingTests + j.numTodoTests };
}

function readPlaywright(file: string): Counts | undefined {
  if (!fs.existsSync(file)) return undefined;
  const j = JSON.parse(fs.readFileSync(file, "utf8")) as { stats: { expected: number; unexpected: number; flaky: number; skipped: number } };
  return { passed: j.stats.expected + j.stats.flaky, failed: j.stats.unexpected, skipped: j.stats.skipped };
}

/**
 * `npm test` runs everything. While developing, narrow it:
 *   npm test -- --suites integration,browser --filter auth
 * (--filter is passed to vitest as a file filter and to Playwright as one).
 */
function parseArgs(argv: string[]): { suites: Set<string>; filter: string[] } {
  const all = ["typecheck", "lint", "unit", "spice", "integration", "browser"];
  let suites = new Set(all);
  const filter: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--suites") suites = new Set((argv[++i] ?? "").split(","));
    else if (argv[i] === "--filter") filter.push(argv[++i] ?? "");
  }
  return { suites, filter };
}

export async function runTestSuites(opts: { env: NodeJS.ProcessEnv; origin: string; root: string; argv: string[] }): Promise<boolean> {
  const { suites: wanted, filter } = parseArgs(opts.argv);
  const out = path.join(opts.root, ".data", "test", "reports");
  fs.mkdirSync(out, { recursive: true });
  const vitest = path.join(opts.root, "node_modules/.bin/vitest");
  const env: NodeJS.ProcessEnv = { ...opts.env, NODE_ENV: "test" };
  const suites: { name: string; code: number; counts?: Counts }[] = [];

  if (wanted.has("typecheck")) {
    console.log("\n=== typecheck (tsc --noEmit) ===");
    const code = await runTool(opts.root, path.join(opts.root, "node_modules/.bin/tsc"), ["--noEmit", "-p", "."], env);
    console.log(code === 0 ? "typecheck: no errors" : "typecheck: errors above");
    suites.push({ name: "typecheck", code, counts: { passed: code === 0 ? 1 : 0, failed: code === 0 ? 0 : 1, skipped: 0 } });
  }

  if (wanted.has("lint")) {
    // ESLint (eslint.config.mjs: Next's rules, typescript-eslint, the house plan's layer rule) and
    // Prettier in check mode (the files .prettierignore lets through).
    console.log("\n=== lint (eslint, prettier --check) ===");
    const eslint = await runTool(opts.root, path.join(opts.root, "node_modules/.bin/eslint"), ["--max-warnings", "0", "."], env);
    const prettier = await runTool(opts.root, path.join(opts.root, "node_modules/.bin/prettier"), ["--check", "."], env);
    const code = eslint || prettier;
    console.log(code === 0 ? "lint: no problems" : "lint: problems above");
    suites.push({ name: "lint", code, counts: { passed: Number(eslint === 0) + Number(prettier === 0), failed: Number(eslint !== 0) + Number(prettier !== 0), skipped: 0 } });
  }

  for (const project of ["unit", "spice", "integration"].filter((p) => wanted.has(p))) {
    const file = path.join(out, `vitest-${project}.json`);
    fs.rmSync(file, { force: true });
    console.log(`\n=== vitest: ${project} ===`);
    const code = await runTool(opts.root, vitest, ["run", "--project", project, "--passWithNoTests", "--reporter=default", "--reporter=json", `--outputFile.json=${file}`, ...filter], env);
    suites.push({ name: `vitest ${project}`, code, counts: readVitest(file) });
  }

  if (wanted.has("browser")) {
    const pwFile = path.join(out, "playwright.json");
    fs.rmSync(pwFile, { force: true });
    console.log("\n=== playwright (chromium) ===");
    const pwCode = await runTool(opts.root, path.join(opts.root, "node_modules/.bin/playwright"), ["test", "--pass-with-no-tests", ...filter], { ...env, PLAYWRIGHT_JSON_OUTPUT_NAME: pwFile });
    suites.push({ name: "playwright", code: pwCode, counts: readPlaywright(pwFile) });
  }

  const total: Counts = { passed: 0, failed: 0, skipped: 0 };
  console.log("\n=== summary ===");
  for (const s of suites) {
    const c = s.counts ?? { passed: 0, failed: s.code === 0 ? 0 : 1, skipped: 0 };
    console.log(`${s.name.padEnd(20)} ${c.passed} passed, ${c.failed} failed, ${c.skipped} skipped (exit ${s.code})`);
    total.passed += c.passed;
    total.failed += c.failed + (s.code !== 0 && c.failed === 0 ? 1 : 0);
    total.skipped += c.skipped;
  }
  console.log(`\nall: ${total.passed} passed, ${total.failed} failed, ${total.skipped} skipped`);
  return suites.every((s) => s.code === 0) && total.passed > 0;
}
