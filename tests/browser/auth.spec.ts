// Accounts in chromium: sign up through the mailed link, sign out, sign in;
// each of the five roles sees only what it may use; an admin invites someone
// through the members page, sees the mail in the development inbox without
// its link (only the recipient may follow it), and the invitee joins by
// following the link from their mailbox; a member of two workspaces switches
// between them; a crafted ?next= never leads off-site after signing in.
import { expect, test, type Page } from "@playwright/test";
import { ROLES, type Role } from "../../lib/roles";
import { TEST_PASSWORD, addMembership, clearAddressThrottle, closeTestDb, createMember, createWorkspaceWithRoles, linkFrom, uniqueEmail, waitForMail } from "../integration/support/db";

let ws: Awaited<ReturnType<typeof createWorkspaceWithRoles>>;

test.beforeAll(async () => {
  await clearAddressThrottle(); // the integration tests signed up and in from the same loopback address
  ws = await createWorkspaceWithRoles("Browser roles", ROLES);
});
test.afterAll(closeTestDb);

async function signIn(page: Page, email: string, password = TEST_PASSWORD): Promise<void> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
}

async function signOut(page: Page): Promise<void> {
  await page.locator("summary", { hasText: "account menu" }).click();
  await page.getByRole("button", { name: "Sign out" }).click();
  await page.waitForURL((u) => u.pathname === "/sign-in");
}

test("sign up, sign out, sign in again; a wrong password gets the generic message", async ({ page }) => {
  const email = uniqueEmail("browser-signup");
  const password = "browser passphrase twelve+";
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Brook Signup");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("short");
  await page.getByLabel("Workspace name").fill("Brook Power");
  await page.getByRole("button", { name: "Create account and workspace" }).click();
  await expect(page.getByText("Use at least 12 characters.")).toBeVisible();
  await expect(page.getByLabel("E-mail")).toHaveValue(email);

  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Create account and workspace" }).click();
  await expect(page.getByText("Check your inbox")).toBeVisible();
  const { url } = linkFrom((await waitForMail(email)).text, "/sign-up/confirm");
  await page.goto(url);
  await page.getByRole("button", { name: "Create account and workspace" }).click();
  await page.waitForURL("**/home");
  await expect(page.getByRole("heading", { name: "Hello, Brook Signup" })).toBeVisible();
  await expect(page.getByText("You are working in Brook Power.")).toBeVisible();

  await signOut(page);
  await page.goto("/home");
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fhome$/);

  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("not the password at all");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "E-mail or password is wrong." })).toBeVisible();
  await expect(page.locator("body")).not.toContainText("not the password at all");

  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL("**/home");
  await expect(page.getByRole("heading", { name: "Hello, Brook Signup" })).toBeVisible();
});

for (const role of ROLES) {
  test(`${role} sees only what the role allows`, async ({ page }) => {
    await signIn(page, ws.users[role].email);
    await expect(page).toHaveURL(/\/home$/);
    const nav = page.getByRole("navigation", { name: "Sections" });
    const isAdmin = role === ("admin" satisfies Role);
    await expect(nav.getByRole("link", { name: "Members" })).toHaveCount(isAdmin ? 1 : 0);
    await expect(nav.getByRole("link", { name: "Dev inbox" })).toHaveCount(1); // each member reads only their own mail there
    const abilities = page.getByTestId("abilities");
    await expect(abilities.getByText("Invite members, change roles, remove members")).toHaveCount(isAdmin ? 1 : 0);
    await expect(abilities.getByText("Choose the design option to build")).toHaveCount(role === "admin" || role === "manager" ? 1 : 0);
    await expect(abilities.getByText("Review design options")).toHaveCount(role === "admin" || role === "reviewer" ? 1 : 0);

    await page.goto("/members");
    if (isAdmin) {
      await expect(page.getByRole("form", { name: "Invite a member" })).toBeVisible();
      await expect(page.getByTestId("member-row")).toHaveCount(ROLES.length);
    } else {
      await expect(page.getByRole("heading", { name: "Your role does not include this page" })).toBeVisible();
      await expect(page.getByRole("button", { name: "Send invitation" })).toHaveCount(0);
    }
    await page.goto("/dev/inbox");
    await expect(page.getByRole("heading", { name: "Development inbox" })).toBeVisible();
  });
}

