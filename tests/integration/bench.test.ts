// Bench correlation over HTTP: refused files change nothing and say which
// row is wrong; a good file is stored (rows + original in S3); the API
// compares each reading with the model; a reviewer's accepted fit becomes a
// new revision.
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";
import { BENCH_HEADER, readingsAround, templateDesign, toCsv, uploadBench } from "./support/bench";
import type { Client } from "./support/http";
import { correlateBench } from "@/models/fitDesign";
import { parseDesign } from "@/models/input/schema";

let wsA: string;
let designer: Client, reviewer: Client, viewer: Client, adminB: Client;
let optionId: string;
let runId: string;
const design = templateDesign();
// Controller readings 8 K hotter than the model (outside the ±5 K band), Q1 1 K hotter (inside).
const readings = readingsAround(design, { controller: 8, Q1: 1 });

beforeAll(async () => {
  const a = await createWorkspaceWithRoles("Bench A", ["designer", "reviewer", "viewer"]);
  const b = await createWorkspaceWithRoles("Bench B", ["admin"]);
  wsA = a.workspaceId;
  [designer, reviewer, viewer, adminB] = await Promise.all([
    signedInClient(a.users.designer.email), signedInClient(a.users.reviewer.email), signedInClient(a.users.viewer.email), signedInClient(b.users.admin.email),
  ]);
  optionId = (await createProjectWithOption(designer)).optionId;
});

afterAll(closeTestDb);

const counts = async () => ({
  runs: Number((await testDb()("bench_run").where({ workspace_id: wsA }).count<{ n: string }>({ n: "*" }).first())?.n),
  files: Number((await testDb()("stored_file").where({ workspace_id: wsA, kind: "bench" }).count<{ n: string }>({ n: "*" }).first())?.n),
});

describe("bench upload: refusals", () => {
  it("a wrong column is refused with the column named, and nothing is written", async () => {
    const csv = toCsv(readings).replace(BENCH_HEADER, BENCH_HEADER.replace("temperature", "temp"));
    const r = await uploadBench(designer, optionId, csv);
    expect(r.status).toBe(400);
    const messages = r.json.error.issues.map((i: { message: string }) => i.message);
    expect(messages).toContain('unknown column "temp" (columns: part_id, corner_id, method, measured_at, temperature, ambient, note)');
    expect(messages).toContain('missing column "temperature"');
    expect(await counts()).toEqual({ runs: 0, files: 0 });
  });

  it("a wrong unit, an unknown part and an unknown corner are each reported on their row; nothing is written", async () => {
    const lines = toCsv(readings).split("\n");
    lines[2] = lines[2].replace(/,[\d.]+ °C,25 °C/, ",185 °F,25 °C");
    lines[3] = lines[3].replace(/^controller/, "Q9");
    lines[5] = lines[5].replace(",vmax,", ",hot,");
    const r = await uploadBench(designer, optionId, lines.join("\n"));
    expect(r.status).toBe(400);
    const byPath = Object.fromEntries(r.json.error.issues.map((i: { path: string; message: string }) => [i.path, i.message]));
    expect(byPath["rows.3.temperature"]).toMatch(/^row 3: temperature must be a number with the unit °C/);
    expect(byPath["rows.4.part_id"]).toMatch(/^row 4: no part "Q9"/);
    expect(byPath["rows.6.corner_id"]).toMatch(/^row 6: no corner "hot"/);
    expect(Object.keys(byPath)).toHaveLength(3);
    expect(await counts()).toEqual({ runs: 0, files: 0 });
  });

  it("a case reading of a part with only RθJA is refused; a viewer may not upload; another workspace gets 404", async () => {
    const csv = [BENCH_HEADER, "controller,vnom,ir,case,70 °C,25 °C,"].join("\n");
    const r = await uploadBench(designer, optionId, csv);
    expect(r.status).toBe(400);
    expect(r.json.error.issues[0]).toMatchObject({ path: "rows.2.measured_at" });
    expect((await uploadBench(viewer, optionId, toCsv(readings))).status).toBe(403);
    expect((await uploadBench(adminB, optionId, toCsv(readings))).status).toBe(404);
    expect(await counts()).toEqual({ runs: 0, files: 0 });
  });
});

