// The budget dashboard, its thermal map, the what-if knobs and the
// manager's sign-off, in Debian's chromium against the test stack. The test
// makes its own workspace (a designer and a manager, inserted directly) and
// creates a project with two demo options through the API; the npm test
// database carries no demo seed. Screenshots go to docs/screenshots/.
import { expect, test, type APIRequestContext, type Page } from "@playwright/test";
import path from "node:path";
import { demoOptions } from "@/models/demo";
import { closeTestDb, createWorkspaceWithRoles, TEST_PASSWORD } from "../integration/support/db";

const ORIGIN = process.env.APP_ORIGIN ?? "http://127.0.0.1:3100";
const SHOTS = path.resolve(__dirname, "../../docs/screenshots");

type Users = Awaited<ReturnType<typeof createWorkspaceWithRoles>>["users"];
let users: Users;
let projectId = "";
const optionIds: string[] = [];

async function signIn(request: APIRequestContext, email: string): Promise<void> {
  const r = await request.post("/api/v1/auth/sign-in", { data: { email, password: TEST_PASSWORD }, headers: { origin: ORIGIN } });
  expect(r.status(), await r.text()).toBe(200);
}

interface CornerJson {
  cornerId: string;
  totalLoss: number;
  parts: { id: string; kind: string; total: number; junction: { runaway: boolean; tj?: number } | null }[];
}
interface BudgetJson {
  revision: number;
  evaluation: { corners: CornerJson[]; worstTotal: { cornerId: string } };
}

async function figure(page: Page, name: string): Promise<number> {
  const v = await page.locator(`[data-figure="${name}"] data`).first().getAttribute("value");
  return Number(v);
}

test.describe.configure({ mode: "serial" });

test.beforeAll(async ({ playwright }) => {
  ({ users } = await createWorkspaceWithRoles("dashboard", ["designer", "manager"]));
  const api = await playwright.request.newContext({ baseURL: ORIGIN });
  await signIn(api, users.designer.email);
  const p = await api.post("/api/v1/projects", {
    headers: { origin: ORIGIN },
    data: { name: "HX-240 dashboard", topology: "active-clamp-forward", vinMin: "36 V", vinNom: "48 V", vinMax: "75 V", outputs: [{ label: "Main", voltage: "12 V", current: "20 A" }], fsw: "250 kHz", ambientMax: "85 °C" },
  });
  expect(p.status(), await p.text()).toBe(201);
  projectId = (await p.json()).project.id;
  for (const demo of demoOptions.slice(0, 3)) {
    const o = await api.post(`/api/v1/projects/${projectId}/options`, { headers: { origin: ORIGIN }, data: { name: demo.name, summary: demo.summary, document: demo.input } });
    expect(o.status(), await o.text()).toBe(201);
    optionIds.push((await o.json()).option.id);
  }
  await api.dispose();
});

test.afterAll(async () => {
  await closeTestDb();
});

test("the dashboard shows the API's numbers, one bar per part with loss", async ({ page }) => {
  await signIn(page.request, users.designer.email);
  const api = await page.request.get(`/api/v1/options/${optionIds[1]}/budget`);
  expect(api.status()).toBe(200);
  const budget = (await api.json()) as BudgetJson;
  const corner = budget.evaluation.corners.find((c) => c.cornerId === budget.evaluation.worstTotal.cornerId)!;

  await page.setViewportSize({ width: 1440, height: 1000 });
  await page.goto(`/projects/${projectId}/options/${optionIds[1]}/budget`);
  await expect(page.locator(`[role="tab"][data-corner="${corner.cornerId}"]`)).toHaveAttribute("aria-selected", "true");

  // bars: nivo marks every stacked segment bar.item.<mechanism>.<index>; one index per part
  const chart = page.locator('[data-chart="loss-stack"]');
  await expect(chart.locator('[data-testid^="bar.item."]').first()).toBeVisible();
  const ids = await chart.locator('[data-testid^="bar.item."]').evaluateAll((els) => els.map((e) => e.getAttribute("data-testid")!.split(".").pop()));
  const partsWithLoss = corner.parts.filter((p) => p.total > 0);
  expect(new Set(ids).size).toBe(partsWithLoss.length);
  expect(partsWithLoss.length).toBeGreaterThan(2);

  // figures equal the data route's
  expect(await figure(page, "total-loss")).toBeCloseTo(corner.totalLoss, 9);
  const ctl = corner.parts.find((p) => p.kind === "controller")!;
  expect(await figure(page, "controller-tj")).toBeCloseTo(ctl.junction!.tj!, 9);
  const ledgerTotals = await page.locator("[data-ledger-part]").evaluateAll((rows) =>
    rows.map((r) => ({ id: r.getAttribute("data-ledger-part"), total: Number(r.querySelector('[data-figure="part-total"] data')?.getAttribute("value")) })),
  );
  expect(ledgerTotals.map((r) => r.id)).toEqual(corner.parts.map((p) => p.id));
  ledgerTotals.forEach((r, i) => expect(r.total).toBeCloseTo(corner.parts[i].total, 9));

  // another corner: the selection changes the figures to that corner's
  const other = budget.evaluation.corners.find((c) => c.cornerId !== corner.cornerId)!;
  await page.locator(`[role="tab"][data-corner="${other.cornerId}"]`).click();
  await expect.poll(() => figure(page, "total-loss")).toBeCloseTo(other.totalLoss, 9);
  await page.locator(`[role="tab"][data-corner="${corner.cornerId}"]`).click();

  await expect(page.getByText("Estimates, not measurements", { exact: false }).first()).toBeVisible();
  await page.screenshot({ path: path.join(SHOTS, "budget-dashboard.png"), fullPage: false });
});

