// Migration 20261201_0008_design_document_v2 on a database holding
// version-1 documents: revisions written the old way (one of them frozen for
// review) and a library MOSFET with the old parameter names are rewritten to
// version 2; the frozen revision stays frozen and its guard is back on
// afterwards; the option then opens over HTTP and its budget is the budget
// of the same design saved as version 2.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import crypto from "node:crypto";
import v1DriverIc from "../fixtures/demo-driver-ic-v1.json";
import * as migration from "@/db/migrations/20261201_0008_design_document_v2";
import { closeTestDb, createWorkspaceWithRoles, testDb, type TestUser } from "./support/db";
import type { Client } from "./support/http";
import { createProject, signedInClient } from "./support/projects";
import { demoOptions } from "@/models/demo";
import { mosfetSchema } from "@/models/input/schemaParts";
import { partToModelBlock } from "@/lib/parts/modelBlock";

const demoV2 = () => JSON.parse(JSON.stringify(demoOptions.find((o) => o.key === "driver-ic")!.input));

let designer: TestUser;
let client: Client;
let workspaceId = "";
let v1OptionId = "";
let v2OptionId = "";
let partId = "";

const revisionDoc = async (revision: number) =>
  (await testDb()("option_revision").where({ option_id: v1OptionId, revision }).first("document", "frozen")) as { document: Record<string, unknown>; frozen: boolean };

beforeAll(async () => {
  const ws = await createWorkspaceWithRoles("Doc v2", ["designer"]);
  workspaceId = ws.workspaceId;
  designer = ws.users.designer;
  client = await signedInClient(designer.email);
  const projectId = await createProject(client);
  const made = await client.post(`/api/v1/projects/${projectId}/options`, { name: "Saved as v2", template: "driver-ic" });
  expect(made.status, made.text).toBe(201);
  v2OptionId = made.json<{ option: { id: string } }>().option.id;

  // The old option, written as the product stored it before version 2.
  const k = testDb();
  v1OptionId = `opt_test_${crypto.randomBytes(6).toString("hex")}`;
  await k("design_option").insert({ id: v1OptionId, workspace_id: workspaceId, project_id: projectId, name: "Saved as v1", latest_revision: 2, created_by: designer.id });
  await k("option_revision").insert([
    { option_id: v1OptionId, revision: 1, document: JSON.stringify(v1DriverIc), note: "old", created_by: designer.id, frozen: true },
    { option_id: v1OptionId, revision: 2, document: JSON.stringify(v1DriverIc), note: "old, latest", created_by: designer.id },
  ]);
  partId = `prt_test_${crypto.randomBytes(6).toString("hex")}`;
  await k("part").insert({
    id: partId, workspace_id: workspaceId, kind: "mosfet", manufacturer: "Old Library Ltd", mpn: `QN-OLD-${partId.slice(-4)}`,
    params: JSON.stringify({ qg: 4.2e-8, qgs: 1.3e-8, qgd: 9e-9, vTest: 10, vth: 3.1, vpl: 4.8, rds25: 0.012, rthJA: 40, outputCapacitance: { vTest: 75, eoss: 1.6e-6 } }),
  });

  await k.transaction((trx) => migration.up(trx));
});
afterAll(closeTestDb);

describe("migration to design document version 2", () => {
  it("rewrites every old revision, frozen or not, to the version-2 document", async () => {
    for (const rev of [1, 2]) expect((await revisionDoc(rev)).document).toStrictEqual(demoV2());
    expect((await revisionDoc(1)).frozen).toBe(true);
  });

  it("leaves the frozen-revision guard on after it", async () => {
    await expect(testDb()("option_revision").where({ option_id: v1OptionId, revision: 1 }).update({ note: "edited in place" })).rejects.toThrow(/frozen/);
  });

  it("renames the library MOSFET's parameters and nothing else", async () => {
    const p = await testDb()("part").where({ id: partId }).first("params");
    expect(p.params).toStrictEqual({ qg: 4.2e-8, qgs: 1.3e-8, qgd: 9e-9, qgVgs: 10, vth: 3.1, vpl: 4.8, rds25: 0.012, rthJA: 40, outputCapacitance: { vds: 75, eoss: 1.6e-6 } });
    // ...so it still copies into a design as a MOSFET block the model accepts.
    const block = partToModelBlock({ kind: "mosfet", mpn: "QN-OLD", unitCost: null, params: p.params, tolerance: {} });
    expect(mosfetSchema.safeParse(block).success).toBe(true);
  });

  it("opens the migrated option and evaluates it to the numbers of the same design saved as version 2", async () => {
    const opened = await client.get(`/api/v1/options/${v1OptionId}`);
    expect(opened.status, opened.text).toBe(200);
    expect(opened.json<{ revision: { document: Record<string, unknown> } }>().revision.document).toStrictEqual(demoV2());
    const [oldBudget, newBudget] = await Promise.all([v1OptionId, v2OptionId].map((id) => client.get(`/api/v1/options/${id}/budget`)));
    expect(oldBudget.status, oldBudget.text).toBe(200);
    expect(newBudget.status, newBudget.text).toBe(200);
    type Budget = { evaluation: unknown };
    expect(oldBudget.json<Budget>().evaluation).toStrictEqual(newBudget.json<Budget>().evaluation);
  });

  it("accepts a version-1 document from an API client and stores it as version 2", async () => {
    const saved = await client.post(`/api/v1/options/${v2OptionId}/revisions`, { baseRevision: 1, document: v1DriverIc, note: "sent by an old script" });
    expect(saved.status, saved.text).toBe(201);
    const row = await testDb()("option_revision").where({ option_id: v2OptionId, revision: 2 }).first("document");
    expect(row.document).toStrictEqual(demoV2());
  });

  it("is idempotent, and its down step restores the version-1 names (checked inside a rolled-back transaction)", async () => {
    await testDb().transaction((trx) => migration.up(trx));
    expect((await revisionDoc(2)).document).toStrictEqual(demoV2());
    const rollback = new Error("rollback");
    await expect(
      testDb().transaction(async (trx) => {
        await migration.down(trx);
        const row = await trx("option_revision").where({ option_id: v1OptionId, revision: 1 }).first("document");
        expect(row.document).toStrictEqual(v1DriverIc);
        throw rollback;
      }),
    ).rejects.toBe(rollback);
    expect((await revisionDoc(1)).document).toStrictEqual(demoV2());
  });
});
