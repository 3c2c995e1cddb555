// Self-driven synchronous-rectifier gate with a zener-referenced NPN clamp
// (issue #18 item 1). The winding is a PULSE source (k·Vin while the
// rectifier conducts, a negative level off) behind its own resistance; it
// feeds the NPN's collector through a blocking diode (so the collector never
// follows the winding negative) and biases the zener on the base through
// Rz. The emitter drives the gate through the gate resistors. At turn-off
// the winding pulls the base node down through Rz (the zener then conducts
// forward, holding it near −0.7 V) and a PNP follower on the same base and
// emitter discharges the gate into the ground return; its emitter-base
// junction also keeps the NPN's base-emitter reverse bias to one drop.
// Both transistors can pass only hFE × the base current Rz leaves them:
// the clamp's current limit.
import { bjtModel, type BjtCard } from "./bjt";
import { energyLines, perEdge, windowLine, type PerEdge } from "./driveMeasure";
import { gateElement, type GateLoad } from "./gateLoad";
import { runNgspice, sp, valueOf } from "./ngspice";

export interface Zener {
  bv: number; // breakdown voltage at ibv, V
  ibv: number;
  rs: number; // dynamic resistance, Ω
  cjo: number;
}

export interface ClampCase {
  vOn: number; // winding level while the rectifier conducts, V
  vOff: number; // winding level off (negative), V
  rWinding: number;
  edge: number; // winding edge time, s
  fsw: number;
  duty: number; // fraction of the period at vOn
  rZ: number;
  zener: Zener;
  npn: BjtCard;
  pnp: BjtCard; // turn-off follower
  rGate: number;
  rgInt: number;
  gate: GateLoad;
  vth: number; // threshold for the time-to-threshold reading, V
}

export interface ClampMeasurement {
  clamp: PerEdge; // NPN VCE·IC + VBE·IB
  discharge: PerEdge; // PNP VEC·IC + VEB·IB
  zener: PerEdge;
  rZ: PerEdge;
  diode: PerEdge; // collector blocking diode
  rWinding: PerEdge;
  rGate: PerEdge;
  rgInt: PerEdge;
  gate: PerEdge;
  winding: PerEdge; // energy the winding source delivers
  gateCharge: PerEdge;
  igPeak: number;
  igOffPeak: number; // positive, A
  baseCurrentMax: number; // NPN base current, highest over the on-time, A
  rzCurrentMax: number; // current Rz delivers to the base node, highest over the on-time, A
  zenerHold: number; // zener current at the end of the on-time, A
  tThreshold: number; // s from the winding's edge start to v(g) = vth
  vgTop: number;
  vgMax: number;
  vbTop: number;
  vgBottom: number;
}

const T0 = 20e-9;

export function clampTiming(c: ClampCase) {
  const period = 1 / c.fsw;
  const tA = T0 + period; // one warm-up period
  const tOff = tA + c.duty * period;
  return { on: [tA, tOff] as [number, number], off: [tOff, tA + period] as [number, number], tEnd: tA + period };
}

