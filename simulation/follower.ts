// Emitter-follower (NPN/PNP totem pole) gate drive over one full switching
// period. The controller pin is a 0 … Vcc PULSE with a few-ns edges behind
// a resistance that moves smoothly from the sink to the source value with
// the pin's own level (and, optionally, a source/sink current limit); it
// feeds both bases through a base resistor each; the emitters drive the
// gate through the external resistor and Rg(int). Collectors sit at Vcc and
// V−. One warm-up period runs first so the measured period starts from the
// circuit's own state (gate tail, junction charge), not from the DC point.
import { bjtModel, type BjtCard } from "./bjt";
import { energyLines, seriesResistor, windowLine, type EdgeWindows } from "./driveMeasure";
import { gateElement, type GateLoad } from "./gateLoad";
import { clampedStage, type ClampedStage, type VdmosCard } from "./gateLoadVdmos";
import { sp } from "./ngspice";

/**
 * How the pin's output stage is drawn:
 *  - "thevenin": a 0 … Vcc PULSE behind a resistance moving from the sink
 *    to the source value with the PULSE's level (one smooth source);
 *  - "push-pull": a pull-up from Vcc and a pull-down to ground whose
 *    conductances ramp in turn (break before make, each over half the
 *    edge), as a CMOS output stage is built.
 * At the terminal both look alike once the edge is over; inside the edge
 * they differ: a current that flows during the Thevenin source's own ramp
 * is partly absorbed by the ramp, where the push-pull stage burns it.
 */
export type PinStage = "thevenin" | "push-pull";

export interface ControllerPin {
  stage?: PinStage; // default "thevenin"
  vcc: number; // pin high level = NPN collector rail
  rSource: number;
  rSink: number;
  edge: number; // 0→100 % edge time of the pin's own source, s
  sourceLimit?: number; // A
  sinkLimit?: number;
}

export type FollowerLoad =
  | { kind: "charge"; gate: GateLoad }
  | { kind: "switch"; card: VdmosCard; stage: ClampedStage };

export interface FollowerCase {
  pin: ControllerPin;
  vNeg: number; // PNP collector rail, ≤ 0
  rBase: number; // per transistor, may be 0
  npn: BjtCard;
  pnp: BjtCard;
  rGate: number; // external, both edges
  rgInt: number;
  rGs?: number; // gate-source pull-down, Ω
  load: FollowerLoad;
  fsw: number; // duty 0.5
  /** Pin straight into the gate resistor: the direct-drive baseline. */
  direct?: boolean;
  warmupPeriods?: number;
}

export interface FollowerTiming extends EdgeWindows {
  tEnd: number;
  tmax: number;
}

const T0 = 20e-9;

export function followerTiming(c: FollowerCase): FollowerTiming {
  const period = 1 / c.fsw;
  const tA = T0 + (c.warmupPeriods ?? 1) * period;
  // Sub-ns steps over the whole period: the base and gate currents change on
  // the scale of the transistors' transit times around every edge. With
  // 0.25 ns every figure stayed within 0.7 % of a 0.05 ns run (high-current
  // pair, 500 kHz); 1 ns moved the pin's turn-off charge by 2.4 %.
  const tmax = Math.min(0.25e-9, period / 4000);
  return { on: [tA, tA + period / 2], off: [tA + period / 2, tA + period], tEnd: tA + period, tmax };
}

const cap = (i: string, limit: number | undefined) => (limit === undefined ? i : `min(${i}, ${sp(limit)})`);

/** Deck lines of the pin up to node `pin`; its supply is the source Vsrc. */
function pinLines(p: ControllerPin, period: number): string {
  const width = sp(period / 2 - p.edge);
  if ((p.stage ?? "thevenin") === "thevenin") {
    const r = `(${sp(p.rSink)} + ${sp(p.rSource - p.rSink)}*v(src)/${sp(p.vcc)})`;
    let i = cap(`(v(src)-v(pin))/${r}`, p.sourceLimit);
    if (p.sinkLimit !== undefined) i = `max(${i}, ${sp(-p.sinkLimit)})`;
    return `Vsrc src 0 PULSE(0 ${sp(p.vcc)} ${sp(T0)} ${sp(p.edge)} ${sp(p.edge)} ${width} ${sp(period)})
Bpin src pin I = ${i}
Vpin pin pinx 0`;
  }
  const half = sp(p.edge / 2);
  // su: pull-up 0→1 in the second half of the rising edge, 1→0 in the first half of the falling one; sd the mirror.
  return `Vsu su 0 PULSE(0 1 ${sp(T0 + p.edge / 2)} ${half} ${half} ${sp(period / 2 - p.edge)} ${sp(period)})
Vsd sd 0 PULSE(1 0 ${sp(T0)} ${half} ${half} ${sp(period / 2)} ${sp(period)})
Vsrc src 0 ${sp(p.vcc)}
Bup src pin I = ${cap(`v(su)*(v(src)-v(pin))/${sp(p.rSource)}`, p.sourceLimit)}
Bdn pin 0 I = ${cap(`v(sd)*v(pin)/${sp(p.rSink)}`, p.sinkLimit)}
Rpinoff pin 0 1e7
Vpin pin pinx 0`;
}

