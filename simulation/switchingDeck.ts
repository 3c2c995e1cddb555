// One hard-switched edge of a clamped inductive load, as an ngspice deck.
// Pure: a circuit in SI numbers in, netlist text out; switchingWave.ts reads
// the waveform file the deck writes and measures the edge.
//
// Circuit: the bus source, optionally a power-loop inductance (with a damping
// resistor across it) to the node the load and the freewheel diode return
// to; the load inductor as a constant current source (it does not change over
// an edge) freewheeling through a diode to that node; a 1 mΩ resistor that
// senses the drain-terminal current as a bench probe would (a 0 V source in
// series with the diodes upsets ngspice's first time steps); the switch,
// optionally with a common-source inductance from its source pin to ground,
// which is also the gate drive's return; the gate driven by an ideal PULSE
// source between V+ and V− through the external gate resistor (the card's Rg
// is the internal one). Gear integration: the trapezoidal rule rings from
// step to step where the diode clamps the drain. Time step and tolerance
// come from the caller (switchingRun.ts says why they are what they are).
import { modelLine, type VdmosCard } from "./mosfetCard";
import { sp } from "./ngspice";

export interface ClampedCircuit {
  card: VdmosCard;
  vBus: number;
  iLoad: number;
  vHigh: number;
  vLow: number;
  /** External gate resistance, Ω. */
  rGate: number;
  /** Power-loop inductance in series with the bus, H (0: none). */
  lLoop: number;
  /** Common-source inductance between the source pin and the gate-drive return, H (0: none). */
  lCommonSource: number;
}

export interface EdgeRun {
  edge: "on" | "off";
  /** Simulated time after the gate command, s. */
  window: number;
  /** Largest time step, s. */
  tMax: number;
  /** Relative tolerance (ngspice's default 1e-3). */
  reltol?: number;
}

/** Start of the PULSE edge, s (steady state before it) and its 10-90 % length. */
export const PULSE_DELAY = 10e-9;
export const PULSE_EDGE = 1e-9;
/** The command instant: the middle of the drive source's edge. */
export const COMMAND_TIME = PULSE_DELAY + PULSE_EDGE / 2;
export const SENSE_RESISTANCE = 1e-3;

/**
 * Damping across the loop inductance, Ω (invented, a deck choice): stands
 * for the loop's high-frequency losses. Without it the loop rings with the
 * switch's Coss at Q of several hundred for microseconds (Rd, Rb and the
 * diode's 5 mΩ are all it has), so no energy window closes; with it Q is
 * about 6 (60 V part at 48 V) and 3 (650 V part at 400 V). Its L/R of 0.2 ns
 * is short against the current edges, so it takes little of the L·di/dt.
 */
export const LOOP_DAMPING = 50;

// Freewheel diode: no recovery (TT = 0), a little Rs and Cjo keep the commutation
// well-posed; abstol 10 nA (1e-9 of the load) avoids "timestep too small" after the edge.
const FREEWHEEL = ".model dfw D(Is=1e-12 Rs=5m Cjo=50p N=1 TT=0)";

export const WAVE_FILE = "edge.txt";
/** Columns of the waveform file, after time. */
export const WAVE_COLUMNS = ["vds", "id", "ich", "vdsi", "vgs", "ig", "ibus", "vbi", "vsw", "vsrc", "vdrv"] as const;

export function clampedEdgeDeck(c: ClampedCircuit, run: EdgeRun): string {
  const from = run.edge === "on" ? c.vLow : c.vHigh;
  const to = run.edge === "on" ? c.vHigh : c.vLow;
  const tEnd = COMMAND_TIME + run.window;
  const loop = c.lLoop > 0;
  const cs = c.lCommonSource > 0;
  const bi = loop ? "busi" : "bus";
  const src = cs ? "s" : "0";
  return `* hard turn-${run.edge} of ${c.card.name}, clamped inductive load
${modelLine(c.card)}
${FREEWHEEL}
.options abstol=1e-8 reltol=${sp(run.reltol ?? 1e-3)} method=gear
Vbus bus 0 ${sp(c.vBus)}
${loop ? `Lloop bus busi ${sp(c.lLoop)}\nRdamp bus busi ${sp(LOOP_DAMPING)}` : ""}
Iload ${bi} sw ${sp(c.iLoad)}
Dfw sw ${bi} dfw
Rsd sw d ${sp(SENSE_RESISTANCE)}
M1 d g ${src} ${c.card.name}
${cs ? `Lcs s 0 ${sp(c.lCommonSource)}` : ""}
Vdrv gd 0 PULSE(${sp(from)} ${sp(to)} ${sp(PULSE_DELAY)} ${sp(PULSE_EDGE)} ${sp(PULSE_EDGE)} 1 2)
Rgate gd g ${sp(c.rGate)}
.control
set wr_singlescale
set wr_vecnames
option numdgt=9
save all @m1[id] @m1[vds]
op
tran ${sp(run.tMax)} ${sp(tEnd)} 0 ${sp(run.tMax)}
let vsrc = ${cs ? "v(s)" : "0*v(d)"}
let vds = v(d) - vsrc
let id = (v(sw)-v(d))/${sp(SENSE_RESISTANCE)}
let ich = @m1[id]
let vdsi = @m1[vds]
let vgs = v(g) - vsrc
let ig = (v(gd)-v(g))/${sp(c.rGate)}
let ibus = -i(Vbus)
let vbi = ${loop ? "v(busi)" : "v(bus)"}
let vsw = v(sw)
let vdrv = v(gd)
wrdata ${WAVE_FILE} ${WAVE_COLUMNS.join(" ")}
.endc
.end
`;
}

/**
 * Energy held in the switch's capacitances in its two states, measured
 * directly with slow ramps (purely capacitive currents): instance A has the
 * drain held at 0 V and its gate ramped to vHigh (the on state; its Vds of
 * Id·Rds(on) is taken as 0); instance B has its gate ramped to vLow and then
 * its drain to vBus (the off state). The capacitances are charge-based
 * two-terminal elements, so the energy is a function of the state and the
 * path does not matter. Prints e_on_state and e_off_state, J, and
 * e_off_gate, B's energy when its gate has reached vLow (so e_off_state −
 * e_off_gate is the Coss energy at the bus with the gate held at vLow).
 */
export function storedEnergyDeck(card: VdmosCard, o: { vHigh: number; vLow: number; vBus: number }, ramp = 20e-6): string {
  const t1 = ramp;
  const t2 = 2 * ramp;
  return `* stored energy of ${card.name} in the on and off states
${modelLine(card)}
Vda da 0 0
Vga ga 0 PWL(0 0 ${sp(t1)} ${sp(o.vHigh)})
Ma da ga 0 ${card.name}
Vdb db 0 PWL(0 0 ${sp(t1)} 0 ${sp(t2)} ${sp(o.vBus)})
Vgb gb 0 PWL(0 0 ${sp(t1)} ${sp(o.vLow)})
Mb db gb 0 ${card.name}
.control
option numdgt=10
tran ${sp(ramp / 4000)} ${sp(t2)} 0 ${sp(ramp / 4000)}
let pa = -v(ga)*i(Vga)
let pb = -v(gb)*i(Vgb) - v(db)*i(Vdb)
meas tran e_on_state integ pa from=0 to=${sp(t2)}
meas tran e_off_gate integ pb from=0 to=${sp(t1)}
meas tran e_off_state integ pb from=0 to=${sp(t2)}
.endc
.end
`;
}