test("the thermal map has rows × cols cells of the chosen grid, the limit line and the design point", async ({ page }) => {
  await signIn(page.request, users.designer.email);
  await page.setViewportSize({ width: 1440, height: 1000 });
  await page.goto(`/projects/${projectId}/options/${optionIds[0]}/budget`);
  // the first sweep starts when the map comes near the viewport, as it does for a reader scrolling down
  await page.locator('[data-sweep="grid"]').scrollIntoViewIfNeeded();
  await page.locator('[data-sweep="grid"]').selectOption("coarse");
  const map = page.locator('[data-chart="sweep-heatmap"]');
  await expect(map).toHaveAttribute("data-cols", "16", { timeout: 30_000 });
  await expect(map).toHaveAttribute("data-rows", "12");
  await expect(map.locator('[data-testid^="cell."]')).toHaveCount(16 * 12);
  await expect(map.locator('[data-layer="design-point"]')).toHaveCount(1);

  await page.locator('[data-sweep="grid"]').selectOption("medium");
  await expect(map.locator('[data-testid^="cell."]')).toHaveCount(24 * 16, { timeout: 30_000 });
  await map.scrollIntoViewIfNeeded();
  await map.screenshot({ path: path.join(SHOTS, "thermal-map.png") });
});

test("a what-if knob changes the numbers at once; saving makes a new revision", async ({ page }) => {
  await signIn(page.request, users.designer.email);
  await page.goto(`/projects/${projectId}/options/${optionIds[0]}/budget`);
  const before = await figure(page, "total-loss");
  const fsw = page.locator('[data-knob-field="fsw"]');
  const kHz = Number(await fsw.inputValue());
  await fsw.fill(String(kHz * 2));
  await expect(page.locator("[data-budget-view]")).toHaveAttribute("data-trial", "on");
  await expect.poll(() => figure(page, "total-loss")).toBeGreaterThan(before * 1.01);

  const rev = ((await (await page.request.get(`/api/v1/options/${optionIds[0]}/budget`)).json()) as BudgetJson).revision;
  await page.getByRole("button", { name: "Save as new revision" }).click();
  await expect(page.getByText(`Saved as revision ${rev + 1}`)).toBeVisible();
  const after = (await (await page.request.get(`/api/v1/options/${optionIds[0]}/budget`)).json()) as BudgetJson;
  expect(after.revision).toBe(rev + 1);
});

test("the manager records the chosen option on the comparison", async ({ page }) => {
  await signIn(page.request, users.manager.email);
  await page.setViewportSize({ width: 1440, height: 1100 });
  await page.goto(`/projects/${projectId}/compare`);
  await expect(page.locator("thead [data-option]")).toHaveCount(3);
  await expect(page.locator('[data-chart="comparison"] [data-testid^="bar.item."]').first()).toBeVisible();
  await page.getByLabel("Chosen option", { exact: true }).selectOption(optionIds[2]);
  await page.getByLabel("Reason", { exact: true }).fill("Coolest controller at the 36 V corner for a few cents more.");
  await page.getByRole("button", { name: "Record the choice" }).click();
  await expect(page.getByText("is the chosen option")).toBeVisible();
  await expect(page.locator("[data-choice-history] li").first()).toHaveAttribute("data-choice", optionIds[2]);

  const r = await page.request.get(`/api/v1/projects/${projectId}/choice`);
  const body = (await r.json()) as { choice: { optionId: string; reason: string } };
  expect(body.choice.optionId).toBe(optionIds[2]);
  expect(body.choice.reason).toContain("Coolest controller");
  await page.screenshot({ path: path.join(SHOTS, "option-comparison.png"), fullPage: true });
});
