// A start after an unclean stop: starts a PostgreSQL of its own through
// scripts/lib/postgres.ts (own data dir and free port), writes a row, kills
// the postmaster with SIGKILL (as when the whole stack is killed), leaves
// its postmaster.pid and socket lock behind and makes the PID in it belong
// to a live process that is not PostgreSQL (PID reuse after a reboot or in
// a container, which PostgreSQL's own check takes for a running server).
// startPostgres must then start cleanly and the row must be there; while a
// server really runs on that data dir, startPostgres must refuse.
import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";
import pg from "pg";
import { startPostgres, stopChild } from "../lib/postgres";

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, "127.0.0.1", () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
    srv.on("error", reject);
  });
}

async function query(url: string, sql: string): Promise<pg.QueryResult> {
  const c = new pg.Client({ connectionString: url });
  await c.connect();
  try {
    return await c.query(sql);
  } finally {
    await c.end();
  }
}

export async function runUncleanStop(root = path.resolve(__dirname, "../../.data")): Promise<{ ok: boolean; lines: string[] }> {
  const dir = path.join(root, `unclean-${process.pid}`);
  const port = await freePort();
  const lines: string[] = [];
  const check = (ok: boolean, text: string) => {
    lines.push(`  ${ok ? "PASS" : "FAIL"} ${text}`);
    return ok;
  };
  const sleeper = spawn("sleep", ["60"], { stdio: "ignore" });
  let second: Awaited<ReturnType<typeof startPostgres>> | undefined;
  let ok = true;
  try {
    const first = await startPostgres({ root: dir, port, fresh: true, dbName: "heatsplit_unclean" });
    await query(first.url, "create table survivor (id int primary key); insert into survivor values (42)");

    const refused = await startPostgres({ root: dir, port, fresh: false, dbName: "heatsplit_unclean" }).then(
      () => "",
      (e: Error) => e.message,
    );
    ok &&= check(/already running/.test(refused), `a second start on a running data dir is refused (${refused.slice(0, 60)}...)`);

    first.child.kill("SIGKILL");
    await new Promise((r) => first.child.once("exit", r));
    // the postmaster's own children notice its death and exit; wait until the port is free
    for (let i = 0; i < 50 && (await portOpen(port)); i++) await new Promise((r) => setTimeout(r, 100));
    const pidFile = path.join(first.dataDir, "postmaster.pid");
    const stale = fs.existsSync(pidFile);
    const socketLock = fs.readdirSync(first.dataDir).filter((f) => f.startsWith(".s.PGSQL"));
    if (stale) {
      const lines = fs.readFileSync(pidFile, "utf8").split("\n");
      lines[0] = String(sleeper.pid);
      fs.writeFileSync(pidFile, lines.join("\n"));
    }
    ok &&= check(stale, `SIGKILL left postmaster.pid (now naming live PID ${sleeper.pid}, a sleep) and ${socketLock.length} socket files`);

    second = await startPostgres({ root: dir, port, fresh: false, dbName: "heatsplit_unclean" });
    const row = await query(second.url, "select id from survivor");
    ok &&= check(row.rows[0]?.id === 42, "the next start cleared the stale files, recovered, and the committed row is there");
  } catch (e) {
    ok = check(false, `unclean-stop check failed: ${(e as Error).message}`);
  } finally {
    await stopChild(second?.child, "SIGINT");
    sleeper.kill("SIGTERM");
    fs.rmSync(dir, { recursive: true, force: true });
  }
  return { ok, lines };
}

function portOpen(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const s = net.connect({ host: "127.0.0.1", port }, () => {
      s.destroy();
      resolve(true);
    });
    s.on("error", () => resolve(false));
  });
}
