// Role-matrix entries for the review workflow, the activity log, the
// workspace derating policy and personal API tokens (format and helpers:
// route-matrix.ts). Calls that change a record get a fresh one per caller.
// Decisions need a revision submitted by someone other than the caller, so
// a designer of workspace A is made here and submits them.
import type { Caller, Expectation, Fixtures, MatrixEntry, Outcome } from "./route-matrix";
import type { Permission } from "@/lib/roles";
import type { Client } from "./support/http";
import { TEST_PASSWORD, addMembership, createUser } from "./support/db";
import { createProject, createProjectWithOption, signedInClient } from "./support/projects";

interface Helpers {
  api: (permission: Permission, ok: number, otherWorkspace?: Outcome) => Expectation;
  page: (permission: Permission, otherWorkspace?: Outcome) => Expectation;
}

const designers = new WeakMap<Fixtures, Promise<Client>>();
function designerOfA(fx: Fixtures): Promise<Client> {
  let c = designers.get(fx);
  if (!c) {
    c = (async () => {
      const u = await createUser("matrix-review-designer");
      await addMembership(fx.workspaceA.id, u.id, "designer");
      return signedInClient(u.email);
    })();
    designers.set(fx, c);
  }
  return c;
}

async function submittedOption(fx: Fixtures): Promise<{ projectId: string; optionId: string }> {
  const designer = await designerOfA(fx);
  const { projectId, optionId } = await createProjectWithOption(designer);
  const r = await designer.post(`/api/v1/options/${optionId}/review`, { revision: 1 });
  if (r.status !== 201) throw new Error(`review fixture: submit ${r.status} ${r.text}`);
  return { projectId, optionId };
}

/** A fresh token of A's admin: only the admin may revoke it; anyone else finds nothing. */
async function adminToken(fx: Fixtures): Promise<{ tokenId: string }> {
  const r = await fx.adminOfA.post("/api/v1/tokens", { name: "matrix token", expiresInDays: 7, password: TEST_PASSWORD });
  if (r.status !== 201) throw new Error(`token fixture: ${r.status} ${r.text}`);
  return { tokenId: r.json<{ token: { id: string } }>().token.id };
}

const ownTokenOnly: Expectation = { admin: 204, designer: 404, reviewer: 404, manager: 404, viewer: 404, otherWorkspace: 404, signedOut: 401 } satisfies Record<Caller, Outcome>;

const DEFAULT_POLICY = {
  tjMargin: { controller: "25 K", mosfet: "25 K", bjt: "25 K", driverIc: "25 K", clamp: "25 K" },
  vgsMaxFraction: "80 %",
  minHeadroomAbovePlateau: "4 V",
};

const project = async (fx: Fixtures) => ({ projectId: await createProject(fx.adminOfA) });
const option = async (fx: Fixtures) => createProjectWithOption(fx.adminOfA);
// The record an action's page() made, for its fields() (they run one after the other per caller).
const forms = { option: { projectId: "", optionId: "" }, token: "" };
const reviewPage = (o: { projectId: string; optionId: string }) => `/projects/${o.projectId}/options/${o.optionId}/review`;

export const reviewRoutes = ({ api, page }: Helpers): MatrixEntry[] => [
  // ---- pages ----
  { key: "page /projects/[projectId]/options/[optionId]/review", params: option, expect: page("read", 404) },
  { key: "page /projects/[projectId]/activity", params: project, expect: page("read", 404) },
  { key: "page /settings/derating", expect: page("read") },
  { key: "page /settings/tokens", expect: page("token:own") },

  // ---- review workflow ----
  { key: "GET /api/v1/options/[optionId]/review", params: option, expect: api("read", 200, 404) },
  { key: "POST /api/v1/options/[optionId]/review", params: option, body: () => ({ note: "matrix" }), expect: api("option:submit", 201, 404) },
  {
    key: "POST /api/v1/options/[optionId]/review/decision",
    params: submittedOption,
    body: () => ({ revision: 1, decision: "approved", comments: [{ body: "matrix", targetPart: "Q1" }] }),
    expect: api("option:review", 200, 404),
  },
  {
    key: "PATCH /api/v1/options/[optionId]/revisions/[rev]",
    params: async (fx) => ({ ...(await option(fx)), rev: "1" }),
    body: () => ({ note: "note fixed by the matrix" }),
    expect: api("option:write", 200, 404),
  },
  { key: "GET /api/v1/projects/[projectId]/activity", params: project, expect: api("read", 200, 404) },

  // ---- derating policy ----
  { key: "GET /api/v1/derating", expect: api("read", 200) },
  { key: "PUT /api/v1/derating", body: () => DEFAULT_POLICY, expect: api("derating:write", 200) },

  // ---- API tokens (session only) ----
  { key: "GET /api/v1/tokens", expect: api("token:own", 200) },
  { key: "POST /api/v1/tokens", body: () => ({ name: "matrix token", expiresInDays: 7, password: TEST_PASSWORD }), expect: api("token:own", 201) },
  { key: "DELETE /api/v1/tokens/[tokenId]", params: adminToken, expect: ownTokenOnly },

  // ---- server actions, each through the route with the same flow ----
  {
    key: "action (workspace)/projects/[projectId]/options/[optionId]/review/actions.ts#submitReviewAction",
    via: "POST /api/v1/options/[optionId]/review",
    page: async (fx) => reviewPage((forms.option = await option(fx))),
    fields: () => ({ optionId: forms.option.optionId, note: "matrix (form)" }),
  },
  {
    key: "action (workspace)/projects/[projectId]/options/[optionId]/review/actions.ts#decideReviewAction",
    via: "POST /api/v1/options/[optionId]/review/decision",
    page: async (fx) => reviewPage((forms.option = await submittedOption(fx))),
    fields: () => ({ optionId: forms.option.optionId, revision: "1", decision: "approved", body: "matrix (form)", targetPart: "Q1" }),
  },
  {
    key: "action (workspace)/settings/derating/actions.ts#saveDeratingAction",
    via: "PUT /api/v1/derating",
    page: () => "/settings/derating",
    fields: () => ({
      ...Object.fromEntries(Object.entries(DEFAULT_POLICY.tjMargin).map(([k, v]) => [`tjMargin.${k}`, v])),
      vgsMaxFraction: DEFAULT_POLICY.vgsMaxFraction,
      minHeadroomAbovePlateau: DEFAULT_POLICY.minHeadroomAbovePlateau,
    }),
  },
  {
    key: "action (workspace)/settings/tokens/actions.ts#createTokenAction",
    via: "POST /api/v1/tokens",
    page: () => "/settings/tokens",
    fields: () => ({ name: "matrix token (form)", expiresInDays: "7", password: TEST_PASSWORD }),
  },
  {
    key: "action (workspace)/settings/tokens/actions.ts#revokeTokenAction",
    via: "DELETE /api/v1/tokens/[tokenId]",
    page: async (fx) => {
      forms.token = (await adminToken(fx)).tokenId;
      return "/settings/tokens";
    },
    fields: () => ({ id: forms.token }),
  },
];
