// The role matrix, generated from the route tree: every page, route handler
// method and server action under app/ must have an entry in route-matrix.ts,
// and every entry is called as each role of workspace A, as the admin of
// workspace B, and signed out. See route-matrix.ts for how to add entries.
import fs from "node:fs";
import path from "node:path";
import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ROLES, type Role } from "@/lib/roles";
import { Client, locationPath, type Reply } from "./support/http";
import { callAction } from "./support/actions";
import { TEST_PASSWORD, addMembership, clearAddressThrottle, closeTestDb, createUser, createWorkspaceWithRoles, testDb, uniqueEmail } from "./support/db";
import { CALLERS, MATRIX, type ActionEntry, type CallEntry, type Caller, type Fixtures, type Outcome, type PendingEntry } from "./route-matrix";

const APP_DIR = path.resolve(__dirname, "../../app");
const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"];

interface TreeItem {
  key: string;
  file: string;
  /** For route methods and actions: the wrapper used and its permission ("public" for publicRoute/publicAction). */
  guard?: string;
}

function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
    const full = path.join(dir, d.name);
    return d.isDirectory() ? walk(full) : [full];
  });
}

/** `export const NAME = route({ permission: "x" ...` -> "x"; publicRoute/publicAction -> "public"; else "unwrapped". */
function guardOf(source: string, name: string): string {
  const start = source.search(new RegExp(`export\\s+(?:const\\s+${name}\\s*=|(?:async\\s+)?function\\s+${name}\\b)`));
  const head = source.slice(start, start + 400);
  const wrapper = head.match(/=\s*(route|publicRoute|action|publicAction)\s*(?:<[^>]*>)?\s*\(/);
  if (!wrapper) return "unwrapped";
  if (wrapper[1].startsWith("public")) return "public";
  return head.match(/permission:\s*"([^"]+)"/)?.[1] ?? "unwrapped";
}

function exportedNames(source: string): string[] {
  const names = [...source.matchAll(/export\s+(?:const|let|(?:async\s+)?function)\s+([A-Za-z0-9_$]+)/g)].map((m) => m[1]);
  for (const m of source.matchAll(/export\s*\{([^}]+)\}/g)) {
    for (const part of m[1].split(",")) names.push(part.trim().split(/\s+as\s+/).pop()!.trim());
  }
  return names.filter(Boolean);
}

/** Every page, route method and server action, keyed as in route-matrix.ts. */
function routeTree(): TreeItem[] {
  const items: TreeItem[] = [];
  for (const file of walk(APP_DIR)) {
    const rel = path.relative(APP_DIR, file).split(path.sep);
    if (rel.some((s) => s.startsWith("_"))) continue; // private folders are not routes
    const name = rel[rel.length - 1];
    const urlPath = "/" + rel.slice(0, -1).filter((s) => !(s.startsWith("(") && s.endsWith(")"))).join("/");
    const source = () => fs.readFileSync(file, "utf8");
    if (/^page\.(tsx|ts|jsx|js)$/.test(name)) items.push({ key: `page ${urlPath}`, file });
    else if (/^route\.(ts|js)$/.test(name)) {
      const src = source();
      for (const m of exportedNames(src).filter((n) => HTTP_METHODS.includes(n))) items.push({ key: `${m} ${urlPath}`, file, guard: guardOf(src, m) });
    } else if (/^actions\.(ts|js)$/.test(name)) {
      const src = source();
      for (const a of exportedNames(src)) items.push({ key: `action ${rel.join("/")}#${a}`, file, guard: guardOf(src, a) });
    }
  }
  return items;
}

const isCall = (e: (typeof MATRIX)[number]): e is CallEntry => "expect" in e;
const isAction = (e: (typeof MATRIX)[number]): e is ActionEntry => "via" in e;
const isPending = (e: (typeof MATRIX)[number]): e is PendingEntry => "pending" in e;

const tree = routeTree();
const treeByKey = new Map(tree.map((t) => [t.key, t]));

describe("the matrix covers the route tree", () => {
  it("has an entry for every page, route method and server action in app/", () => {
    const described = new Set(MATRIX.map((e) => e.key));
    expect(tree.length).toBeGreaterThan(20);
    expect(tree.filter((t) => !described.has(t.key)).map((t) => t.key)).toEqual([]);
  });

  it("has no entry for something that is no longer in app/", () => {
    expect(MATRIX.filter((e) => !treeByKey.has(e.key)).map((e) => e.key)).toEqual([]);
  });

  it("every described route method and action goes through the access wrappers", () => {
    const unwrapped = MATRIX.filter((e) => !isPending(e) && treeByKey.get(e.key)?.guard === "unwrapped").map((e) => e.key);
    expect(unwrapped).toEqual([]);
  });

  it("each action declares the same permission as the route it is checked through", () => {
    const problems: string[] = [];
    for (const a of MATRIX.filter(isAction)) {
      const via = MATRIX.find((e) => e.key === a.via);
      if (!via || !isCall(via)) problems.push(`${a.key}: via "${a.via}" is not a called entry`);
      else if (treeByKey.get(a.key)?.guard !== treeByKey.get(a.via)?.guard) {
        problems.push(`${a.key} (${treeByKey.get(a.key)?.guard}) vs ${a.via} (${treeByKey.get(a.via)?.guard})`);
      }
    }
    expect(problems).toEqual([]);
  });
});

// ---- fixtures: workspace A with one member per role, workspace B with an admin ----
const clients = new Map<Caller, Client>();
const credentials = new Map<Caller, string>();
let fx: Fixtures;

async function signedIn(email: string): Promise<Client> {
  const c = new Client();
  const r = await c.post("/api/v1/auth/sign-in", { email, password: TEST_PASSWORD });
  if (r.status !== 200) throw new Error(`fixture sign-in failed: ${r.status} ${r.text}`);
  return c;
}

