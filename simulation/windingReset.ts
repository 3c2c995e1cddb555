// The off level of a self-driven gate on a forward converter's transformer
// (issue #18 item 4). An ideal transformer (E and F sources) with its
// magnetizing inductance across the primary; a gate winding of k turns per
// primary turn drives the rectifier's gate through its leakage inductance
// and the gate resistors. The gate is a linear capacitance here: a pwl
// Q(Vgs) table, crossed at amperes while this deck's switch node slews,
// stalled ngspice's time step on 13 of 22 trial cases, and the level the
// deck is for is set by the winding, whatever the curve's shape (the gate
// settles to the winding's voltage once its current has died away; the
// curve changes only how long that takes). The main switch puts Vin on the
// primary for D·T;
// the core is reset either by
//  - an active clamp (a switch and capacitor across the primary for the rest
//    of the period): volt-second balance on the magnetizing inductance then
//    sets the off level, −k·Vin·D/(1−D), and nothing else does;
//  - a reset winding of Nr/Np turns returning energy to Vin through a diode:
//    −k·Vin·Np/Nr while the core resets (for D·T·Nr/Np), then near zero.
// The deck runs `periods` periods from rest (clamp capacitor at 0 V) and
// measures the last, and the off level one period earlier to show the start
// has died away. The positive interval runs from the winding's rise
// through half its on-level to its fall through zero, the negative one from
// there to the next rise: any split gives on·t_on + off·t_off = 0 over a
// settled period, the volt-second balance itself.
import { runNgspice, sp, valueOf } from "./ngspice";

export type CoreReset =
  | { kind: "active-clamp"; cClamp: number; rClamp: number }
  | { kind: "reset-winding"; turnsRatio: number }; // Nr/Np

export interface ForwardGateCase {
  vin: number;
  duty: number; // main switch on-time / period
  fsw: number;
  lm: number; // magnetizing inductance, H
  k: number; // gate-winding turns per primary turn
  lLeak: number; // leakage inductance in series with the gate winding, H
  reset: CoreReset;
  cNode: number; // output capacitance of each switch, F
  rGate: number;
  rgInt: number;
  cGate: number; // F
  periods: number; // the clamp capacitor needs tens of periods to settle; a reset winding two or three
}

export interface ForwardGateMeasurement {
  windingOnAvg: number; // gate-winding voltage averaged over its positive interval, V
  windingOffAvg: number; // and over the rest of the period
  windingOffAvgBefore: number; // the same one period earlier
  dutyMeasured: number; // positive interval / period
  resetLevel: number; // winding at the middle of the reset (reset winding) or of the off interval (active clamp)
  resetTime: number; // s the winding stays below half that level
  gateReset: number; // gate at the same instant
  gateMin: number;
  gateTop: number; // gate at the end of the positive interval
  clampVoltage: number; // active clamp: its capacitor's voltage at mid off, V (0 for a reset winding)
}

const T0 = 50e-9;
// The switches are conductances (10 mΩ when on) that ramp over SWITCH_EDGE
// with their command, and the clamp switch takes over as the main switch
// finishes turning off (the switch node slews on the two output
// capacitances in between): no diode turns on in the clamp loop, where
// ngspice's abrupt switch model or a body diode there stall the time step
// ("timestep too small"). For the same reason the gate winding has its
// leakage inductance.
const G_ON = 100;
const SWITCH_EDGE = 10e-9;

function resetLines(c: ForwardGateCase, period: number): string {
  const e = sp(SWITCH_EDGE);
  if (c.reset.kind === "active-clamp") {
    const start = T0 + c.duty * period + SWITCH_EDGE / 2;
    const width = (1 - c.duty) * period - 3 * SWITCH_EDGE;
    return `Vc2 c2 0 PULSE(0 1 ${sp(start)} ${e} ${e} ${sp(width)} ${sp(period)})
Bs2 d cc I = v(d,cc)*(1e-9 + ${G_ON}*v(c2))
C2 d cc ${sp(c.cNode)}
Rc cc ccr ${sp(c.reset.rClamp)}
Cc ccr vin ${sp(c.reset.cClamp)}`;
  }
  const n = c.reset.turnsRatio;
  // v(rr) = −(Nr/Np)·vp: the diode returns the magnetizing energy to Vin once it reaches Vin.
  // The reset winding has the gate winding's leakage and 0.5 Ω in its diode, for the time step.
  // After the reset the switch node would ring on Lm and Cd and cross zero again; a critically
  // damping resistor across the primary (an RC-less snubber) keeps one zero crossing per edge.
  return `.model drst D(Is=1e-9 N=1.5 Rs=0.5 Cjo=50p)
Er rr 0 vin d ${sp(-n)}
Vrs rr rrl 0
Lrl rrl rr2 ${sp(c.lLeak)}
Dr rr2 vin drst
Fr vin d Vrs ${sp(-n)}
Rdamp vin d ${sp(0.5 * Math.sqrt(c.lm / c.cNode))}`;
}

