// (a) Where the gate-drive energy is burnt: ngspice vs the model's resistive split.
// Circuit: Q1 of demo option 3 (driver IC HRG-LS9T 2 Ω / 1 Ω, split outputs rTurnOn 2.2 Ω /
// rTurnOff 1 Ω, Rg(int) 1 Ω, gate charge of QN-150F12), built from the model's inputs.
import { describe, expect, it } from "vitest";
import { demoOptions, evaluateDesign } from "@/models";
import type { Design } from "@/models/input";
import { runNgspice, valueOf } from "@/simulation/ngspice";
import { splitNetlist, type GateLoad, type GateNetwork } from "./netlists";
import { curveLoad, designOf, integralVdQ, chargeOn } from "./fromModel";

type Variant = { vNeg: number; linearC?: number; keepLimits?: boolean };

/** Option 3 without the steering diode (separate on/off resistors) or peak-current limits, optionally a linear gate and a negative rail. */
function variant({ vNeg, linearC, keepLimits }: Variant): Design {
  const input = structuredClone(demoOptions.find((o) => o.key === "driver-ic")!.input);
  const q1 = input.positions[0];
  q1.gate = { rTurnOn: "2.2 Ω", rTurnOff: "1 Ω" };
  if (q1.drive.kind !== "driver-ic") throw new Error("demo option 3 changed");
  q1.drive.vNeg = vNeg;
  // Resistive split first: no peak-current limit (the limited case has its own test below).
  if (!keepLimits) {
    delete q1.drive.sourcePeakCurrent;
    delete q1.drive.sinkPeakCurrent;
  }
  if (linearC !== undefined) {
    // Q = C·V everywhere: Qgs = C·Vpl, no plateau, Qg = C·qgVgs, Ciss = C.
    q1.mosfet = { ...q1.mosfet, qgs: linearC * 4.8, qgd: 0, qg: linearC * 10, qgVgs: 10, vpl: 4.8, ciss: linearC };
  }
  return designOf(input);
}

function networkOf(d: Design, linear: boolean): GateNetwork {
  const q1 = d.positions[0];
  if (q1.drive.kind !== "driver-ic") throw new Error("expected a driver IC");
  const m = q1.mosfet;
  const gate: GateLoad = linear
    ? { kind: "linear", c: m.ciss as number }
    : curveLoad({ qgs: m.qgs, qgd: m.qgd, qg: m.qg, qgVgs: m.qgVgs, vth: m.vth, vpl: m.vpl, ciss: m.ciss });
  return {
    vHigh: q1.drive.supply ?? d.controller.vcc, vLow: q1.drive.vNeg, rSource: q1.drive.sourceResistance, rSink: q1.drive.sinkResistance,
    rExtOn: q1.gate.rTurnOn, rExtOff: q1.gate.rTurnOff as number, rgInt: m.rgInt, gate,
    sourceLimit: q1.drive.sourcePeakCurrent, sinkLimit: q1.drive.sinkPeakCurrent,
  };
}

/** Model energy per cycle in each element, J (gate-drive power / fsw at the nominal corner). */
function modelSplit(d: Design) {
  const c = evaluateDesign(d, { corners: ["vnom"] }).corners[0];
  const e = (id: string) => c.parts.find((p) => p.id === id)!.losses.gateDrive / c.fsw;
  return { driver: e("Q1.driver"), rOn: e("Q1.rgOn"), rOff: e("Q1.rgOff"), rgInt: e("Q1"), deltaQ: c.positions[0].deltaQ };
}

