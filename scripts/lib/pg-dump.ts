// pg_dump / pg_restore in PostgreSQL's custom format (-Fc), used by
// scripts/backup.ts and tests/integration/backup.test.ts. The password
// travels in PGPASSWORD, never on a command line other processes can read.
import { spawn } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

/** The newest installed PostgreSQL's bin dir, so pg_dump matches the server we run. */
function pgBin(tool: string): string {
  const root = "/usr/lib/postgresql";
  const versions = fs.existsSync(root) ? fs.readdirSync(root).filter((v) => fs.existsSync(path.join(root, v, "bin", tool))) : [];
  versions.sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(root, versions[0], "bin", tool) : tool;
}

function connArgs(url: string): { args: string[]; env: NodeJS.ProcessEnv } {
  const u = new URL(url);
  return {
    args: ["-h", u.hostname, "-p", u.port || "5432", "-U", decodeURIComponent(u.username), "-d", decodeURIComponent(u.pathname.slice(1))],
    env: { ...process.env, PGPASSWORD: decodeURIComponent(u.password), PGCONNECT_TIMEOUT: "10" },
  };
}

function runTool(tool: string, args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(pgBin(tool), args, { env, stdio: ["ignore", "ignore", "pipe"] });
    let err = "";
    child.stderr.on("data", (b: Buffer) => (err += b.toString()));
    child.on("error", reject);
    child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`${tool} exited ${code}: ${err.trim()}`))));
  });
}

/** Dumps the database at `url` to `file`; with `snapshot`, exactly as that exported snapshot saw it. */
export async function dumpDatabase({ url, file, snapshot }: { url: string; file: string; snapshot?: string }): Promise<void> {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const { args, env } = connArgs(url);
  await runTool("pg_dump", [...args, "-Fc", "--no-owner", "--no-privileges", "-f", file, ...(snapshot ? [`--snapshot=${snapshot}`] : [])], env);
}

/** Restores `file` into the (empty) database at `url`, all or nothing; objects end up owned by the connecting user. */
export async function restoreDatabase({ url, file }: { url: string; file: string }): Promise<void> {
  const { args, env } = connArgs(url);
  await runTool("pg_restore", [...args, "--no-owner", "--no-privileges", "--single-transaction", "--exit-on-error", file], env);
}

/** The same URL pointing at another database. */
export function withDatabase(url: string, dbName: string): string {
  const u = new URL(url);
  u.pathname = `/${dbName}`;
  return u.toString();
}
