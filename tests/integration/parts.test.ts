// Parts library: the list query (search, kind, parameter range incl. hFE at
// a current, sort, pages), create with unit strings, field-named 400s, and
// workspace isolation (another workspace's part is 404).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles } from "./support/db";
import { signedInClient } from "./support/projects";
import { createPart, mosfetBody } from "./support/parts";
import type { Client } from "./support/http";
import { listPartsByWorkspace } from "@/db/queries/parts";
import { upsertPartsByMpn } from "@/db/queries/partsBulk";
import { validatePartDraft, type PartValues } from "@/lib/parts/values";
import { partListQuerySchema } from "@/lib/parts/schema";
import { getDb } from "@/db/knex";

let wsA: string;
let designerA: Client;
let viewerA: Client;
let adminB: Client;

function part(draft: Parameters<typeof validatePartDraft>[0]): PartValues {
  const r = validatePartDraft(draft);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.value;
}

const mosfet = (mpn: string, qg: string, rds: string, maker = "Alpha Devices") =>
  part({ kind: "mosfet", manufacturer: maker, mpn, params: { qg, qgs: "5 nC", qgd: "4 nC", vth: "2 V", vpl: "4 V", rds25: rds, rthJA: "50 K/W" }, tolerance: {} });
const bjt = (mpn: string, hfe: string) => part({ kind: "bjt", manufacturer: "Beta Works", mpn, params: { polarity: "npn", hfe, icMax: "3 A", pMax: "1 W", rthJA: "200 K/W" }, tolerance: {} });

beforeAll(async () => {
  const a = await createWorkspaceWithRoles("Parts A", ["designer", "viewer"]);
  const b = await createWorkspaceWithRoles("Parts B", ["admin"]);
  wsA = a.workspaceId;
  designerA = await signedInClient(a.users.designer.email);
  viewerA = await signedInClient(a.users.viewer.email);
  adminB = await signedInClient(b.users.admin.email);
  const rows: PartValues[] = [];
  for (let i = 0; i < 12; i++) rows.push(mosfet(`QF-${String(i).padStart(2, "0")}`, `${10 + 5 * i} nC`, `${2 + i} mΩ`, i % 3 === 0 ? "Gamma Fets" : "Alpha Devices"));
  rows.push(bjt("BJ-HC", "10 mA: 300; 1 A: 260; 3 A: 150")); // high current: hFE(1 A) = 260
  rows.push(bjt("BJ-SS", "1 mA: 120; 150 mA: 130; 500 mA: 35; 1 A: 15")); // small signal: collapsed by 1 A
  rows.push(bjt("BJ-SHORT", "1 mA: 200; 0.5 A: 180")); // no point at or beyond 1 A: unknown there
  await upsertPartsByMpn({ workspaceId: wsA, userId: a.users.designer.id, rows });
});

afterAll(async () => {
  await getDb().destroy();
  (globalThis as { heatsplitDb?: unknown }).heatsplitDb = undefined;
  await closeTestDb();
});

const list = (q: Record<string, string>) => listPartsByWorkspace({ workspaceId: wsA, filter: partListQuerySchema.parse(q) });

describe("listPartsByWorkspace", () => {
  it("searches part number, maker and text, and filters by kind", async () => {
    expect((await list({ q: "gamma" })).items.map((p) => p.mpn)).toEqual(["QF-00", "QF-03", "QF-06", "QF-09"]);
    expect((await list({ kind: "bjt" })).total).toBe(3);
    expect((await list({ q: "QF-1", kind: "mosfet" })).items.map((p) => p.mpn)).toEqual(["QF-10", "QF-11"]);
    expect((await list({ q: "%" })).total).toBe(0); // LIKE wildcards are literal
  });

  it("filters by a parameter range given with units", async () => {
    // Qg = 10 + 5i nC: 20..40 nC -> i = 2..6
    expect((await list({ param: "qg", min: "20 nC", max: "0.04 µC" })).items.map((p) => p.mpn)).toEqual(["QF-02", "QF-03", "QF-04", "QF-05", "QF-06"]);
    // Rds(on) = 2 + i mΩ: below 4 mΩ -> i = 0..2
    expect((await list({ param: "rds25", max: "4 mΩ" })).total).toBe(3);
  });

  it("filters by hFE interpolated at a collector current", async () => {
    expect((await list({ param: "hfe", min: "100", ic: "1 A" })).items.map((p) => p.mpn)).toEqual(["BJ-HC"]);
    // at 100 mA all three still have gain; log-Ic interpolation between the neighbouring points
    expect((await list({ param: "hfe", min: "100", ic: "100 mA" })).items.map((p) => p.mpn)).toEqual(["BJ-HC", "BJ-SHORT", "BJ-SS"]);
  });

  it("refuses a bound of the wrong dimension, naming the field", () => {
    const r = partListQuerySchema.safeParse({ param: "qg", min: "20 V" });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path).toEqual(["min"]);
  });

  it("sorts (also by the filtered parameter) and pages", async () => {
    const byQg = await list({ kind: "mosfet", param: "qg", sort: "param", dir: "desc", pageSize: "5" });
    expect(byQg.items.map((p) => p.mpn)).toEqual(["QF-11", "QF-10", "QF-09", "QF-08", "QF-07"]);
    expect(byQg.pageCount).toBe(3);
    const p3 = await list({ kind: "mosfet", sort: "mpn", pageSize: "5", page: "3" });
    expect(p3.items.map((p) => p.mpn)).toEqual(["QF-10", "QF-11"]);
    const beyond = await list({ kind: "mosfet", pageSize: "5", page: "99" });
    expect(beyond.page).toBe(3);
    const makers = (await list({ kind: "mosfet", sort: "manufacturer", dir: "desc", pageSize: "100" })).items.map((p) => p.manufacturer);
    expect(makers.slice(0, 4)).toEqual(["Gamma Fets", "Gamma Fets", "Gamma Fets", "Gamma Fets"]);
  });
});

