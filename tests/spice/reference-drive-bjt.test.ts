// The transistor cards of simulation/bjtCards.ts and the datasheet decks of
// simulation/bjtDatasheet.ts, checked against closed forms of the same
// Gummel–Poon model and against the two classes the cards stand for.
import { beforeAll, describe, expect, it } from "vitest";
import { depletionCapacitance, type BjtCard } from "@/simulation/bjt";
import { BJT_PAIRS, SMALL_NPN } from "@/simulation/bjtCards";
import { extractDatasheet, logSpaced, type Datasheet, type DatasheetConditions } from "@/simulation/bjtDatasheet";

const VT = 0.025852; // kT/q at 27 °C, V
// VBE(on) is read at the fT current so the fT check knows the B-E bias.
const CONDITIONS: Record<"small" | "high", DatasheetConditions> = {
  small: { ics: logSpaced(1e-4, 1, 12), hfeVce: 2, vbeIc: 10e-3, vceSatIc: 0.1, cobVcb: 10, cibVeb: 0.5, ftIc: 10e-3, ftVce: 2 },
  high: { ics: logSpaced(1e-3, 5, 12), hfeVce: 2, vbeIc: 0.1, vceSatIc: 1, cobVcb: 10, cibVeb: 0.5, ftIc: 0.1, ftVce: 2 },
};
const CARDS = (["small", "high"] as const).flatMap((family) => [BJT_PAIRS[family].npn, BJT_PAIRS[family].pnp].map((card) => ({ family, card })));
// The small NPN with high injection, leakage and transit time switched off: ideal Ebers–Moll plus
// Early effect and ohmic resistances, for which VBE, hFE and VCE(sat) have closed forms.
const IDEAL: BjtCard = { name: "qideal", polarity: "npn", gp: { ...SMALL_NPN.gp, ikf: 1e6, ikr: 1e6, ise: 0 } };

const sheets = new Map<string, Datasheet>();
let ideal: Datasheet;

beforeAll(async () => {
  // One card at a time: each extraction already runs its five decks side by side.
  for (const { family, card } of [...CARDS, { family: "small" as const, card: IDEAL }]) sheets.set(card.name, await extractDatasheet(card, CONDITIONS[family]));
  ideal = sheets.get(IDEAL.name)!;
}, 60_000);

const hfeAt = (s: Datasheet, ic: number) => s.hfe.reduce((best, p) => (Math.abs(Math.log(p.ic / ic)) < Math.abs(Math.log(best.ic / ic)) ? p : best)).hfe;
const peak = (s: Datasheet) => Math.max(...s.hfe.map((p) => p.hfe));

