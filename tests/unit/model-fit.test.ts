// Bench fit (models/fit.ts, models/fitDesign.ts): synthetic measurements
// made with the model itself from a design whose true thermal resistance is
// known, plus seeded noise, must give that resistance back.
import { describe, expect, it } from "vitest";
import { demoOptions } from "@/models/demo";
import { parseDesign, type Design, type DesignInput } from "@/models/input/schema";
import { buildCornerResult, computeCorner, prepare } from "@/models/evaluate";
import { createRng } from "@/models/rng";
import { fitThermalResistance, surfaceTemperature } from "@/models/fit";
import { benchParts, correlateBench, withDocumentValue, type BenchReadingInput } from "@/models/fitDesign";

function parsed(input: unknown): Design {
  const r = parseDesign(input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

const AMBIENTS = [25, 40, 55];
const NOISE_SIGMA_K = 0.5;

/** "Bench" readings: the true design evaluated at each corner × ambient, plus N(0, σ) noise. */
function synthetic(truth: Design, partId: string, surface: "junction" | "case", seed: number, rthJC = 0): BenchReadingInput[] {
  const prep = prepare(truth);
  const rng = createRng(seed);
  const out: BenchReadingInput[] = [];
  truth.corners.forEach((c, ci) => {
    for (const ambient of AMBIENTS) {
      computeCorner(prep, ci, { ambient });
      const p = buildCornerResult(prep).parts.find((x) => x.id === partId)!;
      if (!p.junction || p.junction.runaway) throw new Error("runaway in the synthetic design");
      const t = surface === "case" ? p.junction.tj - p.total * rthJC : p.junction.tj;
      out.push({ row: out.length + 2, partId, cornerId: c.id, method: "thermocouple", surface, temperature: t + NOISE_SIGMA_K * rng.normal(), ambient, note: "" });
    }
  });
  return out;
}

describe("least-squares fit of a part's own thermal resistance", () => {
  it("recovers Rθ exactly from noise-free points and leaves zero residuals", () => {
    const pts = [0.2, 0.5, 0.9].map((power, i) => ({ cornerId: `c${i}`, ambient: 25 + i * 10, power, coupling: 1.5, rthJC: 0, surface: "junction" as const, measured: 0 }));
    for (const p of pts) p.measured = surfaceTemperature(p, 87);
    const fit = fitThermalResistance(pts)!;
    expect(fit.rth).toBeCloseTo(87, 10);
    expect(fit.maxAbsResidual).toBeLessThan(1e-9);
  });

  it("gives no fit when no reading carries power", () => {
    expect(fitThermalResistance([{ cornerId: "a", ambient: 25, power: 0, coupling: 0, rthJC: 0, surface: "junction", measured: 30 }])).toBeNull();
  });

  it("controller: true RθJA 20 % above the design's is recovered within ±2 % from noisy readings", () => {
    const input = structuredClone(demoOptions[0].input) as DesignInput;
    const design = parsed(input);
    const trueRth = design.controller.rthJA * 1.2;
    const truth = parsed(withDocumentValue(input, "controller.rthJA", trueRth));
    const readings = synthetic(truth, "controller", "junction", 7);
    const corr = correlateBench(design, readings);
    const part = corr.parts.find((p) => p.part.id === "controller")!;
    // Band: σ = 0.5 K on rises of tens of kelvin over 12 points gives well under 1 %; 2 % allows for that with margin.
    expect(Math.abs(part.fit!.rth / trueRth - 1)).toBeLessThan(0.02);
    // The design's own prediction is off by the 20 %: every reading differs by more than the noise.
    expect(part.readings.every((r) => r.difference! > 2)).toBe(true);
    // Residuals after the fit are of the size of the noise (3σ bound).
    expect(part.fit!.residuals).toHaveLength(readings.length);
    expect(part.fit!.maxAbsResidual).toBeLessThan(3 * NOISE_SIGMA_K + 0.1);
    expect(part.proposal).toMatchObject({ path: "controller.rthJA" });
    expect((part.proposal as { value: number }).value).toBeCloseTo(part.fit!.rth, 10);
  });

  it("MOSFET case readings: fitted RθSA gives the true heatsink within ±5 % (P(T) held fixed in the fit)", () => {
    const input = structuredClone(demoOptions[0].input) as DesignInput;
    const design = parsed(input);
    const q1 = benchParts(design).find((p) => p.id === "Q1")!;
    expect(q1.element).toBe("positions.0.mosfet.rthSA");
    const m = design.positions[0].mosfet;
    const trueSA = m.rthSA! * 1.3;
    const truth = parsed(withDocumentValue(input, "positions.0.mosfet.rthSA", trueSA));
    const readings = synthetic(truth, "Q1", "case", 11, q1.rthJC!);
    const part = correlateBench(design, readings).parts.find((p) => p.part.id === "Q1")!;
    const proposal = part.proposal as { path: string; value: number };
    expect(proposal.path).toBe("positions.0.mosfet.rthSA");
    // Wider band than the controller: the design's Rds(on) runs at a cooler Tj than the truth's, so its P is a little low.
    expect(Math.abs(proposal.value / trueSA - 1)).toBeLessThan(0.05);
    const refit = correlateBench(parsed(withDocumentValue(input, proposal.path, proposal.value)), readings).parts.find((p) => p.part.id === "Q1")!;
    expect(refit.readings.every((r) => Math.abs(r.difference!) < 3 * NOISE_SIGMA_K + 0.5)).toBe(true);
  });

  it("the model's own Tj equals Ta + Rθ·P + coupling (the relation the fit inverts)", () => {
    const design = parsed(demoOptions[0].input);
    const readings = synthetic(design, "controller", "junction", 3).map((r) => ({ ...r, temperature: 0 }));
    const part = correlateBench(design, readings).parts[0];
    for (const r of part.readings) {
      const tj = surfaceTemperature({ ambient: r.ambient, power: r.power, coupling: r.coupling, rthJC: 0, surface: "junction" }, part.part.theta);
      expect(tj).toBeCloseTo(r.predicted!, 6);
    }
  });
});
