// Bad input on every write route: for each non-GET entry of the role matrix
// (read programmatically from MATRIX, so a new write route is fuzzed as soon
// as it is described there), fast-check sends malformed versions of the
// entry's valid body as workspace A's admin (who passes every role gate, so
// the input reaches validation): wrong types, huge and NaN-like strings,
// units of the wrong dimension, nested junk, missing and unknown fields,
// broken JSON; CSV files for the imports and random bytes for the datasheet
// upload. Every answer must be below 500 and its JSON free of NaN/Infinity;
// a 400 must carry code and message, and when a field was spoiled on a body
// that is otherwise accepted, issues[].path must name that field; a refused
// request (4xx) must leave the row counts of the app's tables unchanged.
// Total requests: FUZZ_RUNS (default 300; `npm run fuzz` sends 10 000).
import crypto from "node:crypto";
import fc from "fast-check";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/roles";
import { Client, ORIGIN } from "./support/http";
import { TEST_PASSWORD, addMembership, clearAddressThrottle, closeTestDb, createUser, createWorkspaceWithRoles, testDb, uniqueEmail } from "./support/db";
import { sendRaw, tinyPdf, uploadDatasheet } from "./support/parts";
import { applyMutation, csvBody, datasheetBytes, mutationOf, type Mutation } from "./support/fuzz-bodies";
import { MATRIX, type CallEntry, type Fixtures } from "./route-matrix";

const TOTAL_RUNS = Number(process.env.FUZZ_RUNS ?? 300);
// A fixed seed in npm test keeps CI repeatable; `npm run fuzz` sets
// FUZZ_SEED=random to explore new cases. The seed is in every failure message:
// FUZZ_SEED=<it> npm run fuzz repeats the run.
const FUZZ_SEED = process.env.FUZZ_SEED === "random" ? Math.floor(Math.random() * 2 ** 31) : Number(process.env.FUZZ_SEED ?? 20261201);
/** Tables a refused request must not add rows to (auth_guard, dev_mailbox and activity_log may change on refusals by design). */
const TABLES = ["auth_user", "workspace", "membership", "user_session", "invite", "password_reset", "project", "design_option", "option_revision", "option_choice", "part", "stored_file"];
const TOUCHED = ["project", "design_option", "part"]; // tables with updated_at: a refused PATCH must not touch a row

const writes = MATRIX.filter((e): e is CallEntry => "expect" in e).filter((e) => !["GET", "page"].includes(e.key.split(" ")[0]));
const runsPerRoute = Math.max(3, Math.ceil(TOTAL_RUNS / Math.max(1, writes.length)));
let sent = 0;

let fx: Fixtures;
let admin: Client;

async function signedIn(email: string): Promise<Client> {
  const c = new Client();
  const r = await c.post("/api/v1/auth/sign-in", { email, password: TEST_PASSWORD });
  if (r.status !== 200) throw new Error(`fuzz sign-in failed: ${r.status} ${r.text}`);
  return c;
}

// The sign-in routes' cases fail passwords on purpose; the loopback address's
// count would then throttle every later fixture's sign-in for 15 minutes.
afterEach(clearAddressThrottle);

beforeAll(async () => {
  await clearAddressThrottle();
  const a = await createWorkspaceWithRoles("Fuzz A", ["admin"]);
  const b = await createWorkspaceWithRoles("Fuzz B", ["admin"]);
  admin = await signedIn(a.users.admin.email);
  const spare = await createUser("fuzz-spare");
  fx = {
    workspaceA: { id: a.workspaceId, name: a.name },
    workspaceB: { id: b.workspaceId, name: b.name },
    async newMemberOfA(role: Role) {
      const u = await createUser(`fuzz-${role}`);
      await addMembership(a.workspaceId, u.id, role);
      return u.id;
    },
    async newInviteOfA() {
      const id = `inv_fuzz_${crypto.randomBytes(6).toString("hex")}`;
      await testDb()("invite").insert({ id, workspace_id: a.workspaceId, email: uniqueEmail("fuzz-invite"), role: "viewer", token_hash: crypto.randomBytes(32).toString("hex"), invited_by: a.users.admin.id, expires_at: new Date(Date.now() + 86_400_000) });
      return id;
    },
    spareAccount: { email: spare.email, password: TEST_PASSWORD },
    uniqueEmail,
    adminOfA: admin,
  };
});

afterAll(async () => {
  console.log(`fuzz-writes: ${sent} requests to ${writes.length} write routes (FUZZ_RUNS=${TOTAL_RUNS}), FUZZ_SEED=${FUZZ_SEED}`);
  // refused sign-ins count against the loopback address; later files sign in from it too
  await clearAddressThrottle();
  await closeTestDb();
});

