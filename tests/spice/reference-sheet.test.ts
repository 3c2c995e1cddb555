// The datasheet decks (simulation/mosfetSheetDecks.ts) checked against each
// other and against the closed forms of ngspice's VDMOS equations, for both
// reference cards. Nothing here involves the Heatsplit model.
import { beforeAll, describe, expect, it } from "vitest";
import { SJ_650V, TRENCH_60V, type ReferencePart } from "@/simulation/mosfetCards";
import { curveAt, curveIntegral } from "@/simulation/mosfetCurve";
import { extractSheet, type Datasheet } from "@/simulation/mosfetSheet";

const PARTS: [string, ReferencePart][] = [["t60", TRENCH_60V], ["sj650", SJ_650V]];
const sheets = new Map<ReferencePart, Datasheet>();

beforeAll(async () => {
  for (const [, p] of PARTS) sheets.set(p, await extractSheet(p));
}, 60_000);

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const THERMAL_VOLTAGE = 0.025865; // kT/q at 27 °C, ngspice's default temperature

describe.each(PARTS)("datasheet decks of %s", (_, part) => {
  const p = part.card.params;
  const d = () => sheets.get(part)!;

  it("Miller charge of the gate-charge plateau equals ∫Crss dVdg from the 1 MHz curve, within 2 %", () => {
    // Cgd is a function of Vdg alone (ngspice VDMOS); on the plateau the load current drops
    // qgId·Rd in the drift region and qgId·Rs in the source, which the card's values give.
    // Only stretches where Vdg stays above 0.1 V (the curve's first point) are compared.
    const s = d();
    const vdg = (m: (typeof s.miller)[number]) => m.vds - s.qgId * (p.rd ?? 0) - (m.vgs - s.qgId * (p.rs ?? 0));
    const usable = s.miller.filter((m) => vdg(m) >= 0.1);
    expect(usable.length).toBeGreaterThanOrEqual(3);
    const cgs = curveAt(s.capacitance, "ciss", s.qgVds) - curveAt(s.capacitance, "crss", s.qgVds);
    for (let i = 1; i < usable.length; i++) {
      const [hi, lo] = [usable[i - 1], usable[i]];
      const expected = curveIntegral(s.capacitance, "crss", vdg(lo), vdg(hi), 0) + cgs * (lo.vgs - hi.vgs);
      expect(rel(lo.q - hi.q, expected)).toBeLessThan(0.02);
    }
  });

  it("Eoss and Qoss from the Coss curve equal the slow-ramp measurement within 2 %", () => {
    const s = d();
    expect(rel(curveIntegral(s.capacitance, "coss", 0, s.eoss.vds, 1), s.eoss.e)).toBeLessThan(0.02);
    expect(rel(curveIntegral(s.capacitance, "coss", 0, s.qoss.vds, 0), s.qoss.q)).toBeLessThan(0.02);
  });

  it("slope of Q(Vgs) below the plateau equals the AC Ciss at the test voltage within 1 %", () => {
    const s = d();
    expect(rel(s.ciss, curveAt(s.capacitance, "ciss", s.qgVds))).toBeLessThan(0.01);
  });

  it("internal gate resistance read as the series part of Zin: Rg + Rs within 2 %", () => {
    // Rd in the Cgd branch adds about Rd·(Crss/Ciss)², under 1 % of Rg here.
    expect(rel(d().rgInt, (p.rg ?? 0) + (p.rs ?? 0))).toBeLessThan(0.02);
  });

  it("transfer points, gfs and Rds(on) follow the VDMOS level-1 equations of the card within 2 %", () => {
    // ngspice VDMOS (MOS1 form): saturation Id = Kp/2·(Vgs − Vto)²·(1 + λ·Vds), so
    // gm = sqrt(2·Kp·(1 + λ·Vds)·Id), seen at the pins as gm/(1 + gm·Rs); linear region at small Vds: Rds = Rd + Rs + 1/(Kp·(Vgs − Vto)).
    // Points within 1 V of Vto are left out (subthreshold smoothing, ksubthres), and Rs
    // lowers the internal Vgs by Id·Rs.
    const s = d();
    const kp = p.kp!;
    const vto = p.vto!;
    const lam = 1 + (p.lambda ?? 0) * part.sheet.transferVds;
    for (const { vgs, id } of s.transfer.filter((x) => x.vgs > vto + 1)) {
      const vgsi = vgs - id * (p.rs ?? 0);
      expect(rel(id, (kp / 2) * (vgsi - vto) ** 2 * lam)).toBeLessThan(0.02);
    }
    const gm = Math.sqrt(2 * kp * lam * s.gfsId);
    expect(rel(s.gfs, gm / (1 + gm * (p.rs ?? 0)))).toBeLessThan(0.02);
    const hi = s.rdsOn.find((r) => r.vgs === 10)!;
    expect(rel(hi.rds, (p.rd ?? 0) + (p.rs ?? 0) + 1 / (kp * (10 - vto)))).toBeLessThan(0.03);
    expect(s.rdsOn.find((r) => r.vgs !== 10)!.rds).toBeGreaterThan(hi.rds);
  });

  it("body-diode Vsd follows the diode equation n·Vt·ln(I/Is) + I·Rb within 1 %", () => {
    const s = d();
    const vsd = (p.n ?? 1) * THERMAL_VOLTAGE * Math.log(s.vsdI / p.is!) + s.vsdI * (p.rb ?? 0);
    expect(rel(s.vsd, vsd)).toBeLessThan(0.01);
  });

  it("Vth at 250 µA sits just below Vto (subthreshold conduction) and below the plateau", () => {
    const s = d();
    expect(s.vth).toBeLessThan(p.vto!);
    expect(s.vth).toBeGreaterThan(p.vto! - 0.5);
    expect(s.vpl).toBeGreaterThan(s.vth);
  });
});

describe("the 650 V card is superjunction-like (class figures from memory)", () => {
  it("Crss falls two to three decades and Coss about two from 0.1 V to 100 V; Rds(on) 0.1-0.2 Ω; Qg 30-60 nC", () => {
    const s = sheets.get(SJ_650V)!;
    const c = s.capacitance;
    const crssDrop = curveAt(c, "crss", 0.1) / curveAt(c, "crss", 100);
    const cossDrop = curveAt(c, "coss", 0.1) / curveAt(c, "coss", 100);
    expect(crssDrop).toBeGreaterThan(100);
    expect(crssDrop).toBeLessThan(1000);
    expect(cossDrop).toBeGreaterThan(50);
    expect(s.rdsOn.find((r) => r.vgs === 10)!.rds).toBeGreaterThan(0.1);
    expect(s.rdsOn.find((r) => r.vgs === 10)!.rds).toBeLessThan(0.2);
    expect(s.qg).toBeGreaterThan(30e-9);
    expect(s.qg).toBeLessThan(60e-9);
  });

  it("the datasheet Qgd is longer than ∫Crss from 0 to the test voltage: the plateau ends with the gate above the drain", () => {
    // At the plateau end Vds ≈ Id·Rds(on) < Vpl, so Vdg < 0, where Cgd is near Cgdmax: the
    // Crss curve (Vds ≥ 0 at Vgs = 0) does not show that charge. Worth knowing when a model
    // integrates Crss(Vds) for the edge and compares with a datasheet Qgd.
    for (const part of [TRENCH_60V, SJ_650V]) {
      const s = sheets.get(part)!;
      expect(s.vdsPlateauEnd).toBeLessThan(s.vpl);
      expect(s.qgd).toBeGreaterThan(1.2 * curveIntegral(s.capacitance, "crss", 0, s.qgVds, 0));
    }
  });
});
