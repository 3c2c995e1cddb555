// Decks that measure a VDMOS card the way a datasheet is measured. Pure
// functions from a card and SI numbers to netlist text; mosfetSheet.ts runs
// them and reads the results back by the names printed here.
import { modelLine, type VdmosCard } from "./mosfetCard";
import { sp } from "./ngspice";

/** Frequency of the capacitance and internal gate resistance measurements, Hz (datasheet practice). */
export const CV_FREQUENCY = 1e6;

/**
 * Ciss, Coss, Crss against Vds at Vgs = 0, small-signal AC at 1 MHz. Two
 * instances per drain voltage k, in circuits that share only ground:
 *  - `a`: 1 V AC on the gate, drain held by a DC source (an AC short):
 *    Zin = Rg + 1/(jωCiss), so Ciss = −1/(ω·Im Zin) and Rg = Re Zin
 *    (the series form keeps the internal Rg out of Ciss);
 *  - `b`: 1 V AC on the drain, gate held at 0 V: the drain current gives
 *    Coss = Cds + Cgd, the current out of the gate gives Crss = Cgd.
 * Prints ciss_k, coss_k, crss_k, rg_k.
 */
export function capacitanceDeck(card: VdmosCard, vds: number[]): string {
  const lines = vds.flatMap((v, k) => [
    `Vda${k} da${k} 0 DC ${sp(v)}`,
    `Vga${k} ga${k} 0 DC 0 AC 1`,
    `Ma${k} da${k} ga${k} 0 ${card.name}`,
    `Vdb${k} db${k} 0 DC ${sp(v)} AC 1`,
    `Vgb${k} gb${k} 0 DC 0`,
    `Mb${k} db${k} gb${k} 0 ${card.name}`,
  ]);
  const reads = vds.flatMap((_, k) => [
    `let zin${k} = 1/(-i(vga${k}))`,
    `let ciss_${k} = -1/(w*imag(zin${k}))`,
    `let rg_${k} = real(zin${k})`,
    `let coss_${k} = imag(-i(vdb${k}))/w`,
    `let crss_${k} = imag(i(vgb${k}))/w`,
    `print ciss_${k} coss_${k} crss_${k} rg_${k}`,
  ]);
  return `* capacitances of ${card.name}
${modelLine(card)}
${lines.join("\n")}
.control
option numdgt=10
ac lin 1 ${sp(CV_FREQUENCY)} ${sp(CV_FREQUENCY)}
let w = 2*pi*${sp(CV_FREQUENCY)}
${reads.join("\n")}
.endc
.end
`;
}

/** The load of the gate-charge test: current source + freewheel diode to the bus, 1 mΩ drain sense. */
const GATE_CHARGE_DIODE = ".model dqg D(Is=1e-12 Rs=5m Cjo=50p N=1 TT=0)\n.model dcl D(Is=1e-12 Rs=5m N=1)\n.options abstol=1e-8";

/** Charge the gate-charge run covers, C; the clamp holds the gate once it is delivered. */
const GATE_CHARGE_SPAN = 200e-9;

/**
 * Gate-charge test (JEDEC JESD24-2 style): a nearly constant gate current
 * `ig` (1 kV PULSE through a large resistor, so the operating point is well
 * defined) into the device switching a clamped inductive load of `id` at
 * `vds`; the charge is the integral of the resistor current. Reads:
 *  - q_pl, v_pl: charge and gate voltage at the plateau start, where Vds has
 *    fallen 5 % below the bus;
 *  - q_pl_end, vd_pl_end: at the plateau end, Vgs 0.2 V above v_pl;
 *  - q_test: charge at Vgs = vgsTest; q_a, q_b: at Vgs = 1 V and 1.5 V (the
 *    slope below the plateau, Ciss);
 *  - q_x_k, vg_x_k: charge and Vgs when Vds falls through levels[k] (the
 *    Miller charge between two drain voltages, checked against ∫Crss dV).
 * A diode without junction capacitance (it would add to Ciss) clamps the
 * gate 2 V above vgsTest, so the run may be generously long: the constant
 * current would otherwise drive the gate to hundreds of volts and stall the
 * time step.
 */