async function snapshot(): Promise<Record<string, string>> {
  const counts = TABLES.map((t) => `(select count(*) from ${t})::text as ${t}`);
  const touched = TOUCHED.map((t) => `(select max(updated_at) from ${t})::text as ${t}_updated`);
  const r = await testDb().raw(`select ${[...counts, ...touched].join(", ")}`);
  return r.rows[0];
}

/** Every number in a JSON value is finite (JSON.parse turns 1e999 into Infinity). */
function nonFinitePath(v: unknown, path = "$"): string | null {
  if (typeof v === "number") return Number.isFinite(v) ? null : path;
  if (v && typeof v === "object") {
    for (const [k, x] of Object.entries(v)) {
      const p = nonFinitePath(x, `${path}.${k}`);
      if (p) return p;
    }
  }
  return null;
}

/** The message names the field by its last path segment (e.g. "qgVgs"), as a rule between two fields does. */
const mentions = (message: string, path: string) => {
  const last = path.split(".").pop() ?? "";
  return last.length >= 3 && !/^\d+$/.test(last) && message.includes(last);
};
const related = (a: string, b: string) => a === b || a.startsWith(`${b}.`) || b.startsWith(`${a}.`);

interface Answer {
  status: number;
  type: string;
  text: string;
}

/** The problems with one answer (empty when it is fine). */
/** The value at a dotted path of a body (undefined when absent). */
function valueAt(body: unknown, path: string): unknown {
  let cur = body;
  for (const k of path.split(".")) cur = cur !== null && typeof cur === "object" ? (cur as Record<string, unknown>)[k] : undefined;
  return cur;
}

function judge(answer: Answer, mutation: Mutation | null, baselineOk: boolean, valid?: unknown): string[] {
  const problems: string[] = [];
  if (answer.status >= 500) problems.push(`status ${answer.status}`);
  if (!answer.type.includes("json")) return problems;
  let json: { error?: { code?: unknown; message?: unknown; issues?: { path?: unknown; message?: unknown }[] } };
  try {
    json = JSON.parse(answer.text);
  } catch {
    return [...problems, "content-type JSON but the body does not parse (a NaN or Infinity token would)"];
  }
  const bad = nonFinitePath(json);
  if (bad) problems.push(`non-finite number at ${bad}`);
  if (answer.status >= 400) {
    const err = json.error;
    if (typeof err?.code !== "string" || typeof err?.message !== "string") problems.push("refusal without error.code and error.message");
    const issues = err?.issues ?? [];
    if (issues.some((i) => typeof i.path !== "string" || typeof i.message !== "string")) problems.push("an issue without a string path and message");
    const fieldMutation = mutation && (mutation.kind === "replace" || mutation.kind === "delete" || mutation.kind === "addKey");
    if (answer.status === 400 && baselineOk && fieldMutation && err?.message !== "The body is not valid JSON.") {
      // zod reports an unknown key at its object's path with the key in the message
      const parent = mutation.path.split(".").slice(0, -1).join(".");
      const named =
        mutation.kind === "addKey"
          ? issues.some((i) => (String(i.path) === mutation.path && String(i.message).includes(mutation.key)) || related(String(i.path), [mutation.path, mutation.key].filter(Boolean).join(".")))
          : mutation.kind === "delete"
            ? issues.some((i) => related(String(i.path), mutation.path) || String(i.path) === parent) || // a missing field, or an object-level rule ("nothing to change")
              (/\.\d+$/.test(mutation.path) && issues.some((i) => String(i.path) !== "")) // a list element others refer to: the error names the dangling references
            : issues.some((i) => related(String(i.path), mutation.path) || mentions(String(i.message), mutation.path)) || // a cross-field rule may sit on the partner field
              (/\.id$/.test(mutation.path) && typeof valueAt(valid, mutation.path) === "string" && issues.some((i) => String(i.message).includes(`"${String(valueAt(valid, mutation.path))}"`))); // a renamed id others refer to: the error names the dangling reference by the old id
      if (!named) problems.push(`400 does not name the spoiled field ${mutation.path} (issues: ${JSON.stringify(issues).slice(0, 200)})`);
    }
  }
  return problems;
}

function urlOf(entry: CallEntry, params: Record<string, string>): string {
  const template = entry.key.split(" ")[1];
  return template.replace(/\[([^\]]+)\]/g, (_, name: string) => encodeURIComponent(params[name] ?? "missing")) + (entry.query ?? "");
}

const isCsv = (e: CallEntry) => e.key.includes("/parts/import/");
const isUpload = (e: CallEntry) => e.key === "POST /api/v1/parts/[partId]/datasheet";

