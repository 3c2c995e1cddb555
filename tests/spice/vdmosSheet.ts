// The switch the edge checks (switching.test.ts, turnon.test.ts) share: one
// VDMOS card, the clamped inductive load and the driver's high rail, and the
// "datasheet" the model gets, measured in ngspice itself: a JESD24-2 style
// gate-charge test (Qgs, Qgd, Qg, Vpl, Ciss from the slope below the
// plateau) and Vth at 250 µA.
import type { DesignInput } from "@/models/input";
import { runNgspice, valueOf } from "@/simulation/ngspice";
import { gateChargeNetlist, thresholdNetlist, type VdmosCard } from "./netlists";

export const DEVICE: VdmosCard = {
  name: "mx",
  // Generic 60 V-class trench-like part (invented): Vto 3 V, Rg 1.2 Ω, nonlinear Cgd 1 nF → 80 pF.
  params: "Vto=3 Kp=20 Rd=4m Rs=2m Rg=1.2 Cgdmax=1n Cgdmin=80p A=0.3 Cgs=1.5n Cjo=400p Is=1e-12 Rb=5m lambda=0.01",
};
export const LOAD = { vBus: 48, iLoad: 10 };
export const V_HIGH = 12;

export interface Sheet { qgs: number; qgd: number; qg: number; vpl: number; vth: number; ciss: number }

export async function sheet(): Promise<Sheet> {
  const q = await runNgspice(gateChargeNetlist(DEVICE, LOAD, 1e-3, 10));
  const t = await runNgspice(thresholdNetlist(DEVICE));
  const v = (k: string) => valueOf(q, k);
  return {
    qgs: v("q_pl"), qgd: v("q_pl_end") - v("q_pl"), qg: v("q_test"), vpl: v("v_pl"), vth: valueOf(t, "vth"),
    ciss: (v("q_b") - v("q_a")) / 0.5,
  };
}

/** Switching frequency of the edge checks' one corner, Hz (losses per edge = loss / fsw). */
export const EDGE_FSW = 100e3;

/**
 * The same switch in a one-position design: an ideal driver (V_HIGH, vLow,
 * 1 µΩ outputs), gate resistor rGate, hard switching of LOAD at `vds`.
 * `opposingQrr` and the switch's Eoss (at `vds`) are given only when set.
 */
export function edgeCheckDesign(d: Sheet, o: { name: string; vLow: number; rGate: number; vds: number; opposingQrr?: number; eoss?: number }): DesignInput {
  const q = (x: number) => `${x} C`;
  return {
    schemaVersion: 2,
    name: o.name,
    corners: [{ id: "c", vin: 48, ambient: 25, fsw: EDGE_FSW }],
    controller: { vcc: 12, iq: 0, pin: { sourceResistance: 1, sinkResistance: 1 }, rthJA: 50 },
    positions: [{
      id: "Q1", role: "primary",
      mosfet: {
        qgs: q(d.qgs), qgd: q(d.qgd), qg: q(d.qg), qgVgs: 10, vth: d.vth, vpl: d.vpl, ciss: d.ciss, rgInt: 1.2,
        rds25: 0.006, rthJA: 40,
        ...(o.eoss !== undefined ? { outputCapacitance: { vds: o.vds, eoss: `${o.eoss} J` } } : {}),
      },
      drive: { kind: "driver-ic", supply: V_HIGH, vNeg: o.vLow, sourceResistance: 1e-6, sinkResistance: 1e-6, rthJA: 100 },
      gate: { rTurnOn: o.rGate },
      conduction: {
        switching: "hard",
        ...(o.opposingQrr !== undefined ? { opposingQrr: q(o.opposingQrr) } : {}),
        points: [{ vin: 48, duty: 0.5, turnOnVds: o.vds, turnOnId: LOAD.iLoad, turnOffVds: o.vds, turnOffId: LOAD.iLoad, iRms: 7, iAvg: 5 }],
      },
    }],
  };
}
