// A real switch as the gate load: ngspice's VDMOS in a clamped inductive
// stage (the load inductor as a constant current source freewheeling
// through a diode to the bus), so part of the gate charge flows through Cgd
// into the drain circuit as in a converter. Internal gate resistance is
// left out of the card: the drive decks place it as their own resistor.
import { deckName } from "./bjt";
import { sp } from "./ngspice";

export interface VdmosParams {
  vto: number; kp: number; lambda: number;
  rd: number; rs: number; rb: number;
  cgs: number; cgdmax: number; cgdmin: number; a: number;
  cjo: number; is: number;
}

export interface VdmosCard {
  name: string;
  p: VdmosParams;
}

export interface ClampedStage {
  vBus: number;
  iLoad: number;
}

// Invented 60 V-class trench-like switch (values from memory of the class):
// Vth ≈ 3 V, Cgs 2 nF, Cgd 1.2 nF at low Vds falling to 60 pF; switching
// 48 V / 10 A it takes about 45 nC from 0 V to 11 V (as the follower deck
// measures it).
export const SWITCH_60V: VdmosCard = {
  name: "msw",
  p: { vto: 3, kp: 25, lambda: 0.01, rd: 4e-3, rs: 2e-3, rb: 5e-3, cgs: 2e-9, cgdmax: 1.2e-9, cgdmin: 60e-12, a: 0.4, cjo: 500e-12, is: 1e-12 },
};

export function vdmosModel(card: VdmosCard): string {
  const q = card.p;
  return `.model ${deckName(card.name)} VDMOS(Vto=${sp(q.vto)} Kp=${sp(q.kp)} lambda=${sp(q.lambda)} Rd=${sp(q.rd)} Rs=${sp(q.rs)} Rb=${sp(q.rb)} Cgs=${sp(q.cgs)} Cgdmax=${sp(q.cgdmax)} Cgdmin=${sp(q.cgdmin)} A=${sp(q.a)} Cjo=${sp(q.cjo)} Is=${sp(q.is)})`;
}

/**
 * The stage with its gate on `gate`: bus, load current source into the
 * switch node, freewheel diode back to the bus (a little Rs and Cjo keep
 * the commutation well-posed), 1 mΩ drain sense resistor, the switch.
 * abstol 10 nA: 1e-9 of the load current, else the diode loop ends in
 * "timestep too small".
 */
export function clampedStage(gate: string, card: VdmosCard, s: ClampedStage): string {
  return `${vdmosModel(card)}
.model dfw D(Is=1e-12 Rs=5m Cjo=50p N=1 TT=0)
.options abstol=1e-8
Vbus bus 0 ${sp(s.vBus)}
Iload bus sw ${sp(s.iLoad)}
Dfw sw bus dfw
Rsd sw d 1m
M1 d ${deckName(gate)} 0 ${card.name}`;
}
