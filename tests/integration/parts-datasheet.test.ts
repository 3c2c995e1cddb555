// Datasheet upload and download: size limit (413), content check (415), the
// stored object and row, download by the same workspace only (404 elsewhere).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import { signedInClient } from "./support/projects";
import { createPart, getRaw, mosfetBody, pngBytes, tinyPdf, uploadDatasheet } from "./support/parts";
import type { Client } from "./support/http";
import { MAX_DATASHEET_BYTES } from "@/lib/limits";

let wsA: string;
let designer: Client;
let viewer: Client;
let adminB: Client;
let partId: string;

beforeAll(async () => {
  const a = await createWorkspaceWithRoles("Sheets A", ["designer", "viewer"]);
  const b = await createWorkspaceWithRoles("Sheets B", ["admin"]);
  wsA = a.workspaceId;
  designer = await signedInClient(a.users.designer.email);
  viewer = await signedInClient(a.users.viewer.email);
  adminB = await signedInClient(b.users.admin.email);
  partId = await createPart(designer, mosfetBody("SHEET-Q1"));
});

afterAll(closeTestDb);

const files = async () => testDb()("stored_file").where({ workspace_id: wsA });

describe("datasheet upload", () => {
  it("refuses a file over the limit with 413 and stores nothing", async () => {
    const big = new Uint8Array(MAX_DATASHEET_BYTES + 1);
    big.set(tinyPdf().subarray(0, 9));
    const r = await uploadDatasheet(designer, partId, big, "huge.pdf");
    expect(r.status).toBe(413);
    expect(await files()).toHaveLength(0);
  });

  it("refuses a PNG renamed .pdf (and declared application/pdf) with 415", async () => {
    const r = await uploadDatasheet(designer, partId, pngBytes(), "datasheet.pdf", "application/pdf");
    expect(r.status).toBe(415);
    expect(await files()).toHaveLength(0);
  });

  it("stores a real PDF, downloadable as an attachment by the same workspace", async () => {
    const pdf = tinyPdf();
    const up = await uploadDatasheet(designer, partId, pdf, "../../QN sheet.pdf");
    expect(up.status).toBe(201);
    const stored = await files();
    expect(stored).toHaveLength(1);
    expect(stored[0]).toMatchObject({ filename: "QN sheet.pdf", content_type: "application/pdf", kind: "datasheet" });
    expect(Number(stored[0].size_bytes)).toBe(pdf.byteLength);
    for (const c of [designer, viewer]) {
      const down = await getRaw(c, `/api/v1/parts/${partId}/datasheet`);
      expect(down.status).toBe(200);
      expect(down.headers.get("content-type")).toBe("application/pdf");
      expect(down.headers.get("content-disposition")).toMatch(/^attachment; filename="QN sheet.pdf"/);
      expect(Buffer.from(down.bytes).equals(Buffer.from(pdf))).toBe(true);
    }
  });

  it("answers 404 to another workspace and refuses a viewer's upload", async () => {
    expect((await getRaw(adminB, `/api/v1/parts/${partId}/datasheet`)).status).toBe(404);
    expect((await uploadDatasheet(adminB, partId, tinyPdf(), "x.pdf")).status).toBe(404);
    expect((await uploadDatasheet(viewer, partId, tinyPdf(), "x.pdf")).status).toBe(403);
  });

  it("replaces the datasheet: one row remains, the new bytes are served", async () => {
    const second = tinyPdf("second revision");
    expect((await uploadDatasheet(designer, partId, second, "rev2.pdf")).status).toBe(201);
    const stored = await files();
    expect(stored).toHaveLength(1);
    expect(stored[0].filename).toBe("rev2.pdf");
    const down = await getRaw(designer, `/api/v1/parts/${partId}/datasheet`);
    expect(Buffer.from(down.bytes).equals(Buffer.from(second))).toBe(true);
  });

  it("deleting the part removes its datasheet row", async () => {
    expect((await designer.request("DELETE", `/api/v1/parts/${partId}`)).status).toBe(204);
    expect(await files()).toHaveLength(0);
  });
});
