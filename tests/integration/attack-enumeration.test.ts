// Attack 8 (low): user enumeration. Sign-up answered 409 "already exists"
// and the password-reset answer took longer for a known address. Both must
// answer the same for known and unknown addresses: sign-up mails a link to
// finish (or, for an address that has an account, a notice to its owner),
// and neither flow touches the accounts before it answers, so the answer
// cannot wait on work only a known address causes.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, SESSION_COOKIE } from "./support/http";
import { clearAddressThrottle, closeTestDb, createUser, linkFrom, testDb, uniqueEmail, waitForMail } from "./support/db";

beforeAll(clearAddressThrottle);
afterAll(async () => {
  await clearAddressThrottle();
  await closeTestDb();
});

const signUpBody = (email: string) => ({ displayName: "Enum Probe", email, password: "enumeration probe passphrase", workspaceName: "Probe Works" });

/** Runs `send` while the given tables are locked; the answers that arrive within `ms`. */
async function whileLocked<T>(tables: string[], ms: number, send: () => Promise<T>[]): Promise<(T | "waited")[]> {
  const trx = await testDb().transaction();
  try {
    await trx.raw(`lock table ${tables.join(", ")} in access exclusive mode`);
    const timeout = new Promise<"waited">((r) => setTimeout(() => r("waited"), ms));
    return await Promise.all(send().map((p) => Promise.race([p, timeout])));
  } finally {
    await trx.rollback();
  }
}

describe("sign-up", () => {
  it("answers an address with an account exactly as a new one, and mails its owner a notice", async () => {
    const owner = await createUser("enum-owner");
    const hashBefore = (await testDb()("auth_user").where({ id: owner.id }).first<{ password_hash: string }>()).password_hash;
    const taken = await new Client().post("/api/v1/auth/sign-up", signUpBody(owner.email));
    const fresh = await new Client().post("/api/v1/auth/sign-up", signUpBody(uniqueEmail("enum-new")));
    expect(taken.status).toBe(202);
    expect(fresh.status).toBe(202);
    expect(taken.text).toBe(fresh.text);
    expect(taken.headers.getSetCookie()).toEqual([]);
    expect(fresh.headers.getSetCookie()).toEqual([]);
    const notice = await waitForMail(owner.email);
    expect(notice.text).toMatch(/already has a Heatsplit account/);
    expect(notice.text).not.toMatch(/#token=/);
    const hashAfter = (await testDb()("auth_user").where({ id: owner.id }).first<{ password_hash: string }>()).password_hash;
    expect(hashAfter).toBe(hashBefore);
  });

  it("a new address finishes through the mailed link and becomes admin of its workspace", async () => {
    const email = uniqueEmail("enum-finish");
    expect((await new Client().post("/api/v1/auth/sign-up", signUpBody(email))).status).toBe(202);
    expect(await testDb()("auth_user").where({ email }).first()).toBeUndefined();
    const { token } = linkFrom((await waitForMail(email)).text, "/sign-up/confirm");
    const c = new Client();
    const done = await c.post("/api/v1/auth/sign-up/confirm", { token });
    expect(done.status, done.text).toBe(201);
    expect(c.cookies.has(SESSION_COOKIE)).toBe(true);
    expect((await c.get("/api/v1/auth/session")).json()).toMatchObject({ user: { email }, workspace: { name: "Probe Works" }, role: "admin" });
    expect((await new Client().post("/api/v1/auth/sign-up/confirm", { token })).status).toBe(400);
  });

  it("answers without touching the accounts, so known and unknown addresses take the same time", async () => {
    const owner = await createUser("enum-lock");
    const [known, unknown] = await whileLocked(["auth_user", "pending_sign_up"], 5_000, () => [
      new Client().post("/api/v1/auth/sign-up", signUpBody(owner.email)),
      new Client().post("/api/v1/auth/sign-up", signUpBody(uniqueEmail("enum-lock-new"))),
    ]);
    expect(known === "waited" ? "waited" : known.status).toBe(202);
    expect(unknown === "waited" ? "waited" : unknown.status).toBe(202);
    await waitForMail(owner.email);
  });
});

describe("password reset", () => {
  it("answers without touching the accounts or reset links, so known and unknown addresses take the same time", async () => {
    const owner = await createUser("enum-reset");
    const [known, unknown] = await whileLocked(["auth_user", "password_reset"], 5_000, () => [
      new Client().post("/api/v1/auth/password/forgot", { email: owner.email }),
      new Client().post("/api/v1/auth/password/forgot", { email: uniqueEmail("enum-reset-nobody") }),
    ]);
    expect(known === "waited" ? "waited" : known.status).toBe(200);
    expect(unknown === "waited" ? "waited" : unknown.status).toBe(200);
    expect(known !== "waited" && unknown !== "waited" && known.text === unknown.text).toBe(true);
    // the work happens after the answer: the link still arrives
    linkFrom((await waitForMail(owner.email)).text, "/reset-password");
  });
});
