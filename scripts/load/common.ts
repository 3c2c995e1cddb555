// Helpers shared by the load, fault and page benchmarks: accounts and demo
// records made through the public API, an autocannon run that keeps every
// response time (so percentiles are exact), and the revision-writer pool that
// gives each in-flight save an option of its own.
import autocannon from "autocannon";
import crypto from "node:crypto";
import knexFactory, { type Knex } from "knex";
import { demoOptions } from "../../models/demo";

export const ORIGIN = process.env.APP_ORIGIN ?? "http://127.0.0.1:3300";

export interface Account {
  cookie: string;
  email: string;
  workspaceId: string;
}

/**
 * A new account with its own workspace (admin): the sign-up request, then
 * its link, read from the fake SMTP server's dev_mailbox table as the
 * recipient would read it; the confirmation's answer carries the session cookie.
 */
export async function signUp(label: string): Promise<Account> {
  const email = `${label}.${crypto.randomBytes(4).toString("hex")}@example.test`;
  const res = await fetch(`${ORIGIN}/api/v1/auth/sign-up`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: ORIGIN },
    body: JSON.stringify({ displayName: `Load ${label}`, email, password: crypto.randomBytes(12).toString("hex"), workspaceName: `Load ${label}` }),
  });
  if (res.status !== 202) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const token = await signUpToken(email);
  const done = await fetch(`${ORIGIN}/api/v1/auth/sign-up/confirm`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: ORIGIN },
    body: JSON.stringify({ token }),
  });
  if (done.status !== 201) throw new Error(`sign-up confirmation failed: ${done.status} ${await done.text()}`);
  const body = (await done.json()) as { workspace: { id: string } };
  return { cookie: done.headers.getSetCookie().map((c) => c.split(";")[0]).join("; "), email, workspaceId: body.workspace.id };
}

async function signUpToken(email: string): Promise<string> {
  const db: Knex = knexFactory({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 1 } });
  try {
    for (const until = Date.now() + 15_000; Date.now() < until; ) {
      const row = await db("dev_mailbox").whereRaw("? = any(recipients)", [email]).orderBy("id", "desc").first<{ text_body: string } | undefined>("text_body");
      const m = row && /\/sign-up\/confirm#token=([A-Za-z0-9_-]+)/.exec(row.text_body);
      if (m) return m[1];
      await new Promise((r) => setTimeout(r, 100));
    }
    throw new Error(`no sign-up link for ${email} in the dev mailbox`);
  } finally {
    await db.destroy();
  }
}

