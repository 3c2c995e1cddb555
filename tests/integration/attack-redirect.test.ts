// Attack 4 (medium): open redirect through ?next=. `/sign-in?next=/%09/evil.example`
// sent a signed-in member off-site: a browser drops the tab and reads
// `//evil.example` as another host. Only a same-origin path, after the same
// normalisation a browser applies, may be a redirect target; control
// characters are refused outright (400 naming next). The signed-out half
// (sign in through the form, then the redirect) is in tests/browser/auth.spec.ts.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ORIGIN, type Client } from "./support/http";
import { closeTestDb, createMember } from "./support/db";
import { signedInClient } from "./support/projects";

let member: Client;

beforeAll(async () => {
  member = await signedInClient((await createMember("redirect")).email);
});
afterAll(closeTestDb);

const OFFSITE = ["/.//evil.example", "/%5Cevil.example", "/%5C/evil.example", "%2F%5Cevil.example", "/%2E%2E//evil.example", "https://evil.example/", "//evil.example", "http:evil.example", "/%2F/evil.example"];

describe("a signed-in member following /sign-in?next=", () => {
  for (const next of OFFSITE) {
    it(`stays on Heatsplit for next=${next}`, async () => {
      const r = await member.get(`/sign-in?next=${next}`);
      expect(r.status).toBe(307);
      const target = new URL(r.location!, ORIGIN); // resolved the way a browser resolves Location
      expect(target.origin).toBe(ORIGIN);
      expect(target.pathname.startsWith("//")).toBe(false);
    });
  }

  it("keeps a same-origin path with its query", async () => {
    const r = await member.get(`/sign-in?next=${encodeURIComponent("/parts?kind=mosfet")}`);
    expect(new URL(r.location!, ORIGIN).pathname + new URL(r.location!, ORIGIN).search).toBe("/parts?kind=mosfet");
  });

  for (const next of ["/%09/evil.example", "/%0D%0A/evil.example", "%0Aevil"]) {
    it(`refuses control characters in next=${next} (400 naming next), signed in and out`, async () => {
      for (const client of [member, undefined]) {
        const r = client ? await client.get(`/sign-in?next=${next}`) : await fetch(new URL(`/sign-in?next=${next}`, ORIGIN), { redirect: "manual" }).then(async (x) => ({ status: x.status, text: await x.text(), location: x.headers.get("location") }));
        expect(r.status).toBe(400);
        expect(r.text).toContain("next");
        expect(r.location).toBeNull();
      }
    });
  }
});
