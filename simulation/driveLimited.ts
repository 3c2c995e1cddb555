// A current-limited pin or driver IC into the gate (issue #18 item 2): the
// output is min((V − v)/R, limit) on each edge, a resistor once the limit
// no longer bites. The pull-up and pull-down are B-sources gated in turn by
// a 0.2 ns command edge (break before make, so no crowbar current), and the
// limit phase and the resistive phase come out of one source. Measures, per
// edge, the heat in the driver (and the part of it taken while limited,
// beyond I²R), in each resistor, the energy into the gate, the energy drawn
// from both rails and the limit phase's length.
import { energyLines, perEdge, windowLine, type EdgeWindows, type PerEdge } from "./driveMeasure";
import { gateElement, type GateLoad } from "./gateLoad";
import { runNgspice, sp, valueOf } from "./ngspice";

export interface LimitedDriver {
  vHigh: number;
  vLow: number; // 0 or negative
  rSource: number;
  rSink: number;
  sourceLimit?: number; // A; none = a plain resistor
  sinkLimit?: number;
}

export interface LimitedCase {
  driver: LimitedDriver;
  rExt: number;
  rgInt: number;
  gate: GateLoad;
  halfPeriod: number; // s, long enough for the gate to settle
}

export interface LimitedMeasurement {
  driver: PerEdge; // all heat in the driver's output
  driverLimit: PerEdge; // the part beyond I²·R (the limiter's drop × current)
  rExt: PerEdge;
  rgInt: PerEdge;
  gate: PerEdge;
  supply: PerEdge; // from V+ and V−
  gateCharge: PerEdge;
  peakSource: number;
  peakSink: number; // positive, A
  limitTimeOn: number; // s from the command edge to the end of the limit phase (0 when never limited)
  limitTimeOff: number;
  vgTop: number;
  vgBottom: number;
}

const T0 = 20e-9;
const EDGE = 0.2e-9;
// Break before make: the pull-up conducts above half the command, the pull-down below it.
const UP = "max(2*v(ctl)-1, 0)";
const DOWN = "max(1-2*v(ctl), 0)";
const NO_LIMIT = 1e6;

export function limitedTiming(c: LimitedCase): EdgeWindows & { tEnd: number; tmax: number } {
  const tOff = T0 + c.halfPeriod;
  return { on: [0, tOff], off: [tOff, tOff + c.halfPeriod], tEnd: tOff + c.halfPeriod, tmax: Math.min(0.2e-9, c.halfPeriod / 5000) };
}

/** Whether the edge starts limited: the full-swing resistive current exceeds the limit. */
export function limitBites(c: LimitedCase, edge: "on" | "off"): boolean {
  const d = c.driver;
  const limit = edge === "on" ? d.sourceLimit : d.sinkLimit;
  const r = (edge === "on" ? d.rSource : d.rSink) + c.rExt + c.rgInt;
  return limit !== undefined && (d.vHigh - d.vLow) / r > limit;
}

export function limitedDeck(c: LimitedCase): string {
  const d = c.driver, w = limitedTiming(c);
  const src = `min((v(vhi)-v(a))/${sp(d.rSource)}, ${sp(d.sourceLimit ?? NO_LIMIT)})`;
  const snk = `min((v(a)-v(vlo))/${sp(d.rSink)}, ${sp(d.sinkLimit ?? NO_LIMIT)})`;
  // Where the resistive current equals the limit: the driver output's level at the end of the limit phase.
  const onEdge = limitBites(c, "on") ? `meas tran t_lim_on when v(a)=${sp(d.vHigh - (d.sourceLimit ?? 0) * d.rSource)} rise=1` : "";
  const offEdge = limitBites(c, "off") ? `meas tran t_lim_off when v(a)=${sp(d.vLow + (d.sinkLimit ?? 0) * d.rSink)} fall=1` : "";
  return `* current-limited gate driver
Vctl ctl 0 PULSE(0 1 ${sp(T0)} ${sp(EDGE)} ${sp(EDGE)} ${sp(c.halfPeriod - EDGE)} ${sp(4 * c.halfPeriod)})
Vhi vhi 0 ${sp(d.vHigh)}
Vlo vlo 0 ${sp(d.vLow)}
Bsrc vhi a I = ${UP}*${src}
Bsnk a vlo I = ${DOWN}*${snk}
Ra a 0 1e9
Vsg a a1 0
Rext a1 g1 ${sp(c.rExt)}
Rgint g1 g ${sp(c.rgInt)}
${gateElement("g", c.gate)}
.control
op
tran ${sp(w.tmax)} ${sp(w.tEnd)} 0 ${sp(w.tmax)}
let isrc = ${UP}*${src}
let isnk = ${DOWN}*${snk}
let ig = i(Vsg)
${energyLines("e_drv", "isrc*(v(vhi)-v(a)) + isnk*(v(a)-v(vlo))", w)}
${energyLines("e_lim", `isrc*(v(vhi)-v(a)-isrc*${sp(d.rSource)}) + isnk*(v(a)-v(vlo)-isnk*${sp(d.rSink)})`, w)}
${energyLines("e_rext", `ig*ig*${sp(c.rExt)}`, w)}
${energyLines("e_rgint", `ig*ig*${sp(c.rgInt)}`, w)}
${energyLines("e_gate", "v(g)*ig", w)}
${energyLines("e_supply", `-i(Vhi)*${sp(d.vHigh)} - i(Vlo)*${sp(d.vLow)}`, w)}
${energyLines("q_gate", "ig", w)}
${windowLine("ig_max", "max ig", w.on)}
${windowLine("ig_min", "min ig", w.off)}
${onEdge}
${offEdge}
meas tran vg_top find v(g) at=${sp(w.on[1])}
meas tran vg_bottom find v(g) at=${sp(w.off[1])}
.endc
.end
`;
}

export async function simulateLimited(c: LimitedCase): Promise<LimitedMeasurement> {
  const r = await runNgspice(limitedDeck(c));
  const e = (n: string) => perEdge(r, n);
  const tOff = T0 + c.halfPeriod;
  return {
    driver: e("e_drv"), driverLimit: e("e_lim"), rExt: e("e_rext"), rgInt: e("e_rgint"), gate: e("e_gate"),
    supply: e("e_supply"), gateCharge: e("q_gate"),
    peakSource: valueOf(r, "ig_max"), peakSink: -valueOf(r, "ig_min"),
    limitTimeOn: limitBites(c, "on") ? valueOf(r, "t_lim_on") - T0 : 0,
    limitTimeOff: limitBites(c, "off") ? valueOf(r, "t_lim_off") - tOff : 0,
    vgTop: valueOf(r, "vg_top"), vgBottom: valueOf(r, "vg_bottom"),
  };
}
