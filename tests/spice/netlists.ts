// Netlist builders for the comparisons. Inputs are plain SI circuit values, so
// each test builds the SAME circuit the model is given (values taken from a
// demo option) and nothing here knows the model's formulas.
import { sp } from "@/simulation/ngspice";

/** Gate load: a linear capacitance, or a piecewise-linear Q(Vgs) through (v, q) points. */
export type GateLoad = { kind: "linear"; c: number } | { kind: "curve"; points: Array<[number, number]> };

export interface GateNetwork {
  vHigh: number; // driver rail for turn-on (V+)
  vLow: number; // driver rail for turn-off (V−, 0 or negative)
  rSource: number; // driver pull-up resistance
  rSink: number; // driver pull-down resistance
  rExtOn: number; // external gate resistance on the turn-on path
  rExtOff: number; // external gate resistance on the turn-off path (steering diode ideal)
  rgInt: number;
  gate: GateLoad;
  /** Driver peak-current limits, A: the output is then min(V/R, limit) (a B-source) instead of a switch. */
  sourceLimit?: number;
  sinkLimit?: number;
}

/** Charge-conserving Q(V) element: I = dQ(v)/dt with Q from a pwl table (in nC on an aux node). */
function gateElement(node: string, gate: GateLoad): string {
  if (gate.kind === "linear") return `Cgate ${node} 0 ${sp(gate.c)}`;
  const pts = gate.points.map(([v, q]) => `${sp(v)},${sp(q * 1e9)}`).join(", ");
  return [
    `Bqv qn 0 V = pwl(v(${node}), ${pts})`,
    "Cq qn qs 1n",
    "Vqs qs 0 0",
    `Bgate ${node} 0 I = i(Vqs)`,
    `Rleak ${node} 0 1e9`,
  ].join("\n");
}

/** Rough charge time constant used to size the pulse and the time step. */
function settleTime(net: GateNetwork): number {
  const dv = net.vHigh - net.vLow;
  const qTot =
    net.gate.kind === "linear"
      ? net.gate.c * dv
      : Math.abs(net.gate.points[net.gate.points.length - 1][1] - net.gate.points[0][1]);
  const rMax = Math.max(net.rSource + net.rExtOn, net.rSink + net.rExtOff) + net.rgInt;
  return (rMax * qTot) / dv;
}

export interface SplitTiming {
  tOn: number; // gate command rises
  tOff: number; // gate command falls
  tEnd: number;
}

/**
 * Pull-up and pull-down: ideal switches with Ron = the driver's resistance, or,
 * with a peak-current limit, B-sources I = min(V/R, limit) gated by the command
 * (the command edge is then 1 ns so the source stays smooth).
 */
function driverOutputs(net: GateNetwork): string {
  if (net.sourceLimit === undefined && net.sinkLimit === undefined)
    return `Ssrc vhi a ctl 0 swsrc
Ssnk b vlo 0 ctl swsnk
.model swsrc sw(vt=0.5 ron=${sp(net.rSource)} roff=1e12)
.model swsnk sw(vt=-0.5 ron=${sp(net.rSink)} roff=1e12)`;
  const lim = (x: number | undefined) => sp(x ?? 1e6);
  return `Bsrc vhi a I = v(ctl) * min(max(v(vhi,a), 0)/${sp(net.rSource)}, ${lim(net.sourceLimit)})
Bsnk b vlo I = (1 - v(ctl)) * min(max(v(b,vlo), 0)/${sp(net.rSink)}, ${lim(net.sinkLimit)})
Rsa a vlo 1e9
Rsb b vhi 1e9`;
}

/**
 * Driver as two ideal switches (Ron = source / sink resistance) so source and
 * sink can differ; separate on/off external resistors stand for a steering diode.
 * Measures per-edge energy in every series resistance, the swing charge and the
 * energy drawn from the two rails.
 */
