// The review workflow end to end over HTTP: submit -> reject with a pinned
// comment -> revise (a new revision) -> approve -> the manager's choice, each
// step's e-mail read back from the development mailbox; a frozen revision
// refuses in-place edits (API 409, and the table itself); the activity log
// records every step in order and refuses UPDATE and DELETE; a change of the
// workspace derating policy moves the evaluated margin and is logged.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb, waitForMail, type TestUser } from "./support/db";
import { ORIGIN, type Client } from "./support/http";
import { createProjectWithOption, signedInClient, templateInput } from "./support/projects";

let users: Record<string, TestUser>;
const c: Record<string, Client> = {};
let projectId = "";
let optionId = "";

async function lastMailId(): Promise<number> {
  const row = await testDb()("dev_mailbox").max<{ max: string | null }>({ max: "id" }).first();
  return Number(row?.max ?? 0);
}

const reviewLink = (rev: number) => `${ORIGIN}/projects/${projectId}/options/${optionId}/review?revision=${rev}`;

beforeAll(async () => {
  const ws = await createWorkspaceWithRoles("Review", ["admin", "designer", "reviewer", "manager", "viewer"]);
  users = ws.users;
  for (const role of Object.keys(users)) c[role] = await signedInClient(users[role].email);
  ({ projectId, optionId } = await createProjectWithOption(c.designer));
});
afterAll(closeTestDb);

describe("submit, reject, revise, approve, choose", () => {
  it("submitting freezes revision 1 and e-mails the reviewers a link to it", async () => {
    const after = await lastMailId();
    const r = await c.designer.post(`/api/v1/options/${optionId}/review`, { note: "first look please" });
    expect(r.status, r.text).toBe(201);
    expect(r.json<{ review: { status: string; revision: number } }>().review).toMatchObject({ status: "submitted", revision: 1 });
    const mail = await waitForMail(users.reviewer.email, { after });
    expect(mail.subject).toContain("Review requested");
    expect(mail.text).toContain(reviewLink(1));
    const revs = await c.viewer.get(`/api/v1/options/${optionId}/revisions`);
    expect(revs.json<{ items: { revision: number; frozen: boolean }[] }>().items.find((i) => i.revision === 1)?.frozen).toBe(true);
    expect((await c.designer.post(`/api/v1/options/${optionId}/review`, { revision: 1 })).status).toBe(409);
  });

  it("a frozen revision refuses in-place edits: 409 from the API, an error from the table", async () => {
    const r = await c.designer.request("PATCH", `/api/v1/options/${optionId}/revisions/1`, { json: { note: "sneaky edit" } });
    expect(r.status, r.text).toBe(409);
    await expect(testDb()("option_revision").where({ option_id: optionId, revision: 1 }).update({ document: JSON.stringify({ name: "edited in place" }) })).rejects.toThrow(/frozen/);
    await expect(testDb()("option_revision").where({ option_id: optionId, revision: 1 }).update({ frozen: false })).rejects.toThrow(/frozen/);
    const rev = await c.viewer.get(`/api/v1/options/${optionId}/revisions/1`);
    expect(rev.json<{ revision: { note: string; frozen: boolean } }>().revision.frozen).toBe(true);
  });

  it("only a reviewer decides; a rejection needs a comment", async () => {
    expect((await c.designer.post(`/api/v1/options/${optionId}/review/decision`, { revision: 1, decision: "approved" })).status).toBe(403);
    expect((await c.manager.post(`/api/v1/options/${optionId}/review/decision`, { revision: 1, decision: "approved" })).status).toBe(403);
    const bare = await c.reviewer.post(`/api/v1/options/${optionId}/review/decision`, { revision: 1, decision: "rejected" });
    expect(bare.status).toBe(400);
  });

  it("the reviewer rejects with a comment pinned to a part and a figure; the designer is e-mailed", async () => {
    const after = await lastMailId();
    const comment = { body: "Q1 runs too close to its limit at high line.", targetPart: "Q1", targetFigure: "Q1 Tj at vin-max" };
    const r = await c.reviewer.post(`/api/v1/options/${optionId}/review/decision`, { revision: 1, decision: "rejected", comments: [comment] });
    expect(r.status, r.text).toBe(200);
    expect(r.json<{ review: { status: string; comments: unknown[] } }>().review).toMatchObject({ status: "rejected", comments: [comment] });
    const mail = await waitForMail(users.designer.email, { after });
    expect(mail.subject).toContain("Review rejected");
    expect(mail.text).toContain("[Q1, Q1 Tj at vin-max] Q1 runs too close");
    expect(mail.text).toContain(reviewLink(1));
    expect((await c.reviewer.post(`/api/v1/options/${optionId}/review/decision`, { revision: 1, decision: "approved" })).status).toBe(409);
  });

  it("the designer revises (revision 2, not frozen), submits it, and the reviewer approves", async () => {
    const doc = templateInput();
    doc.positions[0].gate.rTurnOn = "3.3 Ω";
    const saved = await c.designer.post(`/api/v1/options/${optionId}/revisions`, { baseRevision: 1, document: doc, partRefs: {}, note: "lower rTurnOn after review" });
    expect(saved.status, saved.text).toBe(201);
    expect(saved.json<{ revision: { revision: number } }>().revision.revision).toBe(2);
    const note = await c.designer.request("PATCH", `/api/v1/options/${optionId}/revisions/2`, { json: { note: "lower Q1 rTurnOn after review" } });
    expect(note.status, note.text).toBe(200);
    let after = await lastMailId();
    expect((await c.designer.post(`/api/v1/options/${optionId}/review`, {})).status).toBe(201);
    expect((await waitForMail(users.reviewer.email, { after })).text).toContain(reviewLink(2));
    after = await lastMailId();
    const r = await c.reviewer.post(`/api/v1/options/${optionId}/review/decision`, { revision: 2, decision: "approved" });
    expect(r.status, r.text).toBe(200);
    const mail = await waitForMail(users.designer.email, { after });
    expect(mail.subject).toContain("Review approved");
    expect(mail.text).toContain(reviewLink(2));
  });

  it("the manager's choice e-mails designers and reviewers", async () => {
    const after = await lastMailId();
    const r = await c.manager.post(`/api/v1/projects/${projectId}/choice`, { optionId, revision: 2, reason: "approved and cheapest" });
    expect(r.status, r.text).toBe(201);
    for (const who of ["designer", "reviewer"]) {
      const mail = await waitForMail(users[who].email, { after });
      expect(mail.subject).toContain("Option chosen");
      expect(mail.text).toContain("approved and cheapest");
      expect(mail.text).toContain(reviewLink(2));
    }
  });

  it("the activity log has every step in order, and the table refuses UPDATE and DELETE", async () => {
    const r = await c.viewer.get(`/api/v1/projects/${projectId}/activity`);
    expect(r.status).toBe(200);
    const items = r.json<{ items: { id: string; optionId: string | null; action: string; revision: number | null; actor: { id: string } | null }[] }>().items.filter((i) => i.optionId === optionId);
    expect(items.map((i) => `${i.action}@${i.revision}`)).toEqual([
      "revision.saved@1",
      "review.submitted@1",
      "review.rejected@1",
      "revision.saved@2",
      "revision.note_changed@2",
      "review.submitted@2",
      "review.approved@2",
      "option.chosen@2",
    ]);
    expect(items.map((i) => i.actor?.id)).toEqual([users.designer.id, users.designer.id, users.reviewer.id, users.designer.id, users.designer.id, users.designer.id, users.reviewer.id, users.manager.id]);
    const id = items[0].id;
    await expect(testDb()("activity_log").where({ id }).update({ action: "nothing happened" })).rejects.toThrow(/append-only/);
    await expect(testDb()("activity_log").where({ id }).delete()).rejects.toThrow(/append-only/);
    await expect(testDb().raw("truncate activity_log")).rejects.toThrow(/append-only/);
    const still = await testDb()("activity_log").where({ id }).first<{ action: string }>("action");
    expect(still.action).toBe("revision.saved");
  });
});

