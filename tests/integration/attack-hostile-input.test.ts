// Attack 7 (low): 5xx on hostile input. NUL in a query string, JSON nested
// 100 000 levels (unauthenticated), a lone surrogate in a design document
// (PostgreSQL refuses it) and a `next` with a newline or characters outside
// Latin-1 all answered 500. Each must be a 400 that names the field.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client, ORIGIN } from "./support/http";
import { closeTestDb, createMember } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";

let designer: Client;
let optionId: string;

beforeAll(async () => {
  designer = await signedInClient((await createMember("hostile", "admin")).email);
  optionId = (await createProjectWithOption(designer)).optionId;
});
afterAll(closeTestDb);

type Issues = { error: { code: string; issues: { path: string; message: string }[] } };
const issuePaths = (text: string) => (JSON.parse(text) as Issues).error.issues.map((i) => i.path);

async function raw(client: Client | null, method: string, path: string, body: string): Promise<{ status: number; text: string }> {
  const headers: Record<string, string> = { "content-type": "application/json", origin: ORIGIN };
  if (client) headers.cookie = client.cookieHeader();
  const res = await fetch(new URL(path, ORIGIN), { method, headers, body, redirect: "manual" });
  return { status: res.status, text: await res.text() };
}

describe("NUL in a query string", () => {
  for (const path of ["/api/v1/projects?q=%00", "/api/v1/parts?q=a%00b", "/api/v1/parts/export?q=%00"]) {
    it(`GET ${path} is a 400 naming q`, async () => {
      const r = await designer.get(path);
      expect(r.status).toBe(400);
      expect(issuePaths(r.text)).toContain("q");
    });
  }
  for (const path of ["/projects?q=%00", "/parts?q=x%00"]) {
    it(`the list page ${path} is a 400 naming q`, async () => {
      const r = await designer.get(path);
      expect(r.status).toBe(400);
      expect(r.text).toMatch(/\bq\b/);
    });
  }
});

describe("JSON nested 100 000 levels", () => {
  const deep = "[".repeat(100_000) + "]".repeat(100_000);
  it("to the unauthenticated sign-in route is a 400", async () => {
    const r = await raw(null, "POST", "/api/v1/auth/sign-in", deep);
    expect(r.status).toBe(400);
    expect(JSON.parse(r.text).error.message).toMatch(/nested/i);
  });
  it("inside an object of a signed-in write is a 400", async () => {
    const r = await raw(designer, "POST", "/api/v1/projects", `{"name":${"[".repeat(100_000)}${"]".repeat(100_000)}}`);
    expect(r.status).toBe(400);
  });
});

/** The dotted path of the first string value found walking the object (keys in order). */
function firstStringPath(v: unknown, prefix: string): string | null {
  if (typeof v === "string") return prefix;
  if (v && typeof v === "object") {
    for (const [k, x] of Object.entries(v)) {
      const p = firstStringPath(x, `${prefix}.${k}`);
      if (p) return p;
    }
  }
  return null;
}

function setPath(root: Record<string, unknown>, path: string, value: unknown): void {
  const keys = path.split(".").slice(1);
  let node = root as Record<string, unknown>;
  for (const k of keys.slice(0, -1)) node = node[k] as Record<string, unknown>;
  node[keys[keys.length - 1]] = value;
}

describe("a lone surrogate", () => {
  it("in a design document is a 400 naming where it is", async () => {
    const latest = (await designer.get(`/api/v1/options/${optionId}`)).json<{ revision: { revision: number; document: Record<string, unknown> } }>().revision;
    const doc = structuredClone(latest.document);
    const at = firstStringPath(doc, "document")!;
    expect(at).toBeTruthy();
    setPath(doc, at, "rev \ud800 B");
    const body = JSON.stringify({ baseRevision: latest.revision, document: doc, note: "surrogate" });
    expect(body).toContain("\\ud800"); // sent as the JSON escape, as an attacker would
    const r = await raw(designer, "POST", `/api/v1/options/${optionId}/revisions`, body);
    expect(r.status, r.text).toBe(400);
    expect(issuePaths(r.text)).toContain(at);
  });

  it("in a plain field of an unauthenticated route is a 400 naming it", async () => {
    const r = await raw(null, "POST", "/api/v1/auth/password/forgot", '{"email":"a\\udfff@b.example"}');
    expect(r.status).toBe(400);
    expect(issuePaths(r.text)).toContain("email");
  });
});

describe("a next value with a newline or characters outside Latin-1", () => {
  for (const next of ["/home%0A", "/%E2%82%AC", "/%F0%9F%94%A5"]) {
    it(`the sign-in page refuses next=${next} with a 400 naming next`, async () => {
      const r = await designer.get(`/sign-in?next=${next}`);
      expect(r.status).toBe(400);
      expect(r.text).toContain("next");
      const out = await new Client().get(`/sign-in?next=${next}`);
      expect(out.status).toBe(400);
    });
  }

  for (const next of ["/home\nSet-Cookie: x=1", "/€", "/\u0000"]) {
    it(`the sign-in route refuses next=${JSON.stringify(next)} with a 400 naming next`, async () => {
      const r = await new Client().post("/api/v1/auth/sign-in", { email: "someone@example.test", password: "whatever it is", next });
      expect(r.status).toBe(400);
      expect(issuePaths(r.text)).toContain("next");
    });
  }
});
