// Projects and design options on the real database, through HTTP: list
// queries, validation with field paths (and nothing written), numbered
// revisions, the save conflict, duplication, workspace isolation.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import type { Client } from "./support/http";
import { createOption, createProject, createProjectWithOption, projectBody, signedInClient, templateInput } from "./support/projects";

type Issue = { path: string; message: string };
const issuesOf = (r: { json: <T>() => T }) => r.json<{ error: { code: string; issues: Issue[] } }>().error.issues;

let designer: Client;
let viewer: Client;
let outsider: Client;
let workspaceId: string;

beforeAll(async () => {
  const a = await createWorkspaceWithRoles("projects", ["designer", "viewer"]);
  const b = await createWorkspaceWithRoles("projects-other", ["admin"]);
  workspaceId = a.workspaceId;
  designer = await signedInClient(a.users.designer.email);
  viewer = await signedInClient(a.users.viewer.email);
  outsider = await signedInClient(b.users.admin.email);
});
afterAll(closeTestDb);

describe("project list: server-side sort, filter, search, pagination", () => {
  const names = ["Alder flyback", "birch buck", "Cedar LLC", "Dogwood flyback", "Elm boost"];
  beforeAll(async () => {
    const topo = ["flyback", "buck", "llc", "flyback", "boost"];
    const status = ["concept", "design", "design", "review", "released"];
    for (let i = 0; i < names.length; i++) await createProject(designer, { name: names[i], topology: topo[i], status: status[i], notes: i === 2 ? "resonant tank idea" : "" });
  });
  const list = async (q: string) => {
    const r = await viewer.get(`/api/v1/projects${q}`);
    expect(r.status).toBe(200);
    return r.json<{ items: { name: string; status: string; topology: string }[]; total: number; pageCount: number }>();
  };

  it("sorts by name in both directions, ignoring case", async () => {
    expect((await list("?sort=name&dir=asc&pageSize=100")).items.map((p) => p.name)).toEqual(names);
    expect((await list("?sort=name&dir=desc&pageSize=100")).items.map((p) => p.name)).toEqual([...names].reverse());
  });

  it("filters by status and by topology, and searches name and notes", async () => {
    expect((await list("?status=design&sort=name")).items.map((p) => p.name)).toEqual(["birch buck", "Cedar LLC"]);
    expect((await list("?topology=flyback&sort=name")).items.map((p) => p.name)).toEqual(["Alder flyback", "Dogwood flyback"]);
    expect((await list("?q=FLYBACK&status=review")).items.map((p) => p.name)).toEqual(["Dogwood flyback"]);
    expect((await list("?q=resonant")).items.map((p) => p.name)).toEqual(["Cedar LLC"]);
    expect((await list("?q=50%25")).total).toBe(0); // a literal %, not a wildcard
  });

  it("pages with a total and a page count", async () => {
    const p2 = await list("?sort=name&pageSize=2&page=2");
    expect(p2.items.map((p) => p.name)).toEqual(["Cedar LLC", "Dogwood flyback"]);
    expect(p2.total).toBe(5);
    expect(p2.pageCount).toBe(3);
    expect((await list("?sort=name&pageSize=2&page=9")).items).toEqual([]);
  });

  it("refuses a bad query with 400 naming the parameter", async () => {
    const r = await viewer.get("/api/v1/projects?pageSize=1000&sort=colour");
    expect(r.status).toBe(400);
    expect(issuesOf(r).map((i) => i.path).sort()).toEqual(["pageSize", "sort"]);
  });

  it("never lists another workspace's projects", async () => {
    const r = await outsider.get("/api/v1/projects?pageSize=100");
    expect(r.json<{ items: { name: string }[] }>().items.map((p) => p.name)).not.toContain("Alder flyback");
  });
});

