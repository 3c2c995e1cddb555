import { describe, expect, it } from "vitest";
import { parseDesign, type Design, type DesignInput } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { npnQTN6SL, pnpQTP6SL } from "@/models/demoParts";

type PositionInput = DesignInput["positions"][number];

/** Purpose-built inputs: one position, corners at 36 and 75 V. */
function build(drive: PositionInput["drive"], over: { pin?: Record<string, string>; duty?: number; rthJA?: string } = {}): Design {
  const point = (vin: number) => ({ vin, turnOnVds: vin, turnOnId: 5, turnOffVds: 1.5 * vin, turnOffId: 6, iRms: 4, iAvg: 2, duty: over.duty ?? 0.4 });
  const input: DesignInput = {
    schemaVersion: 2,
    name: "warning test",
    corners: [
      { id: "vmin", vin: "36 V", ambient: "60 °C", fsw: "200 kHz" },
      { id: "vmax", vin: "75 V", ambient: "60 °C", fsw: "200 kHz" },
    ],
    controller: { vcc: "12 V", iq: "5 mA", pin: { sourceResistance: "6 Ω", sinkResistance: "3 Ω", ...over.pin }, rthJA: "90 K/W" },
    positions: [{
      id: "SR1", role: "synchronous-rectifier",
      mosfet: { qgs: "15 nC", qgd: "9 nC", qg: "52 nC", vth: "2.6 V", vpl: "4.3 V", rds25: "3 mΩ", vgsMax: "20 V", rthJA: over.rthJA ?? "20 K/W" },
      drive, gate: { rTurnOn: "1 Ω" },
      conduction: { switching: "zvs", points: [point(36), point(75)] },
    }],
  };
  const r = parseDesign(input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

const codes = (d: Design) => evaluateDesign(d).warnings.map((w) => `${w.code}@${w.cornerId}:${w.partId}`);

describe("warnings on purpose-built inputs", () => {
  it("self-driven SR without clamp: Vgs over its rating at Vin max only; the clamp cures it", () => {
    const winding = { ref: "vin" as const, k: 0.27 };
    const e = evaluateDesign(build({ kind: "self-driven", winding }));
    const w = e.warnings.filter((x) => x.code === "vgs-over-rating");
    expect(w.map((x) => x.cornerId)).toEqual(["vmax"]);
    expect(w[0]).toMatchObject({ partId: "SR1", severity: "error", element: "positions.0.drive.winding" });
    expect(w[0].message).toMatch(/20\.3 V/);
    const clamp = { zenerVoltage: "12 V", zenerBiasCurrent: "2 mA", rthJA: "200 K/W" };
    expect(codes(build({ kind: "self-driven", winding, clamp })).filter((c) => c.startsWith("vgs-over-rating"))).toEqual([]);
  });

  it("gate starved by hFE collapse: a weak pin behind a small-signal follower", () => {
    const d = build(
      { kind: "bjt-follower", npn: { ...npnQTN6SL, rBase: "10 Ω" }, pnp: { ...pnpQTP6SL, rBase: "10 Ω" } },
      { pin: { sourceCurrentLimit: "0.1 A", sinkCurrentLimit: "0.1 A" } },
    );
    const e = evaluateDesign(d);
    const starved = e.warnings.filter((w) => w.code === "gate-drive-starved");
    expect(starved.map((w) => w.partId).sort()).toEqual(["SR1.npn", "SR1.npn", "SR1.pnp", "SR1.pnp"]);
    expect(starved[0].element).toMatch(/^positions\.0\.drive\.(npn|pnp)\.hfe$/);
    expect(e.corners[0].positions[0].starved).toBe(true);
  });

  it("drive headroom too low: an AC-coupled 1:1 transformer at 60 % duty", () => {
    const e = evaluateDesign(build({ kind: "transformer", mode: "ac-coupled", turnsRatio: 1 }, { duty: 0.6 }));
    const w = e.warnings.find((x) => x.code === "drive-headroom-low");
    expect(w).toMatchObject({ partId: "SR1", element: "positions.0.drive.turnsRatio" });
    expect(e.corners[0].positions[0].vHigh).toBeCloseTo(4.8, 12);
  });

  it("thermal runaway and junction over its derated limit", () => {
    const hot = build({ kind: "direct" }, { rthJA: "5000 K/W" });
    const e = evaluateDesign(hot);
    expect(e.warnings.some((w) => w.code === "thermal-runaway" && w.partId === "SR1")).toBe(true);
    const warm = build({ kind: "direct" }, { rthJA: "1500 K/W" });
    const w = evaluateDesign(warm).warnings.find((x) => x.code === "junction-over-limit");
    expect(w).toMatchObject({ partId: "SR1", element: "positions.0.mosfet.rthJA" });
  });

  it("transistor over its peak current rating", () => {
    const d = build({ kind: "bjt-follower", npn: npnQTN6SL, pnp: pnpQTP6SL });
    expect(codes(d)).toContain("transistor-over-rating@vmin:SR1.npn");
  });

  it("a sound design raises nothing", () => {
    expect(codes(build({ kind: "direct" }))).toEqual([]);
  });
});