describe("workspace derating policy", () => {
  const policy = (mosfet: string) => ({
    tjMargin: { controller: "25 K", mosfet, bjt: "25 K", driverIc: "25 K", clamp: "25 K" },
    vgsMaxFraction: "80 %",
    minHeadroomAbovePlateau: "4 V",
  });
  const q1 = async () => {
    const r = await c.viewer.get(`/api/v1/options/${optionId}/budget`);
    expect(r.status, r.text).toBe(200);
    const part = r.json<{ evaluation: { parts: { id: string; junction: { margin: number; limit: number } | null }[] } }>().evaluation.parts.find((p) => p.id === "Q1");
    return part!.junction!;
  };

  it("only reviewers and admins set it; units are checked", async () => {
    expect((await c.designer.request("PUT", "/api/v1/derating", { json: policy("30 K") })).status).toBe(403);
    const bad = await c.reviewer.request("PUT", "/api/v1/derating", { json: policy("30 V") });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.json())).toContain("tjMargin.mosfet");
    const r = await c.viewer.get("/api/v1/derating");
    expect(r.json<{ source: string }>().source).toBe("model-defaults");
  });

  it("a stricter MOSFET margin lowers Q1's derated limit and margin by the same kelvins, and is logged", async () => {
    const before = await q1();
    const r = await c.reviewer.request("PUT", "/api/v1/derating", { json: policy("37 K") });
    expect(r.status, r.text).toBe(200);
    expect(r.json<{ policy: { tjMargin: { mosfet: number } }; source: string }>()).toMatchObject({ source: "workspace", policy: { tjMargin: { mosfet: 37 } } });
    const after = await q1();
    // The document says 25 K; the workspace policy (37 K) replaces it: 12 K less margin.
    expect(after.limit).toBeCloseTo(before.limit - 12, 9);
    expect(after.margin).toBeCloseTo(before.margin - 12, 9);
    const log = await c.viewer.get(`/api/v1/projects/${projectId}/activity`);
    const entry = log.json<{ items: { action: string; projectId: string | null; actor: { id: string } | null; detail: { before: unknown; after: { tjMargin: { mosfet: number } } } }[] }>().items.filter((i) => i.action === "derating.changed").pop();
    expect(entry).toMatchObject({ projectId: null, actor: { id: users.reviewer.id }, detail: { before: null, after: { tjMargin: { mosfet: 37 } } } });
  });
});