describe("project create and edit", () => {
  const count = async () => Number((await testDb()("project").where({ workspace_id: workspaceId }).count<{ n: string }[]>({ n: "*" }))[0].n);

  it("refuses bad input with 400 and field paths, and creates nothing", async () => {
    const before = await count();
    const r = await designer.post("/api/v1/projects", projectBody({ vinNom: 30, topology: "cuk", outputs: [{ label: "Main", voltage: "12 A", current: 20 }], fsw: "250 kHz" }));
    expect(r.status).toBe(400);
    expect(issuesOf(r).map((i) => i.path).sort()).toEqual(["outputs.0.voltage", "topology"]);
    const order = await designer.post("/api/v1/projects", projectBody({ vinNom: 30 }));
    expect(issuesOf(order).map((i) => i.path)).toEqual(["vinNom"]);
    expect(await count()).toBe(before);
  });

  it("stores unit strings as SI and edits with PATCH; a bad edit changes nothing", async () => {
    const id = await createProject(designer, { name: "Edit me" });
    const got = (await designer.get(`/api/v1/projects/${id}`)).json<{ project: { fsw: number; efficiencyTarget: number } }>().project;
    expect(got.fsw).toBe(250_000);
    expect(got.efficiencyTarget).toBeCloseTo(0.92, 12);

    const bad = await designer.request("PATCH", `/api/v1/projects/${id}`, { json: { vinMax: 40, name: "" } });
    expect(bad.status).toBe(400);
    expect(issuesOf(bad).map((i) => i.path)).toEqual(["name"]);
    const order = await designer.request("PATCH", `/api/v1/projects/${id}`, { json: { vinMax: 40 } });
    expect(issuesOf(order).map((i) => i.path)).toEqual(["vinMax"]);
    const after = (await designer.get(`/api/v1/projects/${id}`)).json<{ project: { name: string; vinMax: number } }>().project;
    expect(after).toMatchObject({ name: "Edit me", vinMax: 75 });

    const ok = await designer.request("PATCH", `/api/v1/projects/${id}`, { json: { name: "Edited", status: "review" } });
    expect(ok.status).toBe(200);
    expect(ok.json<{ project: { name: string; status: string } }>().project).toMatchObject({ name: "Edited", status: "review" });
  });

  it("refuses a viewer's write with 403", async () => {
    expect((await viewer.post("/api/v1/projects", projectBody())).status).toBe(403);
  });
});