describe.each(CARDS)("$family-class $card.polarity card $card.name", ({ family, card }) => {
  it("hFE(Ic) behaves like its class: small-signal gain collapses by 0.4 A, high-current gain holds to 2 A (class description, common practice)", () => {
    const s = sheets.get(card.name)!;
    if (family === "small") {
      expect(hfeAt(s, 0.43) / peak(s)).toBeLessThan(0.35);
      expect(hfeAt(s, 0.19) / peak(s)).toBeLessThan(0.6);
    } else {
      expect(hfeAt(s, 2.3) / peak(s)).toBeGreaterThan(0.5);
      expect(hfeAt(s, 0.49) / peak(s)).toBeGreaterThan(0.85);
    }
  });

  it("Cobo (VCB 10 V, IE = 0, 1 MHz) equals CJC/(1 + VCB/VJC)^MJC (depletion capacitance, Baliga 2nd ed.; SPICE's own form) within 0.5 %", () => {
    const s = sheets.get(card.name)!, g = card.gp;
    expect(Math.abs(s.cob / depletionCapacitance(g.cjc, g.vjc, g.mjc, -s.cobVcb) - 1)).toBeLessThan(0.005);
  });

  it("Cibo (VEB 0.5 V reverse, IC = 0) equals CJE/(1 + VEB/VJE)^MJE within 0.5 %", () => {
    const s = sheets.get(card.name)!, g = card.gp;
    expect(Math.abs(s.cib / depletionCapacitance(g.cje, g.vje, g.mje, -s.cibVeb) - 1)).toBeLessThan(0.005);
  });

  it("fT at moderate current: within 5 % of the charge-control closed form, below 1/(2π·TF) and above 60 % of it", () => {
    // 1/(2π·fT) = TF + (Cje(VBE) + Cjc(VBC))·VT/Ic + Cjc·(RE + RC): the hybrid-π transit plus
    // junction charging delays (closed form recalled from memory of the standard small-signal model).
    // Cje at forward bias uses SPICE's FC = 0.5 linear extension (depletionCapacitance).
    const s = sheets.get(card.name)!, g = card.gp;
    const cje = depletionCapacitance(g.cje, g.vje, g.mje, s.vbe);
    const cjc = depletionCapacitance(g.cjc, g.vjc, g.mjc, s.vbe - s.ftVce);
    const expected = 1 / (2 * Math.PI * (g.tf + ((cje + cjc) * VT) / s.ftIc + cjc * (g.re + g.rc)));
    expect(Math.abs(s.ft / expected - 1)).toBeLessThan(0.05);
    const intrinsic = 1 / (2 * Math.PI * g.tf);
    expect(s.ft).toBeLessThan(intrinsic);
    expect(s.ft).toBeGreaterThan(0.6 * intrinsic);
  });

  it("VCE(sat) at Ic/10 sits in its class: under 0.25 V (small, 0.1 A) or 0.15 V (high-current, 1 A) (common practice)", () => {
    const s = sheets.get(card.name)!;
    expect(s.vceSat).toBeGreaterThan(0.02);
    expect(s.vceSat).toBeLessThan(family === "small" ? 0.25 : 0.15);
  });
});

describe("the datasheet decks against closed forms, on an ideal card (no high injection, no leakage)", () => {
  const g = IDEAL.gp;

  it("hFE equals BF·(1 + VCB/VAF) at every current (Gummel–Poon q1 with the Early voltage) within 1 %", () => {
    for (const { ic, hfe } of ideal.hfe) {
      // VCB from VCE = 2 V less an estimated VBE; 50 mV of VBE error moves this by 0.05 %.
      const vbe = VT * Math.log(ic / g.is);
      expect(Math.abs(hfe / (g.bf * (1 + (2 - vbe) / g.vaf)) - 1)).toBeLessThan(0.01);
    }
  });

  it("VBE(on) equals VT·ln(Ic/(IS·(1 + VCB/VAF))) + Ib·RB + Ie·RE within 1 mV", () => {
    const ic = ideal.vbeIc;
    const ib = ic / ideal.hfe[0].hfe;
    let vbe = 0.7;
    for (let k = 0; k < 5; k++) vbe = VT * Math.log(ic / (g.is * (1 + (2 - vbe) / g.vaf))) + ib * g.rb + (ic + ib) * g.re;
    expect(Math.abs(ideal.vbe - vbe)).toBeLessThan(1e-3);
  });

  it("VCE(sat) equals the Ebers–Moll saturation voltage plus the ohmic drops within 1 %", () => {
    // VCE(sat) = VT·ln[(1 + (β_f + 1)/BR)/(1 − β_f/BF)] with β_f = Ic/Ib = 10, + Ic·RC + (Ic + Ib)·RE
    // (Ebers–Moll, recalled from memory); the Early factor is left out (VCB ≈ −0.6 V: 0.7 % of VAF).
    const bf = 10, ic = ideal.vceSatIc;
    const vceSat = VT * Math.log((1 + (bf + 1) / g.br) / (1 - bf / g.bf)) + ic * g.rc + (ic + ic / bf) * g.re;
    expect(Math.abs(ideal.vceSat / vceSat - 1)).toBeLessThan(0.01);
  });
});
