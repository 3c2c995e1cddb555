// (c) Hard turn-off of a clamped inductive load, with and without negative gate bias:
// ngspice VDMOS vs the model's edge estimate (switching.ts, through evaluateDesign).
// The model gets the device's "datasheet" from ngspice itself: a JESD24-2 style
// gate-charge test (Qgs, Qgd, Qg, Vpl, slope below the plateau) and Vth at 250 µA.
import { beforeAll, describe, expect, it } from "vitest";
import { evaluateDesign, type EdgeResult } from "@/models";
import { runNgspice, valueOf } from "@/simulation/ngspice";
import { turnOffNetlist } from "./netlists";
import { DEVICE, LOAD, V_HIGH, edgeCheckDesign, sheet, type Sheet } from "./vdmosSheet";
import { designOf } from "./fromModel";

const CASES = [
  { vLow: 0, r: 2.2 }, { vLow: 0, r: 10 }, { vLow: -10, r: 2.2 }, { vLow: -10, r: 10 },
];

interface Edge { tv: number; ti: number; eoff: number; vClamp: number }

/** ngspice turn-off; 10–90 % times scaled by 1/0.8 to the full ramp the model's t_v, t_i stand for. */
async function spiceEdge(vLow: number, r: number): Promise<Edge> {
  const s = await runNgspice(turnOffNetlist(DEVICE, LOAD, { vHigh: V_HIGH, vLow, rGate: r }, 400e-9));
  const v = (k: string) => valueOf(s, k);
  return { tv: (v("tv90") - v("tv10")) / 0.8, ti: (v("ti10") - v("ti90")) / 0.8, eoff: v("eoff"), vClamp: v("vds_end") };
}

/** The same switch in a one-position design: ideal driver (V+, V−), gate resistor r. */
function modelEdge(d: Sheet, vLow: number, r: number, vClamp: number): EdgeResult {
  const input = edgeCheckDesign(d, { name: "turn-off check", vLow, rGate: r, vds: vClamp });
  const edge = evaluateDesign(designOf(input)).corners[0].positions[0].turnOff;
  if (!edge) throw new Error("no turn-off edge in the model result");
  return edge;
}

let ds: Sheet;
const results: { vLow: number; r: number; spice: Edge; model: EdgeResult }[] = [];

beforeAll(async () => {
  ds = await sheet();
  for (const c of CASES) {
    const spice = await spiceEdge(c.vLow, c.r);
    results.push({ ...c, spice, model: modelEdge(ds, c.vLow, c.r, spice.vClamp) });
  }
}, 60_000);

const find = (vLow: number, r: number) => results.find((x) => x.vLow === vLow && x.r === r)!;

describe("generic VDMOS datasheet from ngspice", () => {
  it("gate-charge test gives a sensible curve", () => {
    expect(ds.vth).toBeGreaterThan(2);
    expect(ds.vth).toBeLessThan(ds.vpl);
    expect(ds.vpl).toBeLessThan(6);
    expect(ds.qgd).toBeGreaterThan(ds.qgs * 0.5);
    expect(ds.qg).toBeGreaterThan(ds.qgs + ds.qgd);
  });
});

describe("turn-off of a clamped inductive load: ngspice vs model", () => {
  it.each(CASES)("V− = $vLow V, R = $r Ω: Eoff within a factor 2, t_v within ±40 %", ({ vLow, r }) => {
    // Band of agreement: factor 2 for the edge energy (the linear-ramp overlap of
    // Erickson & Maksimović 3rd ed. 2020 ch. 4 / Mohan et al. 3rd ed. 2003 ch. 2 against a
    // device whose Cgd falls 12× with Vds: the real voltage rise is fast where Cgd is small).
    const { spice, model } = find(vLow, r);
    expect(model.energy / spice.eoff).toBeGreaterThan(0.5);
    expect(model.energy / spice.eoff).toBeLessThan(2);
    expect(Math.abs(model.tv / spice.tv - 1)).toBeLessThan(0.4);
    // t_i = Qgs2/I is the conservative side: Coss takes part of the current while Vds rises.
    expect(model.ti).toBeGreaterThan(spice.ti);
    expect(model.ti / spice.ti).toBeLessThan(5);
  });

  it.each([2.2, 10])("negative bias at R = %d Ω: shorter turn-off and lower Eoff in both, by a similar factor", (r) => {
    const z = find(0, r), n = find(-10, r);
    for (const side of ["spice", "model"] as const) {
      const e = (x: typeof z) => (side === "spice" ? x.spice.eoff : x.model.energy);
      const t = (x: typeof z) => (side === "spice" ? x.spice.tv + x.spice.ti : x.model.tv + x.model.ti);
      expect(e(n)).toBeLessThan(e(z));
      expect(t(n)).toBeLessThan(t(z));
    }
    // The gain from the bias, (Vpl + 10 V)/Vpl in the model: ratio within 30 % of ngspice's.
    const gain = (x: "spice" | "model") => (x === "spice" ? z.spice.eoff / n.spice.eoff : z.model.energy / n.model.energy);
    expect(Math.abs(gain("model") / gain("spice") - 1)).toBeLessThan(0.3);
  });

  it.each([0, -10])("larger gate resistance at V− = %d V: longer edges and higher Eoff in both", (vLow) => {
    const a = find(vLow, 2.2), b = find(vLow, 10);
    expect(b.spice.tv).toBeGreaterThan(a.spice.tv);
    expect(b.spice.ti).toBeGreaterThan(a.spice.ti);
    expect(b.spice.eoff).toBeGreaterThan(a.spice.eoff);
    expect(b.model.tv).toBeGreaterThan(a.model.tv);
    expect(b.model.ti).toBeGreaterThan(a.model.ti);
    expect(b.model.energy).toBeGreaterThan(a.model.energy);
  });
});