function bufferLines(c: FollowerCase): string {
  if (c.direct) return "Vdir pinx e 0";
  return `Vsbn pinx bnr 0
${seriesResistor("bn", "bnr", "bn", c.rBase)}
Vsbp bpr pinx 0
${seriesResistor("bp", "bpr", "bp", c.rBase)}
Vcn vcc cn 0
Vcp cp vneg 0
Qn cn bn e ${c.npn.name}
Qp cp bp e ${c.pnp.name}`;
}

function loadLines(c: FollowerCase): string {
  const pull = c.rGs !== undefined ? `\nRgs g 0 ${sp(c.rGs)}` : "";
  if (c.load.kind === "charge") return gateElement("g", c.load.gate) + pull;
  return clampedStage("g", c.load.card, c.load.stage) + pull;
}

/** Energies (J, per window), charges (C), peaks (A) and levels (V) of one measured period. */
function measureLines(c: FollowerCase, w: FollowerTiming): string {
  const period: [number, number] = [w.on[0], w.off[1]];
  const gs = c.rGs !== undefined ? ` - v(g)*v(g)/${sp(c.rGs)}` : "";
  const lines = [
    "let ipin = i(Vpin)",
    "let ig = i(Vsg)",
    energyLines("e_pin", "-i(Vsrc)*v(src) - v(pin)*ipin", w),
    energyLines("e_pin_supply", "-i(Vsrc)*v(src)", w),
    energyLines("e_vcc", `-i(Vcc)*${sp(c.pin.vcc)}`, w),
    energyLines("e_vneg", `-i(Vneg)*${sp(c.vNeg)}`, w),
    energyLines("e_rgate", `ig*ig*${sp(c.rGate)}`, w),
    energyLines("e_rgint", `ig*ig*${sp(c.rgInt)}`, w),
    energyLines("e_gate", `v(g)*ig${gs}`, w),
    energyLines("q_pin", "ipin", w),
    energyLines("q_pin_abs", "abs(ipin)", w),
    energyLines("q_gate", "ig", w),
    windowLine("ipin_max", "max ipin", period),
    windowLine("ipin_min", "min ipin", period),
    windowLine("ig_on_peak", "max ig", w.on),
    windowLine("ig_off_peak", "min ig", w.off),
    windowLine("vg_max", "max v(g)", w.on),
    windowLine("vg_min", "min v(g)", w.off),
    `meas tran vg_top find v(g) at=${sp(w.on[1])}`,
    `meas tran vg_bottom find v(g) at=${sp(w.off[1])}`,
    `meas tran ipin_hold_high find ipin at=${sp(w.on[1] - 1e-9)}`,
  ];
  if (c.rGs !== undefined) lines.push(energyLines("e_rgs", `v(g)*v(g)/${sp(c.rGs)}`, w));
  if (!c.direct) {
    lines.push(
      "let ibn = i(Vsbn)",
      "let ibp = i(Vsbp)",
      energyLines("e_npn", "i(Vcn)*(v(cn)-v(e)) + ibn*(v(bn)-v(e))", w),
      energyLines("e_pnp", "i(Vcp)*(v(e)-v(cp)) + ibp*(v(e)-v(bp))", w),
      energyLines("e_rbase", `(ibn*ibn + ibp*ibp)*${sp(c.rBase)}`, w),
    );
  }
  return lines.join("\n");
}

export function followerDeck(c: FollowerCase): { deck: string; timing: FollowerTiming } {
  const w = followerTiming(c);
  if (!(c.rGate > 0 && c.rgInt > 0)) throw new Error("rGate and rgInt must be > 0");
  const deck = `* emitter-follower gate drive, one period at ${sp(c.fsw)} Hz
${c.direct ? "" : `${bjtModel(c.npn)}\n${bjtModel(c.pnp)}`}
${pinLines(c.pin, 1 / c.fsw)}
Vcc vcc 0 ${sp(c.pin.vcc)}
Vneg vneg 0 ${sp(c.vNeg)}
${bufferLines(c)}
Vsg e e1 0
Rext e1 g1 ${sp(c.rGate)}
Rgint g1 g ${sp(c.rgInt)}
${loadLines(c)}
.control
op
tran ${sp(w.tmax)} ${sp(w.tEnd)} ${sp(w.on[0] - 1e-9)} ${sp(w.tmax)}
${measureLines(c, w)}
.endc
.end
`;
  return { deck, timing: w };
}
