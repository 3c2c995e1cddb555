// Sign-up, sign-in, throttling, sign-out, invitations, password reset,
// session expiry and renewal, the Origin check, and that no response ever
// carries a password or a token back. Talks HTTP to the running app
// (APP_ORIGIN); reads mail and moves session expiry through DATABASE_URL.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, ORIGIN, SESSION_COOKIE, locationPath } from "./support/http";
import { TEST_PASSWORD, clearAddressThrottle, closeTestDb, countMailTo, createMember, createUser, linkFrom, testDb, uniqueEmail, waitForMail } from "./support/db";

const NEW_PASSWORD = "a different long passphrase 42";
/** Everything secret the tests send; checked against every response at the end. */
const secrets = new Set<string>([TEST_PASSWORD, NEW_PASSWORD]);

/** Sign-up through the mailed link (the request itself answers the same for every address). */
async function signUp(client: Client, label: string): Promise<{ email: string; workspaceId: string; userId: string }> {
  const email = uniqueEmail(label);
  const password = `${label} sign-up passphrase`;
  secrets.add(password);
  const r = await client.post("/api/v1/auth/sign-up", { displayName: `Test ${label}`, email, password, workspaceName: `${label} Power` });
  expect(r.status, r.text).toBe(202);
  const { token } = linkFrom((await waitForMail(email)).text, "/sign-up/confirm");
  secrets.add(token);
  const done = await client.post("/api/v1/auth/sign-up/confirm", { token });
  expect(done.status, done.text).toBe(201);
  const body = done.json<{ user: { id: string }; workspace: { id: string } }>();
  return { email, workspaceId: body.workspace.id, userId: body.user.id };
}

async function signIn(email: string, password = TEST_PASSWORD): Promise<Client> {
  const c = new Client();
  const r = await c.post("/api/v1/auth/sign-in", { email, password });
  expect(r.status, r.text).toBe(200);
  secrets.add(c.cookies.get(SESSION_COOKIE)!);
  return c;
}

function failedSignIn(email: string, password = "not the password at all") {
  return new Client().post("/api/v1/auth/sign-in", { email, password });
}

beforeAll(async () => {
  await clearAddressThrottle();
});

afterAll(async () => {
  await clearAddressThrottle();
  await closeTestDb();
});

describe("sign-up", () => {
  it("mails a link; following it creates the account and workspace, makes the creator admin and signs in with a safe cookie", async () => {
    const c = new Client();
    const email = uniqueEmail("signup");
    const password = "twelve chars and more";
    secrets.add(password);
    const r = await c.post("/api/v1/auth/sign-up", { displayName: "Ada Signup", email: `  ${email.toUpperCase()} `, password, workspaceName: "Signup Power" });
    expect(r.status, r.text).toBe(202);
    expect(r.json<{ message: string }>().message).toMatch(/Check your inbox/);
    expect(r.headers.getSetCookie()).toEqual([]);
    const { token, url } = linkFrom((await waitForMail(email)).text, "/sign-up/confirm");
    secrets.add(token);
    expect(url.startsWith(`${ORIGIN}/sign-up/confirm#token=`)).toBe(true);
    expect((await c.get("/sign-up/confirm")).status).toBe(200);
    const done = await c.post("/api/v1/auth/sign-up/confirm", { token });
    expect(done.status, done.text).toBe(201);
    const setCookie = done.headers.getSetCookie().find((h) => h.startsWith(`${SESSION_COOKIE}=`))!;
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Lax/i);
    expect(setCookie.match(/;\s*Secure/i) !== null).toBe(ORIGIN.startsWith("https:"));
    secrets.add(c.cookies.get(SESSION_COOKIE)!);

    const me = await c.get("/api/v1/auth/session");
    expect(me.status).toBe(200);
    const body = me.json<{ user: { email: string }; workspace: { name: string }; role: string }>();
    expect(body).toMatchObject({ user: { email }, workspace: { name: "Signup Power" }, role: "admin" });
    const row = await testDb()("auth_user").where({ email }).first<{ password_hash: string }>();
    expect(row.password_hash).toMatch(/^\$argon2id\$/);
  });

  it("answers bad input with a message per field and creates nothing", async () => {
    const email = uniqueEmail("bad-signup");
    const r = await new Client().post("/api/v1/auth/sign-up", { displayName: "", email: "not-an-email", password: "short", workspaceName: "" });
    expect(r.status).toBe(400);
    const issues = r.json<{ error: { code: string; issues: { path: string; message: string }[] } }>().error.issues;
    expect(issues.map((i) => i.path).sort()).toEqual(["displayName", "email", "password", "workspaceName"]);
    expect(issues.find((i) => i.path === "password")!.message).toMatch(/12 characters/);
    const again = await new Client().post("/api/v1/auth/sign-up", { displayName: "Bo", email, password: "short", workspaceName: "W" });
    expect(again.status).toBe(400);
    expect(await testDb()("auth_user").where({ email }).first()).toBeUndefined();
    expect(await testDb()("pending_sign_up").where({ email }).first()).toBeUndefined();
  });
});

