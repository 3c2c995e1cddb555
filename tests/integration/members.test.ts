// Member management beyond the role matrix: the last admin is kept, role
// changes and removals take effect on the member's next request, and the
// development inbox shows an admin only their own workspace's mail.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./support/http";
import { TEST_PASSWORD, addMembership, closeTestDb, createWorkspaceWithRoles, uniqueEmail, waitForMail } from "./support/db";

async function signIn(email: string): Promise<Client> {
  const c = new Client();
  const r = await c.post("/api/v1/auth/sign-in", { email, password: TEST_PASSWORD });
  expect(r.status, r.text).toBe(200);
  return c;
}

let ws: Awaited<ReturnType<typeof createWorkspaceWithRoles>>;
let admin: Client;

beforeAll(async () => {
  ws = await createWorkspaceWithRoles("Members", ["admin", "designer", "viewer"]);
  admin = await signIn(ws.users.admin.email);
});
afterAll(closeTestDb);

describe("the last admin", () => {
  it("cannot be demoted or removed; with a second admin both work", async () => {
    const self = ws.users.admin.id;
    const demote = await admin.request("PATCH", `/api/v1/members/${self}`, { json: { role: "viewer" } });
    expect(demote.status).toBe(409);
    expect(demote.json<{ error: { message: string } }>().error.message).toMatch(/at least one admin/);
    expect((await admin.request("DELETE", `/api/v1/members/${self}`)).status).toBe(409);

    const promote = await admin.request("PATCH", `/api/v1/members/${ws.users.designer.id}`, { json: { role: "admin" } });
    expect(promote.status).toBe(200);
    const designerAsAdmin = await signIn(ws.users.designer.email);
    expect((await designerAsAdmin.get("/api/v1/auth/session")).json()).toMatchObject({ role: "admin" });
    // back to designer: there are two admins, so this is allowed
    expect((await designerAsAdmin.request("PATCH", `/api/v1/members/${ws.users.designer.id}`, { json: { role: "designer" } })).status).toBe(200);
    expect((await designerAsAdmin.get("/api/v1/auth/session")).json()).toMatchObject({ role: "designer" });
  });

  it("refuses a role that is not one of the five, with a field message", async () => {
    const r = await admin.request("PATCH", `/api/v1/members/${ws.users.viewer.id}`, { json: { role: "owner" } });
    expect(r.status).toBe(400);
    expect(r.json<{ error: { issues: { path: string }[] } }>().error.issues[0].path).toBe("role");
  });
});

describe("changes take effect at once", () => {
  it("a removed member's session loses the workspace on its next request", async () => {
    const extra = await createWorkspaceWithRoles("Members extra", ["viewer"]);
    await addMembership(ws.workspaceId, extra.users.viewer.id, "reviewer");
    const member = await signIn(extra.users.viewer.email);
    await member.post("/api/v1/auth/workspace", { workspaceId: ws.workspaceId });
    expect((await member.get("/api/v1/auth/session")).json()).toMatchObject({ workspace: { id: ws.workspaceId }, role: "reviewer" });
    expect((await admin.request("DELETE", `/api/v1/members/${extra.users.viewer.id}`)).status).toBe(204);
    // falls back to the workspace the user still belongs to
    expect((await member.get("/api/v1/auth/session")).json()).toMatchObject({ workspace: { id: extra.workspaceId }, role: "viewer" });
  });
});

describe("development inbox", () => {
  it("shows an admin the invitation they sent, without its link, and another workspace's admin nothing of it", async () => {
    const invitee = uniqueEmail("inbox-invitee");
    expect((await admin.post("/api/v1/invites", { email: invitee, role: "viewer" })).status).toBe(201);
    const mail = await waitForMail(invitee);
    const own = await admin.get("/dev/inbox");
    expect(own.status).toBe(200);
    expect(own.text).toContain(invitee);
    expect(own.text).not.toContain("/invite#token=");
    expect(own.text).toContain("link withheld");
    const other = await createWorkspaceWithRoles("Members other", ["admin"]);
    const otherAdmin = await signIn(other.users.admin.email);
    const theirs = await otherAdmin.get("/dev/inbox");
    expect(theirs.status).toBe(200);
    expect(theirs.text).not.toContain(invitee);
    expect(theirs.text).not.toContain(mail.subject);
  });
});
