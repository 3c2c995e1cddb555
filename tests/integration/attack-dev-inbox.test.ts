// Attack 1 (critical): account takeover through the development inbox. A
// self-registered admin invites the victim's address into their own
// workspace, asks for a password reset for it while signed out, and reads the
// reset link in /dev/inbox. The inbox must show a member only the mail their
// own actions caused and the mail addressed to them, never a link meant for
// someone else, and it must be off when mail goes to a real SMTP service.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, ORIGIN } from "./support/http";
import { TEST_PASSWORD, addMembership, closeTestDb, createMember, createUser, linkFrom, waitForMail } from "./support/db";
import { signedInClient } from "./support/projects";

let victim: { id: string; email: string };
let attacker: Client;
let attackerWs: string;
let colleague: Client;

beforeAll(async () => {
  victim = await createMember("inbox-victim", "admin");
  const a = await createMember("inbox-attacker", "admin");
  attackerWs = a.workspaceId;
  attacker = await signedInClient(a.email);
  const c = await createUser("inbox-colleague");
  await addMembership(attackerWs, c.id, "designer");
  colleague = await signedInClient(c.email);
});

afterAll(closeTestDb);

describe("the development inbox", () => {
  it("never shows the attacker the reset or invite link of the address they invited", async () => {
    expect((await attacker.post("/api/v1/invites", { email: victim.email, role: "viewer" })).status).toBe(201);
    const invite = await waitForMail(victim.email);
    expect((await new Client().post("/api/v1/auth/password/forgot", { email: victim.email })).status).toBe(200);
    const reset = await waitForMail(victim.email, { after: invite.id });
    const resetToken = linkFrom(reset.text, "/reset-password").token;
    const inviteToken = linkFrom(invite.text, "/invite").token;

    const page = await attacker.get("/dev/inbox");
    expect(page.status).toBe(200);
    expect(page.text).not.toContain(resetToken);
    expect(page.text).not.toContain(inviteToken);
    expect(page.text).not.toContain("#token=");
    expect(page.text).not.toContain(reset.subject);
    // the invitation the attacker sent is theirs to see, without its link
    expect(page.text).toContain(invite.subject.replace(/&/g, "&amp;"));
    expect(page.text).toContain("link withheld");
  });

  it("shows a colleague of the same workspace nothing they did not cause", async () => {
    const page = await colleague.get("/dev/inbox");
    expect(page.status).toBe(200);
    expect(page.text).not.toContain(victim.email);
  });

  it("shows the recipient their own mail with its links", async () => {
    const own = await signedInClient(victim.email);
    const page = await own.get("/dev/inbox");
    expect(page.status).toBe(200);
    const reset = await waitForMail(victim.email);
    expect(page.text).toContain(`href="${linkFrom(reset.text, "/reset-password").url}"`);
  });
});

describe("with a real SMTP service", () => {
  let server: ChildProcess | undefined;
  const port = Number(new URL(ORIGIN).port) + 99; // no mode of scripts/stack.ts uses x199
  const origin = `http://127.0.0.1:${port}`;

  beforeAll(async () => {
    const root = path.resolve(__dirname, "../..");
    // the same build and database, mail pointed at a (never contacted) outside relay
    const env = { ...process.env, NODE_ENV: "production" as const, APP_ORIGIN: origin, SMTP_URL: "smtp://relay.mail.example.net:587", HEATSPLIT_DEV_INBOX: "1" };
    server = spawn(path.join(root, "node_modules/.bin/next"), ["start", "--hostname", "127.0.0.1", "--port", String(port)], { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] });
    await new Promise<void>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error("second server did not start")), 30_000);
      server!.stdout!.on("data", (b: Buffer) => {
        if (/Ready|started server|Local:/i.test(b.toString())) {
          clearTimeout(timer);
          resolve();
        }
      });
      server!.on("exit", (code) => reject(new Error(`second server exited ${code}`)));
    });
  }, 60_000);

  afterAll(() => {
    if (server?.pid) process.kill(server.pid, "SIGTERM");
  });

  it("keeps the development inbox switched off even when HEATSPLIT_DEV_INBOX=1", async () => {
    const signIn = await fetch(`${origin}/api/v1/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/json", origin },
      body: JSON.stringify({ email: victim.email, password: TEST_PASSWORD }),
    });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const inbox = await fetch(`${origin}/dev/inbox`, { headers: { cookie }, redirect: "manual" });
    expect(inbox.status).toBe(404);
    const home = await fetch(`${origin}/home`, { headers: { cookie }, redirect: "manual" });
    expect(home.status).toBe(200);
    expect(await home.text()).not.toContain('href="/dev/inbox"');
  });
});
