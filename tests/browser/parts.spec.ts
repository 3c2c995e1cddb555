// Parts library in the browser: a designer imports a CSV and finds the parts
// in the table, creates a MOSFET typing "0.047 µC" and sees it normalised to
// "47 nC", and has a wrong unit refused at the field; a viewer sees no create
// or import controls and a direct POST with their session is refused.
import { expect, test } from "@playwright/test";
import { closeTestDb, createWorkspaceWithRoles } from "../integration/support/db";
import { partsCsv } from "../integration/support/parts";
import { signIn } from "./support";

let users: Record<string, { email: string }>;

test.beforeAll(async () => {
  users = (await createWorkspaceWithRoles("parts-ui", ["designer", "viewer"])).users;
});
test.afterAll(closeTestDb);

test.describe.configure({ mode: "serial" });

test("designer imports a CSV and sees the parts in the table", async ({ page }) => {
  await signIn(page, users.designer.email);
  await page.goto("/parts");
  await page.getByRole("link", { name: "Import CSV" }).click();
  await expect(page.getByRole("heading", { name: "CSV format" })).toBeVisible();
  await page.getByLabel("CSV file").setInputFiles({ name: "library.csv", mimeType: "text/csv", buffer: Buffer.from(partsCsv(12, "UI")) });
  await expect(page.getByRole("status")).toContainText("12 rows, 12 valid (12 new, 0 to update), 0 problems");
  await page.getByRole("button", { name: "Import all 12 parts" }).click();
  await expect(page.getByText("Imported: 12 new, 0 updated.")).toBeVisible();
  await page.getByRole("link", { name: "Open the parts library" }).click();
  await expect(page.getByRole("table", { name: /Parts \(12\)/ })).toBeVisible();
  await expect(page.getByRole("link", { name: "UI-0007" })).toBeVisible();

  await page.getByLabel("Kind").selectOption("bjt");
  await page.getByRole("button", { name: "Apply filters" }).click();
  await expect(page.getByRole("table", { name: /Parts \(6\)/ })).toBeVisible();
});

test("designer creates a MOSFET with unit strings; a wrong unit is refused at the field", async ({ page }) => {
  await signIn(page, users.designer.email);
  await page.goto("/parts/new");
  await page.getByLabel("Manufacturer").fill("Browserworks");
  await page.getByLabel("Part number").fill("UI-Q47");
  const qg = page.locator('[name="param.qg"]');
  await qg.fill("0.047 µC");
  await qg.blur();
  await expect(qg).toHaveValue("47 nC");

  const qgs = page.locator('[name="param.qgs"]');
  await qgs.fill("12 V");
  await qgs.blur();
  await expect(qgs).toHaveAttribute("aria-invalid", "true");
  await expect(page.getByText('expected a charge (e.g. "47 nC"), got "12 V"')).toBeVisible();
  await qgs.fill("12nC");
  await qgs.blur();
  await expect(qgs).toHaveValue("12 nC");
  await expect(qgs).not.toHaveAttribute("aria-invalid", "true");

  for (const [name, value] of [["qgd", "15 nC"], ["vth", "2.5 V"], ["vpl", "4.6 V"], ["rds25", "12 mΩ"], ["rthJA", "40 K/W"]])
    await page.locator(`[name="param.${name}"]`).fill(value);
  await page.getByRole("button", { name: "Add part" }).click();
  await page.waitForURL(/\/parts\/prt_[A-Za-z0-9_-]+$/);
  await expect(page.getByRole("heading", { level: 1, name: "UI-Q47" })).toBeVisible();
  await expect(page.locator('[name="param.qg"]')).toHaveValue("47 nC");
  await expect(page.locator('[name="param.rds25"]')).toHaveValue("12 mΩ");
});

test("viewer sees no create or import controls and a direct POST is refused", async ({ page }) => {
  await signIn(page, users.viewer.email);
  await page.goto("/parts");
  await expect(page.getByRole("table", { name: /Parts \(13\)/ })).toBeVisible();
  await expect(page.getByRole("link", { name: "New part" })).toHaveCount(0);
  await expect(page.getByRole("link", { name: "Import CSV" })).toHaveCount(0);
  await expect(page.getByRole("button", { name: /Delete/ })).toHaveCount(0);
  await page.getByRole("link", { name: "UI-Q47" }).click();
  await expect(page.locator('[name="param.qg"]')).toHaveCount(0); // read-only view
  await expect(page.getByText("47 nC")).toBeVisible();
  const status = await page.evaluate(async () => {
    const res = await fetch("/api/v1/parts", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ kind: "diode", manufacturer: "X", mpn: "VIEWER-1", params: { vf: "0.7 V", rthJA: "300 K/W" } }),
    });
    return res.status;
  });
  expect(status).toBe(403);
  expect((await page.request.get("/parts/import")).status()).toBe(403);
});
