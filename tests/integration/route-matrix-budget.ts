// Role-matrix entries for the budget dashboard, its data route, the option
// comparison and the manager's choice (format and helpers: route-matrix.ts).
// One project with two demo options is made in workspace A through its
// admin's API client and shared: none of these calls changes the options,
// and recording a choice only appends a row.
import type { Expectation, Fixtures, MatrixEntry, Outcome } from "./route-matrix";
import type { Permission } from "@/lib/roles";
import { demoOptions } from "@/models/demo";
import { projectBody } from "./support/projects";

interface Helpers {
  api: (permission: Permission, ok: number, otherWorkspace?: Outcome) => Expectation;
  page: (permission: Permission, otherWorkspace?: Outcome) => Expectation;
}

type BudgetFixture = { projectId: string; optionIds: string[] };
const made = new WeakMap<Fixtures, Promise<BudgetFixture>>();
// Bodies are built synchronously after the params were awaited, so the resolved value is kept too.
const resolved = new WeakMap<Fixtures, BudgetFixture>();

function budgetFixture(fx: Fixtures): Promise<BudgetFixture> {
  let p = made.get(fx);
  if (!p) {
    p = (async () => {
      const pr = await fx.adminOfA.request("POST", "/api/v1/projects", { json: projectBody({ name: "Matrix budget" }) });
      if (pr.status !== 201) throw new Error(`budget fixture: project ${pr.status} ${pr.text}`);
      const projectId = pr.json<{ project: { id: string } }>().project.id;
      const optionIds: string[] = [];
      for (const demo of demoOptions.slice(0, 2)) {
        const o = await fx.adminOfA.request("POST", `/api/v1/projects/${projectId}/options`, { json: { name: demo.name, document: demo.input } });
        if (o.status !== 201) throw new Error(`budget fixture: option ${o.status} ${o.text}`);
        optionIds.push(o.json<{ option: { id: string } }>().option.id);
      }
      const value = { projectId, optionIds };
      resolved.set(fx, value);
      return value;
    })();
    made.set(fx, p);
  }
  return p;
}

function resolvedFixture(fx: Fixtures): BudgetFixture {
  const b = resolved.get(fx);
  if (!b) throw new Error("budget fixture: params must run before the body");
  return b;
}

const project = async (fx: Fixtures) => ({ projectId: (await budgetFixture(fx)).projectId });

export const budgetRoutes = ({ api, page }: Helpers): MatrixEntry[] => [
  {
    key: "page /projects/[projectId]/options/[optionId]/budget",
    params: async (fx) => {
      const b = await budgetFixture(fx);
      return { projectId: b.projectId, optionId: b.optionIds[0] };
    },
    expect: page("read", 404),
  },
  { key: "page /projects/[projectId]/compare", params: project, expect: page("read", 404) },
  { key: "GET /api/v1/options/[optionId]/budget", params: async (fx) => ({ optionId: (await budgetFixture(fx)).optionIds[0] }), expect: api("read", 200, 404) },
  { key: "GET /api/v1/projects/[projectId]/choice", params: project, expect: api("read", 200, 404) },
  {
    key: "POST /api/v1/projects/[projectId]/choice",
    params: project,
    body: (fx) => ({ optionId: resolvedFixture(fx).optionIds[1], reason: "role matrix" }),
    expect: api("option:choose", 201, 404),
  },
  {
    key: "action (workspace)/projects/[projectId]/compare/actions.ts#chooseOptionAction",
    via: "POST /api/v1/projects/[projectId]/choice",
    page: async (fx) => `/projects/${(await budgetFixture(fx)).projectId}/compare`,
    fields: (fx) => ({ projectId: resolvedFixture(fx).projectId, optionId: resolvedFixture(fx).optionIds[1], reason: "role matrix (form)" }),
  },
];
