// Attack 2 (high): parallel password guessing. Forty wrong guesses sent at
// once all reached the password check, and a burst of wrong guesses with the
// right one signed in and cleared the count; meanwhile anyone could lock any
// account for 15 minutes. The throttle must count and check in one step,
// slow the (address, account) pair with growing delays, keep a cap per
// address, and leave the owner signing in from elsewhere alone.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { TEST_PASSWORD, clearAddressThrottle, closeTestDb, createMember, createUser, linkFrom, testDb, waitForMail } from "./support/db";
import { signedInClient } from "./support/projects";
import { requestFrom } from "./support/raw";

const WRONG = "not the password at all";
const signInBody = (email: string, password: string) => ({ email, password });
// The attacks come from their own loopback address, so the per-address cap
// they fill never throttles the other test files signing in from 127.0.0.1
// at the same time (and their failures never blur these counts).
const ATTACKER = "127.0.0.50";
const attempt = async (email: string, password: string, headers?: Record<string, string>) => {
  const r = await requestFrom(ATTACKER, "POST", "/api/v1/auth/sign-in", { json: signInBody(email, password), headers });
  return { status: r.status, text: r.text, retryAfter: Number(r.headers["retry-after"]) };
};

beforeAll(clearAddressThrottle);
afterAll(async () => {
  await clearAddressThrottle();
  await closeTestDb();
});

describe("parallel guesses on one account", () => {
  it("40 wrong guesses at once: only a few reach the password check, most get 429", async () => {
    await clearAddressThrottle();
    const { email } = await createUser("burst40");
    const answers = await Promise.all(Array.from({ length: 40 }, () => attempt(email, WRONG)));
    const statuses = answers.map((a) => a.status);
    expect(statuses.filter((s) => s !== 401 && s !== 429)).toEqual([]);
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(3);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(37);
    const limited = answers.find((a) => a.status === 429)!;
    expect(limited.retryAfter).toBeGreaterThan(0);
    await clearAddressThrottle();
  });

  it("a burst of wrong guesses with the right one cannot reach more checks or clear the count early", async () => {
    await clearAddressThrottle();
    const { email } = await createUser("burst-right");
    const wrong = Array.from({ length: 14 }, () => attempt(email, WRONG));
    await Promise.race(wrong); // the burst is under way (its first answer is back); the right guess joins it
    const right = await attempt(email, TEST_PASSWORD);
    const answers = [...(await Promise.all(wrong)), right];
    const checked = answers.filter((a) => a.status === 401 || a.status === 200);
    expect(checked.length).toBeLessThanOrEqual(3);
    // the right password was not even checked, so it cleared nothing: the pair stays slowed down
    expect(right.status).toBe(429);
    expect((await attempt(email, TEST_PASSWORD)).status).toBe(429);
    await clearAddressThrottle();
  });

  it("after a wrong guess the wait grows, and the owner from another address signs in at once", async () => {
    await clearAddressThrottle();
    const { email } = await createMember("owner-elsewhere");
    for (let i = 0; i < 3; i++) expect((await attempt(email, WRONG)).status).toBe(401);
    const first = await attempt(email, TEST_PASSWORD);
    expect(first.status).toBe(429);
    const wait1 = first.retryAfter;
    expect(wait1).toBeGreaterThanOrEqual(1);
    await new Promise((r) => setTimeout(r, wait1 * 1000 + 300));
    expect((await attempt(email, WRONG)).status).toBe(401);
    const second = await attempt(email, WRONG);
    expect(second.status).toBe(429);
    expect(second.retryAfter).toBeGreaterThan(wait1);

    const owner = await requestFrom("127.0.0.2", "POST", "/api/v1/auth/sign-in", { json: signInBody(email, TEST_PASSWORD) });
    expect(owner.status, owner.text).toBe(200);
    await clearAddressThrottle();
  });
});

describe("one address across many accounts", () => {
  it("is capped at 20 failures; a spoofed X-Forwarded-For does not escape; another address is unaffected", async () => {
    await clearAddressThrottle();
    const accounts = await Promise.all([1, 2, 3, 4, 5, 6, 7].map((i) => createUser(`cap${i}`)));
    const statuses: number[] = [];
    for (const a of accounts) for (let i = 0; i < 3; i++) statuses.push((await attempt(a.email, WRONG)).status);
    expect(statuses.slice(0, 20).every((s) => s === 401)).toBe(true);
    expect(statuses[20]).toBe(429);
    const fresh = await createUser("cap-fresh");
    expect((await attempt(fresh.email, TEST_PASSWORD)).status).toBe(429);
    const spoofed = await attempt(fresh.email, TEST_PASSWORD, { "x-forwarded-for": "203.0.113.7" });
    expect(spoofed.status).toBe(429);
    const elsewhere = await requestFrom("127.0.0.3", "POST", "/api/v1/auth/sign-in", { json: signInBody(fresh.email, TEST_PASSWORD) });
    expect(elsewhere.status).toBe(200);
    await clearAddressThrottle();
  });
});

describe("invite acceptance", () => {
  it("counts and checks the password of an existing account in one step too", async () => {
    await clearAddressThrottle();
    const admin = await createMember("guess-inviter", "admin");
    const target = await createUser("guess-invitee");
    const adminClient = await signedInClient(admin.email);
    expect((await adminClient.post("/api/v1/invites", { email: target.email, role: "viewer" })).status).toBe(201);
    const { token } = linkFrom((await waitForMail(target.email)).text, "/invite");
    const answers = await Promise.all(Array.from({ length: 20 }, () => requestFrom(ATTACKER, "POST", "/api/v1/auth/invite/accept", { json: { token, password: WRONG } })));
    expect(answers.filter((a) => a.status === 401).length).toBeLessThanOrEqual(3);
    expect(answers.filter((a) => a.status === 429).length).toBeGreaterThanOrEqual(17);
    const open = await testDb()("invite").where({ email: target.email }).first<{ accepted_at: Date | null }>();
    expect(open.accepted_at).toBeNull();
    await clearAddressThrottle();
  });
});