export function splitNetlist(net: GateNetwork): { netlist: string; timing: SplitTiming } {
  const tau = settleTime(net);
  const tOn = 0.2 * tau + 1e-9;
  const half = 40 * tau;
  const timing = { tOn, tOff: tOn + half, tEnd: tOn + 2 * half };
  const step = tau / 100;
  const { tOff, tEnd } = timing;
  const on = `from=0 to=${sp(tOff)}`;
  const off = `from=${sp(tOff)} to=${sp(tEnd)}`;
  const limited = net.sourceLimit !== undefined || net.sinkLimit !== undefined;
  const edge = limited ? "1e-9" : "1e-10";
  const netlist = `* gate-drive energy split
Vctl ctl 0 PULSE(0 1 ${sp(tOn)} ${edge} ${edge} ${sp(tOff - tOn)} ${sp(4 * half)})
Vhi vhi 0 ${sp(net.vHigh)}
Vlo vlo 0 ${sp(net.vLow)}
${driverOutputs(net)}
Rexton a g1 ${sp(net.rExtOn)}
Rextoff g1 b ${sp(net.rExtOff)}
Rgint g1 g ${sp(net.rgInt)}
${gateElement("g", net.gate)}
.control
op
tran ${sp(step)} ${sp(tEnd)} 0 ${sp(step)}
let ion = (v(a)-v(g1))/${sp(net.rExtOn)}
let ioff = (v(g1)-v(b))/${sp(net.rExtOff)}
let ig = (v(g1)-v(g))/${sp(net.rgInt)}
let psrc = ion*(v(vhi)-v(a))
let pexton = ion*ion*${sp(net.rExtOn)}
let psnk = ioff*(v(b)-v(vlo))
let pextoff = ioff*ioff*${sp(net.rExtOff)}
let prg = ig*ig*${sp(net.rgInt)}
let psup = -i(Vhi)*${sp(net.vHigh)} - i(Vlo)*${sp(net.vLow)}
meas tran e_src integ psrc ${on}
meas tran e_exton integ pexton ${on}
meas tran e_rg_on integ prg ${on}
meas tran e_snk integ psnk ${off}
meas tran e_extoff integ pextoff ${off}
meas tran e_rg_off integ prg ${off}
meas tran e_supply integ psup from=0 to=${sp(tEnd)}
meas tran dq integ ig ${on}
meas tran vg_top find v(g) at=${sp(tOff)}
meas tran vg_bottom find v(g) at=${sp(tEnd)}
.endc
.end
`;
  return { netlist, timing };
}

/** Generic Gummel–Poon transistor for the follower tests. */
export interface BjtCard {
  name: string;
  /** Parameters after the type, e.g. "IS=1e-14 BF=200 IKF=0.3 ...". */
  params: string;
}

/**
 * Datasheet-style hFE(Ic) and VBE of a BJT model from a DC sweep at fixed
 * VCE (the way the plot is measured): base voltage swept, Ic and Ib read at
 * each wanted collector current. For a PNP the same with reversed signs.
 */
export function hfeNetlist(card: BjtCard, polarity: "npn" | "pnp", ics: number[], vce = 2): string {
  const s = polarity === "npn" ? 1 : -1;
  const meas = ics
    .map((ic, k) => `meas dc ib_${k} find ib when ic=${sp(ic)}\nmeas dc vbe_${k} find vb when ic=${sp(ic)}`)
    .join("\n");
  return `* hFE(Ic) of ${card.name}
.model ${card.name} ${polarity.toUpperCase()}(${card.params})
Vb b 0 0
Vc c 0 ${sp(s * vce)}
Q1 c b 0 ${card.name}
.control
dc Vb 0 ${sp(s * 3)} ${sp(s * 1e-3)}
let ic = ${s > 0 ? "-" : ""}i(Vc)
let ib = ${s > 0 ? "-" : ""}i(Vb)
let vb = ${s > 0 ? "" : "-"}v(b)
${meas}
.endc
.end
`;
}

export interface FollowerNetwork {
  vcc: number; // controller supply = pin high level = NPN collector rail
  vNeg: number; // PNP collector rail (≤ 0)
  rPinSource: number;
  rPinSink: number;
  /** Pin output edge time, s (a controller's output stage is not an ideal switch). */
  pinEdge: number;
  rBase: number; // per transistor
  rGate: number; // one external resistor for both edges
  rgInt: number;
  gate: GateLoad;
  npn: BjtCard;
  pnp: BjtCard;
  /** Time the gate is held high and then low, s. */
  halfPeriod: number;
  /** Pin straight into the gate resistor (no transistors), for the direct-drive baseline. */
  direct?: boolean;
}