describe("sign-in and sign-out", () => {
  it("signs in with the right password; wrong password and unknown e-mail get the same generic answer", async () => {
    const { email } = await createMember("signin");
    const c = await signIn(email);
    expect((await c.get("/api/v1/auth/session")).status).toBe(200);

    const wrong = await failedSignIn(email);
    const unknown = await failedSignIn(uniqueEmail("nobody"));
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.text).toBe(unknown.text);
    expect(wrong.json<{ error: { message: string } }>().error.message).toBe("E-mail or password is wrong.");
    expect(wrong.headers.getSetCookie()).toEqual([]);
  });

  it("signs out: the session ends in the database and the cookie is cleared", async () => {
    const { email } = await createMember("signout");
    const c = await signIn(email);
    const sessionId = c.cookies.get(SESSION_COOKIE)!;
    const stale = new Client();
    stale.cookies.set(SESSION_COOKIE, sessionId);
    const r = await c.post("/api/v1/auth/sign-out");
    expect(r.status).toBe(204);
    expect(c.cookies.has(SESSION_COOKIE)).toBe(false);
    expect(await testDb()("user_session").where({ id: sessionId }).first()).toBeUndefined();
    expect((await stale.get("/api/v1/auth/session")).status).toBe(401);
  });

  it("signs out from the shell's plain form (POST /sign-out -> 303 to sign-in)", async () => {
    const { email } = await createMember("signout-form");
    const c = await signIn(email);
    const r = await c.request("POST", "/sign-out", { form: {} });
    expect(r.status).toBe(303);
    expect(locationPath(r)).toBe("/sign-in");
    expect((await c.get("/api/v1/auth/session")).status).toBe(401);
  });

  it("sends a signed-in member away from the sign-in page, and a signed-out visitor of /home to sign-in", async () => {
    const { email } = await createUser("signin-page");
    // a user without a workspace sees the "no workspace" notice, not a loop
    const lonely = await signIn(email);
    const notice = await lonely.get("/sign-in");
    expect(notice.status).toBe(200);
    expect(notice.text).toContain("not a member of any workspace");
    const out = await new Client().get("/home");
    expect(out.status).toBe(307);
    expect(locationPath(out)).toBe("/sign-in?next=%2Fhome");
    const member = await signIn((await createMember("signin-page-member")).email);
    const away = await member.get("/sign-in?next=%2Fmembers");
    expect(away.status).toBe(307);
    expect(locationPath(away)).toBe("/members");
    const offsite = await member.get("/sign-in?next=%2F%2Fevil.example");
    expect(locationPath(offsite)).toBe("/home");
  });
});

// The sign-in throttle (parallel bursts, growing waits per account and
// address, the cap per address) is held by attack-guessing.test.ts.

