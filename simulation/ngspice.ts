// ngspice batch runner, shared by the tests and (issue 17) the product's
// simulation jobs. The deck is written to a private mkdtemp folder and run as
// `ngspice -b` through execFile (no shell), with a wall-time limit, a cap on
// what it may print or write, and HOME pointed at the folder so no user
// .spiceinit is read. Collects every `name = value` line that `meas` and
// `print` emit, and, when asked, the data files the deck wrote (wrdata).
import { execFile } from "node:child_process";
import { existsSync } from "node:fs";
import { mkdtemp, readFile, rm, stat, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";

export interface NgspiceResult {
  /** Measured/printed scalars, keyed by lower-case name (ngspice lower-cases). */
  values: Record<string, number>;
  stdout: string;
  /** Contents of the files named in `files`, by name. */
  files: Record<string, string>;
  /** Wall time of the ngspice process, ms (includes process start-up). */
  wallMs: number;
}

export interface RunOptions {
  /** Wall-time limit, ms; the process is killed after it. */
  timeoutMs?: number;
  /** Limit on the printed output and on each file read back, bytes. */
  maxOutputBytes?: number;
  /** Plain file names (no folders) the deck writes and the caller wants back. */
  files?: string[];
}

const CANDIDATES = ["/usr/bin/ngspice", "/usr/local/bin/ngspice"];
const SAFE_FILE = /^[a-z][a-z0-9_-]{0,40}\.(txt|csv|raw)$/i;

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
  constructor(
    message: string,
    readonly output: string,
  ) {
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

export async function runNgspice(netlist: string, { timeoutMs = 30_000, maxOutputBytes = 64 << 20, files = [] }: RunOptions = {}): Promise<NgspiceResult> {
  const bad = files.find((f) => !SAFE_FILE.test(f));
  if (bad !== undefined) throw new NgspiceError(`not a plain data file name: ${JSON.stringify(bad)}`, "");
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
    // Only what ngspice needs (NODE_ENV is there for the ProcessEnv type); HOME is the private folder.
    const env: NodeJS.ProcessEnv = { NODE_ENV: process.env.NODE_ENV, PATH: process.env.PATH ?? "/usr/bin:/bin", HOME: dir, LC_ALL: "C" };
    const stdout = await new Promise<string>((resolve, reject) => {
      execFile(bin, ["-b", file], { cwd: dir, env, timeout: timeoutMs, killSignal: "SIGKILL", maxBuffer: maxOutputBytes }, (err, out, errOut) => {
        const all = `${out}\n${errOut}`;
        if (err) reject(new NgspiceError(`ngspice failed: ${err.message}\n${tail(all)}`, all));
        else resolve(all);
      });
    });
    const wallMs = performance.now() - t0;
    const fatal = FATAL.find((re) => re.test(stdout));
    if (fatal) throw new NgspiceError(`ngspice reported a problem (${fatal.source}):\n${tail(stdout)}`, stdout);
    const read: Record<string, string> = {};
    for (const f of files) read[f] = await readCapped(path.join(dir, f), maxOutputBytes, stdout);
    return { values: parseValues(stdout), stdout, files: read, wallMs };
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

async function readCapped(file: string, max: number, stdout: string): Promise<string> {
  const s = await stat(file).catch(() => null);
  if (!s) throw new NgspiceError(`ngspice wrote no ${path.basename(file)}:\n${tail(stdout)}`, stdout);
  if (s.size > max) throw new NgspiceError(`${path.basename(file)} is ${s.size} bytes, over the ${max}-byte limit`, stdout);
  return readFile(file, "utf8");
}

/** A named value from a run; throws with the output tail when it is missing or not finite. */
export function valueOf(result: NgspiceResult, name: string): number {
  const v = result.values[name.toLowerCase()];
  if (v === undefined || !Number.isFinite(v)) {
    throw new NgspiceError(`ngspice result has no finite value '${name}':\n${tail(result.stdout)}`, result.stdout);
  }
  return v;
}

/** Number formatting for netlists: plain exponent notation ngspice always reads. The only way a number enters a deck. */
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
  return s
    .split(/\r?\n/)
    .filter((l) => l.trim() !== "")
    .slice(-lines)
    .join("\n");
}
