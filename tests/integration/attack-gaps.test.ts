// Attack 9 (gaps) and the job permission: sign-up was not throttled (one
// argon2 hash per request); sessions had no absolute lifetime and the proxy
// re-sent any session cookie, valid or not, with a fresh 30-day lifetime;
// display and workspace names took CR/LF; the activity log showed today's
// names for old entries and missed role changes, removals, tokens, option
// renames and archiving, part edits and deletions; a viewer's token could
// start background jobs.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SIGN_UPS_PER_ADDRESS } from "@/lib/throttle-policy";
import { sessionAbsoluteSeconds } from "@/lib/session-cookie";
import { Client, SESSION_COOKIE, locationPath } from "./support/http";
import { TEST_PASSWORD, clearAddressThrottle, closeTestDb, createMember, createWorkspaceWithRoles, linkFrom, testDb, uniqueEmail, waitForMail, type TestUser } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";
import { createPart, mosfetBody } from "./support/parts";
import { requestFrom } from "./support/raw";

beforeAll(clearAddressThrottle);
afterAll(async () => {
  await clearAddressThrottle();
  await closeTestDb();
});

const signUpBody = (email: string, overrides: Record<string, string> = {}) => ({ displayName: "Gap Probe", email, password: "gap probe passphrase 12", workspaceName: "Gap Works", ...overrides });
const paths = (text: string) => (JSON.parse(text) as { error: { issues: { path: string }[] } }).error.issues.map((i) => i.path);

describe("sign-up throttle", () => {
  it(`allows ${SIGN_UPS_PER_ADDRESS} sign-ups per address and hour, then 429; another address is unaffected`, async () => {
    await clearAddressThrottle();
    for (let i = 0; i < SIGN_UPS_PER_ADDRESS; i++) {
      const r = await requestFrom("127.0.0.4", "POST", "/api/v1/auth/sign-up", { json: signUpBody(uniqueEmail(`gap-up${i}`)) });
      expect(r.status, r.text).toBe(202);
    }
    const over = await requestFrom("127.0.0.4", "POST", "/api/v1/auth/sign-up", { json: signUpBody(uniqueEmail("gap-up-over")) });
    expect(over.status).toBe(429);
    expect(Number(over.headers["retry-after"])).toBeGreaterThan(0);
    expect((await requestFrom("127.0.0.5", "POST", "/api/v1/auth/sign-up", { json: signUpBody(uniqueEmail("gap-up-other")) })).status).toBe(202);
    await clearAddressThrottle();
  });
});

describe("sessions", () => {
  it("end at their absolute lifetime however active they were", async () => {
    const { email } = await createMember("gap-absolute");
    const c = await signedInClient(email);
    const id = c.cookies.get(SESSION_COOKIE)!;
    expect((await c.get("/api/v1/auth/session")).status).toBe(200);
    await testDb()("user_session").where({ id }).update({ created_at: new Date(Date.now() - (sessionAbsoluteSeconds() + 60) * 1000), expires_at: new Date(Date.now() + 86_400_000) });
    expect((await c.get("/api/v1/auth/session")).status).toBe(401);
    expect(locationPath(await c.get("/home"))).toBe("/sign-in?next=%2Fhome");
  });

  it("the cookie lives no longer than the absolute lifetime, and a page load never re-sends an invalid one", async () => {
    const res = await new Client().post("/api/v1/auth/sign-in", { email: (await createMember("gap-cookie")).email, password: TEST_PASSWORD });
    const set = res.headers.getSetCookie().find((h) => h.startsWith(`${SESSION_COOKIE}=`))!;
    expect(Number(/Max-Age=(\d+)/i.exec(set)![1])).toBeLessThanOrEqual(sessionAbsoluteSeconds());
    const bogus = new Client();
    bogus.cookies.set(SESSION_COOKIE, "not-a-session-id-at-all");
    const page = await bogus.get("/home");
    const resent = page.headers.getSetCookie().filter((h) => h.startsWith(`${SESSION_COOKIE}=not-a-session`));
    expect(resent).toEqual([]);
  });
});

describe("names", () => {
  for (const [field, value] of [["displayName", "Eve\r\nBcc: all@example.test"], ["displayName", "\u202Egnp.exe"], ["workspaceName", "Ops\u0007Bell"], ["workspaceName", "Two\nLines"]] as const) {
    it(`sign-up refuses ${field} ${JSON.stringify(value)}`, async () => {
      const r = await new Client().post("/api/v1/auth/sign-up", signUpBody(uniqueEmail("gap-name"), { [field]: value }));
      expect(r.status).toBe(400);
      expect(paths(r.text)).toContain(field);
    });
  }

  it("invite acceptance refuses a display name with a line break", async () => {
    const admin = await signedInClient((await createMember("gap-inviter", "admin")).email);
    const email = uniqueEmail("gap-invitee");
    expect((await admin.post("/api/v1/invites", { email, role: "viewer" })).status).toBe(201);
    const { token } = linkFrom((await waitForMail(email)).text, "/invite");
    const r = await new Client().post("/api/v1/auth/invite/accept", { token, displayName: "Ivy\nInjected", password: "invitee passphrase 123" });
    expect(r.status).toBe(400);
    expect(paths(r.text)).toContain("displayName");
  });
});

