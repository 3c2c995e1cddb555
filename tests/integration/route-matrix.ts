// THE ROLE MATRIX: who gets what from every page, route handler method and
// server action under app/. role-matrix.test.ts walks app/ and FAILS when a
// page.tsx, an exported method of a route.ts, or an exported action of an
// actions.ts has no entry here; it then calls every entry as each caller:
//
//   admin, designer, reviewer, manager, viewer   members of workspace A
//   otherWorkspace                               the ADMIN of workspace B (has every permission,
//                                                so a record of A must answer 404, not 403)
//   signedOut                                    no session (API: 401, pages: redirect to sign-in)
//
// ADDING AN ENTRY (one object in MATRIX below):
//   key      "page /projects/[projectId]"            a page (route groups dropped from the path)
//            "GET /api/v1/projects/[projectId]"       one exported method of a route.ts
//            "action (workspace)/projects/new/actions.ts#createProjectAction"
//                                                     one exported server action (path under app/)
//   params   (fx, caller) => ({ projectId: ... })     fills the [placeholders]; use fx to make
//                                                     records in workspace A (fresh ones for
//                                                     destructive calls: each caller gets its own)
//   query    "?page=2"                                optional query string
//   body     (fx, caller) => ({ ... })                JSON body (or form fields with form: true)
//   expect   per caller: a status number, "signin" (redirect to /sign-in) or "redirect:/path".
//            Helpers: api(permission, okStatus, otherWorkspace), page(permission), everyone(status).
//   freshSession: true   when the call ends or replaces the caller's session (sign-in, sign-out…)
//   An action is one of two doors to the same service: { key, via: "<route key>", page, fields }.
//   The test checks that the action and that route declare the same permission, then posts
//   the action (as React does, to `page`, with the form `fields`) as every caller: it must
//   succeed where the route succeeds and refuse with the route's status where it refuses.
//   Every non-GET entry is also sent once with a foreign Origin (as A's admin): it must be 403.
//
// Fixtures (fx) are created by the test in two fresh workspaces; extend Fixtures
// (and makeFixtures in role-matrix.test.ts) when a new kind of record is needed.
import { PERMISSIONS, ROLES, type Permission, type Role } from "@/lib/roles";
import type { Client } from "./support/http";
import { projectRoutes } from "./route-matrix-projects";
import { partRoutes } from "./route-matrix-parts";
import { budgetRoutes } from "./route-matrix-budget";
import { modelRoutes } from "./route-matrix-model";
import { reviewRoutes } from "./route-matrix-review";
import { benchRoutes } from "./route-matrix-bench";

export type Caller = Role | "otherWorkspace" | "signedOut";
export const CALLERS: readonly Caller[] = [...ROLES, "otherWorkspace", "signedOut"];

export type Outcome = number | "signin" | `redirect:${string}`;
export type Expectation = Record<Caller, Outcome>;

export interface Fixtures {
  workspaceA: { id: string; name: string };
  workspaceB: { id: string; name: string };
  /** A new member of workspace A with the given role; returns the user id. */
  newMemberOfA(role: Role): Promise<string>;
  /** A new open invitation of workspace A; returns the invite id. */
  newInviteOfA(): Promise<string>;
  /** E-mail and password of an account that exists (and belongs to no workspace). */
  spareAccount: { email: string; password: string };
  /** A never-used address. */
  uniqueEmail(label: string): string;
  /** Signed-in API client of workspace A's admin, to create records through the API. */
  adminOfA: Client;
}

export interface CallEntry {
  key: string;
  params?: (fx: Fixtures, caller: Caller) => Record<string, string> | Promise<Record<string, string>>;
  query?: string;
  body?: (fx: Fixtures, caller: Caller) => unknown;
  form?: boolean;
  freshSession?: boolean;
  expect: Expectation;
}

export interface ActionEntry {
  key: string;
  /** Key of the CallEntry whose route runs the same flow with the same permission. */
  via: string;
  /** The page whose form posts the action (the action runs there). */
  page: (fx: Fixtures, caller: Caller) => string | Promise<string>;
  /** The form's fields, as strings; made after page(), so page() may make the records they name. */
  fields?: (fx: Fixtures, caller: Caller) => Record<string, string> | Promise<Record<string, string>>;
  freshSession?: boolean;
}

