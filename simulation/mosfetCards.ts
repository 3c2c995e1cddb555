// Two invented generic switches for the reference simulations, each with the
// conditions its "datasheet" is measured at (mosfetSheet.ts). The values are
// typical of their class as recalled from memory, not taken from any part.
import type { VdmosCard } from "./mosfetCard";

export interface SheetConditions {
  /** Voltage rating, V: the capacitance curve runs up to it. */
  vdsRating: number;
  /** Gate-charge test (JESD24-2 style): drain voltage, load current, gate voltage Qg is read at. */
  qgVds: number;
  qgId: number;
  qgVgs: number;
  /** Transfer characteristic: drain voltage, gate voltages, and the current gfs is read at. */
  transferVds: number;
  transferVgs: number[];
  gfsId: number;
  /** Rds(on): drain current and the gate voltages it is read at. */
  rdsOnId: number;
  rdsOnVgs: number[];
  /** Body-diode forward voltage: current. */
  vsdI: number;
  /** Eoss and Qoss: drain voltage. */
  eossVds: number;
}

export interface ReferencePart {
  card: VdmosCard;
  sheet: SheetConditions;
}

/**
 * 60 V-class trench-like part: the card of the existing edge checks
 * (tests/spice/vdmosSheet.ts DEVICE), unchanged so both sets of checks
 * simulate one device. Vto 3 V, Kp 20 A/V², Rd + Rs 6 mΩ, Rg 1.2 Ω,
 * Cgd 1 nF → 80 pF, Cgs 1.5 nF, body-diode Cjo 400 pF (M 0.5, Vj 0.8 defaults).
 */
export const TRENCH_60V: ReferencePart = {
  card: {
    name: "t60",
    params: { vto: 3, kp: 20, rd: 4e-3, rs: 2e-3, rg: 1.2, cgdmax: 1e-9, cgdmin: 80e-12, a: 0.3, cgs: 1.5e-9, cjo: 400e-12, is: 1e-12, rb: 5e-3, lambda: 0.01 },
  },
  sheet: {
    vdsRating: 60, qgVds: 30, qgId: 10, qgVgs: 10,
    transferVds: 10, transferVgs: [3.5, 4, 4.5, 5, 6], gfsId: 10,
    rdsOnId: 10, rdsOnVgs: [10, 4.5], vsdI: 10, eossVds: 48,
  },
};

/**
 * 650 V-class superjunction-like part (values from memory of the class, invented):
 * Rds(on) ≈ 0.15 Ω, mostly drift region (Rd); Vto 3.5 V; internal Rg 2.5 Ω.
 * Cgd falls from ≈ 1.7 nF at Vdg = 0 towards 1 pF with a short shape
 * length (a = 1 /V), so Crss drops two to three decades by 100 V; the body
 * diode's junction gives Cds with a steep grading (M 1.3, Vj 3 V) for a Coss
 * that falls about two decades to 100 V, as superjunction curves do (the
 * real curve is flatter then steeper; a power law is what the card offers).
 * Body diode: Vsd ≈ 0.9 V at 5 A, slow recovery (TT 300 ns), 700 V breakdown.
 */
export const SJ_650V: ReferencePart = {
  card: {
    name: "sj650",
    params: {
      vto: 3.5, kp: 8, lambda: 1e-4, ksubthres: 0.1, mtriode: 1,
      rd: 0.12, rs: 0.01, rg: 2.5,
      cgdmax: 2.8e-9, cgdmin: 1e-12, a: 1, cgs: 1.6e-9,
      cjo: 17e-9, m: 1.3, vj: 3, is: 5e-11, n: 1.3, rb: 0.02, tt: 300e-9, bv: 700, ibv: 250e-6,
    },
  },
  sheet: {
    vdsRating: 650, qgVds: 400, qgId: 5, qgVgs: 10,
    transferVds: 20, transferVgs: [4, 4.5, 5, 5.5, 6, 7], gfsId: 5,
    rdsOnId: 5, rdsOnVgs: [10, 6], vsdI: 5, eossVds: 400,
  },
};