describe("the activity log", () => {
  let users: Record<string, TestUser>;
  let admin: Client;
  let projectId: string;
  let optionId: string;
  type Entry = { action: string; actor: { displayName: string } | null; optionName: string | null; detail: Record<string, unknown> };
  const log = async () => (await admin.get(`/api/v1/projects/${projectId}/activity`)).json<{ items: Entry[] }>().items;

  beforeAll(async () => {
    users = (await createWorkspaceWithRoles("Gap activity", ["admin", "designer", "viewer", "reviewer"])).users;
    admin = await signedInClient(users.admin.email);
    ({ projectId, optionId } = await createProjectWithOption(await signedInClient(users.designer.email)));
  });

  it("keeps the names as they were when each entry was written", async () => {
    const before = await testDb()("auth_user").where({ id: users.designer.id }).first<{ display_name: string }>();
    await testDb()("auth_user").where({ id: users.designer.id }).update({ display_name: "Renamed Afterwards" });
    expect((await admin.request("PATCH", `/api/v1/options/${optionId}`, { json: { name: "Option renamed" } })).status).toBe(200);
    const saved = (await log()).find((e) => e.action === "revision.saved")!;
    expect(saved.actor?.displayName).toBe(before.display_name);
    expect(saved.optionName).toBe("Option A");
    const renamed = (await log()).find((e) => e.action === "option.renamed")!;
    expect(renamed.detail).toMatchObject({ from: "Option A", to: "Option renamed" });
  });

  it("records archiving, role changes, removals, tokens and part edits and deletions, with who and whom", async () => {
    expect((await admin.request("PATCH", `/api/v1/options/${optionId}`, { json: { archived: true } })).status).toBe(200);
    expect((await admin.request("PATCH", `/api/v1/members/${users.reviewer.id}`, { json: { role: "manager" } })).status).toBe(200);
    expect((await admin.request("DELETE", `/api/v1/members/${users.viewer.id}`)).status).toBe(204);
    const minted = await admin.post("/api/v1/tokens", { name: "gap token", expiresInDays: 7, password: TEST_PASSWORD });
    expect(minted.status, minted.text).toBe(201);
    expect((await admin.request("DELETE", `/api/v1/tokens/${minted.json<{ token: { id: string } }>().token.id}`)).status).toBe(204);
    const mpn = `GAP-${Date.now().toString(36)}`;
    const partId = await createPart(admin, mosfetBody(mpn));
    expect((await admin.request("PATCH", `/api/v1/parts/${partId}`, { json: { description: "edited" } })).status).toBe(200);
    expect((await admin.request("DELETE", `/api/v1/parts/${partId}`)).status).toBe(204);

    const entries = await log();
    const find = (action: string) => entries.find((e) => e.action === action);
    const adminName = `Test Gap activity-admin`;
    expect(find("option.archived")).toMatchObject({ actor: { displayName: adminName } });
    expect(find("member.role_changed")?.detail).toMatchObject({ member: { id: users.reviewer.id, displayName: "Test Gap activity-reviewer" }, from: "reviewer", to: "manager" });
    expect(find("member.removed")?.detail).toMatchObject({ member: { id: users.viewer.id, displayName: "Test Gap activity-viewer" }, role: "viewer" });
    expect(find("token.created")?.detail).toMatchObject({ name: "gap token" });
    expect(find("token.revoked")?.detail).toMatchObject({ name: "gap token" });
    expect(find("part.updated")?.detail).toMatchObject({ mpn });
    expect(find("part.deleted")?.detail).toMatchObject({ mpn });
  });
});

describe("background jobs", () => {
  it("a viewer's token may not start one (403); a designer's may", async () => {
    const { users: u } = await createWorkspaceWithRoles("Gap jobs", ["designer", "viewer"]);
    const designer = await signedInClient(u.designer.email);
    const { optionId } = await createProjectWithOption(designer);
    const body = { kind: "report", payload: { optionId, revision: 1, heatmapSteps: 8 } };
    for (const [role, expected] of [["viewer", 403], ["designer", 202]] as const) {
      const session = await signedInClient(u[role].email);
      const minted = await session.post("/api/v1/tokens", { name: "jobs", expiresInDays: 7, password: TEST_PASSWORD });
      expect(minted.status, minted.text).toBe(201);
      const secret = minted.json<{ secret: string }>().secret;
      const r = await new Client().request("POST", "/api/v1/jobs", { json: body, headers: { authorization: `Bearer ${secret}` }, origin: null });
      expect(r.status, r.text).toBe(expected);
    }
  });
});