/** Present in app/ but not yet described; the test lists these as todo, not as passed. */
export interface PendingEntry {
  key: string;
  pending: string;
}

export type MatrixEntry = CallEntry | ActionEntry | PendingEntry;

function rolesWith(permission: Permission): readonly Role[] {
  return PERMISSIONS[permission] as readonly Role[];
}

/** API route: roles with the permission get `ok`, the others 403; signed out 401. */
export function api(permission: Permission, ok: number, otherWorkspace: Outcome = ok): Expectation {
  const e = Object.fromEntries(ROLES.map((r) => [r, rolesWith(permission).includes(r) ? ok : 403])) as Expectation;
  return { ...e, otherWorkspace, signedOut: 401 };
}

/** Workspace page: roles with the permission 200, the others 403; signed out -> sign-in. */
export function page(permission: Permission, otherWorkspace: Outcome = 200): Expectation {
  const e = Object.fromEntries(ROLES.map((r) => [r, rolesWith(permission).includes(r) ? 200 : 403])) as Expectation;
  return { ...e, otherWorkspace, signedOut: "signin" };
}

/** The same outcome for every caller (public pages and signed-out flows). */
export function everyone(outcome: Outcome, signedOut: Outcome = outcome): Expectation {
  return { ...(Object.fromEntries(CALLERS.map((c) => [c, outcome])) as Expectation), signedOut };
}

const BOGUS_TOKEN = "not-a-real-token-0123456789abcdef";