/** Expected middle of the negative interval, s after its start: half the reset time or half the off time. */
function resetMiddle(c: ForwardGateCase, period: number): number {
  const reset = c.reset.kind === "reset-winding" ? c.duty * period * c.reset.turnsRatio : (1 - c.duty) * period;
  return Math.min(reset, (1 - c.duty) * period) / 2;
}

export function forwardGateDeck(c: ForwardGateCase): string {
  const period = 1 / c.fsw;
  const tA = T0 + (c.periods - 1) * period;
  const tEnd = tA + period + (c.duty * period) / 2;
  const half = c.reset.kind === "reset-winding" ? (c.k * c.vin) / c.reset.turnsRatio / 2 : (c.k * c.vin * c.duty) / (1 - c.duty) / 2;
  const onHalf = (c.k * c.vin) / 2;
  const clamp = c.reset.kind === "active-clamp" ? "let vcl = v(ccr)-v(vin)\nmeas tran vc_mid find vcl at=$&t_mid" : "";
  return `* self-driven gate on a forward converter, ${c.reset.kind} reset
Vin vin 0 ${sp(c.vin)}
Lm vin d ${sp(c.lm)}
Vc1 c1 0 PULSE(0 1 ${sp(T0 - SWITCH_EDGE / 2)} ${sp(SWITCH_EDGE)} ${sp(SWITCH_EDGE)} ${sp(c.duty * period - SWITCH_EDGE)} ${sp(period)})
Bs1 d 0 I = v(d)*(1e-9 + ${G_ON}*v(c1))
Cd d 0 ${sp(c.cNode)}
${resetLines(c, period)}
Eg gw0 0 vin d ${sp(c.k)}
Vgw gw0 gwl 0
Lgl gwl gw ${sp(c.lLeak)}
Fg vin d Vgw ${sp(c.k)}
Rext gw g1 ${sp(c.rGate)}
Rgint g1 g ${sp(c.rgInt)}
Cgate g 0 ${sp(c.cGate)}
.control
op
tran ${sp(period / 500)} ${sp(tEnd)} ${sp(tA - period - 1e-9)} ${sp(period / 500)}
let vw = v(gw0)
meas tran t_rise0 when vw=${sp(onHalf)} rise=1 from=${sp(tA - (c.duty * period) / 2)}
meas tran t_fall when vw=0 fall=1 from=$&t_rise0
meas tran t_rise1 when vw=${sp(onHalf)} rise=1 from=$&t_fall
meas tran t_fall_before when vw=0 fall=1 from=${sp(tA - period)}
meas tran vw_on_avg avg vw from=$&t_rise0 to=$&t_fall
meas tran vw_off_avg avg vw from=$&t_fall to=$&t_rise1
meas tran vw_off_before avg vw from=$&t_fall_before to=$&t_rise0
let t_mid = t_fall + ${sp(resetMiddle(c, period))}
meas tran vw_reset find vw at=$&t_mid
meas tran vg_reset find v(g) at=$&t_mid
meas tran t_reset_end when vw=${sp(-half)} rise=1 from=$&t_fall
meas tran t_reset_start when vw=${sp(-half)} fall=1 from=$&t_rise0
meas tran vg_min min v(g) from=$&t_rise0 to=$&t_rise1
meas tran vg_top find v(g) at=$&t_fall
${clamp}
.endc
.end
`;
}

export async function simulateForwardGate(c: ForwardGateCase): Promise<ForwardGateMeasurement> {
  const r = await runNgspice(forwardGateDeck(c), { timeoutMs: 60_000 });
  const v = (n: string) => valueOf(r, n);
  return {
    windingOnAvg: v("vw_on_avg"), windingOffAvg: v("vw_off_avg"), windingOffAvgBefore: v("vw_off_before"),
    dutyMeasured: (v("t_fall") - v("t_rise0")) * c.fsw,
    resetLevel: v("vw_reset"), resetTime: v("t_reset_end") - v("t_reset_start"), gateReset: v("vg_reset"),
    gateMin: v("vg_min"), gateTop: v("vg_top"), clampVoltage: c.reset.kind === "active-clamp" ? v("vc_mid") : 0,
  };
}
