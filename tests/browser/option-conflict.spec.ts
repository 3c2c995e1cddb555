// Two editors on one option: the second save from the same base revision
// is refused with a conflict, the edits stay in the form, and re-applying
// them onto the latest revision saves both people's changes. The second
// editor's change is a library part chosen for the switch.
import { expect, test, type Browser, type Page } from "@playwright/test";
import { closeTestDb, createWorkspaceWithRoles } from "../integration/support/db";
import { demoOptions } from "../../models/demo";
import { signedInPage as signedInAs } from "./support";

let email = "";
test.beforeAll(async () => {
  email = (await createWorkspaceWithRoles("conflict", ["designer"])).users.designer.email;
});
test.afterAll(closeTestDb);

function signedInPage(browser: Browser): Promise<Page> {
  return signedInAs(browser, email);
}

async function post(page: Page, path: string, data: unknown): Promise<Record<string, any>> {
  const r = await page.request.post(path, { headers: { origin: new URL(page.url()).origin }, data });
  expect(r.status(), await r.text()).toBe(201);
  return (await r.json()) as Record<string, any>;
}

test("a conflicting save keeps the edits and re-applies them onto the latest revision", async ({ browser }) => {
  const a = await signedInPage(browser);
  const b = await signedInPage(browser);
  const part = (await post(a, "/api/v1/parts", {
    kind: "mosfet", manufacturer: "Test devices (invented)", mpn: "TQ-CONFLICT1",
    params: { qg: "42 nC", qgs: "13 nC", qgd: "9 nC", vth: "3.1 V", vpl: "4.8 V", rds25: "12 mΩ", rthJA: "40 K/W" },
  })).part;
  const project = (await post(a, "/api/v1/projects", {
    name: "Conflict brick", topology: "forward", vinMin: 36, vinNom: 48, vinMax: 75, outputs: [{ label: "Main", voltage: 12, current: 20 }], fsw: "250 kHz", ambientMax: 85,
  })).project;
  const option = (await post(a, `/api/v1/projects/${project.id}/options`, { name: "Shared option", template: demoOptions[0].key })).option;
  const url = `/projects/${project.id}/options/${option.id}`;
  await a.goto(url);
  await b.goto(url);

  await a.locator('[data-block="positions.0.gate"]').click();
  await a.locator("#doc-positions-0-gate-rTurnOn").fill("6.8 Ω");
  await a.locator("#doc-positions-0-gate-rTurnOn").blur();
  await a.getByRole("button", { name: "Save revision 2" }).click();
  await expect(a.getByText("Saved as revision 2.")).toBeVisible();

  await b.locator('[data-block="positions.0.mosfet"]').click();
  await b.getByRole("button", { name: "Choose from library" }).first().click();
  await b.getByLabel("MOSFET from the library").selectOption(part.id);
  await b.getByRole("button", { name: "Use this part" }).click();
  await expect(b.locator("#doc-positions-0-mosfet-qg")).toHaveValue("42 nC");
  await b.getByRole("button", { name: "Save revision 2" }).click();
  await expect(b.getByText("Someone saved this option while you were editing.")).toBeVisible();
  await expect(b.locator("#doc-positions-0-mosfet-qg")).toHaveValue("42 nC");

  await b.getByRole("button", { name: "Re-apply my edits onto revision 2" }).click();
  await b.getByRole("button", { name: "Save revision 3" }).click();
  await expect(b.getByText("Saved as revision 3.")).toBeVisible();

  const latest = (await (await b.request.get(`/api/v1/options/${option.id}/revisions/3`)).json()).revision;
  expect(latest.document.positions[0].gate.rTurnOn).toBe("6.8 Ω");
  expect(latest.document.positions[0].mosfet.partNumber).toBe("TQ-CONFLICT1");
  expect(latest.partRefs["positions.0.mosfet"]).toBe(part.id);
});
