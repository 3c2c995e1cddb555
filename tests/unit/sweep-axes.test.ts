import { describe, expect, it } from "vitest";
import { parseDesign } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { demoOptions } from "@/models/demo";
import { mergeSweepChunks, sweepGrid } from "@/models/sweep";
import { toModelSpec, type SweepSpec } from "@/components/charts/sweepAxes";

const parsed = parseDesign(demoOptions[0].input);
if (!parsed.ok) throw new Error("demo does not parse");
const design = parsed.design;
const corner = design.corners[0];

describe("toModelSpec", () => {
  const spec: SweepSpec = {
    partId: "controller",
    cornerId: corner.id,
    positionId: design.positions[0].id,
    x: { key: "fsw", from: corner.fsw / 2, to: corner.fsw, steps: 3 },
    y: { key: "rGate", from: 1, to: design.positions[0].gate.rTurnOn, steps: 2 },
  };

  it("names the position for rGate, not for the controller's qgScale", () => {
    const m = toModelSpec(design, spec);
    expect(m.y.position).toBe(design.positions[0].id);
    expect(toModelSpec(design, { ...spec, y: { key: "qgScale", from: 0.5, to: 1, steps: 2 } }).y.position).toBeUndefined();
    expect(toModelSpec(design, { ...spec, partId: "Q1", y: { key: "qgScale", from: 0.5, to: 1, steps: 2 } }).y.position).toBe("Q1");
  });

  it("row chunks merged as the worker does give rows × cols, and the design-point cell is the budget's rise", () => {
    const m = toModelSpec(design, spec);
    const r = mergeSweepChunks([sweepGrid(design, { ...m, rows: { from: 0, to: 1 } }), sweepGrid(design, { ...m, rows: { from: 1, to: 2 } })]);
    expect(r.z).toHaveLength(2);
    expect(r.z.every((row) => row.length === 3)).toBe(true);
    const ctl = evaluateDesign(design).corners[0].parts.find((p) => p.id === "controller")!;
    if (!ctl.junction || ctl.junction.runaway) throw new Error("no controller temperature");
    expect(r.z[1][2]).toBeCloseTo(ctl.junction.tj - corner.ambient, 6);
  });
});
