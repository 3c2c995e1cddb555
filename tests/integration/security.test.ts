// Security properties that hold across the app: the security headers on
// pages and API answers, the session cookie's flags, no secret (password,
// another user's session id, a link token, a stored hash) in any response
// or in the app's log, and another workspace's records answering 404 (the
// role matrix calls them; here we check it has that expectation for every
// record route). docs/THREATS.md lists what these defend against.
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, SESSION_COOKIE, type Reply } from "./support/http";
import { TEST_PASSWORD, closeTestDb, createMember, linkFrom, testDb, uniqueEmail, waitForMail } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";
import { MATRIX, type CallEntry } from "./route-matrix";

const secrets = new Set<string>([TEST_PASSWORD]);
let alice: Client;
let bob: Client;
let record: { projectId: string; optionId: string };
const signUpPassword = `sign-up secret ${Date.now()} horse`;

beforeAll(async () => {
  const a = await createMember("sec-alice", "admin");
  const b = await createMember("sec-bob", "admin");
  alice = await signedInClient(a.email);
  bob = await signedInClient(b.email);
  for (const c of [alice, bob]) secrets.add(c.cookies.get(SESSION_COOKIE)!);
  record = await createProjectWithOption(alice);

  // traffic that carries secrets in: sign-up, a wrong password, a reset link, an invite
  const fresh = new Client();
  const signUpEmail = uniqueEmail("sec-signup");
  const up = await fresh.post("/api/v1/auth/sign-up", { displayName: "Sec Signup", email: signUpEmail, password: signUpPassword, workspaceName: "Sec" });
  expect(up.status).toBe(202);
  const signUpLink = linkFrom((await waitForMail(signUpEmail)).text, "/sign-up/confirm").token;
  expect((await fresh.post("/api/v1/auth/sign-up/confirm", { token: signUpLink })).status).toBe(201);
  secrets.add(signUpPassword).add(signUpLink).add(fresh.cookies.get(SESSION_COOKIE)!);
  await new Client().post("/api/v1/auth/sign-in", { email: a.email, password: "wrong password, logged nowhere" });
  secrets.add("wrong password, logged nowhere");
  await new Client().post("/api/v1/auth/password/forgot", { email: b.email });
  const mail = await waitForMail(b.email);
  const { token } = linkFrom(mail.text, "/reset-password");
  secrets.add(token);
  await new Client().post("/api/v1/auth/invite/describe", { token });
  const invite = await alice.post("/api/v1/invites", { email: uniqueEmail("sec-invitee"), role: "viewer" });
  expect(invite.status).toBe(201);

  // read and refused traffic as both users
  for (const c of [alice, bob]) {
    for (const p of ["/home", "/projects", `/projects/${record.projectId}`, "/api/v1/auth/session", "/api/v1/projects", `/api/v1/options/${record.optionId}`, "/api/v1/members", "/api/v1/invites"]) await c.get(p);
  }

  // what the database keeps that must never leave it
  const hashes = await Promise.all([
    testDb()("auth_user").whereIn("email", [a.email, b.email]).pluck("password_hash"),
    testDb()("password_reset").pluck("token_hash"),
    testDb()("invite").pluck("token_hash"),
  ]);
  for (const h of hashes.flat()) if (typeof h === "string" && h.length >= 16) secrets.add(h);
});

afterAll(async () => {
  await closeTestDb();
});

function expectSecurityHeaders(r: Reply, what: string): void {
  const h = r.headers;
  const csp = h.get("content-security-policy") ?? "";
  expect(csp, `${what}: CSP`).toMatch(/default-src 'self'/);
  expect(csp, `${what}: frame-ancestors`).toMatch(/frame-ancestors 'none'/);
  expect(csp, `${what}: no remote script source`).not.toMatch(/script-src[^;]*(https?:|\*)/);
  expect(h.get("x-frame-options"), `${what}: X-Frame-Options`).toBe("DENY");
  expect(h.get("x-content-type-options"), `${what}: nosniff`).toBe("nosniff");
  expect(["same-origin", "no-referrer", "strict-origin", "strict-origin-when-cross-origin"], `${what}: Referrer-Policy`).toContain(h.get("referrer-policy"));
  expect(h.get("x-powered-by"), `${what}: X-Powered-By`).toBeNull();
}

