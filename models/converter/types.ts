/**
 * The operating-point calculator's input and output (SI units throughout).
 *
 * A "corner" here is one set of converter specs (Vin, Vout, Iout, fsw …);
 * the calculator returns, for that corner, the waveform figures of every
 * switch position. Currents are signed in each position's own forward
 * direction: drain to source for a primary or auxiliary switch, the
 * rectifying direction for a rectifier (diode or synchronous). A negative
 * current in a switch is body-diode direction current.
 */

export type Topology = "buck" | "boost" | "flyback" | "forward" | "half-bridge" | "full-bridge";
export type ConductionMode = "continuous" | "discontinuous" | "boundary";
export type ForwardReset = "reset-winding" | "active-clamp";

export interface ConverterSpec {
  topology: Topology;
  /** Input voltage, V. */
  vin: number;
  /** Output voltage, V. */
  vout: number;
  /** Output (load) current, A. */
  iout: number;
  /** Switching frequency of each primary switch, Hz (in boundary mode it is computed instead). */
  fsw: number;
  /** Efficiency estimate Pout/Pin, 0 < η ≤ 1. */
  efficiency: number;
  /** Primary to secondary turns ratio Np/Ns (isolated topologies; each half of a centre-tapped secondary has Ns). */
  turnsRatio?: number;
  /** Magnetizing inductance referred to the primary, H (flyback, forward). */
  magnetizingInductance?: number;
  /** Filter inductance, H: the buck/boost inductor or the output inductor of a forward or bridge. */
  filterInductance?: number;
  rectifier: "synchronous" | "diode";
  /**
   * Dead times, s: [t1, t2]. A synchronous rectifier's body diode conducts
   * for t1 at the start and t2 at the end of each conduction interval (its
   * gate comes on t1 late and goes off t2 early). In an active-clamp forward,
   * t1 is also the delay from the main switch's turn-off to the clamp
   * switch's turn-on and t2 from the clamp switch's turn-off to the main
   * switch's turn-on.
   */
  deadTimes?: [number, number];
  /** "auto" decides from the inductance and the load and reports the mode found. */
  mode: ConductionMode | "auto";
  /** Forward converter only: how the core is reset. */
  forwardReset?: ForwardReset;
  /** Forward with reset winding: Np/Nr (1 when the reset winding has as many turns as the primary). */
  resetTurnsRatio?: number;
  /** The controller's maximum duty (optional): a corner needing more is refused. */
  dutyMax?: number;
}

export type Role = "primary" | "synchronous-rectifier" | "other";

export interface EdgeFigure {
  /** Time of the edge from the start of the period (the main switch's turn-on), s. */
  time: number;
  /** Vds just before turn-on, or just after turn-off, V. */
  vds: number;
  /** Id just after turn-on, or just before turn-off, A (signed, see the file comment). */
  id: number;
  zeroVoltage: boolean;
  zeroCurrent: boolean;
  /** Hard: the edge carries voltage (turn-on: the switch discharges its own capacitance) or both voltage and current (turn-off). */
  hard: boolean;
}

export interface DiodeInterval {
  /** Start within the period, s. */
  start: number;
  duration: number;
  /** Body-diode current at the start and end of the interval, A (magnitudes). */
  iStart: number;
  iEnd: number;
}

export interface BodyDiodeFigures {
  intervals: DiodeInterval[];
  /** Body-diode conduction just before the channel turns on, s (the design document's t1). */
  beforeOn: number;
  /** Body-diode conduction just after the channel turns off, s (the design document's t2). */
  afterOff: number;
  /** Average body-diode current over the period, A. */
  iAvg: number;
  /** RMS body-diode current over the period, A. */
  iRms: number;
}

export interface PositionFigures {
  id: string;
  role: Role;
  label: string;
  device: "mosfet" | "diode";
  /** Conduction fraction of the period: of the channel for a MOSFET, of the diode for a diode. */
  duty: number;
  /** Channel turn-on (a diode: start of conduction). */
  turnOn: EdgeFigure;
  /** Channel turn-off (a diode: end of conduction, where it recovers). */
  turnOff: EdgeFigure;
  /** RMS and average over the period of the channel current (a diode: its current), A. */
  iRms: number;
  iAvg: number;
  /** RMS and average of the whole device current (channel and body diode), A. */
  deviceIRms: number;
  deviceIAvg: number;
  /** Body-diode conduction of a MOSFET; null for a diode or a MOSFET whose body diode never conducts. */
  bodyDiode: BodyDiodeFigures | null;
  /** The highest voltage the device blocks in the period, V (a rectifier's reverse voltage). */
  reverseVoltage: number;
  /** The voltage it blocks once its conduction ends (what a recovering diode recovers against), V. */
  blockingAfterConduction: number;
  /** Conduction intervals per period (2 for a bridge rectifier in discontinuous mode). */
  runs: number;
}

export interface InductorFigures {
  name: "L" | "Lm" | "Lo";
  label: string;
  /** Average, peak, valley and peak-to-peak ripple of the inductor current, A (Lm: referred to the primary). */
  avg: number;
  peak: number;
  valley: number;
  ripple: number;
}

export interface OperatingPoint {
  topology: Topology;
  /** The corner's specs, echoed: input and output voltage (V), load current (A). */
  vin: number;
  vout: number;
  iout: number;
  mode: ConductionMode;
  /** Switching frequency used, Hz (computed in boundary mode). */
  fsw: number;
  /** The main primary switch's duty D. */
  duty: number;
  /** Fraction of the (output-filter) period in which the rectifier carries the decaying inductor current; 1 − D in CCM. */
  dutyFreewheel: number;
  /** Erickson's dimensionless K = 2L/(R·Ts) and its critical value at this duty (Erickson 3rd ed. ch. 5). */
  k: number;
  kCrit: number;
  inputCurrent: number;
  inputPower: number;
  outputPower: number;
  inductors: InductorFigures[];
  positions: PositionFigures[];
  notes: string[];
}

export interface Refusal {
  /** The spec field to change. */
  field: keyof ConverterSpec;
  /** Plain words: what is impossible and what would make it possible. */
  message: string;
}

export type OperatingResult = { ok: true; point: OperatingPoint } | { ok: false; refusal: Refusal };
