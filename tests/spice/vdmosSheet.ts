// The switch the edge checks (switching.test.ts, turnon.test.ts) share: one
// VDMOS card, the clamped inductive load and the driver's high rail, and the
// "datasheet" the model gets, measured in ngspice itself: a JESD24-2 style
// gate-charge test (Qgs, Qgd, Qg, Vpl, Ciss from the slope below the
// plateau) and Vth at 250 µA.
import { runNgspice, valueOf } from "./ngspice";
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
