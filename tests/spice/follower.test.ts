// (b) NPN/PNP emitter-follower buffer: ngspice vs the model's follower (driveBjt.ts).
// Circuit: Q1 of demo option 2 (controller pin 6 Ω / 3 Ω, 4.7 Ω base resistors, QN-150F12
// gate charge, 2.2 Ω + Rg(int) 1 Ω), with one gate resistor for both edges and no pin
// current limit so both sides describe the same circuit. The transistors are generic
// Gummel–Poon cards; the model gets their hFE(Ic) and VBE from an ngspice DC sweep at
// VCE = 2 V, the way a datasheet plot is measured.
import { beforeAll, describe, expect, it } from "vitest";
import { demoOptions, evaluateDesign } from "@/models";
import type { DesignInput } from "@/models/input";
import { runNgspice, valueOf } from "@/simulation/ngspice";
import { followerNetlist, hfeNetlist, type BjtCard, type FollowerNetwork } from "./netlists";
import { curveLoad, designOf } from "./fromModel";

// Gain falls with current through IKF (high-level injection): small-signal vs high-current part.
const DC = {
  small: "IS=1e-14 BF=200 IKF=0.3 BR=4 VAF=100 RB=2 RE=0.05 RC=0.3",
  high: "IS=1e-13 BF=250 IKF=4 BR=4 VAF=100 RB=0.5 RE=0.02 RC=0.05",
};
// β-only: no charge storage, the transistor the model describes. Realistic: junction and
// transit-time charge of parts with fT ≈ 300 / 150 MHz (values from memory, typical SOT-23).
const CHARGE = {
  none: { small: "CJE=1p CJC=1p TF=0", high: "CJE=1p CJC=1p TF=0" },
  real: { small: "CJE=30p CJC=10p TF=0.5n", high: "CJE=150p CJC=50p TF=1n" },
};
const ICS = [1e-3, 3e-3, 10e-3, 30e-3, 0.1, 0.2, 0.3, 0.5, 0.7, 1, 1.5, 2, 3, 4, 5];
type Family = keyof typeof DC;

interface Sim { ctrl: number; npn: number; pnp: number; ipkOn: number; ipkOff: number; top: number; bottom: number }
interface Mod { ctrl: number; npn: number; pnp: number; ipkOn: number; ipkOff: number; vHigh: number; vLow: number; starved: boolean }

async function datasheet(family: Family, polarity: "npn" | "pnp") {
  const r = await runNgspice(hfeNetlist({ name: "q", params: DC[family] }, polarity, ICS));
  return { hfe: ICS.map((ic, k) => ({ ic, hfe: ic / valueOf(r, `ib_${k}`) })), vbe: valueOf(r, `vbe_${ICS.indexOf(0.1)}`) };
}

function input(kind: "bjt-small" | "direct"): DesignInput {
  const i = structuredClone(demoOptions.find((o) => o.key === kind)!.input);
  i.controller.pin = { sourceResistance: "6 Ω", sinkResistance: "3 Ω" };
  i.positions[0].gate = { rTurnOn: "2.2 Ω" };
  return i;
}

async function model(family: Family, rBase: number): Promise<Mod> {
  const i = input("bjt-small");
  const drive = i.positions[0].drive;
  if (drive.kind !== "bjt-follower") throw new Error("demo option 2 changed");
  const n = await datasheet(family, "npn"), p = await datasheet(family, "pnp");
  drive.npn = { ...drive.npn, hfe: n.hfe, vbe: n.vbe, rBase };
  drive.pnp = { ...drive.pnp, hfe: p.hfe, vbe: p.vbe, rBase };
  const c = evaluateDesign(designOf(i), { corners: ["vnom"] }).corners[0];
  const e = (id: string, gate = false) => { const q = c.parts.find((x) => x.id === id)!; return (gate ? q.losses.gateDrive : q.total) / c.fsw; };
  const pos = c.positions[0];
  return {
    ctrl: e("controller", true), npn: e("Q1.npn"), pnp: e("Q1.pnp"), ipkOn: pos.iOnPeak, ipkOff: pos.iOffPeak,
    vHigh: pos.vHigh, vLow: pos.vLow, starved: pos.starved,
  };
}

const design = designOf(input("bjt-small"));
const m1 = design.positions[0].mosfet;
const NET: Omit<FollowerNetwork, "npn" | "pnp" | "rBase"> = {
  vcc: design.controller.vcc, vNeg: 0, rPinSource: 6, rPinSink: 3, pinEdge: 3e-9, rGate: 2.2, rgInt: m1.rgInt,
  gate: curveLoad({ qgs: m1.qgs, qgd: m1.qgd, qg: m1.qg, qgVgs: m1.qgVgs, vth: m1.vth, vpl: m1.vpl, ciss: m1.ciss }),
  halfPeriod: 1.5e-6,
};

