// Attack 5 (medium): API tokens outlived what should end them. A password
// reset signs the account out everywhere but left its tokens working; a
// token of a removed member worked again after a re-invite; tokens could
// live forever, and a stolen session could mint one without the password.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./support/http";
import { TEST_PASSWORD, clearAddressThrottle, closeTestDb, createWorkspaceWithRoles, linkFrom, waitForMail, type TestUser } from "./support/db";
import { signedInClient } from "./support/projects";

let users: Record<string, TestUser>;
let admin: Client;

beforeAll(async () => {
  await clearAddressThrottle();
  users = (await createWorkspaceWithRoles("Token attack", ["admin", "designer", "viewer"])).users;
  admin = await signedInClient(users.admin.email);
});
afterAll(async () => {
  await clearAddressThrottle();
  await closeTestDb();
});

async function mint(client: Client, body: Record<string, unknown> = {}): Promise<string> {
  const r = await client.post("/api/v1/tokens", { name: "attack", expiresInDays: 30, password: TEST_PASSWORD, ...body });
  expect(r.status, r.text).toBe(201);
  return r.json<{ secret: string }>().secret;
}

const useToken = (secret: string) => new Client().request("GET", "/api/v1/projects", { headers: { authorization: `Bearer ${secret}` }, origin: null });

describe("creating a token", () => {
  it("needs the account's password again", async () => {
    const designer = await signedInClient(users.designer.email);
    const none = await designer.post("/api/v1/tokens", { name: "stolen session", expiresInDays: 30 });
    expect(none.status).toBe(400);
    expect(none.json<{ error: { issues: { path: string }[] } }>().error.issues.map((i) => i.path)).toContain("password");
    const wrong = await designer.post("/api/v1/tokens", { name: "stolen session", expiresInDays: 30, password: "a guess at the password" });
    expect(wrong.status).toBe(400);
    expect(wrong.json<{ error: { issues: { path: string }[] } }>().error.issues.map((i) => i.path)).toContain("password");
    expect(await mint(designer)).toMatch(/^hs_/);
  });

  it("needs an expiry of at most one year", async () => {
    const designer = await signedInClient(users.designer.email);
    for (const body of [{ expiresInDays: undefined }, { expiresInDays: "" }, { expiresInDays: 366 }, { expiresInDays: 5000 }]) {
      const r = await designer.post("/api/v1/tokens", { name: "forever", password: TEST_PASSWORD, ...body });
      expect(r.status, JSON.stringify(body)).toBe(400);
      expect(r.json<{ error: { issues: { path: string }[] } }>().error.issues.map((i) => i.path)).toContain("expiresInDays");
    }
    await mint(designer, { expiresInDays: 365 });
  });
});

describe("a token ends", () => {
  it("when its owner resets the password (which signs them out everywhere)", async () => {
    const { users: u } = await createWorkspaceWithRoles("Token reset", ["designer"]);
    const secret = await mint(await signedInClient(u.designer.email));
    expect((await useToken(secret)).status).toBe(200);
    expect((await new Client().post("/api/v1/auth/password/forgot", { email: u.designer.email })).status).toBe(200);
    const { token } = linkFrom((await waitForMail(u.designer.email)).text, "/reset-password");
    expect((await new Client().post("/api/v1/auth/password/reset", { token, password: "a brand new passphrase 77" })).status).toBe(200);
    expect((await useToken(secret)).status).toBe(401);
  });

  it("for good when its member leaves the workspace: a re-invite does not revive it", async () => {
    const viewer = await signedInClient(users.viewer.email);
    const secret = await mint(viewer);
    expect((await useToken(secret)).status).toBe(200);
    expect((await admin.request("DELETE", `/api/v1/members/${users.viewer.id}`)).status).toBe(204);
    expect((await useToken(secret)).status).toBe(401);

    expect((await admin.post("/api/v1/invites", { email: users.viewer.email, role: "viewer" })).status).toBe(201);
    const { token } = linkFrom((await waitForMail(users.viewer.email)).text, "/invite");
    expect((await new Client().post("/api/v1/auth/invite/accept", { token, password: TEST_PASSWORD })).status).toBe(200);
    expect((await useToken(secret)).status).toBe(401);
  });
});
