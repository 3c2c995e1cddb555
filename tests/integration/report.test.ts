// Design-review report and budget export over HTTP: the PDF opens (pdf-parse)
// and carries the budget's figures as the API computes them; the CSV has a
// row for every figure, with the API's exact numbers.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { PDFParse } from "pdf-parse";
import { clearAddressThrottle, closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";
import { ORIGIN, type Client } from "./support/http";
import { formatSi } from "@/lib/format";
import { CAUTION_BENCH } from "@/lib/cautions";
import { LOSS_MECHANISMS } from "@/models/losses";
import type { Evaluation } from "@/models/evaluate";
import { BUDGET_CSV_HEADER } from "@/services/reports/csv";
import { groupWarnings } from "@/models/warningGroups";

let designer: Client, viewer: Client, adminB: Client;
let optionId: string;
let evaluation: Evaluation;

async function getBytes(client: Client, path: string): Promise<{ status: number; type: string | null; disposition: string | null; bytes: Uint8Array }> {
  const res = await fetch(new URL(path, ORIGIN), { headers: { cookie: client.cookieHeader() } });
  return { status: res.status, type: res.headers.get("content-type"), disposition: res.headers.get("content-disposition"), bytes: new Uint8Array(await res.arrayBuffer()) };
}

/** pdf.js gives U+00A0 back as a space and µ as μ: compare in one normal form. */
const norm = (s: string) => s.normalize("NFKC").replace(/\u00a0/g, " ").replace(/μ/g, "µ").replace(/[ \t]+/g, " ");

beforeAll(async () => {
  await clearAddressThrottle(); // three sign-ins from loopback, after whatever the files before this one counted
  const a = await createWorkspaceWithRoles("Report A", ["designer", "viewer"]);
  const b = await createWorkspaceWithRoles("Report B", ["admin"]);
  [designer, viewer, adminB] = await Promise.all([signedInClient(a.users.designer.email), signedInClient(a.users.viewer.email), signedInClient(b.users.admin.email)]);
  optionId = (await createProjectWithOption(designer)).optionId;
  const budget = await viewer.get(`/api/v1/options/${optionId}/budget`);
  expect(budget.status).toBe(200);
  evaluation = budget.json<{ evaluation: Evaluation }>().evaluation;
});

afterAll(closeTestDb);

describe("PDF design-review report", () => {
  it("opens and carries the controller's worst-corner Tj, a loss figure, every corner and the cautions", async () => {
    const r = await getBytes(viewer, `/api/v1/options/${optionId}/revisions/1/report?format=pdf`);
    expect(r.status).toBe(200);
    expect(r.type).toBe("application/pdf");
    expect(r.disposition).toMatch(/^attachment; filename=".+-rev1-review\.pdf"$/);
    expect(Buffer.from(r.bytes.subarray(0, 5)).toString()).toBe("%PDF-");
    const parsed = await new PDFParse({ data: r.bytes }).getText();
    expect(parsed.total).toBeGreaterThanOrEqual(2);
    const text = norm(parsed.text);
    const controller = evaluation.parts.find((p) => p.id === "controller")!;
    if (!controller.junction || controller.junction.runaway) throw new Error("template controller should have a Tj");
    const tj = norm(formatSi(controller.junction.tj, "°C", 4));
    const line = text.split("\n").find((l) => l.startsWith(controller.label) && l.includes(controller.worstCornerId));
    expect(line, `summary row of ${controller.label}`).toBeDefined();
    expect(line).toContain(tj);
    expect(line).toContain(norm(formatSi(controller.junction.margin, "K", 3)));
    const worst = evaluation.corners.find((c) => c.cornerId === controller.worstCornerId)!;
    const gate = worst.parts.find((p) => p.id === "controller")!.losses.gateDrive;
    expect(text).toContain(norm(formatSi(gate, "W", 3)));
    for (const c of evaluation.corners) expect(text).toContain(`Corner ${c.cornerId}: `);
    expect(text).toContain(norm(CAUTION_BENCH).slice(0, 60));
    expect(text).toContain("Derating policy in force");
    expect(text).toContain("Controller temperature rise over fsw × Qg");
    expect(text).toContain("Not reviewed: no review record exists for this revision.");
    // each warning once, with the corners it holds at (not once per corner)
    const flat = text.replace(/\s*\n\s*/g, " ");
    for (const g of groupWarnings(evaluation.warnings)) {
      const corners = g.cornerIds.length === 1 ? `corner ${g.cornerIds[0]}` : `corners ${g.cornerIds.join(", ")}`;
      const head = `[${g.severity}] ${g.partId} (${corners}):`;
      expect(flat.split(head).length - 1, head).toBe(1);
    }
  });

  it("shows the review decision and the reviewer's comments once the revision is reviewed", async () => {
    const option = await testDb()("design_option").where({ id: optionId }).first();
    const reviewId = `rev_test_${Date.now().toString(36)}`;
    await testDb()("option_review").insert({ id: reviewId, workspace_id: option.workspace_id, project_id: option.project_id, option_id: optionId, revision: 1, status: "approved", decided_at: new Date() });
    await testDb()("review_comment").insert({ id: `${reviewId}_c1`, review_id: reviewId, option_id: optionId, revision: 1, body: "Controller margin accepted; confirm Q1 case temperature on the bench." });
    const r = await getBytes(viewer, `/api/v1/options/${optionId}/revisions/1/report?format=pdf`);
    const text = norm((await new PDFParse({ data: r.bytes }).getText()).text);
    expect(text).not.toContain("Not reviewed");
    expect(text).toContain("Decision · approved");
    expect(text).toContain("Controller margin accepted; confirm Q1 case temperature on the bench.");
  });

  it("answers 404 to another workspace and to a missing revision, 400 to an unknown format", async () => {
    expect((await getBytes(adminB, `/api/v1/options/${optionId}/revisions/1/report?format=pdf`)).status).toBe(404);
    expect((await getBytes(viewer, `/api/v1/options/${optionId}/revisions/9/report`)).status).toBe(404);
    expect((await getBytes(viewer, `/api/v1/options/${optionId}/revisions/1/report?format=docx`)).status).toBe(400);
  });
});

describe("CSV export of the budget", () => {
  it("has a row for every corner × part × mechanism, the totals, and Tj / limit / margin, with the API's numbers", async () => {
    const r = await getBytes(viewer, `/api/v1/options/${optionId}/revisions/1/report?format=csv`);
    expect(r.status).toBe(200);
    expect(r.type).toBe("text/csv; charset=utf-8");
    const text = new TextDecoder().decode(r.bytes);
    expect(text.startsWith('"# Heatsplit budget:')).toBe(true); // one quoted cell with the caution, then the table
    const parsed = Papa.parse<Record<string, string>>(text.slice(text.indexOf("\r\n") + 2), { header: true, skipEmptyLines: true });
    expect(parsed.meta.fields).toEqual(BUDGET_CSV_HEADER);
    const rows = parsed.data;
    const find = (c: string, p: string, figure: string, mech = "") => rows.filter((x) => x.corner_id === c && x.part_id === p && x.figure === figure && x.mechanism === mech);
    let expected = 0;
    for (const c of evaluation.corners) {
      expected += 1;
      expect(Number(find(c.cornerId, "", "corner_loss_total")[0]["loss [W]"])).toBe(c.totalLoss);
      for (const p of c.parts) {
        for (const m of LOSS_MECHANISMS) {
          const hit = find(c.cornerId, p.id, "loss", m);
          expect(hit, `${c.cornerId} ${p.id} ${m}`).toHaveLength(1);
          expect(Number(hit[0]["loss [W]"])).toBe(p.losses[m]);
        }
        expect(Number(find(c.cornerId, p.id, "loss_total")[0]["loss [W]"])).toBe(p.total);
        expected += LOSS_MECHANISMS.length + 1;
        if (p.junction && !p.junction.runaway) {
          expect(Number(find(c.cornerId, p.id, "tj")[0]["temperature [°C]"])).toBe(p.junction.tj);
          expect(Number(find(c.cornerId, p.id, "tj_limit_derated")[0]["temperature [°C]"])).toBe(p.junction.limit);
          expect(Number(find(c.cornerId, p.id, "margin")[0]["difference [K]"])).toBe(p.junction.margin);
          expect(find(c.cornerId, p.id, "tj_max")).toHaveLength(1);
          expected += 4;
        }
      }
    }
    expect(rows).toHaveLength(expected);
  });
});
