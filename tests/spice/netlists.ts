// Netlist builders for the comparisons. Inputs are plain SI circuit values, so
// each test builds the SAME circuit the model is given (values taken from a
// demo option) and nothing here knows the model's formulas.
import { sp } from "./ngspice";

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
  const netlist = `* gate-drive energy split
Vctl ctl 0 PULSE(0 1 ${sp(tOn)} 1e-10 1e-10 ${sp(tOff - tOn)} ${sp(4 * half)})
Vhi vhi 0 ${sp(net.vHigh)}
Vlo vlo 0 ${sp(net.vLow)}
Ssrc vhi a ctl 0 swsrc
Ssnk b vlo 0 ctl swsnk
.model swsrc sw(vt=0.5 ron=${sp(net.rSource)} roff=1e12)
.model swsnk sw(vt=-0.5 ron=${sp(net.rSink)} roff=1e12)
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
let psrc = ion*ion*${sp(net.rSource)}
let pexton = ion*ion*${sp(net.rExtOn)}
let psnk = ioff*ioff*${sp(net.rSink)}
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
