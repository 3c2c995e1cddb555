// The demo project seed: five options as revision 1 each, part references
// resolved against the demo parts library, and a second run adds nothing.
import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import { seedDemoParts } from "@/db/seeds/demo-parts";
import { DEMO_PROJECT_ID, seedDemoProjects } from "@/db/seeds/demo-projects";
import { demoOptions } from "@/models/demo";
import { parseDesign } from "@/models/input/schema";

afterAll(closeTestDb);

describe("seedDemoProjects", () => {
  it("adds the project and its five options once, with library part references", async () => {
    const { workspaceId } = await createWorkspaceWithRoles("seed", ["admin"]);
    const k = testDb();
    const first = await k.transaction(async (trx) => {
      await seedDemoParts(trx, workspaceId);
      return seedDemoProjects(trx, workspaceId);
    });
    expect(first).toBe(1 + demoOptions.length);
    const again = await k.transaction((trx) => seedDemoProjects(trx, workspaceId));
    expect(again).toBe(0);

    const revisions = await k("option_revision as r").join("design_option as o", "o.id", "r.option_id").where("o.project_id", DEMO_PROJECT_ID).select("r.revision", "r.document", "r.part_refs");
    expect(revisions).toHaveLength(demoOptions.length);
    for (const r of revisions) {
      expect(r.revision).toBe(1);
      expect(parseDesign(r.document).ok).toBe(true);
      const ids = Object.values(r.part_refs as Record<string, string>);
      expect(ids.length).toBeGreaterThan(0);
      const parts = await k("part").whereIn("id", ids).andWhere("workspace_id", workspaceId).select("id", "mpn");
      expect(parts).toHaveLength(new Set(ids).size);
    }
    const refs = revisions.map((r) => r.part_refs as Record<string, string>);
    const controller = await k("part").where({ workspace_id: workspaceId, mpn: "HRG-PC72" }).first("id");
    expect(refs.every((r) => r.controller === controller.id)).toBe(true);
  });
});
