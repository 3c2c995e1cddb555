// Buck and boost operating points: the calculator against ngspice transients
// of ideal-switch converters (switches with Ron = 1 mΩ, steep diodes),
// driven open loop with the calculator's duty and run to periodic steady
// state (converterBench.ts measures the last period). One buck case takes
// the efficiency estimate as the calculator does, an input resistor before
// a large input capacitor dropping (1 − η)·Vin: the currents and the duty
// must then follow the efficiency too.
import type { ConverterSpec, OperatingPoint, PositionFigures } from "@/models/converter/types";
import { sp } from "@/simulation/ngspice";
import { diodePos, gate, mosfet } from "./converterDeck";
import { benchSuite, type Bench } from "./converterBench";

/**
 * The run starts at Q1's turn-on in the calculator's periodic state (inductor
 * at its valley, output at Vout); a wrong start would show as drift in the
 * steady-state check, and 200 periods let the damped output settle.
 */
const valley = (p: OperatingPoint) => p.inductors[0].valley;

/** Output: 200 µF, an RC damper (1 mF in series with √(L_eff/C)) so the open-loop LC settles, current-sink load. */
function output(spec: ConverterSpec, lEff: number): string[] {
  return [
    `Cout out 0 200u IC=${sp(spec.vout)}`,
    `Cd out dmp 1m IC=${sp(spec.vout)}`,
    `Rd dmp 0 ${sp(Math.sqrt(lEff / 200e-6))}`,
    `Iload out 0 DC ${sp(spec.iout)}`,
  ];
}

/** The input: the source itself, or η·Vin behind a resistor that burns (1 − η)·Pin. */
function input(spec: ConverterSpec): string[] {
  if (spec.efficiency === 1) return [`Vin in 0 DC ${sp(spec.vin)}`];
  const iin = (spec.vout * spec.iout) / (spec.efficiency * spec.vin);
  return [`Vsrc src 0 DC ${sp(spec.vin)}`, `Rin src in ${sp(((1 - spec.efficiency) * spec.vin) / iin)}`, `Cin in 0 2m IC=${sp(spec.efficiency * spec.vin)}`];
}

function buckBench(spec: ConverterSpec, p: OperatingPoint): Bench {
  const T = 1 / p.fsw;
  const [t1, t2] = spec.deadTimes ?? [0, 0];
  const tOn = p.duty * T;
  const sync = spec.rectifier === "synchronous";
  return {
    title: "buck",
    periods: 200,
    circuit: [
      ...input(spec),
      mosfet("q1", "in", "sw", "g1"),
      gate("g1", "g1", 0, tOn, T),
      sync ? [mosfet("sr1", "sw", "0", "gsr"), gate("gsr", "gsr", tOn + t1, T - t2, T)].join("\n") : diodePos("d1", "0", "sw"),
      `L1 sw out ${sp(spec.filterInductance!)} IC=${sp(valley(p))}`,
      ...output(spec, spec.filterInductance!),
    ],
    probes: {
      Q1: { current: "i(viq1)", body: "i(vbq1)", vds: "v(in)-v(sw)" },
      SR1: { current: "-i(visr1)", body: "i(vbsr1)", vds: "v(sw)" },
      D1: { current: "i(vid1)", vds: "v(sw)" },
    },
    vout: "v(out)",
    iin: spec.efficiency === 1 ? "-i(vin)" : "-i(vsrc)",
  };
}

function boostBench(spec: ConverterSpec, p: OperatingPoint): Bench {
  const T = 1 / p.fsw;
  const [t1, t2] = spec.deadTimes ?? [0, 0];
  const tOn = p.duty * T;
  const sync = spec.rectifier === "synchronous";
  const l = spec.filterInductance!;
  return {
    title: "boost",
    periods: 200,
    circuit: [
      ...input(spec),
      `L1 in sw ${sp(l)} IC=${sp(valley(p))}`,
      mosfet("q1", "sw", "0", "g1"),
      gate("g1", "g1", 0, tOn, T),
      sync ? [mosfet("sr1", "out", "sw", "gsr"), gate("gsr", "gsr", tOn + t1, T - t2, T)].join("\n") : diodePos("d1", "sw", "out"),
      ...output(spec, l / (1 - p.duty) ** 2),
    ],
    probes: {
      Q1: { current: "i(viq1)", body: "i(vbq1)", vds: "v(sw)" },
      SR1: { current: "-i(visr1)", body: "i(vbsr1)", vds: "v(out)-v(sw)" },
      D1: { current: "i(vid1)", vds: "v(out)-v(sw)" },
    },
    vout: "v(out)",
    iin: spec.efficiency === 1 ? "-i(vin)" : "-i(vsrc)",
  };
}

/** A continuous-mode buck's device voltages all equal Vin: scaled together with it. */
function voltagesTimes(pos: PositionFigures, k: number): PositionFigures {
  return {
    ...pos,
    reverseVoltage: pos.reverseVoltage * k,
    turnOn: { ...pos.turnOn, vds: pos.turnOn.vds * k },
    turnOff: { ...pos.turnOff, vds: pos.turnOff.vds * k },
  };
}

// Buck 12 V → 3.3 V, 500 kHz, 1.5 µH; boost 12 V → 24 V, 200 kHz, 22 µH.
const buck: ConverterSpec = {
  topology: "buck", vin: 12, vout: 3.3, iout: 10, fsw: 500e3, efficiency: 1, filterInductance: 1.5e-6,
  rectifier: "synchronous", deadTimes: [40e-9, 40e-9], mode: "auto",
};
const boost: ConverterSpec = {
  topology: "boost", vin: 12, vout: 24, iout: 2, fsw: 200e3, efficiency: 1, filterInductance: 22e-6,
  rectifier: "synchronous", deadTimes: [100e-9, 100e-9], mode: "auto",
};
// With the efficiency as an input drop the simulated devices see η·Vin, the calculator
// reports the full Vin (its blocking voltages are upper bounds): compared against η·V.
const ETA = 0.9;
const atEtaVin = (pos: PositionFigures) => ({ pos: voltagesTimes(pos, ETA) });

benchSuite("buck and boost", {
  "buck ccm": { spec: buck, mode: "continuous", bench: buckBench },
  "buck dcm": { spec: { ...buck, iout: 1, rectifier: "diode" }, mode: "discontinuous", bench: buckBench },
  "buck ccm η 0.9": { spec: { ...buck, efficiency: ETA }, mode: "continuous", bench: buckBench, position: atEtaVin },
  "boost ccm": { spec: boost, mode: "continuous", bench: boostBench },
  "boost dcm": { spec: { ...boost, iout: 0.2, rectifier: "diode" }, mode: "discontinuous", bench: boostBench },
});
