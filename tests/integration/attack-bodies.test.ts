// Attack 3 (medium-high): unbounded request bodies. A chunked 100 MB body
// (no Content-Length) to the unauthenticated sign-in route grew the server by
// ~155 MB before the 413, and uploads did the same. Every body reader must
// count while the body streams in and answer 413 once the limit is passed,
// long before the sender is done; the server's memory must not grow by the
// body's size.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Client } from "./support/http";
import { closeTestDb, createMember } from "./support/db";
import { createProjectWithOption, signedInClient } from "./support/projects";
import { createPart, mosfetBody } from "./support/parts";
import { appRssBytes, streamChunked } from "./support/raw";

const MB = 1024 * 1024;
const TOTAL = 100 * MB;
const BOUNDARY = "heatsplit-attack-boundary";
const multipart = `multipart/form-data; boundary=${BOUNDARY}`;
const filePart = (name: string, filename: string, type: string) =>
  `--${BOUNDARY}\r\nContent-Disposition: form-data; name="${name}"; filename="${filename}"\r\nContent-Type: ${type}\r\n\r\n`;
const fieldPart = (name: string) => `--${BOUNDARY}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n`;

let designer: Client;
let partId: string;
let optionId: string;

beforeAll(async () => {
  const m = await createMember("bodies", "admin");
  designer = await signedInClient(m.email);
  partId = await createPart(designer, mosfetBody(`BODY-${Date.now()}`));
  optionId = (await createProjectWithOption(designer)).optionId;
});
afterAll(closeTestDb);

/** Refused while arriving: a 413 before all of the body was written, after at most `limit` plus what sockets buffer. */
function expectRefusedEarly(r: { status: number; sentBytes: number; sentAll: boolean; text: string }, limitBytes: number): void {
  expect(r.status, r.text.slice(0, 200)).toBe(413);
  expect(r.sentAll, "the whole body was sent before the answer").toBe(false);
  expect(r.sentBytes).toBeLessThan(limitBytes + 16 * MB);
}

describe("the unauthenticated sign-in route", () => {
  it("refuses a chunked 100 MB JSON body while it streams, and the server does not grow by it", async () => {
    // warm the route first, so loading its code is not counted as growth
    await streamChunked("/api/v1/auth/sign-in", { totalBytes: 10, contentType: "application/json", prefix: "{}" });
    const before = appRssBytes();
    const r = await streamChunked("/api/v1/auth/sign-in", { totalBytes: TOTAL, contentType: "application/json", prefix: '{"email":"a@b.example","password":"' });
    expectRefusedEarly(r, 256 * 1024);
    const after = appRssBytes();
    if (before !== null && after !== null) {
      console.log(`attack-bodies: ${(r.sentBytes / MB).toFixed(1)} MB sent before the 413; app RSS ${((after - before) / MB).toFixed(1)} MB larger after`);
      expect(after - before, "app RSS growth").toBeLessThan(32 * MB);
    }
  });

  it("refuses form-urlencoded and multipart bodies the same way", async () => {
    expectRefusedEarly(await streamChunked("/api/v1/auth/sign-in", { totalBytes: TOTAL, contentType: "application/x-www-form-urlencoded", prefix: "email=a%40b.example&password=" }), 256 * 1024);
    expectRefusedEarly(await streamChunked("/api/v1/auth/sign-in", { totalBytes: TOTAL, contentType: multipart, prefix: fieldPart("password") }), 256 * 1024);
  });
});

describe("uploads", () => {
  it("the parts CSV import (raw text/csv and multipart)", async () => {
    const cookie = designer.cookieHeader();
    expectRefusedEarly(await streamChunked("/api/v1/parts/import/preview", { cookie, totalBytes: TOTAL, contentType: "text/csv", prefix: "kind,manufacturer,mpn\n" }), 4 * MB);
    expectRefusedEarly(await streamChunked("/api/v1/parts/import/commit", { cookie, totalBytes: TOTAL, contentType: multipart, prefix: filePart("file", "parts.csv", "text/csv") }), 4 * MB);
  });

  it("the datasheet PDF", async () => {
    const r = await streamChunked(`/api/v1/parts/${partId}/datasheet`, { cookie: designer.cookieHeader(), totalBytes: TOTAL, contentType: multipart, prefix: filePart("file", "sheet.pdf", "application/pdf") + "%PDF-1.4\n" });
    expectRefusedEarly(r, 10 * MB);
  });

  it("the bench CSV", async () => {
    const r = await streamChunked(`/api/v1/options/${optionId}/bench`, { cookie: designer.cookieHeader(), totalBytes: TOTAL, contentType: multipart, prefix: filePart("file", "bench.csv", "text/csv") });
    expectRefusedEarly(r, MB);
  });
});

describe("page paths (server actions and the plain-form routes)", () => {
  it("a form post to a page with a length over the limit is refused at once (413)", async () => {
    // Only the first part is written; the 413 must come from the declared
    // length alone, before the rest of the body (socket buffering cannot blur it).
    const r = await streamChunked("/sign-in", {
      totalBytes: TOTAL, contentType: multipart, prefix: fieldPart("email"), headers: { "content-length": String(TOTAL) }, holdAfterPrefix: true,
    });
    expectRefusedEarly(r, MB);
    expect(r.sentBytes).toBe(Buffer.byteLength(fieldPart("email")));
  });

  it("a chunked form post to a page, or to a plain-form route, is refused at once (411: the length is required)", async () => {
    const cookie = designer.cookieHeader();
    for (const path of ["/sign-in", "/switch-workspace", "/sign-out"]) {
      const r = await streamChunked(path, { cookie, totalBytes: TOTAL, contentType: "application/x-www-form-urlencoded", prefix: "workspaceId=" });
      expect(r.status, `${path}: ${r.text.slice(0, 100)}`).toBe(411);
      expect(r.sentAll).toBe(false);
    }
  });
});