describe(`write routes answer malformed input with a 4xx and write nothing (${runsPerRoute} cases each)`, () => {
  it("the matrix lists write routes to fuzz", () => {
    expect(writes.length).toBeGreaterThan(20);
  });

  for (const entry of writes) {
    it(entry.key, async () => {
      const method = entry.key.split(" ")[0];
      const problems: string[] = [];
      let params: Record<string, string> | undefined;
      const pdf = tinyPdf("fuzz");
      const baselineOk = typeof entry.expect.admin === "number" && entry.expect.admin < 300;
      params = entry.params ? await entry.params(fx, "admin") : {};
      // the shape of the valid body, for the mutations; each case builds a fresh one (unique e-mails etc.)
      const shape = entry.body?.(fx, "admin") ?? {};
      await fc.assert(
        fc.asyncProperty(
          (isCsv(entry) ? csvBody : isUpload(entry) ? datasheetBytes(pdf) : mutationOf(shape)) as fc.Arbitrary<unknown>,
          fc.nat(),
          fc.boolean(),
          fc.constantFrom("../../etc/passwd", "x".repeat(300), "0", "-1", "%00", "NaN", "' or 1=1 --", "prj_doesnotexist"),
          async (special, seed, spoilParam, junkParam) => {
            // records (fresh after a destructive success); one param spoiled now and then
            params ??= entry.params ? await entry.params(fx, "admin") : {};
            const useParams = { ...params };
            const names = Object.keys(useParams).filter((n) => entry.key.includes(`[${n}]`)); // only segments of this URL
            const paramSpoiled = spoilParam && names.length > 0 && seed % 4 === 0;
            if (paramSpoiled) useParams[names[seed % names.length]] = junkParam;
            const client = entry.freshSession ? new Client() : admin;
            const valid = entry.body?.(fx, "admin");
            const mutation = isCsv(entry) || isUpload(entry) ? null : (special as Mutation);
            const before = await snapshot();
            let answer: Answer;
            const url = urlOf(entry, useParams);
            if (isCsv(entry)) {
              const r = await sendRaw(client, "POST", url, (special as { text: string }).text, "text/csv");
              answer = { status: r.status, type: r.headers.get("content-type") ?? "", text: Buffer.from(r.bytes).toString("utf8") };
            } else if (isUpload(entry)) {
              const r = await uploadDatasheet(client, useParams.partId, (special as { bytes: Uint8Array }).bytes, "fuzz.pdf");
              answer = { status: r.status, type: r.headers.get("content-type") ?? "", text: Buffer.from(r.bytes).toString("utf8") };
            } else {
              const text = applyMutation(valid ?? {}, mutation!);
              const contentType = entry.form ? "application/x-www-form-urlencoded" : "application/json";
              const body = entry.form ? formOf(text) : text;
              const headers: Record<string, string> = { origin: ORIGIN, "content-type": contentType };
              if (client.cookies.size) headers.cookie = client.cookieHeader();
              const res = await fetch(new URL(url, ORIGIN), { method, headers, body, redirect: "manual" });
              answer = { status: res.status, type: res.headers.get("content-type") ?? "", text: await res.text() };
            }
            sent++;
            const found = judge(answer, paramSpoiled ? null : mutation, baselineOk && !paramSpoiled, valid);
            if (answer.status >= 400 && answer.status < 500) {
              const after = await snapshot();
              const changed = Object.keys(before).filter((k) => before[k] !== after[k]);
              if (changed.length) found.push(`refused (${answer.status}) but changed ${changed.join(", ")}`);
            }
            if (answer.status < 300 && method === "DELETE") params = undefined;
            if (paramSpoiled && answer.status < 400) found.push(`spoiled param ${JSON.stringify(junkParam)} answered ${answer.status}`);
            if (found.length) {
              const what = mutation ? JSON.stringify(mutation).slice(0, 160) : isCsv(entry) ? (special as { spoiled: string }).spoiled : isUpload(entry) ? (special as { what: string }).what : "";
              problems.push(`${found.join("; ")} <- ${what}${paramSpoiled ? ` param ${junkParam}` : ""}: ${answer.status} ${answer.text.slice(0, 160)}`);
            }
            return true;
          },
        ),
        { numRuns: runsPerRoute, endOnFailure: true, seed: FUZZ_SEED },
      );
      expect(problems.slice(0, 8), `FUZZ_SEED=${FUZZ_SEED}`).toEqual([]);
    }, 30_000 + runsPerRoute * 600);
  }
});

/** A form body from a mutated JSON object: top-level fields as strings (forms carry only strings). */
function formOf(jsonText: string): string {
  let obj: unknown;
  try {
    obj = JSON.parse(jsonText);
  } catch {
    return jsonText;
  }
  if (!obj || typeof obj !== "object" || Array.isArray(obj)) return String(jsonText);
  const form = new URLSearchParams();
  try {
    for (const [k, v] of Object.entries(obj)) form.append(k, typeof v === "string" ? v : JSON.stringify(v) ?? "");
  } catch {
    return jsonText; // too deep for this process's JSON.stringify: send the text as it is
  }
  return form.toString();
}