/**
 * Controller pin: a 0 … Vcc PULSE behind a resistance that moves from the
 * sink to the source value with the pin's own level (B-source resistor, so
 * the edge is smooth), into the tied bases of an NPN/PNP emitter follower
 * through a base resistor each; emitters -> external R -> Rg(int) -> gate.
 * Measures the heat in the pin resistance (the controller's share), the
 * energy the pin delivers into the base network, each transistor's
 * dissipation (VCE·IC + VBE·IB) and the peak gate currents of both edges.
 */
export function followerNetlist(f: FollowerNetwork, step: number): string {
  const t0 = 20e-9;
  const tOff = t0 + f.halfPeriod;
  const tEnd = tOff + f.halfPeriod;
  const on = `from=0 to=${sp(tOff)}`;
  const off = `from=${sp(tOff)} to=${sp(tEnd)}`;
  const rPin = `(${sp(f.rPinSink)} + ${sp(f.rPinSource - f.rPinSink)}*v(src)/${sp(f.vcc)})`;
  const stage = f.direct
    ? "Rpe pinx e 1e-3"
    : `Rbn pinx bn ${sp(f.rBase)}
Rbp pinx bp ${sp(f.rBase)}
Vcn vcc cn 0
Vcp cp vneg 0
Qn cn bn e ${f.npn.name}
Qp cp bp e ${f.pnp.name}`;
  const transistorMeas = f.direct
    ? ""
    : `let ibn = (v(pinx)-v(bn))/${sp(f.rBase)}
let ibp = (v(bp)-v(pinx))/${sp(f.rBase)}
let pn = i(Vcn)*(v(cn)-v(e)) + ibn*(v(bn)-v(e))
let pp = i(Vcp)*(v(e)-v(cp)) + ibp*(v(e)-v(bp))
let prb = ibn*ibn*${sp(f.rBase)} + ibp*ibp*${sp(f.rBase)}
meas tran e_npn integ pn from=0 to=${sp(tEnd)}
meas tran e_pnp integ pp from=0 to=${sp(tEnd)}
meas tran e_rbase integ prb from=0 to=${sp(tEnd)}`;
  return `* emitter-follower gate drive
.model ${f.npn.name} NPN(${f.npn.params})
.model ${f.pnp.name} PNP(${f.pnp.params})
Vsrc src 0 PULSE(0 ${sp(f.vcc)} ${sp(t0)} ${sp(f.pinEdge)} ${sp(f.pinEdge)} ${sp(f.halfPeriod - f.pinEdge)} ${sp(4 * f.halfPeriod)})
Bpin src pin I = (v(src)-v(pin))/${rPin}
Vcc vcc 0 ${sp(f.vcc)}
Vneg vneg 0 ${sp(f.vNeg)}
Vpin pin pinx 0
${stage}
Rext e g1 ${sp(f.rGate)}
Rgint g1 g ${sp(f.rgInt)}
${gateElement("g", f.gate)}
.control
op
tran ${sp(step)} ${sp(tEnd)} 0 ${sp(step)}
let ipin = i(Vpin)
let ig = (v(e)-v(g1))/${sp(f.rGate)}
let ppin = (v(src)-v(pin))*ipin
let pbases = v(pin)*ipin
let prg = ig*ig*${sp(f.rGate + f.rgInt)}
${transistorMeas}
meas tran e_pin_on integ ppin ${on}
meas tran e_pin_off integ ppin ${off}
meas tran e_into_bases integ pbases from=0 to=${sp(tEnd)}
meas tran e_rgate integ prg from=0 to=${sp(tEnd)}
meas tran ig_on_peak max ig ${on}
meas tran ig_off_peak min ig ${off}
meas tran dq integ ig ${on}
meas tran vg_top find v(g) at=${sp(tOff)}
meas tran vg_bottom find v(g) at=${sp(tEnd)}
.endc
.end
`;
}

/** Generic vertical power MOSFET (ngspice VDMOS model card parameters). */
export interface VdmosCard {
  name: string;
  params: string;
}

export interface ClampedLoad {
  vBus: number;
  iLoad: number;
}

// Freewheel diode of the clamped inductive load: a little Rs and Cjo keep the commutation well-posed.
// abstol 10 nA (default 1 pA): the 10 A loop through the diode otherwise ends in "timestep too
// small" once the edge is over; 10 nA is 1e-9 of the load current.
const FREEWHEEL = ".model dfw D(Is=1e-12 Rs=5m Cjo=50p N=1 TT=0)\n.options abstol=1e-8";

