// A card's "datasheet", measured in ngspice the way datasheets are (decks in
// mosfetSheetDecks.ts). Everything in SI: C, V, A, F, S, Ω, J.
import type { ReferencePart } from "./mosfetCards";
import { capacitanceDeck, gateChargeDeck, outputChargeDeck, staticDeck } from "./mosfetSheetDecks";
import { runNgspice, valueOf, type NgspiceResult } from "./ngspice";

export interface CapacitancePoint { vds: number; ciss: number; coss: number; crss: number }

export interface Datasheet {
  qgs: number; qgd: number; qg: number;
  /** Gate-charge test conditions: Qg read at qgVgs, drain at qgVds, load qgId. */
  qgVgs: number; qgVds: number; qgId: number;
  vth: number;
  vpl: number;
  /** Slope of Q(Vgs) between 1 and 1.5 V in the gate-charge test, F. */
  ciss: number;
  capacitance: CapacitancePoint[];
  transfer: { vgs: number; id: number }[];
  gfs: number; gfsId: number;
  rdsOn: { vgs: number; rds: number }[];
  vsd: number; vsdI: number;
  eoss: { vds: number; e: number };
  qoss: { vds: number; q: number };
  /** Internal gate resistance, from Re(Zin) at 1 MHz with the drain shorted. */
  rgInt: number;
  /** Miller-charge readings of the gate-charge test: charge and Vgs as Vds falls through each level. */
  miller: { vds: number; q: number; vgs: number }[];
  /** Drain voltage at the plateau end (Vgs = Vpl + 0.2 V). */
  vdsPlateauEnd: number;
}

/** Drain voltages of the capacitance curve: `n` points log-spaced from 0.1 V to the rating. */
export function cvPoints(rating: number, n = 14): number[] {
  return Array.from({ length: n }, (_, k) => 0.1 * (rating / 0.1) ** (k / (n - 1)));
}

/** Drain levels the Miller charge is read at: from 90 % of the test voltage down to Vpl + 1 V region. */
function millerLevels(vds: number): number[] {
  return [0.9, 0.5, 0.25, 0.1, 0.05, 0.025].map((f) => f * vds);
}

const GATE_TEST_CURRENT = 1e-3;

export async function extractSheet(part: ReferencePart): Promise<Datasheet> {
  const { card, sheet: s } = part;
  const vdsList = cvPoints(s.vdsRating);
  const levels = millerLevels(s.qgVds);
  const [cv, qg, st, oc] = await Promise.all([
    runNgspice(capacitanceDeck(card, vdsList)),
    runNgspice(gateChargeDeck(card, { vds: s.qgVds, id: s.qgId, ig: GATE_TEST_CURRENT, vgsTest: s.qgVgs, levels })),
    runNgspice(staticDeck(card, { transferVds: s.transferVds, transferVgs: s.transferVgs, gfsId: s.gfsId, rdsId: s.rdsOnId, rdsVgs: s.rdsOnVgs, vsdI: s.vsdI })),
    runNgspice(outputChargeDeck(card, s.eossVds)),
  ]);
  const q = (k: string) => valueOf(qg, k);
  const at = (r: NgspiceResult, k: string) => valueOf(r, k);
  return {
    qgs: q("q_pl"),
    qgd: q("q_pl_end") - q("q_pl"),
    qg: q("q_test"),
    qgVgs: s.qgVgs, qgVds: s.qgVds, qgId: s.qgId,
    vth: at(st, "vth"),
    vpl: q("v_pl"),
    ciss: (q("q_b") - q("q_a")) / 0.5,
    capacitance: vdsList.map((vds, k) => ({ vds, ciss: at(cv, `ciss_${k}`), coss: at(cv, `coss_${k}`), crss: at(cv, `crss_${k}`) })),
    transfer: s.transferVgs.map((vgs, k) => ({ vgs, id: at(st, `id_${k}`) })),
    gfs: at(st, "gfs"), gfsId: s.gfsId,
    rdsOn: s.rdsOnVgs.map((vgs, k) => ({ vgs, rds: at(st, `rds_${k}`) })),
    vsd: at(st, "vsd"), vsdI: s.vsdI,
    eoss: { vds: s.eossVds, e: at(oc, "eoss") },
    qoss: { vds: s.eossVds, q: at(oc, "qoss") },
    rgInt: at(cv, "rg_0"),
    miller: levels.map((vds, k) => ({ vds, q: q(`q_x_${k}`), vgs: q(`vg_x_${k}`) })),
    vdsPlateauEnd: q("vd_pl_end"),
  };
}