test("an admin invites by e-mail, sees the mail without its link, and the invitee follows the link and joins with the role", async ({ page, browser }) => {
  const { users } = await createWorkspaceWithRoles("Browser invite", ["admin"]);
  const invitee = uniqueEmail("browser-invitee");
  await signIn(page, users.admin.email);
  await page.goto("/members");
  const form = page.getByRole("form", { name: "Invite a member" });
  await form.getByLabel("E-mail").fill("not-an-address");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(form.getByText("Enter a valid e-mail address.")).toBeVisible();
  await form.getByLabel("E-mail").fill(invitee);
  await form.getByLabel("Role").selectOption("reviewer");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(form.getByRole("status")).toContainText(`Invitation sent to ${invitee} as Reviewer.`);
  await expect(page.getByRole("table", { name: "Open invitations" })).toContainText(invitee);

  await page.goto("/dev/inbox");
  const mail = page.getByTestId("dev-mail").filter({ hasText: invitee }).first();
  await expect(mail).toContainText("link withheld");
  await expect(mail.getByRole("link")).toHaveCount(0);

  // the invitee reads the link in their own mailbox
  const { url: href } = linkFrom((await waitForMail(invitee)).text, "/invite");
  const guest = await browser.newContext();
  const guestPage = await guest.newPage();
  await guestPage.goto(href);
  await expect(guestPage.getByText(/Join .* as Reviewer/)).toBeVisible();
  await guestPage.getByLabel("Your name").fill("Ivy Invitee");
  await guestPage.getByLabel("Choose a password").fill("invitee passphrase 123");
  await guestPage.getByRole("button", { name: "Create account and join" }).click();
  await guestPage.waitForURL("**/home");
  await expect(guestPage.getByRole("heading", { name: "Hello, Ivy Invitee" })).toBeVisible();
  await expect(guestPage.getByTestId("abilities")).toContainText("Review design options");
  await guest.close();

  await page.goto("/members");
  await expect(page.getByTestId("member-row").filter({ hasText: invitee })).toHaveCount(1);
});

test("a member of two workspaces switches between them", async ({ page }) => {
  const other = await createWorkspaceWithRoles("Browser second", ["admin"]);
  await addMembership(other.workspaceId, ws.users.viewer.id, "designer");
  await signIn(page, ws.users.viewer.email);
  await page.locator("summary", { hasText: "switch workspace" }).click();
  await page.getByRole("button", { name: other.name }).click();
  await page.waitForURL("**/home");
  await expect(page.getByText(`You are working in ${other.name}.`)).toBeVisible();
  await expect(page.getByTestId("abilities")).toContainText("Create and edit projects");
  await page.locator("summary", { hasText: "switch workspace" }).click();
  await page.getByRole("button", { name: ws.name }).click();
  await expect(page.getByText(`You are working in ${ws.name}.`)).toBeVisible();
});

test("signed out, a crafted ?next= leads back to Heatsplit after signing in, never off-site", async ({ page, baseURL }) => {
  const { email } = await createMember("browser-next");
  for (const next of ["/.//evil.example", "/%5C%5Cevil.example"]) {
    await page.context().clearCookies();
    await page.goto(`/sign-in?next=${next}`);
    // the form may also be tampered with: its hidden next is read again by the action
    await page.evaluate(() => {
      const hidden = document.querySelector<HTMLInputElement>('input[name="next"]');
      if (hidden) hidden.value = "/.//evil.example";
    });
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(TEST_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    expect(new URL(page.url()).origin).toBe(new URL(baseURL!).origin);
    expect(new URL(page.url()).pathname).toBe("/home");
  }
});