export function clampDeck(c: ClampCase): string {
  const w = clampTiming(c), period = 1 / c.fsw, z = c.zener;
  return `* zener-referenced NPN clamp on a self-driven gate
${bjtModel(c.npn)}
${bjtModel(c.pnp)}
.model dz D(Is=1e-14 N=1 Rs=${sp(z.rs)} Cjo=${sp(z.cjo)} BV=${sp(z.bv)} IBV=${sp(z.ibv)})
.model dsig D(Is=2e-9 N=1.8 Rs=0.5 Cjo=4p TT=5n)
Vw w0 0 PULSE(${sp(c.vOff)} ${sp(c.vOn)} ${sp(T0)} ${sp(c.edge)} ${sp(c.edge)} ${sp(c.duty * period - c.edge)} ${sp(period)})
Rw w0 w ${sp(c.rWinding)}
Dc w cd dsig
Vcq cd cq 0
Rz w bz ${sp(c.rZ)}
Vbq bz b 0
Vzq b zk 0
Dz 0 zk dz
Vbb b bq 0
Q1 cq bq e ${c.npn.name}
Vpb b pbq 0
Vpc pc 0 0
Qp pc pbq e ${c.pnp.name}
Vsg e e1 0
Rext e1 g1 ${sp(c.rGate)}
Rgint g1 g ${sp(c.rgInt)}
${gateElement("g", c.gate)}
.control
op
tran 0.25n ${sp(w.tEnd)} ${sp(w.on[0] - 1e-9)} 0.25n
let ig = i(Vsg)
let ib = i(Vbb)
${energyLines("e_clamp", "i(Vcq)*(v(cq)-v(e)) + ib*(v(bq)-v(e))", w)}
${energyLines("e_zener", "i(Vzq)*v(zk)", w)}
${energyLines("e_rz", `i(Vbq)*i(Vbq)*${sp(c.rZ)}`, w)}
${energyLines("e_discharge", "i(Vpc)*v(e) - i(Vpb)*(v(e)-v(pbq))", w)}
${energyLines("e_diode", "i(Vcq)*(v(w)-v(cd))", w)}
${energyLines("e_rw", `-i(Vw)*(v(w0)-v(w))`, w)}
${energyLines("e_rgate", `ig*ig*${sp(c.rGate)}`, w)}
${energyLines("e_rgint", `ig*ig*${sp(c.rgInt)}`, w)}
${energyLines("e_gate", "v(g)*ig", w)}
${energyLines("e_winding", "-i(Vw)*v(w0)", w)}
${energyLines("q_gate", "ig", w)}
${windowLine("ig_peak", "max ig", w.on)}
${windowLine("ig_off_peak", "min ig", w.off)}
${windowLine("vg_max", "max v(g)", w.on)}
${windowLine("ib_max", "max ib", w.on)}
${windowLine("irz_max", "max i(Vbq)", w.on)}
meas tran iz_hold find i(Vzq) at=${sp(w.on[1] - 1e-9)}
meas tran t_th when v(g)=${sp(c.vth)} rise=1 from=${sp(w.on[0])}
meas tran vg_top find v(g) at=${sp(w.on[1])}
meas tran vb_top find v(b) at=${sp(w.on[1])}
meas tran vg_bottom find v(g) at=${sp(w.off[1])}
.endc
.end
`;
}

export async function simulateClamp(c: ClampCase): Promise<ClampMeasurement> {
  const r = await runNgspice(clampDeck(c), { timeoutMs: 60_000 });
  const e = (n: string) => perEdge(r, n);
  const v = (n: string) => valueOf(r, n);
  return {
    clamp: e("e_clamp"), zener: e("e_zener"), rZ: e("e_rz"), discharge: e("e_discharge"), diode: e("e_diode"), rWinding: e("e_rw"),
    rGate: e("e_rgate"), rgInt: e("e_rgint"), gate: e("e_gate"), winding: e("e_winding"), gateCharge: e("q_gate"),
    igPeak: v("ig_peak"), igOffPeak: -v("ig_off_peak"), baseCurrentMax: v("ib_max"), rzCurrentMax: v("irz_max"), zenerHold: v("iz_hold"),
    tThreshold: v("t_th") - clampTiming(c).on[0],
    vgTop: v("vg_top"), vgMax: v("vg_max"), vbTop: v("vb_top"), vgBottom: v("vg_bottom"),
  };
}

/** Heat of every element plus the energy into the gate, in a window. */
export function clampAccounted(m: ClampMeasurement, edge: keyof PerEdge): number {
  return [m.clamp, m.discharge, m.zener, m.rZ, m.diode, m.rWinding, m.rGate, m.rgInt, m.gate].reduce((s, x) => s + x[edge], 0);
}