describe("invitations", () => {
  it("e-mails a link; a new person follows it, sets name and password, and joins with the role", async () => {
    const admin = new Client();
    const owner = await signUp(admin, "inviter");
    const invitee = uniqueEmail("invitee");
    const r = await admin.post("/api/v1/invites", { email: invitee, role: "reviewer" });
    expect(r.status, r.text).toBe(201);
    const mail = await waitForMail(invitee);
    const { url, token } = linkFrom(mail.text, "/invite");
    secrets.add(token);
    expect(url.startsWith(`${ORIGIN}/invite#token=`)).toBe(true);
    const stored = await testDb()("invite").where({ email: invitee }).first<{ token_hash: string }>();
    expect(stored.token_hash).not.toContain(token);

    const guest = new Client();
    const page = await guest.get(new URL(url).pathname);
    expect(page.status).toBe(200);
    const described = await guest.post("/api/v1/auth/invite/describe", { token });
    expect(described.json()).toMatchObject({ email: invitee, role: "reviewer", hasAccount: false });

    const weak = await guest.post("/api/v1/auth/invite/accept", { token, displayName: "Rita Reviewer", password: "short" });
    expect(weak.status).toBe(400);
    expect(weak.json<{ error: { issues: { path: string }[] } }>().error.issues[0].path).toBe("password");

    const accepted = await guest.post("/api/v1/auth/invite/accept", { token, displayName: "Rita Reviewer", password: NEW_PASSWORD });
    expect(accepted.status, accepted.text).toBe(200);
    const me = (await guest.get("/api/v1/auth/session")).json<{ workspace: { id: string }; role: string; user: { email: string } }>();
    expect(me).toMatchObject({ workspace: { id: owner.workspaceId }, role: "reviewer", user: { email: invitee } });
    expect((await new Client().post("/api/v1/auth/invite/accept", { token, displayName: "Again", password: NEW_PASSWORD })).status).toBe(400);
  });

  it("lets someone with an account join with their password, then switch between workspaces", async () => {
    const admin = new Client();
    const owner = await signUp(admin, "inviter2");
    const existing = await createUser("existing");
    const own = await testDb()("workspace").insert({ id: `ws_own_${Date.now().toString(36)}`, name: "Own Works" }).returning<{ id: string }[]>("id");
    await testDb()("membership").insert({ workspace_id: own[0].id, user_id: existing.id, role: "designer" });
    expect((await admin.post("/api/v1/invites", { email: existing.email, role: "viewer" })).status).toBe(201);
    const { token } = linkFrom((await waitForMail(existing.email)).text, "/invite");
    secrets.add(token);

    const guest = new Client();
    expect((await guest.post("/api/v1/auth/invite/describe", { token })).json()).toMatchObject({ hasAccount: true, role: "viewer" });
    expect((await guest.post("/api/v1/auth/invite/accept", { token, password: "wrong password here" })).status).toBe(401);
    expect((await guest.post("/api/v1/auth/invite/accept", { token, password: TEST_PASSWORD })).status).toBe(200);
    const me = (await guest.get("/api/v1/auth/session")).json<{ workspace: { id: string }; role: string; workspaces: { id: string }[] }>();
    expect(me.workspace.id).toBe(owner.workspaceId);
    expect(me.role).toBe("viewer");
    expect(me.workspaces.map((w) => w.id).sort()).toEqual([owner.workspaceId, own[0].id].sort());

    const switched = await guest.post("/api/v1/auth/workspace", { workspaceId: own[0].id });
    expect(switched.status).toBe(200);
    expect((await guest.get("/api/v1/auth/session")).json()).toMatchObject({ workspace: { id: own[0].id }, role: "designer" });
    const form = await guest.request("POST", "/switch-workspace", { form: { workspaceId: owner.workspaceId } });
    expect(form.status).toBe(303);
    expect((await guest.get("/api/v1/auth/session")).json()).toMatchObject({ workspace: { id: owner.workspaceId }, role: "viewer" });
    const stranger = await signUp(new Client(), "stranger");
    expect((await guest.post("/api/v1/auth/workspace", { workspaceId: stranger.workspaceId })).status).toBe(404);
  });
});

