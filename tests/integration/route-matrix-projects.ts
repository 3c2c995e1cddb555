// Role-matrix entries for projects and design options (format and helpers:
// route-matrix.ts). Records are made in workspace A through its admin's API
// client; calls that write get a fresh record per caller, so one caller's
// save never turns into another's conflict. The helpers come in as
// arguments (types only imported) so the two files do not import each other.
import type { Expectation, Fixtures, MatrixEntry, Outcome } from "./route-matrix";
import type { Permission } from "@/lib/roles";
import { createProject, createProjectWithOption, projectBody, templateInput, TEMPLATE_KEY } from "./support/projects";

const project = async (fx: Fixtures) => ({ projectId: await createProject(fx.adminOfA) });
const option = async (fx: Fixtures) => createProjectWithOption(fx.adminOfA);
// The record an action's page() made, for its fields() (they run one after the other per caller).
const pages = { project: "", option: "" };

/** A JSON body as form fields: structured values as one JSON string, the rest as text. */
function formFields(body: Record<string, unknown>): Record<string, string> {
  return Object.fromEntries(Object.entries(body).map(([k, v]) => [k, typeof v === "object" ? JSON.stringify(v) : String(v)]));
}

interface Helpers {
  api: (permission: Permission, ok: number, otherWorkspace?: Outcome) => Expectation;
  page: (permission: Permission, otherWorkspace?: Outcome) => Expectation;
}

export const projectRoutes = ({ api, page }: Helpers): MatrixEntry[] => [
  // ---- pages ----
  { key: "page /projects", expect: page("read") },
  { key: "page /projects/new", expect: page("project:write") },
  { key: "page /projects/[projectId]", params: project, expect: page("read", 404) },
  { key: "page /projects/[projectId]/options/[optionId]", params: option, expect: page("read", 404) },

  // ---- projects ----
  { key: "GET /api/v1/projects", query: "?sort=name&pageSize=5", expect: api("read", 200) },
  { key: "POST /api/v1/projects", body: () => projectBody({ name: "Matrix project" }), expect: api("project:write", 201) },
  { key: "GET /api/v1/projects/[projectId]", params: project, expect: api("read", 200, 404) },
  { key: "PATCH /api/v1/projects/[projectId]", params: project, body: () => ({ status: "design" }), expect: api("project:write", 200, 404) },
  { key: "GET /api/v1/projects/[projectId]/options", params: project, expect: api("read", 200, 404) },
  { key: "POST /api/v1/projects/[projectId]/options", params: project, body: () => ({ name: "Matrix option", template: TEMPLATE_KEY }), expect: api("option:write", 201, 404) },

  // ---- options and revisions ----
  { key: "GET /api/v1/options/[optionId]", params: option, expect: api("read", 200, 404) },
  { key: "PATCH /api/v1/options/[optionId]", params: option, body: () => ({ name: "Renamed by the matrix" }), expect: api("option:write", 200, 404) },
  { key: "GET /api/v1/options/[optionId]/revisions", params: option, expect: api("read", 200, 404) },
  {
    key: "POST /api/v1/options/[optionId]/revisions",
    params: option,
    body: () => ({ baseRevision: 1, document: templateInput(), partRefs: {}, note: "matrix" }),
    expect: api("option:write", 201, 404),
  },
  { key: "GET /api/v1/options/[optionId]/revisions/[rev]", params: async (fx) => ({ ...(await option(fx)), rev: "1" }), expect: api("read", 200, 404) },
  { key: "POST /api/v1/options/[optionId]/duplicate", params: option, body: () => ({}), expect: api("option:write", 201, 404) },

  // ---- server actions, each through the route with the same flow ----
  {
    key: "action (workspace)/projects/new/actions.ts#createProjectAction",
    via: "POST /api/v1/projects",
    page: () => "/projects/new",
    fields: () => formFields(projectBody({ name: "Matrix project (form)" })),
  },
  {
    key: "action (workspace)/projects/[projectId]/actions.ts#createOptionAction",
    via: "POST /api/v1/projects/[projectId]/options",
    page: async (fx) => `/projects/${(pages.project = await createProject(fx.adminOfA))}`,
    fields: () => ({ projectId: pages.project, name: "Matrix option (form)", template: TEMPLATE_KEY }),
  },
  {
    key: "action (workspace)/projects/[projectId]/actions.ts#duplicateOptionAction",
    via: "POST /api/v1/options/[optionId]/duplicate",
    page: async (fx) => {
      const o = await option(fx);
      pages.option = o.optionId;
      return `/projects/${o.projectId}`;
    },
    fields: () => ({ optionId: pages.option }),
  },
];
