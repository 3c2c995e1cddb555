// The emitter-follower decks (simulation/follower.ts) over the reference
// cases: bookkeeping that must close, bounds the transistors' own charge
// sets, and the trends between the two transistor classes. These check the
// decks, not the Heatsplit model.
import { beforeAll, describe, expect, it } from "vitest";
import { depletionCharge, type BjtCard } from "@/simulation/bjt";
import { BJT_PAIRS, type BjtFamily } from "@/simulation/bjtCards";
import { extractDatasheet, type Datasheet } from "@/simulation/bjtDatasheet";
import { energyOnCurve, swingCharge } from "@/simulation/gateLoad";
import { accounted, drawn, simulateFollower, type FollowerMeasurement } from "@/simulation/followerResult";
import {
  DATASHEET_CONDITIONS, FOLLOWER_SPECS, GATES, R_GS, VCC, followerCase, followerId, mapLimited, type FollowerSpec,
} from "./reference-drive-cases";

const runs = new Map<string, { spec: FollowerSpec; m: FollowerMeasurement }>();
const npnSheet = new Map<BjtFamily, Datasheet>();

beforeAll(async () => {
  for (const family of ["small", "high"] as BjtFamily[]) npnSheet.set(family, await extractDatasheet(BJT_PAIRS[family].npn, DATASHEET_CONDITIONS[family]));
  const done = await mapLimited(FOLLOWER_SPECS, async (spec) => ({ spec, m: await simulateFollower(followerCase(spec)) }));
  for (const r of done) runs.set(followerId(r.spec), r);
}, 120_000);

const all = () => [...runs.values()];
const get = (s: FollowerSpec) => runs.get(followerId(s))!.m;
const followers = () => all().filter((r) => !r.spec.direct);
const matrix = () => followers().filter((r) => (r.spec.rBase === 0 || r.spec.rBase === 4.7) && r.spec.gate !== "switch" && !r.spec.vNeg && !r.spec.limits);
/** hFE at ic on the extracted curve, log-log interpolation. */
function hfeAt(s: Datasheet, ic: number): number {
  const p = s.hfe;
  let k = 1;
  while (k < p.length - 1 && p[k].ic < ic) k++;
  const t = Math.log(ic / p[k - 1].ic) / Math.log(p[k].ic / p[k - 1].ic);
  return Math.exp(Math.log(p[k - 1].hfe) + t * Math.log(p[k].hfe / p[k - 1].hfe));
}
/** Charge each transistor's Cjc takes over the full base swing 0 … Vcc (collectors at Vcc and 0). */
const cjcCharge = (c: BjtCard) => -depletionCharge(c.gp.cjc, c.gp.vjc, c.gp.mjc, -VCC);

describe("energy bookkeeping (conservation of energy: drawn from the rails = heat in every element + energy into the gate)", () => {
  it("closes within 0.1 % on every edge of every case", () => {
    for (const { spec, m } of all()) for (const edge of ["on", "off"] as const) {
      const scale = Math.max(Math.abs(drawn(m, edge)), Math.abs(m.gate[edge]), 1e-12);
      expect(Math.abs(drawn(m, edge) - accounted(m, edge)) / scale, `${followerId(spec)} ${edge}`).toBeLessThan(1e-3);
    }
  });

  it("the pwl gate returns its energy over the period, and takes ∫v·dQ along its curve on the on-edge (within 0.5 %)", () => {
    for (const { spec, m } of all()) {
      if (spec.gate === "switch") continue;
      expect(Math.abs(m.gate.on + m.gate.off) / m.gate.on).toBeLessThan(1e-3);
      expect(m.gate.on / energyOnCurve(GATES[spec.gate], m.vgBottom, m.vgTop, 0) - 1).toBeCloseTo(0, 2);
    }
  });
});

