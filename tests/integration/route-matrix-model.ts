// Role-matrix entries for the model API (format: route-matrix.ts). Every
// signed-in member may evaluate, sweep and read the schema; nothing is
// stored, so another workspace's member gets the same answer as ours.
import type { Expectation, MatrixEntry, Outcome } from "./route-matrix";
import type { Permission } from "@/lib/roles";
import { demoOptions } from "@/models/demo";

interface Helpers {
  api: (permission: Permission, ok: number, otherWorkspace?: Outcome) => Expectation;
}

const design = () => demoOptions[0].input;

export const modelRoutes = ({ api }: Helpers): MatrixEntry[] => [
  { key: "POST /api/v1/evaluate", body: () => ({ design: design() }), expect: api("read", 200) },
  {
    key: "POST /api/v1/sweep",
    body: () => ({
      design: design(),
      spec: { part: "controller", x: { axis: "fsw", from: 1e5, to: 4e5, steps: 3 }, y: { axis: "qgScale", from: 0.5, to: 1.5, steps: 3 } },
    }),
    expect: api("read", 200),
  },
  { key: "POST /api/v1/spread", body: () => ({ design: design(), samples: 20, seed: 7 }), expect: api("read", 200) },
  { key: "GET /api/v1/schema", expect: api("read", 200) },
];