describe("password reset", () => {
  it("always gives the same answer, e-mails a one-hour single-use link, and retires the old password and sessions", async () => {
    const { email, id: userId } = await createMember("reset");
    const before = await signIn(email);
    const unknown = await new Client().post("/api/v1/auth/password/forgot", { email: uniqueEmail("nobody") });
    const known = await new Client().post("/api/v1/auth/password/forgot", { email });
    expect(known.status).toBe(200);
    expect(known.text).toBe(unknown.text);
    expect(known.json<{ message: string }>().message).toMatch(/If an account exists/);

    const { token } = linkFrom((await waitForMail(email)).text, "/reset-password");
    secrets.add(token);
    const row = await testDb()("password_reset").where({ user_id: userId }).orderBy("created_at", "desc").first<{ token_hash: string; expires_at: Date; created_at: Date }>();
    expect(row.token_hash).not.toContain(token);
    const ttlMinutes = (row.expires_at.getTime() - row.created_at.getTime()) / 60_000;
    expect(ttlMinutes).toBeGreaterThan(59);
    expect(ttlMinutes).toBeLessThanOrEqual(60.1);

    const weak = await new Client().post("/api/v1/auth/password/reset", { token, password: "short" });
    expect(weak.status).toBe(400);
    const ok = await new Client().post("/api/v1/auth/password/reset", { token, password: NEW_PASSWORD });
    expect(ok.status, ok.text).toBe(200);
    expect((await new Client().post("/api/v1/auth/password/reset", { token, password: "yet another long one" })).status).toBe(400);

    expect((await failedSignIn(email, TEST_PASSWORD)).status).toBe(401);
    await signIn(email, NEW_PASSWORD);
    expect((await before.get("/api/v1/auth/session")).status).toBe(401);
    await clearAddressThrottle();
  });

  it("caps reset mails per address and never says so", async () => {
    const { email } = await createUser("reset-cap");
    const answers = new Set<string>();
    for (let i = 0; i < 5; i++) answers.add((await new Client().post("/api/v1/auth/password/forgot", { email })).text);
    expect(answers.size).toBe(1);
    const until = Date.now() + 10_000;
    while ((await countMailTo(email)) < 3 && Date.now() < until) await new Promise((r) => setTimeout(r, 100));
    await new Promise((r) => setTimeout(r, 1_000)); // time for a fourth to arrive, if one were sent
    expect(await countMailTo(email)).toBe(3);
  });
});

describe("session lifetime", () => {
  it("an expired session is refused by the API and sends pages to sign-in", async () => {
    const { email } = await createMember("expiry");
    const c = await signIn(email);
    const id = c.cookies.get(SESSION_COOKIE)!;
    await testDb()("user_session").where({ id }).update({ expires_at: new Date(Date.now() - 60_000) });
    expect((await c.get("/api/v1/auth/session")).status).toBe(401);
    const page = await c.get("/home");
    expect(page.status).toBe(307);
    expect(locationPath(page)).toBe("/sign-in?next=%2Fhome");
    expect(await testDb()("user_session").where({ id }).first()).toBeUndefined();
  });

  it("a session past half its lifetime is renewed and its cookie re-sent", async () => {
    const ttl = Number(process.env.SESSION_TTL_SECONDS ?? 30 * 24 * 3600);
    const { email } = await createMember("renewal");
    const c = await signIn(email);
    const id = c.cookies.get(SESSION_COOKIE)!;
    const soon = new Date(Date.now() + (ttl / 4) * 1000);
    await testDb()("user_session").where({ id }).update({ expires_at: soon });
    const r = await c.get("/api/v1/auth/session");
    expect(r.status).toBe(200);
    expect(r.headers.getSetCookie().some((h) => h.startsWith(`${SESSION_COOKIE}=${id}`) && /Max-Age=\d+/i.test(h))).toBe(true);
    const row = await testDb()("user_session").where({ id }).first<{ expires_at: Date }>();
    expect(row.expires_at.getTime()).toBeGreaterThan(Date.now() + ttl * 1000 * 0.9);
  });
});

describe("origin check", () => {
  it("refuses state-changing requests from another origin or with none", async () => {
    const { email } = await createMember("origin");
    for (const origin of ["http://evil.example", null]) {
      const r = await new Client().post("/api/v1/auth/sign-in", { email, password: TEST_PASSWORD }, { origin });
      expect(r.status).toBe(403);
      expect(r.headers.getSetCookie()).toEqual([]);
    }
    const c = await signIn(email);
    const out = await c.request("POST", "/sign-out", { form: {}, origin: "http://evil.example" });
    expect(out.status).toBe(403);
    expect((await c.get("/api/v1/auth/session")).status).toBe(200);
  });
});

describe("secrets", () => {
  it("no response body or header ever contained a submitted password, a link token or a session id", () => {
    expect(Client.responseLog.length).toBeGreaterThan(40);
    for (const secret of secrets) {
      const hit = Client.responseLog.find((t) => t.includes(secret));
      expect(hit, `a response contained a secret:\n${hit?.slice(0, 400)}`).toBeUndefined();
    }
  });
});