export async function api<T>(account: Account, method: string, path: string, body?: unknown): Promise<{ status: number; json: T }> {
  const res = await fetch(`${ORIGIN}${path}`, {
    method,
    headers: { cookie: account.cookie, origin: ORIGIN, ...(body === undefined ? {} : { "content-type": "application/json" }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  return { status: res.status, json: (text ? JSON.parse(text) : null) as T };
}

const PROJECT = {
  name: "Load brick",
  topology: "active-clamp-forward",
  vinMin: 36,
  vinNom: 48,
  vinMax: 75,
  outputs: [{ label: "Main", voltage: 12, current: 20 }],
  fsw: "250 kHz",
  ambientMax: 85,
  efficiencyTarget: "92 %",
};

/** `count` demo options spread over projects of `perProject` each; returns their ids. */
export async function createOptions(account: Account, count: number, perProject = 20): Promise<string[]> {
  const ids: string[] = [];
  let projectId = "";
  for (let i = 0; i < count; i++) {
    if (i % perProject === 0) {
      const p = await api<{ project: { id: string } }>(account, "POST", "/api/v1/projects", { ...PROJECT, name: `Load brick ${i / perProject + 1}` });
      if (p.status !== 201) throw new Error(`project not created: ${p.status} ${JSON.stringify(p.json)}`);
      projectId = p.json.project.id;
    }
    const o = await api<{ option: { id: string } }>(account, "POST", `/api/v1/projects/${projectId}/options`, { name: `Load option ${i}`, template: demoOptions[i % demoOptions.length].key });
    if (o.status !== 201) throw new Error(`option not created: ${o.status} ${JSON.stringify(o.json)}`);
    ids.push(o.json.option.id);
  }
  return ids;
}

/** An autocannon request whose hooks are functions (the typings also allow file paths, for workers). */
export type Hooked = Omit<autocannon.Request, "setupRequest" | "onResponse"> & {
  setupRequest?: (req: autocannon.Request, context: object) => autocannon.Request;
  onResponse?: (status: number, body: string, context: object, headers?: unknown) => void;
};

export interface Run {
  result: autocannon.Result;
  times: number[];
  statuses: Map<number, number>;
}

/** Runs autocannon and keeps every response time and status. */
export function cannon(opts: Omit<autocannon.Options, "requests"> & { requests?: Hooked[] }): Promise<Run> {
  const times: number[] = [];
  const statuses = new Map<number, number>();
  return new Promise((resolve, reject) => {
    const instance = autocannon({ timeout: 10, ...opts } as autocannon.Options, (err, result) => (err ? reject(err) : resolve({ result, times, statuses })));
    instance.on("response", (_c: unknown, status: number, _bytes: number, ms: number) => {
      times.push(ms);
      statuses.set(status, (statuses.get(status) ?? 0) + 1);
    });
  });
}

export function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return Number.NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return Math.round(sorted[i] * 10) / 10;
}

export function latencyLine(run: Run, seconds: number): string {
  const t = [...run.times].sort((a, b) => a - b);
  return `${(t.length / seconds).toFixed(0)} req/s, p50 ${percentile(t, 50)} ms, p95 ${percentile(t, 95)} ms, p99 ${percentile(t, 99)} ms (${t.length} responses)`;
}

export const statusLine = (run: Run) => [...run.statuses].sort(([a], [b]) => a - b).map(([s, n]) => `${s}: ${n}`).join(", ");

/**
 * Revision saves for autocannon: each save leases an option no other save
 * holds, so saves never race each other and every one should be a 201. A
 * 201 moves the option's base on; anything else (or a lease older than the
 * request timeout) sends the option to refresh(), which reads its latest
 * revision before it is leased again. Every save carries a unique note, so
 * the rows written can be matched one for one against the 201s.
 */
export class WriterPool {
  readonly acknowledged = new Set<string>();
  readonly refused409 = new Set<string>();
  /** Milliseconds from sending a save to its answer, for every answered save. */
  readonly saveTimes: number[] = [];
  /** Saves that had no answer within the lease (their connection was dropped or they hung). */
  expiredCount = 0;
  private free: { id: string; base: number }[];
  private leased = new Map<string, { base: number; since: number; note: string }>();
  private stale = new Set<string>();
  private expired: { note: string }[] = [];
  private seq = 0;
  private timer: NodeJS.Timeout | undefined;

  constructor(
    private account: Account,
    optionIds: string[],
    private leaseMs = 15_000,
  ) {
    this.free = optionIds.map((id) => ({ id, base: 1 }));
  }

  /** An autocannon request entry that saves a revision of a leased option. */
  request(document: unknown): Hooked {
    return {
      method: "POST",
      path: "/api/v1/options/_/revisions",
      headers: { cookie: this.account.cookie, origin: ORIGIN, "content-type": "application/json" },
      setupRequest: (req, ctx) => {
        const context = ctx as Record<string, unknown>;
        const slot = this.free.shift();
        // every option is busy or being refreshed: send a read instead of a save
        if (!slot) return { ...req, method: "GET", path: `/api/v1/auth/session`, body: undefined };
        const note = `load ${slot.id} #${++this.seq}`;
        this.leased.set(slot.id, { base: slot.base, since: Date.now(), note });
        context.slot = slot.id;
        context.note = note;
        context.sentAt = Date.now();
        return { ...req, path: `/api/v1/options/${slot.id}/revisions`, body: JSON.stringify({ baseRevision: slot.base, document, partRefs: {}, note }) };
      },
      onResponse: (status, body, ctx) => {
        const context = ctx as Record<string, unknown>;
        const { slot: id, note } = context as { slot?: string; note?: string };
        if (!id || !note) return;
        this.saveTimes.push(Date.now() - (context.sentAt as number));
        context.slot = context.note = undefined;
        if (status === 201) this.acknowledged.add(note);
        if (status === 409) this.refused409.add(note);
        const lease = this.leased.get(id);
        if (lease?.note !== note) return; // the lease had expired; the option is being refreshed
        this.leased.delete(id);
        if (status === 201) this.free.push({ id, base: (JSON.parse(body) as { revision: { revision: number } }).revision.revision });
        else this.stale.add(id);
      },
    };
  }

  /** Starts the background refresher (stale options and expired leases). */
  start(): void {
    this.timer = setInterval(() => void this.refresh(), 500);
  }

  stop(): void {
    clearInterval(this.timer);
  }

  /** Saves sent but not answered (still in flight when the run ended, or timed out). */
  unanswered(): Set<string> {
    return new Set([...this.leased.values(), ...this.expired].map((l) => l.note));
  }

  private async refresh(): Promise<void> {
    const now = Date.now();
    for (const [id, lease] of this.leased) if (now - lease.since > this.leaseMs) {
      this.leased.delete(id);
      this.expired.push(lease);
      this.expiredCount++;
      this.stale.add(id);
    }
    for (const id of [...this.stale]) {
      try {
        const r = await api<{ option: { latestRevision: number } }>(this.account, "GET", `/api/v1/options/${id}`);
        if (r.status !== 200) continue;
        if (!this.stale.delete(id)) continue;
        this.free.push({ id, base: r.json.option.latestRevision });
      } catch {
        // the app or database is down; try again on the next tick
      }
    }
  }
}

/**
 * Compares the revision rows of the given options (revision > 1) with the
 * saves acknowledged by a 201: `lost` were acknowledged but are not stored,
 * `duplicated` notes are stored more than once, `unacknowledged` are stored
 * without a 201 although the client got another answer (or none, outside
 * `unanswered`: saves still in flight when the run stopped, which may or
 * may not have committed).
 */
export async function auditRevisions(
  optionIds: string[],
  acknowledged: Set<string>,
  unanswered: Set<string> = new Set(),
): Promise<{ stored: number; lost: number; duplicated: number; unacknowledged: number; inFlight: number }> {
  const db: Knex = knexFactory({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 1 } });
  try {
    const rows = await db("option_revision").whereIn("option_id", optionIds).where("revision", ">", 1).select<{ note: string }[]>("note");
    const seen = new Map<string, number>();
    for (const r of rows) seen.set(r.note, (seen.get(r.note) ?? 0) + 1);
    return {
      stored: rows.length,
      lost: [...acknowledged].filter((n) => !seen.has(n)).length,
      duplicated: [...seen.values()].filter((n) => n > 1).length,
      unacknowledged: [...seen.keys()].filter((n) => !acknowledged.has(n) && !unanswered.has(n)).length,
      inFlight: [...seen.keys()].filter((n) => unanswered.has(n)).length,
    };
  } finally {
    await db.destroy();
  }
}