/**
 * Gate-charge test (the datasheet Qg plot, JEDEC JESD24-2 style): a nearly
 * constant gate current (1 kV PULSE through a large resistor, so the DC
 * operating point is well defined) into the device switching the clamped
 * inductive load (current source + freewheel diode to the bus). The gate
 * charge is integrated from the resistor current. Reads the plateau start
 * (Vds 5 % below the bus), the plateau end (Vgs 0.2 V above the plateau
 * level), the charge at Vgs = qgVgs, and the slope dQ/dV between 1 and 1.5 V.
 * Drain current is sensed by a 1 mΩ resistor (a 0 V source in series with
 * the two diodes upsets ngspice's first time steps here).
 */
export function gateChargeNetlist(m: VdmosCard, load: ClampedLoad, ig: number, qgVgs: number): string {
  const t0 = 10e-9;
  const vq = 1000;
  const tEnd = t0 + 150e-9 / ig;
  return `${clampedStage(`gate charge test of ${m.name}`, m, load)}
Vq src 0 PULSE(0 ${sp(vq)} ${sp(t0)} 1e-9 1e-9 1 2)
Rq src g ${sp(vq / ig)}
.control
op
tran ${sp(tEnd / 6000)} ${sp(tEnd)}
let ig = (v(src)-v(g))/${sp(vq / ig)}
let q = integ(ig)
meas tran t_pl when v(d)=${sp(0.95 * load.vBus)} fall=1
meas tran q_pl find q at=t_pl
meas tran v_pl find v(g) at=t_pl
let vend = v_pl + 0.2
meas tran t_pl_end when v(g)=vend rise=1
meas tran q_pl_end find q at=t_pl_end
meas tran t_test when v(g)=${sp(qgVgs)} rise=1
meas tran q_test find q at=t_test
meas tran t_a when v(g)=1 rise=1
meas tran q_a find q at=t_a
meas tran t_b when v(g)=1.5 rise=1
meas tran q_b find q at=t_b
.endc
.end
`;
}

/** Datasheet Vth: Vgs at Id = 250 µA with drain tied to gate. */
export function thresholdNetlist(m: VdmosCard, id = 250e-6): string {
  return `* threshold of ${m.name}
.model ${m.name} VDMOS(${m.params})
Vg g 0 0
M1 g g 0 ${m.name}
.control
dc Vg 0 10 1m
let id = -i(Vg)
meas dc vth find v(g) when id=${sp(id)}
.endc
.end
`;
}

/**
 * The power stage the gate-charge test and both edge netlists share: the
 * load current source (the inductor, constant over the edge) freewheeling
 * through FREEWHEEL to the bus, the 1 mΩ drain-terminal sense resistor and
 * the switch with its gate on node g.
 */
function clampedStage(title: string, m: VdmosCard, load: ClampedLoad): string {
  return `* ${title}
.model ${m.name} VDMOS(${m.params})
${FREEWHEEL}
Vbus bus 0 ${sp(load.vBus)}
Iload bus sw ${sp(load.iLoad)}
Dfw sw bus dfw
Rsd sw d 1m
M1 d g 0 ${m.name}`;
}

/** The stage with a gate step from `from` to `to` at t0 through rGate. */
function clampedEdgeDeck(title: string, m: VdmosCard, load: ClampedLoad, from: number, to: number, rGate: number, t0: number): string {
  return `${clampedStage(title, m, load)}
Vdrv gd 0 PULSE(${sp(from)} ${sp(to)} ${sp(t0)} 1e-9 1e-9 1 2)
Rgate gd g ${sp(rGate)}`;
}

/**
 * Hard turn-off of the clamped inductive load: the device conducts iLoad at
 * the operating point (gate at vHigh), then a PULSE source through rGate
 * takes the gate to vLow. Drain current is sensed at the drain terminal by a
 * 1 mΩ resistor (as a bench probe would, so Coss charging current is included). Measures the
 * 10→90 % Vds rise, the 90→10 % Id fall and Eoff = ∫ Vds·Id over the edge.
 */
