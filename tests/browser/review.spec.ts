// Review in the browser: the designer submits revision 1 from the review
// page, the reviewer rejects it with a comment pinned to Q1, and the
// designer sees the rejection and the comment on their own review page.
import { expect, test, type Page } from "@playwright/test";
import { closeTestDb, createWorkspaceWithRoles } from "../integration/support/db";
import { demoOptions } from "../../models/demo";
import { signedInPage } from "./support";

let designerEmail = "";
let reviewerEmail = "";
test.beforeAll(async () => {
  const ws = await createWorkspaceWithRoles("review-ui", ["designer", "reviewer"]);
  designerEmail = ws.users.designer.email;
  reviewerEmail = ws.users.reviewer.email;
});
test.afterAll(closeTestDb);

async function post(page: Page, path: string, data: unknown): Promise<Record<string, any>> {
  const r = await page.request.post(path, { headers: { origin: new URL(page.url()).origin }, data });
  expect(r.status(), await r.text()).toBe(201);
  return (await r.json()) as Record<string, any>;
}

test("designer submits, reviewer rejects with a comment the designer then reads", async ({ browser }) => {
  const designer = await signedInPage(browser, designerEmail);
  const project = (await post(designer, "/api/v1/projects", {
    name: "Review brick", topology: "forward", vinMin: 36, vinNom: 48, vinMax: 75, outputs: [{ label: "Main", voltage: 12, current: 20 }], fsw: "250 kHz", ambientMax: 85,
  })).project;
  const option = (await post(designer, `/api/v1/projects/${project.id}/options`, { name: "Option under review", template: demoOptions[0].key })).option;
  const url = `/projects/${project.id}/options/${option.id}/review`;

  await designer.goto(url);
  await expect(designer.getByText("not submitted", { exact: true })).toBeVisible();
  await designer.getByLabel("Note to the reviewer").fill("Please check Q1 at high line.");
  await designer.getByRole("button", { name: "Submit revision 1 for review" }).click();
  await expect(designer.getByText(/Waiting for a reviewer/)).toBeVisible();
  await expect(designer.getByText("awaiting review").first()).toBeVisible();

  const reviewer = await signedInPage(browser, reviewerEmail);
  await reviewer.goto(url);
  await expect(reviewer.locator('tr[data-part="Q1"]')).toBeVisible();
  await reviewer.getByLabel("Comment").fill("Q1 has too little margin at vin-max; lower the gate resistor.");
  await reviewer.getByLabel("About part").fill("Q1");
  await reviewer.getByLabel("About figure").fill("Q1 Tj at vin-max");
  await reviewer.getByRole("button", { name: "Reject revision 1" }).click();
  await expect(reviewer.locator('[data-review-revision="1"]')).toContainText("rejected");

  await designer.reload();
  const comment = designer.getByTestId("review-comment");
  await expect(comment).toContainText("Q1 has too little margin at vin-max; lower the gate resistor.");
  await expect(comment).toContainText("Q1 · Q1 Tj at vin-max");
  await expect(designer.locator('[data-review-revision="1"]')).toContainText("rejected");
  await expect(designer.getByRole("link", { name: "editor" })).toBeVisible();
});
