import { describe, expect, it } from "vitest";
import { parseDesign } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { compareOptions } from "@/models/compare";
import { designBom } from "@/models/bom";
import { demoOptions } from "@/models/demo";

describe("compareOptions", () => {
  const list = demoOptions.map((o) => {
    const r = parseDesign(o.input);
    if (!r.ok) throw new Error(o.key);
    const bom = designBom(r.design);
    return { id: o.key, name: o.name, evaluation: evaluateDesign(r.design), partCount: bom.partCount, cost: bom.cost };
  });
  const rows = compareOptions(list, "direct");

  it("reads the baseline against itself as zero and others at the baseline's worst controller corner", () => {
    const base = rows.find((r) => r.id === "direct")!;
    expect(base.isBaseline).toBe(true);
    expect(base.vsBaseline).toEqual({ cornerId: base.controller!.cornerId, controllerPowerDelta: 0, controllerTjDelta: 0 });
    const buffered = rows.find((r) => r.id === "bjt-small")!;
    expect(buffered.vsBaseline!.cornerId).toBe(base.controller!.cornerId);
    // Heat moved out of the controller: the follower takes the gate current.
    expect(buffered.vsBaseline!.controllerPowerDelta).toBeLessThan(-0.05);
    expect(buffered.vsBaseline!.controllerTjDelta!).toBeLessThan(-5);
  });

  it("the ΔP and ΔTj are the differences of the evaluated controller rows", () => {
    const base = list[0].evaluation;
    const other = list[2].evaluation;
    const row = rows[2];
    const cid = row.vsBaseline!.cornerId;
    const ctl = (e: typeof base) => e.corners.find((c) => c.cornerId === cid)!.parts.find((p) => p.id === "controller")!;
    expect(row.vsBaseline!.controllerPowerDelta).toBeCloseTo(ctl(other).total - ctl(base).total, 12);
  });

  it("summarises losses, efficiency, warnings, part count and cost", () => {
    for (const r of rows) {
      expect(r.totalLoss).toBeGreaterThan(0);
      expect(r.efficiency!).toBeGreaterThan(0.9);
      expect(r.hottest && r.tightest).toBeTruthy();
      expect(r.partCount!).toBeGreaterThan(4);
      expect(r.cost!).toBeGreaterThan(1);
    }
    expect(rows.find((r) => r.id === "bjt-small")!.warnings.errors).toBeGreaterThan(0);
    expect(rows.find((r) => r.id === "direct")!.partCount!).toBeLessThan(rows.find((r) => r.id === "bjt-small")!.partCount!);
  });
});