export function turnOffNetlist(m: VdmosCard, load: ClampedLoad, drive: { vHigh: number; vLow: number; rGate: number }, window: number): string {
  const t0 = 20e-9;
  const tEnd = t0 + window;
  return `${clampedEdgeDeck(`turn-off of ${m.name}`, m, load, drive.vHigh, drive.vLow, drive.rGate, t0)}
.control
op
tran ${sp(window / 40000)} ${sp(tEnd)} 0 ${sp(Math.min(window / 4000, 5e-11))}
let id = (v(sw)-v(d))/1m
let p = v(d)*id
meas tran tv10 when v(d)=${sp(0.1 * load.vBus)} rise=1
meas tran tv90 when v(d)=${sp(0.9 * load.vBus)} rise=1
meas tran ti90 when id=${sp(0.9 * load.iLoad)} fall=1
meas tran ti10 when id=${sp(0.1 * load.iLoad)} fall=1
meas tran eoff integ p from=${sp(t0)} to=${sp(tEnd)}
meas tran vds_end find v(d) at=${sp(tEnd)}
meas tran id_end find id at=${sp(tEnd)}
.endc
.end
`;
}

/**
 * Hard turn-on of the clamped inductive load (the mirror of turnOffNetlist):
 * the device is off at the operating point (gate at vLow, iLoad circulating
 * in the freewheel diode), then a PULSE source through rGate takes the gate
 * to vHigh. The current source stands for the inductor (constant over the
 * edge). Same freewheel diode as the other tests (FREEWHEEL: TT=0, so no
 * reverse recovery, Rs 5 mΩ, Cjo 50 pF, abstol 10 nA); its Cjo is charged
 * through the switch while Vds falls. No further convergence aid was needed:
 * with reltol 1e-4 and method=gear, or a 10 ps tmax, the measured times and
 * energies move by less than 0.3 %.
 * Drain current is sensed at the drain terminal by a 1 mΩ resistor, as a
 * bench probe would: the switch's own Coss discharges inside the device and
 * does not pass the probe. Measures the 10→90 % Id rise, the 90→10 % Vds
 * fall, and two energies over the edge window:
 *  - eon = ∫ Vds·Id(terminal) dt, what the probe sees (excludes the Eoss the
 *    switch dumps into its own channel);
 *  - e_channel = ∫ Vds·Id(channel) dt with the VDMOS channel current
 *    @m1[id] (includes that Eoss; Vds is taken at the drain terminal, off
 *    by (Rd + Rs)·Id = 60 mV at 10 A).
 * The window runs from Id = 1 % of iLoad (before it the probe sees only the
 * Cgd current while the gate charges towards Vth, which would make the energy
 * depend on the starting level V−) to Vds = 2 % of the bus (after it the
 * switch is only conducting; the remaining Vds·Id is conduction loss). With
 * 1 % or 5 % of the bus as the end, eon moves by less than 1.5 %.
 */
export function turnOnNetlist(m: VdmosCard, load: ClampedLoad, drive: { vHigh: number; vLow: number; rGate: number }, window: number): string {
  const t0 = 20e-9;
  const tEnd = t0 + window;
  return `${clampedEdgeDeck(`turn-on of ${m.name}`, m, load, drive.vLow, drive.vHigh, drive.rGate, t0)}
.control
op
save all @m1[id]
tran ${sp(window / 40000)} ${sp(tEnd)} 0 ${sp(Math.min(window / 4000, 5e-11))}
let id = (v(sw)-v(d))/1m
let p = v(d)*id
let pch = v(d)*@m1[id]
meas tran ti10 when id=${sp(0.1 * load.iLoad)} rise=1
meas tran ti90 when id=${sp(0.9 * load.iLoad)} rise=1
meas tran tv90 when v(d)=${sp(0.9 * load.vBus)} fall=1
meas tran tv10 when v(d)=${sp(0.1 * load.vBus)} fall=1
meas tran t_start when id=${sp(0.01 * load.iLoad)} rise=1
meas tran t_stop when v(d)=${sp(0.02 * load.vBus)} fall=1
meas tran eon integ p from=t_start to=t_stop
meas tran e_channel integ pch from=t_start to=t_stop
meas tran id_peak max id from=${sp(t0)} to=${sp(tEnd)}
meas tran vds_start find v(d) at=${sp(t0)}
meas tran vds_end find v(d) at=${sp(tEnd)}
meas tran id_end find id at=${sp(tEnd)}
.endc
.end
`;
}