describe("gate levels and the pin's share", () => {
  it("the follower leaves the gate one VBE from the pin's levels (DOMAIN item 4); direct drive reaches them", () => {
    for (const { spec, m } of all()) {
      if (spec.direct) {
        expect(VCC - m.vgTop).toBeLessThan(0.02);
        expect(Math.abs(m.vgBottom)).toBeLessThan(0.02);
      } else {
        expect(VCC - m.vgTop).toBeGreaterThan(0.3);
        expect(VCC - m.vgTop).toBeLessThan(1);
        expect(m.vgBottom).toBeLessThan(0.8);
      }
    }
  });

  it("every edge the pin moves at least both Cjc over the full swing plus the quasi-static ΔQ/(hFE+1) (depletion charge, Baliga 2nd ed.)", () => {
    for (const { spec, m } of followers()) {
      const pair = BJT_PAIRS[spec.family];
      const dq = spec.gate === "switch" ? m.gateCharge.on : swingCharge(GATES[spec.gate], m.vgBottom, m.vgTop);
      const peak = Math.max(...npnSheet.get(spec.family)!.hfe.map((p) => p.hfe));
      const bound = cjcCharge(pair.npn) + cjcCharge(pair.pnp) + dq / (peak + 1);
      expect(m.pinCharge.on, followerId(spec)).toBeGreaterThan(bound);
      expect(-m.pinCharge.off, followerId(spec)).toBeGreaterThan(bound);
    }
  });

  it("while the gate is held high the pin supplies the pull-down's current over hFE (100 kHz: the tail has died), within 10 %", () => {
    for (const { spec, m } of matrix().filter((r) => r.spec.fsw === 100e3)) {
      const ie = m.vgTop / R_GS;
      expect(Math.abs((m.pinHoldHigh * hfeAt(npnSheet.get(spec.family)!, ie)) / ie - 1), followerId(spec)).toBeLessThan(0.1);
    }
  });

  it("a full period counts that DC base current: 100 kHz takes I·(5 µs − 1 µs) more net charge than 500 kHz (small pair, 20 nC, where the gate settles in 1 µs), within 20 %", () => {
    for (const rBase of [0, 4.7]) {
      const at = (fsw: number) => get({ family: "small", gate: "20nC", fsw, rBase, stage: "thevenin" });
      const extra = at(100e3).pinCharge.on - at(500e3).pinCharge.on;
      expect(Math.abs(extra / (at(100e3).pinHoldHigh * 4e-6) - 1)).toBeLessThan(0.2);
    }
  });

  it("the follower takes most of the heat off the controller: direct drive heats the pin ≥ 3× more", () => {
    for (const { spec, m } of matrix().filter((r) => r.spec.fsw === 500e3 && r.spec.rBase === 0)) {
      const direct = get({ ...spec, family: "small", direct: true });
      expect(direct.pinHeat.on + direct.pinHeat.off).toBeGreaterThan(3 * (m.pinHeat.on + m.pinHeat.off));
    }
  });
});

describe("transistor class, base resistor and pin stage", () => {
  const pinHeat = (m: FollowerMeasurement) => m.pinHeat.on + m.pinHeat.off;

  it("the high-current pair's junction and stored charge cost the pin ≥ 3× the heat and ≥ 1.5× the charge of the small pair", () => {
    for (const { spec, m } of matrix().filter((r) => r.spec.family === "high")) {
      const small = get({ ...spec, family: "small" });
      expect(pinHeat(m), followerId(spec)).toBeGreaterThan(3 * pinHeat(small));
      expect(m.pinChargeAbs.on + m.pinChargeAbs.off).toBeGreaterThan(1.5 * (small.pinChargeAbs.on + small.pinChargeAbs.off));
    }
  });

  it("without a base resistor the pin's peaks are higher", () => {
    for (const { spec, m } of matrix().filter((r) => r.spec.rBase === 0)) {
      const rb = get({ ...spec, rBase: 4.7 });
      expect(m.pinPeakSource).toBeGreaterThan(rb.pinPeakSource);
      expect(m.pinPeakSink).toBeGreaterThan(rb.pinPeakSink);
    }
  });

  it("a push-pull pin burns at least what the Thevenin ramp does: current during the ramp is partly absorbed by the ramp source", () => {
    for (const { spec, m } of matrix().filter((r) => r.spec.stage === "push-pull")) {
      const thevenin = get({ ...spec, stage: "thevenin" });
      expect(pinHeat(m), followerId(spec)).toBeGreaterThanOrEqual(pinHeat(thevenin));
    }
  });

  it("100 Ω base resistors starve the gate: both pairs lose ≥ 30 % of peak gate current, the small pair ends lower, and no gate current exceeds hFE(Ic) × the pin's", () => {
    const starved = (family: BjtFamily) => get({ family, gate: "100nC", fsw: 100e3, rBase: 100, stage: "thevenin" });
    const free = (family: BjtFamily) => get({ family, gate: "100nC", fsw: 100e3, rBase: 0, stage: "thevenin" });
    for (const family of ["small", "high"] as BjtFamily[]) {
      const m = starved(family);
      expect(m.igOnPeak).toBeLessThan(0.7 * free(family).igOnPeak);
      expect(m.igOnPeak / m.pinPeakSource).toBeLessThan(hfeAt(npnSheet.get(family)!, m.igOnPeak));
    }
    expect(starved("small").igOnPeak).toBeLessThan(0.9 * starved("high").igOnPeak);
  });

  it("a current-limited pin stays at its limits", () => {
    for (const { spec, m } of followers().filter((r) => r.spec.limits)) {
      expect(m.pinPeakSource).toBeLessThan(spec.limits!.source * 1.001);
      expect(m.pinPeakSink).toBeLessThan(spec.limits!.sink * 1.001);
    }
  });

  it("a −5 V PNP collector rail adds 5 V × the turn-off charge to the PNP's heat, drawn from that rail (within 10 %)", () => {
    const base = { family: "high" as const, gate: "20nC" as const, fsw: 100e3, rBase: 4.7, stage: "thevenin" as const };
    const neg = get({ ...base, vNeg: -5 }), zero = get(base);
    const q = -neg.gateCharge.off;
    expect(Math.abs(neg.vNeg.off / (5 * q) - 1)).toBeLessThan(0.1);
    expect(Math.abs((neg.pnp.off - zero.pnp.off) / neg.vNeg.off - 1)).toBeLessThan(0.1);
  });
});
