// A designer creates a project, adds an option from a template, edits an
// element in the editor, saves revision 2, duplicates the option and edits
// the copy; a viewer of the same workspace sees no edit controls and a
// direct POST of a revision is refused.
import { expect, test } from "@playwright/test";
import { closeTestDb, createWorkspaceWithRoles } from "../integration/support/db";
import { demoOptions } from "../../models/demo";
import { signIn } from "./support";

let users: Record<string, { email: string }>;

test.beforeAll(async () => {
  users = (await createWorkspaceWithRoles("journey", ["designer", "viewer"])).users;
});
test.afterAll(closeTestDb);

test.describe.configure({ mode: "serial" });

let optionUrl = "";

test("designer: project, option from a template, edit, save, duplicate, edit the copy", async ({ page }) => {
  await signIn(page, users.designer.email);
  await page.goto("/projects/new");
  await page.getByLabel("Project name").fill("Journey brick");
  await page.getByLabel("Topology").selectOption("active-clamp-forward");
  await page.getByLabel("Vin min").fill("36");
  await page.getByLabel("Vin nom").fill("48");
  await page.getByLabel("Vin max").fill("75");
  await page.getByLabel("Switching frequency").fill("250 kHz");
  await page.getByLabel("Max ambient").fill("85");
  await page.locator("#out-0-voltage").fill("12");
  await page.locator("#out-0-current").fill("20");
  await page.getByRole("button", { name: "Create project" }).click();
  await page.waitForURL(/\/projects\/prj_[A-Za-z0-9]+$/);
  await expect(page.getByRole("heading", { level: 1, name: "Journey brick" })).toBeVisible();

  await page.getByLabel("Start from template").selectOption({ index: 1 });
  await expect(page.getByLabel("Option name")).not.toHaveValue("");
  await page.getByRole("button", { name: "Create option" }).click();
  await page.waitForURL(/\/options\/opt_[A-Za-z0-9]+$/);
  optionUrl = new URL(page.url()).pathname;

  await page.locator('[data-block="positions.0.gate"]').click();
  const rOn = page.locator("#doc-positions-0-gate-rTurnOn");
  await rOn.fill("6.8 nC");
  await rOn.blur();
  await expect(page.getByText(/expected a resistance.*not applied/)).toBeVisible();
  await rOn.fill("0.0068 kΩ");
  await rOn.blur();
  await expect(rOn).toHaveValue("6.8 Ω");
  await expect(page.getByText("Unsaved changes")).toBeVisible();
  await page.getByLabel("Revision note").fill("6.8 Ω turn-on resistor");
  await page.getByRole("button", { name: "Save revision 2" }).click();
  await expect(page.getByText("Saved as revision 2.")).toBeVisible();
  await expect(page.getByRole("list", { name: "Revision history" }).getByText("rev 2")).toBeVisible();

  await page.getByRole("button", { name: "Duplicate option" }).click();
  await page.waitForURL((u) => u.pathname !== optionUrl && /\/options\/opt_/.test(u.pathname));
  await expect(page.getByRole("heading", { level: 1 })).toContainText("(copy)");
  await page.locator('[data-block="positions.0.gate"]').click();
  await expect(page.locator("#doc-positions-0-gate-rTurnOn")).toHaveValue("6.8 Ω");
  await page.locator('[data-block="positions.0.mosfet"]').click();
  const qg = page.locator("#doc-positions-0-mosfet-qg");
  await qg.fill("47 nC");
  await qg.blur();
  await page.getByRole("button", { name: "Save revision 2" }).click();
  await expect(page.getByText("Saved as revision 2.")).toBeVisible();
});

test("viewer: no edit controls, and a direct POST is refused with 403", async ({ page }) => {
  expect(optionUrl).not.toBe("");
  await signIn(page, users.viewer.email);
  await page.goto(optionUrl);
  await expect(page.getByText("your role does not allow editing")).toBeVisible();
  await expect(page.getByRole("button", { name: /Save revision/ })).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Duplicate option" })).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Choose from library" })).toHaveCount(0);
  await page.locator('[data-block="positions.0.gate"]').click();
  await expect(page.locator("#doc-positions-0-gate-rTurnOn")).toHaveAttribute("readonly", "");
  await expect(page.locator("#doc-positions-0-gate-rTurnOn")).toHaveValue("6.8 Ω");

  const optionId = optionUrl.split("/").pop()!;
  const origin = new URL(page.url()).origin;
  const r = await page.request.post(`/api/v1/options/${optionId}/revisions`, {
    headers: { origin, "content-type": "application/json" },
    // a valid body, so the refusal is the role's and not the validation's
    data: { baseRevision: 2, document: demoOptions[0].input, partRefs: {} },
  });
  expect(r.status()).toBe(403);
  await page.goto(optionUrl.replace(/\/options\/.*/, ""));
  await expect(page.getByRole("button", { name: /^Duplicate/ })).toHaveCount(0);
  await expect(page.getByRole("button", { name: "Create option" })).toHaveCount(0);
});
