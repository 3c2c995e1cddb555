// Minimal ngspice batch runner for the model-vs-simulator comparisons.
// Writes the netlist to a fresh temp dir, runs `ngspice -b`, and collects
// every `name = value` line that `.meas`/`meas` and `print` emit.
import { execFile } from "node:child_process";
import { existsSync } from "node:fs";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";

export interface NgspiceResult {
  /** Measured/printed scalars, keyed by lower-case name (ngspice lower-cases). */
  values: Record<string, number>;
  stdout: string;
  /** Wall time of the ngspice process, ms (includes process start-up). */
  wallMs: number;
}

const CANDIDATES = ["/usr/bin/ngspice", "/usr/local/bin/ngspice"];

/** Path of the ngspice binary, or null. `NGSPICE`, when set, is the only place looked at. */
export function findNgspice(): string | null {
  const fromEnv = process.env.NGSPICE;
  if (fromEnv) return existsSync(fromEnv) ? fromEnv : null;
  for (const c of CANDIDATES) if (existsSync(c)) return c;
  for (const dir of (process.env.PATH ?? "").split(path.delimiter)) {
    const p = path.join(dir, "ngspice");
    if (dir && existsSync(p)) return p;
  }
  return null;
}

export class NgspiceError extends Error {
  constructor(message: string, readonly output: string) {
    super(message);
    this.name = "NgspiceError";
  }
}

// `name = 1.23e-09` optionally followed by `at=`/`from=` fields.
const VALUE_LINE = /^\s*([a-z_][\w.]*)\s*=\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)(?:\s|$)/i;

export function parseValues(stdout: string): Record<string, number> {
  const values: Record<string, number> = {};
  for (const line of stdout.split(/\r?\n/)) {
    const m = VALUE_LINE.exec(line);
    if (m) values[m[1].toLowerCase()] = Number(m[2]);
  }
  return values;
}

// Messages after which a number in the output cannot be trusted.
const FATAL = [/timestep too small/i, /simulation\(s\) aborted/i, /\bfailed!/i, /no such vector/i, /singular matrix/i, /syntax error/i, /Error: RHS/];

export async function runNgspice(
  netlist: string,
  { timeoutMs = 30_000 }: { timeoutMs?: number } = {},
): Promise<NgspiceResult> {
  const bin = findNgspice();
  if (!bin) {
    throw new NgspiceError(
      "ngspice not found (looked in $NGSPICE, /usr/bin, $PATH). Install the Debian package `ngspice`; `npm test` does this via scripts/bootstrap.sh.",
      "",
    );
  }
  const dir = await mkdtemp(path.join(tmpdir(), "heatsplit-spice-"));
  const file = path.join(dir, "circuit.cir");
  try {
    await writeFile(file, withQuit(netlist));
    const t0 = performance.now();
    const stdout = await new Promise<string>((resolve, reject) => {
      execFile(bin, ["-b", file], { cwd: dir, timeout: timeoutMs, maxBuffer: 64 << 20 }, (err, out, errOut) => {
        const all = `${out}\n${errOut}`;
        if (err) reject(new NgspiceError(`ngspice failed: ${err.message}\n${tail(all)}`, all));
        else resolve(all);
      });
    });
    const wallMs = performance.now() - t0;
    const bad = FATAL.find((re) => re.test(stdout));
    if (bad) throw new NgspiceError(`ngspice reported a problem (${bad.source}):\n${tail(stdout)}`, stdout);
    return { values: parseValues(stdout), stdout, wallMs };
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/** A named value from a run; throws with the output tail when it is missing or not finite. */
export function valueOf(result: NgspiceResult, name: string): number {
  const v = result.values[name.toLowerCase()];
  if (v === undefined || !Number.isFinite(v)) {
    throw new NgspiceError(`ngspice result has no finite value '${name}':\n${tail(result.stdout)}`, result.stdout);
  }
  return v;
}

/** Number formatting for netlists: plain exponent notation ngspice always reads. */
export function sp(x: number): string {
  if (!Number.isFinite(x)) throw new Error(`non-finite netlist value ${x}`);
  return x.toExponential(9);
}

// Without `quit` at the end of the control block, `ngspice -b` exits with 1
// ("no simulations run") even when every measurement succeeded.
function withQuit(netlist: string): string {
  const text = netlist.endsWith("\n") ? netlist : `${netlist}\n`;
  if (/^\s*quit\b/im.test(text)) return text;
  return text.replace(/^\.endc\b/im, "quit\n.endc");
}

function tail(s: string, lines = 25): string {
  return s.split(/\r?\n/).filter((l) => l.trim() !== "").slice(-lines).join("\n");
}