async function freshClient(caller: Caller): Promise<Client> {
  return caller === "signedOut" ? new Client() : signedIn(credentials.get(caller)!);
}

beforeAll(async () => {
  await clearAddressThrottle(); // every caller signs up and in from loopback
  const a = await createWorkspaceWithRoles("Matrix A", ROLES);
  const b = await createWorkspaceWithRoles("Matrix B", ["admin"]);
  for (const role of ROLES) credentials.set(role, a.users[role].email);
  credentials.set("otherWorkspace", b.users.admin.email);
  for (const [caller, email] of credentials) clients.set(caller, await signedIn(email));
  clients.set("signedOut", new Client());
  const spare = await createUser("matrix-spare");
  fx = {
    workspaceA: { id: a.workspaceId, name: a.name },
    workspaceB: { id: b.workspaceId, name: b.name },
    async newMemberOfA(role: Role) {
      const u = await createUser(`matrix-${role}`);
      await addMembership(a.workspaceId, u.id, role);
      return u.id;
    },
    async newInviteOfA() {
      const id = `inv_test_${crypto.randomBytes(6).toString("hex")}`;
      await testDb()("invite").insert({
        id,
        workspace_id: a.workspaceId,
        email: uniqueEmail("matrix-invite"),
        role: "viewer",
        token_hash: crypto.randomBytes(32).toString("hex"),
        invited_by: a.users.admin.id,
        expires_at: new Date(Date.now() + 86_400_000),
      });
      return id;
    },
    spareAccount: { email: spare.email, password: TEST_PASSWORD },
    uniqueEmail,
    adminOfA: clients.get("admin")!,
  };
});

afterAll(async () => {
  await closeTestDb();
});

function outcomeOf(r: Reply): string {
  return r.location ? `${r.status} -> ${locationPath(r)}` : String(r.status);
}

function matches(r: Reply, expected: Outcome): boolean {
  if (typeof expected === "number") return r.status === expected;
  const target = expected === "signin" ? "/sign-in" : expected.slice("redirect:".length);
  const at = locationPath(r) ?? "";
  return [303, 307, 308].includes(r.status) && (at === target || at.startsWith(`${target}?`) || at.startsWith(`${target}/`));
}

function splitKey(key: string): { method: string; template: string } {
  const [kind, template] = key.split(" ");
  return { method: kind === "page" ? "GET" : kind, template };
}

async function call(entry: CallEntry, caller: Caller, client: Client, origin?: string): Promise<Reply> {
  const { method, template } = splitKey(entry.key);
  const params = entry.params ? await entry.params(fx, caller) : {};
  const url = template.replace(/\[([^\]]+)\]/g, (_, name: string) => {
    if (!(name in params)) throw new Error(`${entry.key}: no value for [${name}]`);
    return encodeURIComponent(params[name]);
  });
  const body = entry.body?.(fx, caller);
  if (method === "GET" || method === "HEAD") return client.request(method, url + (entry.query ?? ""));
  const payload = entry.form ? { form: (body ?? {}) as Record<string, string> } : body === undefined ? {} : { json: body };
  return client.request(method, url + (entry.query ?? ""), { ...payload, origin });
}

describe("each caller gets the expected answer", () => {
  for (const entry of MATRIX.filter(isCall)) {
    it(entry.key, async () => {
      const wrong: string[] = [];
      for (const caller of CALLERS) {
        const client = entry.freshSession ? await freshClient(caller) : clients.get(caller)!;
        const r = await call(entry, caller, client);
        if (!matches(r, entry.expect[caller])) wrong.push(`${caller}: expected ${entry.expect[caller]}, got ${outcomeOf(r)} ${r.text.slice(0, 160)}`);
      }
      if (splitKey(entry.key).method !== "GET") {
        const client = entry.freshSession ? await freshClient("admin") : clients.get("admin")!;
        const r = await call(entry, "admin", client, "http://evil.example");
        if (r.status !== 403) wrong.push(`foreign Origin: expected 403, got ${outcomeOf(r)}`);
      }
      expect(wrong).toEqual([]);
    });
  }
  for (const entry of MATRIX.filter(isPending)) it.todo(`${entry.key}: ${entry.pending}`);
});

/** What the action must answer where its route answers `outcome`: success for a 2xx or 3xx, else the same status. */
function actionExpectation(outcome: Outcome): "done" | number {
  return typeof outcome === "number" && outcome >= 400 ? outcome : "done";
}

describe("each server action answers as the route of the same service does", () => {
  for (const entry of MATRIX.filter(isAction)) {
    it(entry.key, async () => {
      const via = MATRIX.find((e): e is CallEntry => isCall(e) && e.key === entry.via);
      if (!via) throw new Error(`${entry.key}: via "${entry.via}" is not a called entry`);
      await clearAddressThrottle(); // sign-ups and sign-ins from loopback, twice per caller (route and form)
      const wrong: string[] = [];
      for (const caller of CALLERS) {
        const client = entry.freshSession ? await freshClient(caller) : clients.get(caller)!;
        const page = await entry.page(fx, caller);
        const fields = entry.fields ? await entry.fields(fx, caller) : {};
        const r = await callAction(client, { key: `app/${entry.key.slice("action ".length)}`, page, fields });
        const expected = actionExpectation(via.expect[caller]);
        const got = r.kind === "done" ? "done" : r.status;
        if (got !== expected) wrong.push(`${caller}: expected ${expected}, got ${r.kind === "done" ? `done (${r.status})` : `${r.status} ${r.code}: ${r.message}`}`);
      }
      expect(wrong).toEqual([]);
    });
  }
});
