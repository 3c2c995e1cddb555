// The model's HTTP API: /api/v1/evaluate, /api/v1/sweep, /api/v1/schema.
// Signed-in users only; bad input is a 400 naming each wrong field, never a
// 500, and no response carries NaN or Infinity.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./support/http";
import { TEST_PASSWORD, closeTestDb, createWorkspaceWithRoles } from "./support/db";
import { demoOptions } from "@/models/demo";

let viewer: Client;

beforeAll(async () => {
  const ws = await createWorkspaceWithRoles("model-api", ["viewer"]);
  viewer = new Client();
  const r = await viewer.post("/api/v1/auth/sign-in", { email: ws.users.viewer.email, password: TEST_PASSWORD });
  expect(r.status).toBe(200);
});
afterAll(closeTestDb);

const direct = demoOptions[0].input;
const buffered = demoOptions.find((o) => o.input.positions.some((p) => p.drive.kind === "bjt-follower"))!.input;

describe("POST /api/v1/evaluate", () => {
  it("refuses a signed-out caller with 401", async () => {
    const r = await new Client().post("/api/v1/evaluate", { design: direct });
    expect(r.status).toBe(401);
  });

  it("evaluates a demo option for a viewer, with finite numbers only", async () => {
    const r = await viewer.post("/api/v1/evaluate", { design: direct });
    expect(r.status).toBe(200);
    expect(r.text).not.toMatch(/NaN|Infinity/);
    const body = r.json<{ evaluation: { corners: unknown[]; parts: { id: string }[] } }>();
    expect(body.evaluation.corners.length).toBe(direct.corners.length);
    expect(body.evaluation.parts.map((p) => p.id)).toContain("controller");
  });

  it("gives the heat moved out of the controller against a baseline", async () => {
    const r = await viewer.post("/api/v1/evaluate", { design: buffered, baseline: direct });
    expect(r.status).toBe(200);
    const c = r.json<{ comparison: { controllerPowerDelta: number; controllerTjDelta: number } }>().comparison;
    // Moving the gate current to a buffer takes drive power out of the
    // controller (DOMAIN brief point 4): the delta is negative.
    expect(c.controllerPowerDelta).toBeLessThan(0);
    expect(c.controllerTjDelta).toBeLessThan(0);
  });

  it("answers a wrong dimension with 400 naming the field path", async () => {
    const bad = structuredClone(direct) as Record<string, any>;
    bad.controller.vcc = "47 nC";
    const r = await viewer.post("/api/v1/evaluate", { design: bad });
    expect(r.status).toBe(400);
    const issues = r.json<{ error: { issues: { path: string; message: string }[] } }>().error.issues;
    expect(issues.some((i) => i.path.includes("controller.vcc"))).toBe(true);
  });

  it("answers malformed JSON and unknown fields with 400, never 500", async () => {
    const raw = await viewer.request("POST", "/api/v1/evaluate", { headers: { "content-type": "application/json" }, json: undefined });
    expect(raw.status).toBe(400);
    const extra = await viewer.post("/api/v1/evaluate", { design: direct, surprise: 1 });
    expect(extra.status).toBe(400);
    const empty = await viewer.post("/api/v1/evaluate", { design: {} });
    expect(empty.status).toBe(400);
    expect(empty.json<{ error: { issues: unknown[] } }>().error.issues.length).toBeGreaterThan(1);
  });
});

describe("GET /api/v1/schema", () => {
  it("serves the input JSON Schema generated from the zod schema", async () => {
    const r = await viewer.get("/api/v1/schema");
    expect(r.status).toBe(200);
    const schema = r.json<{ type: string; properties: Record<string, unknown>; required: string[] }>();
    expect(schema.type).toBe("object");
    expect(Object.keys(schema.properties)).toEqual(expect.arrayContaining(["corners", "controller", "positions"]));
  });
  it("is not served to a signed-out caller", async () => {
    expect((await new Client().get("/api/v1/schema")).status).toBe(401);
  });
});

describe("POST /api/v1/sweep", () => {
  const spec = {
    part: "controller",
    metric: "rise",
    x: { axis: "fsw", from: 100e3, to: 500e3, steps: 9 },
    y: { axis: "qgScale", from: 0.5, to: 2, steps: 7 },
  };
  it("sweeps the controller's rise over fsw × Qg with a rising trend", async () => {
    const r = await viewer.post("/api/v1/sweep", { design: direct, spec });
    expect(r.status).toBe(200);
    expect(r.text).not.toMatch(/NaN|Infinity/);
    const s = r.json<{ z: (number | null)[][]; x: { values: number[] }; y: { values: number[] } }>();
    expect(s.x.values).toHaveLength(9);
    expect(s.z).toHaveLength(7);
    // direct drive: every gate watt is the controller's, so ΔT grows with fsw and Qg
    expect(s.z[6][8]!).toBeGreaterThan(s.z[0][0]!);
  });
  it("answers an unknown part or identical axes with 400", async () => {
    const unknown = await viewer.post("/api/v1/sweep", { design: direct, spec: { ...spec, part: "Q99" } });
    expect(unknown.status).toBe(400);
    const same = await viewer.post("/api/v1/sweep", { design: direct, spec: { ...spec, y: spec.x } });
    expect(same.status).toBe(400);
    expect(same.json<{ error: { issues: { path: string }[] } }>().error.issues[0].path).toContain("spec");
  });
});

describe("POST /api/v1/spread", () => {
  it("gives the same percentiles for the same seed", async () => {
    const a = await viewer.post("/api/v1/spread", { design: direct, samples: 200, seed: 42 });
    const b = await viewer.post("/api/v1/spread", { design: direct, samples: 200, seed: 42 });
    expect(a.status).toBe(200);
    expect(a.text).toBe(b.text);
  });
  it("refuses too many samples with 400 naming the field", async () => {
    const r = await viewer.post("/api/v1/spread", { design: direct, samples: 10_000_000, seed: 1 });
    expect(r.status).toBe(400);
    expect(r.json<{ error: { issues: { path: string }[] } }>().error.issues[0].path).toContain("samples");
  });
});
