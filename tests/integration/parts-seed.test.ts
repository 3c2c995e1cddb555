// The demo parts seed: every kind, idempotent, never overwrites a user's edit.
import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, createWorkspaceWithRoles, testDb } from "./support/db";
import { demoPartValues, seedDemoParts } from "@/db/seeds/demo-parts";
import { demoParts } from "@/models/demo";
import { PART_KINDS } from "@/lib/parts/kinds";

afterAll(closeTestDb);

describe("seedDemoParts", () => {
  it("adds every demo part once and keeps a user's edit on a second run", async () => {
    const { workspaceId } = await createWorkspaceWithRoles("Seed", ["admin"]);
    const k = testDb();
    const first = await k.transaction((trx) => seedDemoParts(trx, workspaceId));
    expect(first).toBe(demoPartValues().length);
    const rows = await k("part").where({ workspace_id: workspaceId }).select("mpn", "kind");
    expect(new Set(rows.map((r) => r.kind))).toEqual(new Set(PART_KINDS));
    // every part the demo options use is in the library (resistors are gate-network values, not library parts)
    for (const p of demoParts.filter((d) => d.kind !== "passive")) expect(rows.map((r) => r.mpn)).toContain(p.partNumber);
    await k("part").where({ workspace_id: workspaceId, mpn: "QN-150F12" }).update({ description: "edited by a user" });
    expect(await k.transaction((trx) => seedDemoParts(trx, workspaceId))).toBe(0);
    expect((await k("part").where({ workspace_id: workspaceId, mpn: "QN-150F12" }).first()).description).toBe("edited by a user");
  });
});