async function simulate(family: Family, charge: keyof typeof CHARGE, rBase: number, direct = false): Promise<Sim> {
  const card = (name: string): BjtCard => ({ name, params: `${DC[family]} ${CHARGE[charge][family]}` });
  const r = await runNgspice(followerNetlist({ ...NET, rBase, npn: card("qn"), pnp: card("qp"), direct }, 0.2e-9));
  const v = (k: string) => valueOf(r, k);
  return {
    ctrl: v("e_pin_on") + v("e_pin_off"), npn: direct ? 0 : v("e_npn"), pnp: direct ? 0 : v("e_pnp"),
    ipkOn: v("ig_on_peak"), ipkOff: -v("ig_off_peak"), top: v("vg_top"), bottom: v("vg_bottom"),
  };
}

const runs: Record<string, { sim: Sim; mod: Mod }> = {};
let direct: { sim: number; mod: number };

beforeAll(async () => {
  for (const family of ["small", "high"] as Family[]) {
    runs[`${family}/none/4.7`] = { sim: await simulate(family, "none", 4.7), mod: await model(family, 4.7) };
    runs[`${family}/none/220`] = { sim: await simulate(family, "none", 220), mod: await model(family, 220) };
    runs[`${family}/real/4.7`] = { sim: await simulate(family, "real", 4.7), mod: runs[`${family}/none/4.7`].mod };
  }
  const d = evaluateDesign(designOf(input("direct")), { corners: ["vnom"] }).corners[0];
  direct = { sim: (await simulate("small", "none", 4.7, true)).ctrl, mod: d.parts.find((p) => p.id === "controller")!.losses.gateDrive / d.fsw };
}, 60_000);

const ratio = (model: number, spice: number) => model / spice;

describe.each(["small", "high"] as Family[])("follower with the %s-signal transistor pair, no charge storage", (family) => {
  it("controller heat: model above ngspice by at most 3× (hFE taken at the edge's peak current, the lowest gain)", () => {
    const { sim, mod } = runs[`${family}/none/4.7`];
    expect(ratio(mod.ctrl, sim.ctrl)).toBeGreaterThanOrEqual(1);
    expect(ratio(mod.ctrl, sim.ctrl)).toBeLessThanOrEqual(3);
  });

  it("the follower takes the gate current off the pin: controller heat ≥ 100× below direct drive, in both", () => {
    const { sim, mod } = runs[`${family}/none/4.7`];
    expect(direct.sim / sim.ctrl).toBeGreaterThan(100);
    expect(direct.mod / mod.ctrl).toBeGreaterThan(100);
  });

  it("transistor dissipation: model 0.55–1.05× ngspice (fixed VBE; the real VBE rises with Ic during the edge)", () => {
    const { sim, mod } = runs[`${family}/none/4.7`];
    for (const [m, s] of [[mod.npn, sim.npn], [mod.pnp, sim.pnp]]) {
      expect(ratio(m, s)).toBeGreaterThan(0.55);
      expect(ratio(m, s)).toBeLessThan(1.05);
    }
  });

  it("peak gate currents within ±20 %, gate levels within 0.3 V", () => {
    const { sim, mod } = runs[`${family}/none/4.7`];
    expect(Math.abs(ratio(mod.ipkOn, sim.ipkOn) - 1)).toBeLessThan(0.2);
    expect(Math.abs(ratio(mod.ipkOff, sim.ipkOff) - 1)).toBeLessThan(0.2);
    expect(Math.abs(mod.vHigh - sim.top)).toBeLessThan(0.3);
    expect(Math.abs(mod.vLow - sim.bottom)).toBeLessThan(0.3);
  });
});

describe("gain collapse (220 Ω base resistors limit the base current)", () => {
  it("the small-signal pair starves the gate, the high-current pair does not; peaks within ±15 %", () => {
    const small = runs["small/none/220"], high = runs["high/none/220"];
    expect(small.sim.ipkOn).toBeLessThan(0.65 * high.sim.ipkOn);
    expect(small.mod.starved).toBe(true);
    expect(high.mod.starved).toBe(false);
    for (const r of [small, high]) {
      expect(Math.abs(ratio(r.mod.ipkOn, r.sim.ipkOn) - 1)).toBeLessThan(0.15);
      expect(Math.abs(ratio(r.mod.ipkOff, r.sim.ipkOff) - 1)).toBeLessThan(0.15);
    }
  });
});

describe.each(["small", "high"] as Family[])("%s-signal pair with junction and transit-time charge (a limit of the model)", (family) => {
  it("the pin must also move the transistors' own charge: ngspice controller heat exceeds the β-only model by > 2×, still ≥ 10× below direct drive", () => {
    const { sim, mod } = runs[`${family}/real/4.7`];
    expect(sim.ctrl).toBeGreaterThan(2 * mod.ctrl);
    expect(direct.sim / sim.ctrl).toBeGreaterThan(10);
  });

  it("and the transistors' charging slows the current rise: ngspice peak below the model's", () => {
    const { sim, mod } = runs[`${family}/real/4.7`];
    expect(sim.ipkOn).toBeLessThan(mod.ipkOn);
    expect(sim.ipkOff).toBeLessThan(mod.ipkOff);
  });
});