describe("bench upload: a good file", () => {
  it("is stored: one run, every reading, the original bytes in object storage", async () => {
    const csv = toCsv(readings);
    const r = await uploadBench(designer, optionId, csv, { revision: 1, filename: "bench day 1.csv" });
    expect(r.status).toBe(201);
    runId = r.json.run.id;
    expect(r.json.run).toMatchObject({ revision: 1, rowCount: readings.length });
    expect(await counts()).toEqual({ runs: 1, files: 1 });
    const rows = await testDb()("bench_reading").where({ run_id: runId }).orderBy("row_number");
    expect(rows.map((x) => [x.row_number, x.part_id, x.corner_id, x.measured_at, x.temperature])).toEqual(readings.map((x) => [x.row, x.partId, x.cornerId, x.surface, x.temperature]));
    expect(rows[3].note).toBe('tab, "K" type');
    const file = await viewer.get(`/api/v1/options/${optionId}/bench/${runId}/file`);
    expect(file.status).toBe(200);
    // the same rows and values as uploaded, every cell quoted by the shared CSV writer
    expect(Papa.parse(file.text, { skipEmptyLines: true }).data).toEqual(Papa.parse(csv, { skipEmptyLines: true }).data);
    expect(file.text.split("\r\n")[0]).toBe(BENCH_HEADER.split(",").map((c) => `"${c}"`).join(","));
    expect((await adminB.get(`/api/v1/options/${optionId}/bench/${runId}/file`)).status).toBe(404);
  });

  it("compares each reading with the model at that corner and the bench ambient, and flags the part outside the band", async () => {
    const r = await viewer.get(`/api/v1/options/${optionId}/bench/${runId}`);
    expect(r.status).toBe(200);
    const { correlation } = r.json<{ correlation: any }>();
    const expected = correlateBench(design, readings);
    expect(correlation.bandK).toBe(5);
    const controller = correlation.parts.find((p: any) => p.part.id === "controller");
    const q1 = correlation.parts.find((p: any) => p.part.id === "Q1");
    controller.readings.forEach((x: any, i: number) => {
      expect(x.predicted).toBeCloseTo(expected.parts[0].readings[i].predicted!, 6);
      expect(Math.abs(x.difference - 8)).toBeLessThan(0.06); // measured rounded to 0.1 K
      expect(x.outsideBand).toBe(true);
    });
    expect(controller.outsideBand).toBe(true);
    expect(q1.outsideBand).toBe(false);
    expect(q1.readings.every((x: any) => Math.abs(x.difference - 1) < 0.06)).toBe(true);
    // Hotter than modelled: the fitted own path is above the design's, with one residual per reading.
    expect(controller.fit.rth).toBeGreaterThan(controller.part.theta);
    expect(controller.fit.residuals).toHaveLength(3);
    expect(controller.proposal).toMatchObject({ path: "controller.rthJA" });
    expect((await adminB.get(`/api/v1/options/${optionId}/bench/${runId}`)).status).toBe(404);
  });
});

describe("accepting the fit", () => {
  it("is for reviewers: a designer is refused, a reviewer's accept writes revision 2 with the fitted RθJA", async () => {
    expect((await designer.post(`/api/v1/options/${optionId}/bench/${runId}/accept`, { parts: ["controller"] })).status).toBe(403);
    const corr = (await reviewer.get(`/api/v1/options/${optionId}/bench/${runId}`)).json<{ correlation: any }>().correlation;
    const proposal = corr.parts.find((p: any) => p.part.id === "controller").proposal;
    const r = await reviewer.post(`/api/v1/options/${optionId}/bench/${runId}/accept`, { parts: ["controller"] });
    expect(r.status).toBe(201);
    expect(r.json<any>().revision.revision).toBe(2);
    const rev = (await viewer.get(`/api/v1/options/${optionId}/revisions/2`)).json<any>().revision;
    expect(rev.document.controller.rthJA).toBe(`${Number(proposal.value.toPrecision(4))} K/W`);
    expect(rev.note).toMatch(/^Bench fit from run /);
    const d2 = parseDesign(rev.document);
    expect(d2.ok && d2.design.controller.rthJA).toBeCloseTo(proposal.value, 1);
    // Revision 1 is untouched.
    const rev1 = (await viewer.get(`/api/v1/options/${optionId}/revisions/1`)).json<any>().revision;
    expect(rev1.document.controller.rthJA).toBe("95 K/W");
  });

  it("refuses a second accept from the same run (the option moved on) and an unknown part", async () => {
    expect((await reviewer.post(`/api/v1/options/${optionId}/bench/${runId}/accept`, { parts: ["controller"] })).status).toBe(409);
    const bad = await reviewer.post(`/api/v1/options/${optionId}/bench/${runId}/accept`, { parts: ["Q7"] });
    expect(bad.status).toBe(400);
    expect(bad.json<any>().error.issues[0].message).toMatch(/no fit for "Q7"/);
  });
});
