// The editor's document plumbing: path reads and immutable writes, the
// re-apply after a save conflict, and copying a library part into a block.
import { describe, expect, it } from "vitest";
import { getAt, setAt } from "@/models/documentPath";
import { changedPaths, reapplyEdits, reapplyFlat } from "@/lib/docPaths";
import { applyPartBlock, partSlots } from "@/lib/parts/slots";
import { demoOptions } from "@/models/demo";

const base = { name: "x", positions: [{ id: "Q1", gate: { rTurnOn: "2 Ω" }, mosfet: { qg: "40 nC", count: 2 } }], corners: [{ id: "a", vin: "36 V" }] };

describe("setAt / getAt", () => {
  it("writes by dotted path without touching the original", () => {
    const next = setAt(base, "positions.0.gate.rTurnOn", "6.8 Ω");
    expect(getAt(next, "positions.0.gate.rTurnOn")).toBe("6.8 Ω");
    expect(base.positions[0].gate.rTurnOn).toBe("2 Ω");
    expect(getAt(next, "positions.0.mosfet")).toBe(getAt(base, "positions.0.mosfet")); // untouched branches are shared
  });

  it("removes a key with undefined and creates missing parents", () => {
    expect(getAt(setAt(base, "positions.0.mosfet.count", undefined), "positions.0.mosfet")).toEqual({ qg: "40 nC" });
    expect(getAt(setAt(base, "thermal.coupling", []), "thermal")).toEqual({ coupling: [] });
  });
});

describe("reapplyEdits (save conflict)", () => {
  it("lays my changes onto theirs and keeps their other changes", () => {
    const mine = setAt(base, "positions.0.gate.rTurnOn", "6.8 Ω");
    const theirs = setAt(base, "positions.0.mosfet.qg", "47 nC");
    const r = reapplyEdits({ base, mine, theirs });
    expect(getAt(r.document, "positions.0.gate.rTurnOn")).toBe("6.8 Ω");
    expect(getAt(r.document, "positions.0.mosfet.qg")).toBe("47 nC");
    expect(r.overlaps).toEqual([]);
    expect(r.applied).toBe(1);
  });

  it("reports a field both sides changed differently; mine wins there", () => {
    const mine = setAt(base, "positions.0.gate.rTurnOn", "6.8 Ω");
    const theirs = setAt(base, "positions.0.gate.rTurnOn", "10 Ω");
    const r = reapplyEdits({ base, mine, theirs });
    expect(r.overlaps).toEqual(["positions.0.gate.rTurnOn"]);
    expect(getAt(r.document, "positions.0.gate.rTurnOn")).toBe("6.8 Ω");
    expect(reapplyEdits({ base, mine, theirs: mine }).overlaps).toEqual([]); // the same change is no overlap
  });

  it("treats an array that changed length as one change, and replays removals", () => {
    const mine = setAt(setAt(base, "corners", [...base.corners, { id: "b", vin: "75 V" }]), "positions.0.mosfet.count", undefined);
    expect(changedPaths(base, mine).sort()).toEqual(["corners", "positions.0.mosfet.count"]);
    const r = reapplyEdits({ base, mine, theirs: setAt(base, "name", "y") });
    expect(getAt(r.document, "corners.1.id")).toBe("b");
    expect(getAt(r.document, "positions.0.mosfet")).toEqual({ qg: "40 nC" });
    expect(getAt(r.document, "name")).toBe("y");
  });
});

describe("part slots", () => {
  it("lists the library slots of every demo drive kind", () => {
    const refs = demoOptions.flatMap((o) => partSlots(o.input).map((s) => `${s.ref}:${s.kind}`));
    for (const expected of ["controller:controller", "positions.0.mosfet:mosfet", "positions.0.drive.npn:bjt", "positions.0.drive:driver-ic", "positions.0.drive:gate-transformer", "positions.0.drive.driver:driver-ic"])
      expect(refs).toContain(expected);
    expect(refs.some((r) => r.endsWith(".drive.clamp.zener:zener"))).toBe(true);
  });

  it("replaces the part's own values and keeps design choices", () => {
    const slot = partSlots(base).find((s) => s.ref === "positions.0.mosfet")!;
    const next = applyPartBlock(slot, { qg: "40 nC", rdsHot: "30 mΩ", count: 2 }, { partNumber: "QN-1", qg: 4.2e-8, rds25: 0.012 });
    expect(next).toEqual({ partNumber: "QN-1", qg: 4.2e-8, rds25: 0.012, count: 2 }); // stale rdsHot gone, count kept
  });
});

describe("reapplyFlat (part references)", () => {
  it("keeps dotted keys flat and replays additions and removals", () => {
    const b = { controller: "p1", "positions.0.drive": "p2" };
    const mine = { controller: "p1", "positions.0.mosfet": "p3" };
    const theirs = { controller: "p9", "positions.0.drive": "p2" };
    expect(reapplyFlat({ base: b, mine, theirs })).toEqual({ controller: "p9", "positions.0.mosfet": "p3" });
  });
});
