// Role-matrix entries for the parts library (format and helpers:
// route-matrix.ts). Parts are made in workspace A through its admin's API
// client; destructive calls get a fresh part per caller. The import routes
// take text/csv and the datasheet upload multipart, but the matrix sends JSON
// (or nothing): a caller who passes the session and role gate is answered
// 415, everyone else 401/403/404 as usual; parts-import.test.ts and
// parts-datasheet.test.ts cover the real uploads.
import crypto from "node:crypto";
import type { Caller, Expectation, Fixtures, MatrixEntry, Outcome } from "./route-matrix";
import type { Permission } from "@/lib/roles";
import { createPart, mosfetBody, tinyPdf, uploadDatasheet } from "./support/parts";

interface Helpers {
  api: (permission: Permission, ok: number, otherWorkspace?: Outcome) => Expectation;
  page: (permission: Permission, otherWorkspace?: Outcome) => Expectation;
}

const mpn = (caller: Caller | string) => `MX-${caller}-${crypto.randomBytes(3).toString("hex")}`;
const freshPart = async (fx: Fixtures, caller: Caller) => ({ partId: await createPart(fx.adminOfA, mosfetBody(mpn(caller))) });

// one part with a datasheet in A, shared by the read-only entries
const sheetParts = new WeakMap<Fixtures, Promise<string>>();
function partWithDatasheet(fx: Fixtures): Promise<string> {
  let made = sheetParts.get(fx);
  if (!made) {
    made = (async () => {
      const id = await createPart(fx.adminOfA, mosfetBody(mpn("sheet")));
      const r = await uploadDatasheet(fx.adminOfA, id, tinyPdf(), "matrix.pdf");
      if (r.status !== 201) throw new Error(`matrix datasheet: ${r.status}`);
      return id;
    })();
    sheetParts.set(fx, made);
  }
  return made;
}
const sheetPart = async (fx: Fixtures) => ({ partId: await partWithDatasheet(fx) });

export const partRoutes = ({ api, page }: Helpers): MatrixEntry[] => [
  // ---- pages ----
  { key: "page /parts", query: "?kind=mosfet&param=qg&min=10%20nC&sort=param", expect: page("read") },
  { key: "page /parts/new", expect: page("part:write") },
  { key: "page /parts/import", expect: page("part:write") },
  { key: "page /parts/[partId]", params: sheetPart, expect: page("read", 404) },

  // ---- records ----
  { key: "GET /api/v1/parts", query: "?q=MX-&sort=mpn&pageSize=5", expect: api("read", 200) },
  { key: "POST /api/v1/parts", body: (_fx, caller) => mosfetBody(mpn(caller)), expect: api("part:write", 201) },
  { key: "GET /api/v1/parts/[partId]", params: sheetPart, expect: api("read", 200, 404) },
  { key: "PATCH /api/v1/parts/[partId]", params: freshPart, body: () => ({ description: "edited by the matrix" }), expect: api("part:write", 200, 404) },
  { key: "DELETE /api/v1/parts/[partId]", params: freshPart, expect: api("part:write", 204, 404) },

  // ---- import / export ----
  { key: "POST /api/v1/parts/import/preview", body: () => ({ csv: "kind,manufacturer,mpn" }), expect: api("part:write", 415) },
  { key: "POST /api/v1/parts/import/commit", body: () => ({ csv: "kind,manufacturer,mpn" }), expect: api("part:write", 415) },
  { key: "GET /api/v1/parts/export", query: "?kind=mosfet", expect: api("read", 200) },

  // ---- datasheet ----
  { key: "GET /api/v1/parts/[partId]/datasheet", params: sheetPart, expect: api("read", 200, 404) },
  { key: "POST /api/v1/parts/[partId]/datasheet", params: freshPart, body: () => ({}), expect: api("part:write", 415, 404) },
];