describe("design options and revisions", () => {
  let projectId: string;
  let optionId: string;
  const save = (baseRevision: number, document: unknown, note = "") => designer.post(`/api/v1/options/${optionId}/revisions`, { baseRevision, document, partRefs: {}, note });

  beforeAll(async () => {
    ({ projectId, optionId } = await createProjectWithOption(designer));
  });

  it("numbers revisions 1, 2, 3 and keeps unit strings as typed", async () => {
    const doc2 = templateInput();
    doc2.positions[0].gate.rTurnOn = "6.8 Ω";
    expect((await save(1, doc2, "6.8 Ω gate")).status).toBe(201);
    const doc3 = structuredClone(doc2);
    doc3.positions[0].gate.rTurnOn = "4.7 Ω";
    const r3 = await save(2, doc3);
    expect(r3.status).toBe(201);
    expect(r3.json<{ revision: { revision: number } }>().revision.revision).toBe(3);
    const list = (await viewer.get(`/api/v1/options/${optionId}/revisions`)).json<{ items: { revision: number; note: string }[] }>();
    expect(list.items.map((i) => i.revision)).toEqual([3, 2, 1]);
    const rev2 = (await viewer.get(`/api/v1/options/${optionId}/revisions/2`)).json<{ revision: { document: Record<string, any>; note: string } }>().revision;
    expect(rev2.document.positions[0].gate.rTurnOn).toBe("6.8 Ω");
    expect(rev2.note).toBe("6.8 Ω gate");
    expect((await viewer.get(`/api/v1/options/${optionId}/revisions/9`)).status).toBe(404);
  });

  it("accepts exactly one of two concurrent saves on the same base revision", async () => {
    const a = templateInput();
    a.positions[0].gate.rTurnOn = "3.3 Ω";
    const b = templateInput();
    b.positions[0].gate.rTurnOn = "10 Ω";
    const results = await Promise.all([save(3, a), save(3, b)]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(results.find((r) => r.status === 409)!.json<{ error: { code: string } }>().error.code).toBe("conflict");
    const latest = (await viewer.get(`/api/v1/options/${optionId}`)).json<{ option: { latestRevision: number }; revision: { document: Record<string, any> } }>();
    expect(latest.option.latestRevision).toBe(4);
    const winner = results[0].status === 201 ? "3.3 Ω" : "10 Ω";
    expect(latest.revision.document.positions[0].gate.rTurnOn).toBe(winner);
    expect((await save(1, a)).status).toBe(409); // a stale base is refused too
  });

  it("validates the document with the model: a bad unit is a 400 naming the path", async () => {
    const bad = templateInput();
    bad.positions[0].gate.rTurnOn = "6.8 nC";
    const r = await save(4, bad);
    expect(r.status).toBe(400);
    expect(issuesOf(r).map((i) => i.path)).toContain("document.positions.0.gate.rTurnOn");
    const refs = await designer.post(`/api/v1/options/${optionId}/revisions`, { baseRevision: 4, document: templateInput(), partRefs: { "positions.0.mosfet": "prt_nope" } });
    expect(issuesOf(refs).map((i) => i.path)).toEqual(["partRefs.positions.0.mosfet"]);
    const created = await designer.post(`/api/v1/projects/${projectId}/options`, { name: "Bad", document: bad });
    expect(issuesOf(created).map((i) => i.path)).toContain("document.positions.0.gate.rTurnOn");
    expect((await viewer.get(`/api/v1/options/${optionId}`)).json<{ option: { latestRevision: number } }>().option.latestRevision).toBe(4);
  });

  it("duplicates the latest document into a new option at revision 1", async () => {
    const source = (await viewer.get(`/api/v1/options/${optionId}`)).json<{ revision: { document: unknown } }>().revision;
    const r = await designer.post(`/api/v1/options/${optionId}/duplicate`, {});
    expect(r.status).toBe(201);
    const copy = r.json<{ option: { id: string; name: string; latestRevision: number; projectId: string } }>().option;
    expect(copy).toMatchObject({ latestRevision: 1, projectId, name: "Option A (copy)" });
    const copied = (await viewer.get(`/api/v1/options/${copy.id}`)).json<{ revision: { document: unknown } }>().revision;
    expect(copied.document).toEqual(source.document);
    const options = (await viewer.get(`/api/v1/projects/${projectId}/options`)).json<{ items: { id: string }[] }>().items;
    expect(options.map((o) => o.id).sort()).toEqual([copy.id, optionId].sort());
  });

  it("answers another workspace's project and option with 404", async () => {
    const paths = [`/api/v1/projects/${projectId}`, `/api/v1/projects/${projectId}/options`, `/api/v1/options/${optionId}`, `/api/v1/options/${optionId}/revisions`, `/api/v1/options/${optionId}/revisions/1`];
    for (const p of paths) expect((await outsider.get(p)).status, p).toBe(404);
    expect((await outsider.post(`/api/v1/options/${optionId}/revisions`, { baseRevision: 4, document: templateInput() })).status).toBe(404);
    expect((await outsider.post(`/api/v1/options/${optionId}/duplicate`, {})).status).toBe(404);
    expect((await outsider.request("PATCH", `/api/v1/projects/${projectId}`, { json: { name: "Mine now" } })).status).toBe(404);
    expect((await outsider.post(`/api/v1/projects/${projectId}/options`, { name: "X", template: "direct" })).status).toBe(404);
    expect((await outsider.get(`/projects/${projectId}`)).status).toBe(404);
  });

  it("renames an option; a viewer may not save a revision", async () => {
    const other = await createOption(designer, projectId, "Before");
    const r = await designer.request("PATCH", `/api/v1/options/${other}`, { json: { name: "After" } });
    expect(r.json<{ option: { name: string } }>().option.name).toBe("After");
    expect((await viewer.post(`/api/v1/options/${other}/revisions`, { baseRevision: 1, document: templateInput() })).status).toBe(403);
  });
});
