// Role-matrix entries for bench correlation, reports and background jobs
// (format and helpers: route-matrix.ts). Records are made in workspace A
// through its admin's API client. Accepting a fit writes a revision on the
// run's base, so each caller gets a fresh option and run.
import type { Expectation, Fixtures, MatrixEntry, Outcome } from "./route-matrix";
import type { Permission } from "@/lib/roles";
import { createProjectWithOption } from "./support/projects";
import { readingsAround, templateDesign, toCsv, uploadBench } from "./support/bench";

interface Helpers {
  api: (permission: Permission, ok: number, otherWorkspace?: Outcome) => Expectation;
  page: (permission: Permission, otherWorkspace?: Outcome) => Expectation;
}

const csv = () => toCsv(readingsAround(templateDesign(), { controller: 8 }));

async function freshRun(fx: Fixtures): Promise<{ projectId: string; optionId: string; runId: string }> {
  const { projectId, optionId } = await createProjectWithOption(fx.adminOfA);
  const r = await uploadBench(fx.adminOfA, optionId, csv());
  if (r.status !== 201) throw new Error(`bench fixture: ${r.status} ${r.text}`);
  return { projectId, optionId, runId: r.json.run.id };
}

const shared = new WeakMap<Fixtures, Promise<{ projectId: string; optionId: string; runId: string }>>();
function sharedRun(fx: Fixtures) {
  let p = shared.get(fx);
  if (!p) shared.set(fx, (p = freshRun(fx)));
  return p;
}

const jobs = new WeakMap<Fixtures, Promise<string>>();
/** One small report job of workspace A, run to completion by the app's workers. */
function completedJob(fx: Fixtures): Promise<string> {
  let p = jobs.get(fx);
  if (!p) {
    p = (async () => {
      const { optionId } = await sharedRun(fx);
      const r = await fx.adminOfA.post("/api/v1/jobs", { kind: "report", payload: { optionId, revision: 1, heatmapSteps: 8 } });
      if (r.status !== 202) throw new Error(`job fixture: ${r.status} ${r.text}`);
      const id = r.json<{ job: { id: string } }>().job.id;
      for (let i = 0; i < 300; i++) {
        const j = (await fx.adminOfA.get(`/api/v1/jobs/${id}`)).json<{ job: { status: string } }>().job;
        if (j.status === "completed") return id;
        if (j.status === "failed") throw new Error("job fixture failed");
        await new Promise((res) => setTimeout(res, 200));
      }
      throw new Error("job fixture timed out");
    })();
    jobs.set(fx, p);
  }
  return p;
}

const sweepBody = (optionId: string) => ({
  kind: "sweep",
  payload: { optionId, revision: 1, spec: { part: "controller", x: { axis: "fsw", from: 1e5, to: 5e5, steps: 3 }, y: { axis: "qgScale", from: 0.5, to: 2, steps: 3 } } },
});
const resolvedOption = new WeakMap<Fixtures, string>();

export const benchRoutes = ({ api, page }: Helpers): MatrixEntry[] => [
  { key: "page /projects/[projectId]/options/[optionId]/bench", params: async (fx) => { const r = await sharedRun(fx); return { projectId: r.projectId, optionId: r.optionId }; }, expect: page("read", 404) },
  { key: "page /projects/[projectId]/options/[optionId]/bench/[runId]", params: sharedRun, expect: page("read", 404) },
  { key: "GET /api/v1/options/[optionId]/bench", params: async (fx) => ({ optionId: (await sharedRun(fx)).optionId }), expect: api("read", 200, 404) },
  // A JSON body instead of the multipart upload: past the permission gate the handler answers 415 (real uploads: bench.test.ts).
  { key: "POST /api/v1/options/[optionId]/bench", params: async (fx) => ({ optionId: (await sharedRun(fx)).optionId }), body: () => ({}), expect: api("bench:write", 415, 404) },
  { key: "GET /api/v1/options/[optionId]/bench/[runId]", params: sharedRun, expect: api("read", 200, 404) },
  { key: "GET /api/v1/options/[optionId]/bench/[runId]/file", params: sharedRun, expect: api("read", 200, 404) },
  { key: "POST /api/v1/options/[optionId]/bench/[runId]/accept", params: freshRun, body: () => ({ parts: ["controller"] }), expect: api("option:review", 201, 404) },
  { key: "GET /api/v1/options/[optionId]/revisions/[rev]/report", params: async (fx) => ({ optionId: (await sharedRun(fx)).optionId, rev: "1" }), query: "?format=csv", expect: api("read", 200, 404) },
  {
    key: "POST /api/v1/jobs",
    params: async (fx) => { resolvedOption.set(fx, (await sharedRun(fx)).optionId); return {}; },
    body: (fx) => sweepBody(resolvedOption.get(fx)!),
    expect: api("job:start", 202, 404),
  },
  { key: "GET /api/v1/jobs/[jobId]", params: async (fx) => ({ jobId: await completedJob(fx) }), expect: api("read", 200, 404) },
  { key: "GET /api/v1/jobs/[jobId]/file", params: async (fx) => ({ jobId: await completedJob(fx) }), expect: api("read", 200, 404) },
];