export function gateChargeDeck(card: VdmosCard, o: { vds: number; id: number; ig: number; vgsTest: number; levels: number[] }): string {
  const t0 = 10e-9;
  const vq = 1000;
  const tEnd = t0 + GATE_CHARGE_SPAN / o.ig;
  const tMax = tEnd / 20000;
  const rq = vq / o.ig;
  const levels = o.levels.flatMap((v, k) => [
    `meas tran t_x_${k} when v(d)=${sp(v)} fall=1`,
    `meas tran q_x_${k} find q at=t_x_${k}`,
    `meas tran vg_x_${k} find v(g) at=t_x_${k}`,
  ]);
  return `* gate charge test of ${card.name}
${modelLine(card)}
${GATE_CHARGE_DIODE}
Vbus bus 0 ${sp(o.vds)}
Iload bus sw ${sp(o.id)}
Dfw sw bus dqg
Rsd sw d 1m
M1 d g 0 ${card.name}
Vq src 0 PULSE(0 ${sp(vq)} ${sp(t0)} 1e-9 1e-9 1 2)
Rq src g ${sp(rq)}
Dcl g gcl dcl
Vcl gcl 0 ${sp(o.vgsTest + 2)}
.control
option numdgt=10
op
tran ${sp(tMax)} ${sp(tEnd)} 0 ${sp(tMax)}
let ig = (v(src)-v(g))/${sp(rq)}
let q = integ(ig)
meas tran t_pl when v(d)=${sp(0.95 * o.vds)} fall=1
meas tran q_pl find q at=t_pl
meas tran v_pl find v(g) at=t_pl
let vend = v_pl + 0.2
meas tran t_pl_end when v(g)=vend rise=1
meas tran q_pl_end find q at=t_pl_end
meas tran vd_pl_end find v(d) at=t_pl_end
meas tran t_test when v(g)=${sp(o.vgsTest)} rise=1
meas tran q_test find q at=t_test
meas tran t_a when v(g)=1 rise=1
meas tran q_a find q at=t_a
meas tran t_b when v(g)=1.5 rise=1
meas tran q_b find q at=t_b
${levels.join("\n")}
.endc
.end
`;
}

/**
 * The DC figures in one deck, each on its own instance:
 *  - vth: Vgs at Id = 250 µA with drain tied to gate (DC sweep of `Vt`);
 *  - transfer: Id at each Vgs at Vds = transferVds (DC sweep of `Vx`; no
 *    self-heating, the card has no thermal nodes, so it reads like a pulsed
 *    measurement), and gfs = dId/dVgs where Id = gfsId;
 *  - rds_k: Vds/Id at Vgs = rdsVgs[k], Id forced by a current source;
 *  - vsd: body-diode forward voltage at vsdI, gate at 0 V.
 */
export function staticDeck(
  card: VdmosCard,
  o: { transferVds: number; transferVgs: number[]; gfsId: number; rdsId: number; rdsVgs: number[]; vsdI: number },
): string {
  const rds = o.rdsVgs.flatMap((vg, k) => [`Vgr${k} gr${k} 0 ${sp(vg)}`, `Ir${k} 0 dr${k} ${sp(o.rdsId)}`, `Mr${k} dr${k} gr${k} 0 ${card.name}`]);
  const transfer = o.transferVgs.map((vg, k) => `meas dc id_${k} find idx at=${sp(vg)}`);
  return `* static characteristics of ${card.name}
${modelLine(card)}
Vt gt 0 0
Mt gt gt 0 ${card.name}
Vdx dx 0 ${sp(o.transferVds)}
Vx gx 0 0
Mx dx gx 0 ${card.name}
${rds.join("\n")}
Vgd gdd 0 0
Idd dd 0 ${sp(o.vsdI)}
Md dd gdd 0 ${card.name}
.control
option numdgt=10
op
${o.rdsVgs.map((_, k) => `let rds_${k} = v(dr${k})/${sp(o.rdsId)}\nprint rds_${k}`).join("\n")}
let vsd = -v(dd)
print vsd
dc Vt 0 10 1m
let idt = -i(Vt)
meas dc vth find v(gt) when idt=250e-6
dc Vx 0 12 1m
let idx = -i(Vdx)
let gm = deriv(idx)
${transfer.join("\n")}
meas dc gfs find gm when idx=${sp(o.gfsId)}
.endc
.end
`;
}

/**
 * Eoss and Qoss measured directly: gate shorted to source, the drain ramped
 * from 0 to `vds` by a voltage source slowly enough (`ramp`) that the current
 * is purely capacitive (I²R in Rd below 0.1 % of Eoss); Eoss = ∫ v·i dt and
 * Qoss = ∫ i dt over the ramp (prints eoss, qoss).
 */
export function outputChargeDeck(card: VdmosCard, vds: number, ramp = 20e-6): string {
  return `* output charge of ${card.name}
${modelLine(card)}
Vd d 0 PWL(0 0 ${sp(ramp)} ${sp(vds)})
Vg g 0 0
M1 d g 0 ${card.name}
.control
option numdgt=10
tran ${sp(ramp / 4000)} ${sp(ramp)} 0 ${sp(ramp / 4000)}
let i = -i(Vd)
let p = v(d)*i
meas tran eoss integ p from=0 to=${sp(ramp)}
meas tran qoss integ i from=0 to=${sp(ramp)}
.endc
.end
`;
}