export const MATRIX: MatrixEntry[] = [
  // ---- public pages ----
  { key: "page /", expect: everyone(200) },
  { key: "page /sign-in", expect: everyone("redirect:/home", 200) },
  { key: "page /sign-up", expect: everyone(200) },
  { key: "page /sign-up/confirm", expect: everyone(200) },
  { key: "page /forgot-password", expect: everyone(200) },
  { key: "page /reset-password", expect: everyone(200) },
  { key: "page /invite", expect: everyone(200) },

  // ---- workspace pages ----
  { key: "page /home", expect: page("read") },
  { key: "page /members", expect: page("members:manage") },
  { key: "page /dev/inbox", expect: page("dev:inbox") },

  // ---- signed-out flows (JSON) ----
  {
    key: "POST /api/v1/auth/sign-up",
    freshSession: true,
    body: (fx) => ({ displayName: "Matrix Signup", email: fx.uniqueEmail("matrix-signup"), password: "matrix sign-up password", workspaceName: "Matrix" }),
    expect: everyone(202),
  },
  { key: "POST /api/v1/auth/sign-up/confirm", body: () => ({ token: BOGUS_TOKEN }), expect: everyone(400) },
  { key: "POST /api/v1/auth/sign-in", freshSession: true, body: (fx) => ({ ...fx.spareAccount, next: "/home" }), expect: everyone(200) },
  { key: "POST /api/v1/auth/sign-out", freshSession: true, expect: everyone(204) },
  { key: "POST /api/v1/auth/password/forgot", body: (fx) => ({ email: fx.uniqueEmail("nobody") }), expect: everyone(200) },
  { key: "POST /api/v1/auth/password/reset", body: () => ({ token: BOGUS_TOKEN, password: "a long enough password" }), expect: everyone(400) },
  { key: "POST /api/v1/auth/invite/describe", body: () => ({ token: BOGUS_TOKEN }), expect: everyone(400) },
  { key: "POST /api/v1/auth/invite/accept", body: () => ({ token: BOGUS_TOKEN, displayName: "X", password: "a long enough password" }), expect: everyone(400) },

  // ---- session ----
  { key: "GET /api/v1/auth/session", expect: api("read", 200) },
  { key: "POST /api/v1/auth/workspace", body: (fx) => ({ workspaceId: fx.workspaceA.id }), expect: api("read", 200, 404) },
  { key: "POST /sign-out", form: true, freshSession: true, expect: everyone(303) },
  { key: "POST /switch-workspace", form: true, body: (fx) => ({ workspaceId: fx.workspaceA.id }), expect: api("read", 303, 404) },

  // ---- members and invitations ----
  { key: "GET /api/v1/members", expect: api("members:manage", 200) },
  {
    key: "PATCH /api/v1/members/[userId]",
    params: async (fx) => ({ userId: await fx.newMemberOfA("designer") }),
    body: () => ({ role: "viewer" }),
    expect: api("members:manage", 200, 404),
  },
  {
    key: "DELETE /api/v1/members/[userId]",
    params: async (fx) => ({ userId: await fx.newMemberOfA("designer") }),
    expect: api("members:manage", 204, 404),
  },
  { key: "GET /api/v1/invites", expect: api("members:manage", 200) },
  { key: "POST /api/v1/invites", body: (fx) => ({ email: fx.uniqueEmail("matrix-invitee"), role: "viewer" }), expect: api("members:manage", 201) },
  {
    key: "DELETE /api/v1/invites/[inviteId]",
    params: async (fx) => ({ inviteId: await fx.newInviteOfA() }),
    expect: api("members:manage", 204, 404),
  },

  // ---- server actions, each through the route with the same flow ----
  {
    key: "action (auth)/sign-in/actions.ts#signInAction",
    via: "POST /api/v1/auth/sign-in",
    freshSession: true,
    page: () => "/sign-in",
    fields: (fx) => ({ ...fx.spareAccount, next: "/home" }),
  },
  {
    key: "action (auth)/sign-up/actions.ts#signUpAction",
    via: "POST /api/v1/auth/sign-up",
    freshSession: true,
    page: () => "/sign-up",
    fields: (fx) => ({ displayName: "Matrix Signup", email: fx.uniqueEmail("matrix-signup-form"), password: "matrix sign-up password", workspaceName: "Matrix" }),
  },
  { key: "action (auth)/sign-up/actions.ts#confirmSignUpAction", via: "POST /api/v1/auth/sign-up/confirm", page: () => "/sign-up/confirm", fields: () => ({ token: BOGUS_TOKEN }) },
  { key: "action (auth)/forgot-password/actions.ts#forgotPasswordAction", via: "POST /api/v1/auth/password/forgot", page: () => "/forgot-password", fields: (fx) => ({ email: fx.uniqueEmail("nobody-form") }) },
  {
    key: "action (auth)/reset-password/actions.ts#resetPasswordAction",
    via: "POST /api/v1/auth/password/reset",
    page: () => "/reset-password",
    fields: () => ({ token: BOGUS_TOKEN, password: "a long enough password" }),
  },
  { key: "action (auth)/invite/actions.ts#describeInviteAction", via: "POST /api/v1/auth/invite/describe", page: () => "/invite", fields: () => ({ token: BOGUS_TOKEN }) },
  {
    key: "action (auth)/invite/actions.ts#acceptInviteAction",
    via: "POST /api/v1/auth/invite/accept",
    page: () => "/invite",
    fields: () => ({ token: BOGUS_TOKEN, displayName: "X", password: "a long enough password" }),
  },
  {
    key: "action (workspace)/members/actions.ts#inviteMemberAction",
    via: "POST /api/v1/invites",
    page: () => "/members",
    fields: (fx) => ({ email: fx.uniqueEmail("matrix-invitee-form"), role: "viewer" }),
  },
  {
    key: "action (workspace)/members/actions.ts#changeRoleAction",
    via: "PATCH /api/v1/members/[userId]",
    page: () => "/members",
    fields: async (fx) => ({ userId: await fx.newMemberOfA("designer"), role: "viewer" }),
  },
  {
    key: "action (workspace)/members/actions.ts#removeMemberAction",
    via: "DELETE /api/v1/members/[userId]",
    page: () => "/members",
    fields: async (fx) => ({ userId: await fx.newMemberOfA("designer") }),
  },
  {
    key: "action (workspace)/members/actions.ts#revokeInviteAction",
    via: "DELETE /api/v1/invites/[inviteId]",
    page: () => "/members",
    fields: async (fx) => ({ inviteId: await fx.newInviteOfA() }),
  },

  // ---- projects and design options (route-matrix-projects.ts) ----
  ...projectRoutes({ api, page }),

  // ---- parts library (route-matrix-parts.ts) ----
  ...partRoutes({ api, page }),
  ...budgetRoutes({ api, page }),

  // ---- model API (route-matrix-model.ts) ----
  ...modelRoutes({ api }),

  // ---- bench correlation, reports, background jobs (route-matrix-bench.ts) ----
  ...benchRoutes({ api, page }),

  // ---- review, activity log, derating policy, API tokens (route-matrix-review.ts) ----
  ...reviewRoutes({ api, page }),
];
