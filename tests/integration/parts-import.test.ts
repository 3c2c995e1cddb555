// CSV import (preview, all-or-nothing commit, re-import updates by mpn) and
// the export -> import round trip.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import { signedInClient } from "./support/projects";
import { csvRequest, getRaw, partsCsv } from "./support/parts";
import type { Client } from "./support/http";

let wsA: string;
let designer: Client;
let viewer: Client;

const count = async (ws: string) => Number((await testDb()("part").where({ workspace_id: ws }).count<{ n: string }[]>({ n: "*" }))[0].n);
const snapshot = async (ws: string) => testDb()("part").where({ workspace_id: ws }).orderBy("mpn").select("mpn", "kind", "manufacturer", "description", "params", "tolerance", "unit_cost");

beforeAll(async () => {
  const a = await createWorkspaceWithRoles("Import A", ["designer", "viewer"]);
  wsA = a.workspaceId;
  designer = await signedInClient(a.users.designer.email);
  viewer = await signedInClient(a.users.viewer.email);
});

afterAll(closeTestDb);

describe("CSV import", () => {
  it("a 500-row file with ONE bad row imports nothing and names the row and column", async () => {
    const before = await count(wsA);
    // data row i sits on spreadsheet row i + 2 (header is row 1)
    const csv = partsCsv(500, "BAD", (i, cells) => {
      if (i === 318) cells[5] = "33 V"; // param.qg of a MOSFET row, wrong dimension
    });
    const preview = await csvRequest(designer, "/api/v1/parts/import/preview", csv);
    expect(preview.status).toBe(200);
    const p = preview.json();
    expect(p.total).toBe(500);
    expect(p.valid).toBe(499);
    expect(p.issues).toEqual([{ row: 320, column: "param.qg", message: 'expected a charge (e.g. "47 nC"), got "33 V"' }]);
    const commit = await csvRequest(designer, "/api/v1/parts/import/commit", csv);
    expect(commit.status).toBe(400);
    expect(commit.json().error.issues).toEqual([{ path: "row 320 · param.qg", message: 'expected a charge (e.g. "47 nC"), got "33 V"' }]);
    expect(await count(wsA)).toBe(before);
  });

  it("a good 500-row file imports; importing it again updates instead of duplicating", async () => {
    const csv = partsCsv(500, "GOOD");
    const preview = (await csvRequest(designer, "/api/v1/parts/import/preview", csv)).json();
    expect(preview).toMatchObject({ total: 500, valid: 500, create: 500, update: 0, issues: [] });
    const first = await csvRequest(designer, "/api/v1/parts/import/commit", csv);
    expect(first.status).toBe(200);
    expect(first.json()).toEqual({ created: 500, updated: 0 });
    const n = await count(wsA);
    const edited = partsCsv(500, "GOOD", (i, cells) => {
      if (i === 4) cells[3] = "re-imported description";
    });
    expect((await csvRequest(designer, "/api/v1/parts/import/preview", edited)).json()).toMatchObject({ create: 0, update: 500 });
    const again = await csvRequest(designer, "/api/v1/parts/import/commit", edited);
    expect(again.json()).toEqual({ created: 0, updated: 500 });
    expect(await count(wsA)).toBe(n);
    const row = await testDb()("part").where({ workspace_id: wsA, mpn: "GOOD-0004" }).first();
    expect(row.description).toBe("re-imported description");
    expect(row.params.qg).toBe(2.4e-8); // "24 nC" stored in SI
  });

  it("lists a duplicate part number, an unknown column and a missing required figure", async () => {
    const csv = "kind,manufacturer,mpn,param.qg,param.bogus\nmosfet,X,D-1,10 nC,\nmosfet,X,D-1,10 nC,\n";
    const p = (await csvRequest(designer, "/api/v1/parts/import/preview", csv)).json();
    expect(p.issues).toContainEqual({ row: 1, column: "param.bogus", message: 'unknown column "param.bogus"' });
    expect(p.issues).toContainEqual({ row: 2, column: "param.qgs", message: "Qgs is required" });
    expect(p.issues.filter((i: { row: number }) => i.row === 3).length).toBeGreaterThan(0);
  });

  it("is refused to a viewer, and refuses a JSON body", async () => {
    expect((await csvRequest(viewer, "/api/v1/parts/import/commit", partsCsv(2, "VIEW"))).status).toBe(403);
    expect((await designer.post("/api/v1/parts/import/preview", { csv: "x" })).status).toBe(415);
  });
});

describe("CSV export", () => {
  it("exports a file that imports back to the same records", async () => {
    const exported = await getRaw(designer, "/api/v1/parts/export?q=GOOD");
    expect(exported.status).toBe(200);
    expect(exported.headers.get("content-type")).toContain("text/csv");
    expect(exported.headers.get("content-disposition")).toMatch(/^attachment; filename="heatsplit-parts-/);
    const csv = Buffer.from(exported.bytes).toString("utf8");
    expect(csv.split("\n").filter((l) => l.trim()).length).toBe(501);
    const before = await snapshot(wsA);
    const preview = (await csvRequest(designer, "/api/v1/parts/import/preview", csv)).json();
    expect(preview).toMatchObject({ total: 500, valid: 500, update: 500, issues: [] });
    expect((await csvRequest(designer, "/api/v1/parts/import/commit", csv)).json()).toEqual({ created: 0, updated: 500 });
    expect(await snapshot(wsA)).toEqual(before);
  });

  it("round-trips into an empty workspace too", async () => {
    const b = await createWorkspaceWithRoles("Import B", ["designer"]);
    const other = await signedInClient(b.users.designer.email);
    const csv = Buffer.from((await getRaw(designer, "/api/v1/parts/export?q=GOOD-00")).bytes).toString("utf8");
    expect((await csvRequest(other, "/api/v1/parts/import/commit", csv)).json()).toEqual({ created: 100, updated: 0 });
    const mine = (await snapshot(wsA)).filter((r) => r.mpn.startsWith("GOOD-00"));
    expect(await snapshot(b.workspaceId)).toEqual(mine);
  });
});