describe("POST/GET/PATCH/DELETE /api/v1/parts", () => {
  it("creates a MOSFET from unit strings and stores SI numbers", async () => {
    const r = await designerA.post("/api/v1/parts", mosfetBody("API-Q1", { params: { ...(mosfetBody("x").params as object), qg: "0.047 µC", rds25: "12 mohm" } }));
    expect(r.status).toBe(201);
    const p = r.json<{ part: PartValues & { id: string } }>().part;
    expect(p.params.qg).toBe(4.7e-8);
    expect(p.params.rds25).toBe(0.012);
    expect(p.unitCost).toBe(0.42);
    expect(p.tolerance).toEqual({ qg: 0.1 });
    expect(p.params).not.toHaveProperty("rgInt"); // model defaults are not stored as datasheet figures
    const listed = await designerA.get("/api/v1/parts?q=API-Q1");
    expect(listed.json<{ items: { id: string }[] }>().items.map((x) => x.id)).toEqual([p.id]);
  });

  it("answers a wrong dimension with 400 naming the field", async () => {
    const r = await designerA.post("/api/v1/parts", mosfetBody("API-BAD", { params: { ...(mosfetBody("x").params as object), qg: "47 V" } }));
    expect(r.status).toBe(400);
    const issues = r.json<{ error: { issues: { path: string; message: string }[] } }>().error.issues;
    expect(issues).toContainEqual({ path: "params.qg", message: 'expected a charge (e.g. "47 nC"), got "47 V"' });
  });

  it("refuses a duplicate part number with 409", async () => {
    await createPart(designerA, mosfetBody("API-DUP"));
    expect((await designerA.post("/api/v1/parts", mosfetBody("API-DUP"))).status).toBe(409);
  });

  it("patches, and checks the whole record again", async () => {
    const id = await createPart(designerA, mosfetBody("API-PATCH"));
    const ok = await designerA.request("PATCH", `/api/v1/parts/${id}`, { json: { description: "edited", unitCost: "1.10" } });
    expect(ok.status).toBe(200);
    expect(ok.json<{ part: PartValues }>().part).toMatchObject({ description: "edited", unitCost: 1.1, params: { qg: 4.7e-8 } });
    const bad = await designerA.request("PATCH", `/api/v1/parts/${id}`, { json: { params: { qg: "47 nC" } } });
    expect(bad.status).toBe(400); // Qgs, Qgd, ... missing once params are replaced
    expect(bad.json<{ error: { issues: { path: string }[] } }>().error.issues.map((i) => i.path)).toContain("params.qgs");
  });

  it("lets a viewer read but not write", async () => {
    const id = await createPart(designerA, mosfetBody("API-VIEW"));
    expect((await viewerA.get(`/api/v1/parts/${id}`)).status).toBe(200);
    expect((await viewerA.post("/api/v1/parts", mosfetBody("API-VIEW2"))).status).toBe(403);
    expect((await viewerA.request("DELETE", `/api/v1/parts/${id}`)).status).toBe(403);
  });

  it("answers 404 for another workspace's part, on every method", async () => {
    const id = await createPart(designerA, mosfetBody("API-ISO"));
    expect((await adminB.get(`/api/v1/parts/${id}`)).status).toBe(404);
    expect((await adminB.request("PATCH", `/api/v1/parts/${id}`, { json: { description: "x" } })).status).toBe(404);
    expect((await adminB.request("DELETE", `/api/v1/parts/${id}`)).status).toBe(404);
    expect((await adminB.get("/api/v1/parts?q=API-ISO")).json<{ total: number }>().total).toBe(0);
    expect((await adminB.get(`/parts/${id}`)).status).toBe(404);
    expect((await designerA.request("DELETE", `/api/v1/parts/${id}`)).status).toBe(204);
    expect((await designerA.get(`/api/v1/parts/${id}`)).status).toBe(404);
  });
});