describe("security headers", () => {
  it("are on public and signed-in pages", async () => {
    const signedOut = new Client();
    for (const p of ["/", "/sign-in", "/sign-up"]) expectSecurityHeaders(await signedOut.get(p), p);
    expectSecurityHeaders(await signedOut.get("/projects"), "/projects signed out (redirect)");
    for (const p of ["/home", `/projects/${record.projectId}`, `/projects/${record.projectId}/options/${record.optionId}/budget`]) {
      const r = await alice.get(p);
      expect(r.status, p).toBe(200);
      expectSecurityHeaders(r, p);
    }
  });

  it("are on API answers, refusals included", async () => {
    const cases: [string, Promise<Reply>][] = [
      ["session 200", alice.get("/api/v1/auth/session")],
      ["budget 200", alice.get(`/api/v1/options/${record.optionId}/budget`)],
      ["signed out 401", new Client().get("/api/v1/projects")],
      ["other workspace 404", bob.get(`/api/v1/options/${record.optionId}`)],
      ["bad body 400", alice.post("/api/v1/projects", { name: 42 })],
      ["foreign origin 403", alice.post("/api/v1/projects", {}, { origin: "http://evil.example" })],
    ];
    for (const [what, p] of cases) {
      const r = await p;
      expect(r.headers.get("content-type") ?? "", what).toMatch(/application\/json/);
      expectSecurityHeaders(r, what);
    }
  });
});

describe("session cookie", () => {
  it("is HttpOnly, SameSite=Lax, Path=/ when set at sign-in, and a page load does not re-send it", async () => {
    const { email } = await createMember("sec-cookie");
    const res = await fetch(new URL("/api/v1/auth/sign-in", process.env.APP_ORIGIN), {
      method: "POST",
      headers: { "content-type": "application/json", origin: process.env.APP_ORIGIN! },
      body: JSON.stringify({ email, password: TEST_PASSWORD }),
    });
    const setAtSignIn = res.headers.getSetCookie().find((c) => c.startsWith(`${SESSION_COOKIE}=`));
    // the cookie lives the session's absolute lifetime from sign-in; pages never set it (proxy.ts)
    expect((await alice.get("/home")).headers.getSetCookie().filter((c) => c.startsWith(`${SESSION_COOKIE}=`))).toEqual([]);
    for (const [what, c] of [["sign-in", setAtSignIn]] as const) {
      expect(c, what).toBeDefined();
      expect(c, what).toMatch(/;\s*HttpOnly/i);
      expect(c, what).toMatch(/;\s*SameSite=Lax/i);
      expect(c, what).toMatch(/;\s*Path=\/(;|$)/i);
      // Secure follows the origin: set for https deployments, absent on the loopback http origin
      expect(/;\s*Secure/i.test(c!), what).toBe((process.env.APP_ORIGIN ?? "").startsWith("https:"));
    }
  });
});

describe("no secret leaves the server", () => {
  it("no response body or header of this file carried a password, a session id, a link token or a stored hash", () => {
    expect(Client.responseLog.length).toBeGreaterThan(30);
    expect(secrets.size).toBeGreaterThan(8);
    for (const s of secrets) {
      const hit = Client.responseLog.find((t) => t.includes(s));
      expect(hit, `a response contained a secret:\n${hit?.slice(0, 300)}`).toBeUndefined();
    }
  });

  it("no line of the app's or the services' log does", async () => {
    const dir = path.resolve(__dirname, "../../.data", process.env.HEATSPLIT_MODE ?? "test");
    await new Promise((r) => setTimeout(r, 500)); // the stack writes the log through a pipe
    const logs = ["app.log", "services.log"].map((f) => path.join(dir, f));
    expect(fs.existsSync(logs[0]), `${logs[0]} (scripts/stack.ts writes it)`).toBe(true);
    const text = logs.filter((f) => fs.existsSync(f)).map((f) => fs.readFileSync(f, "utf8")).join("\n");
    expect(text.length).toBeGreaterThan(0);
    for (const s of secrets) {
      const line = text.split("\n").find((l) => l.includes(s));
      expect(line, `a log line contains a secret: ${line?.slice(0, 200)}`).toBeUndefined();
    }
  });
});

describe("another workspace's records", () => {
  const records = MATRIX.filter((e): e is CallEntry => "expect" in e).filter((e) => /\[[^\]]+\]/.test(e.key));
  it("every record route in the role matrix expects 404 for the admin of another workspace", () => {
    expect(records.length).toBeGreaterThan(15);
    const notHidden = records.filter((e) => e.expect.otherWorkspace !== 404).map((e) => `${e.key}: ${e.expect.otherWorkspace}`);
    expect(notHidden).toEqual([]);
  });
  for (const e of MATRIX.filter((x) => "pending" in x && /\[[^\]]+\]/.test(x.key))) it.todo(`${e.key}: pending in the role matrix, so no 404 check yet`);

  it("a record of A read by B's admin answers a plain 404 that names nothing of it", async () => {
    const r = await bob.get(`/api/v1/options/${record.optionId}`);
    expect(r.status).toBe(404);
    expect(r.text).not.toContain(record.projectId);
  });
});