async function simulate(net: GateNetwork) {
  const r = await runNgspice(splitNetlist(net).netlist);
  const v = (k: string) => valueOf(r, k);
  return {
    src: v("e_src"), extOn: v("e_exton"), rgOn: v("e_rg_on"), snk: v("e_snk"), extOff: v("e_extoff"), rgOff: v("e_rg_off"),
    supply: v("e_supply"), dq: v("dq"), top: v("vg_top"), bottom: v("vg_bottom"),
  };
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("gate-drive energy split: ngspice vs model", () => {
  it.each([0, -5])("linear gate capacitance, V− = %d V: every element within 0.5 percent (½CV² per edge for any R, closed form)", async (vNeg) => {
    const d = variant({ vNeg, linearC: 3.2e-9 });
    const net = networkOf(d, true);
    const s = await simulate(net);
    const m = modelSplit(d);
    const dv = net.vHigh - net.vLow;
    const half = 0.5 * 3.2e-9 * dv * dv;
    // Source: the RC charging result, E = ½CV² in the resistors whatever their values
    // (Erickson & Maksimović, Fundamentals of Power Electronics 3rd ed. 2020, from memory).
    expect(rel(s.src + s.extOn + s.rgOn, half)).toBeLessThan(5e-3);
    expect(rel(s.snk + s.extOff + s.rgOff, half)).toBeLessThan(5e-3);
    expect(rel(s.src + s.snk, m.driver)).toBeLessThan(5e-3);
    expect(rel(s.extOn, m.rOn)).toBeLessThan(5e-3);
    expect(rel(s.extOff, m.rOff)).toBeLessThan(5e-3);
    expect(rel(s.rgOn + s.rgOff, m.rgInt)).toBeLessThan(5e-3);
  });

  it.each([0, -5])("datasheet gate-charge curve (plateau), V− = %d V: total ΔQ·ΔV and the in-edge R ratio exact, per-edge halves within 15 percent", async (vNeg) => {
    const d = variant({ vNeg });
    const net = networkOf(d, false);
    const s = await simulate(net);
    const m = modelSplit(d);
    const pts = (net.gate as Extract<GateLoad, { kind: "curve" }>).points;
    const dv = net.vHigh - net.vLow;
    // The gate reaches both rails, so ΔQ is the curve's swing charge and the rails deliver ΔQ·ΔV.
    expect(s.top).toBeCloseTo(net.vHigh, 3);
    expect(s.bottom).toBeCloseTo(net.vLow, 3);
    const dq = chargeOn(pts, net.vHigh) - chargeOn(pts, net.vLow);
    expect(rel(s.dq, dq)).toBeLessThan(5e-3);
    expect(rel(m.deltaQ, s.dq)).toBeLessThan(5e-3);
    expect(rel(s.supply, dq * dv)).toBeLessThan(5e-3);
    expect(rel(m.driver + m.rOn + m.rOff + m.rgInt, s.supply)).toBeLessThan(5e-3);
    // Series elements carry one current, so within an edge energy ∝ R (exact for any Q(V)).
    expect(rel(s.src / s.extOn, net.rSource / net.rExtOn)).toBeLessThan(5e-3);
    expect(rel(s.snk / s.extOff, net.rSink / net.rExtOff)).toBeLessThan(5e-3);
    // Per edge, closed form for a charge-conserving Q(V): turn-on burns V+·ΔQ − ∫v dQ,
    // turn-off ∫v dQ − V−·ΔQ (energy balance of the capacitor's stored charge).
    const stored = integralVdQ(pts, net.vLow, net.vHigh);
    const onEdge = s.src + s.extOn + s.rgOn;
    const offEdge = s.snk + s.extOff + s.rgOff;
    expect(rel(onEdge, net.vHigh * dq - stored)).toBeLessThan(5e-3);
    expect(rel(offEdge, stored - net.vLow * dq)).toBeLessThan(5e-3);
    // The model books ½·ΔQ·ΔV per edge (documented approximation in gatePower.ts):
    // 3 % off here at V− = 0, 8 % with −5 V, where the Ciss region below 0 V is a
    // low-voltage charge that the turn-off edge returns at a loss.
    const modelOn = (m.rOn * (net.rSource + net.rExtOn + net.rgInt)) / net.rExtOn;
    expect(rel(modelOn, onEdge)).toBeLessThan(0.15);
    expect(rel(m.rOff, s.extOff)).toBeLessThan(0.15);
    expect(rel(m.rOn, s.extOn)).toBeLessThan(0.15);
    expect(offEdge).toBeGreaterThan(onEdge);
  });

  it("current-limited sink (4 A, V− = −5 V): the model's equivalent-resistor rule over-books the driver, under-books the resistors", async () => {
    const d = variant({ vNeg: -5, keepLimits: true });
    const net = networkOf(d, false);
    expect(net.sinkLimit).toBe(4);
    const s = await simulate(net);
    const m = modelSplit(d);
    // Total is still ΔQ·ΔV (2 %: the 1 ns command edge of the B-source outputs overlaps a little).
    expect(rel(m.driver + m.rOn + m.rOff + m.rgInt, s.supply)).toBeLessThan(0.02);
    // While limited the real driver holds 4 A and the resistors see 4 A too; a resistor giving
    // the same peak current (common practice, driveCommon.ts) takes more of the energy for the
    // driver. Measured here: driver +15 %, rOff −29 %. Both signs asserted, and the bands.
    expect(m.driver).toBeGreaterThan(s.src + s.snk);
    expect(rel(m.driver, s.src + s.snk)).toBeLessThan(0.25);
    expect(m.rOff).toBeLessThan(s.extOff);
    expect(rel(m.rOff, s.extOff)).toBeLessThan(0.4);
  });
});
