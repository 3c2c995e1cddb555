// Forward operating points (reset winding and active clamp): the calculator
// against ngspice transients of ideal-switch forward converters (switches
// with Ron = 1 mΩ, steep diodes, windings coupled with K = 0.99999), driven
// open loop with the calculator's duty and measured in the last period
// (converterBench.ts).
import type { ConverterSpec, OperatingPoint } from "@/models/converter/types";
import { sp } from "@/simulation/ngspice";
import { diodePos, gate, mosfet } from "./converterDeck";
import { benchSuite, type Bench } from "./converterBench";

const K = "0.999999";

/** Secondary: forward and freewheeling rectifiers, output inductor, output with an RC damper, current-sink load. */
function secondary(spec: ConverterSpec, T: number, tOn: number, sr1: [number, number], loStart = spec.iout): string[] {
  const [t1, t2] = spec.deadTimes ?? [0, 0];
  const lo = spec.filterInductance!;
  const rect =
    spec.rectifier === "synchronous"
      ? [mosfet("sr1", "x", "s1", "gs1"), gate("gs1", "gs1", sr1[0], sr1[1], T), mosfet("sr2", "x", "0", "gs2"), gate("gs2", "gs2", tOn + t1, T - t2, T)]
      : [diodePos("d1", "s1", "x"), diodePos("d2", "0", "x")];
  return [
    ...rect,
    `Lo x out ${sp(lo)} IC=${sp(loStart)}`,
    `Cout out 0 200u IC=${sp(spec.vout)}`,
    `Cd out dmp 1m IC=${sp(spec.vout)}`,
    `Rd dmp 0 ${sp(Math.sqrt(lo / 200e-6))}`,
    `Iload out 0 DC ${sp(spec.iout)}`,
  ];
}

const probes = {
  Q1: { current: "i(viq1)", body: "i(vbq1)", vds: "v(dp)" },
  SR1: { current: "-i(visr1)", body: "i(vbsr1)", vds: "v(x)-v(s1)" },
  SR2: { current: "-i(visr2)", body: "i(vbsr2)", vds: "v(x)" },
  D1: { current: "i(vid1)", vds: "v(x)-v(s1)" },
  D2: { current: "i(vid2)", vds: "v(x)" },
};

/** Reset winding dotted so that it blocks while Q1 conducts and returns the magnetizing current to Vin through D3. */
function resetBench(spec: ConverterSpec, p: OperatingPoint): Bench {
  const T = 1 / p.fsw;
  const n = spec.turnsRatio!;
  const a = spec.resetTurnsRatio ?? 1;
  const lm = spec.magnetizingInductance!;
  const [t1, t2] = spec.deadTimes ?? [0, 0];
  const tOn = p.duty * T;
  return {
    title: "forward with reset winding",
    periods: 200,
    circuit: [
      `Vin in 0 DC ${sp(spec.vin)}`,
      `Lp in dp ${sp(lm)}`,
      `Lr r in ${sp(lm / (a * a))}`,
      `Ls s1 0 ${sp(lm / (n * n))}`,
      `K1 Lp Lr ${K}`, `K2 Lp Ls ${K}`, `K3 Lr Ls ${K}`,
      mosfet("q1", "dp", "0", "g1"),
      gate("g1", "g1", 0, tOn, T),
      diodePos("d3", "0", "r"),
      "Dcl dp cl DI",
      `Vcl cl 0 DC ${sp(1.5 * spec.vin * (1 + a))}`,
      ...secondary(spec, T, tOn, [t1, tOn - t2], loValley(p)),
    ],
    probes: { ...probes, D3: { current: "i(vid3)", vds: "v(r)" } },
    vout: "v(out)",
    iin: "-i(vin)",
  };
}

/** The output inductor current at Q1's turn-on, from the calculator: the run starts in its periodic state. */
const loValley = (p: OperatingPoint) => p.inductors.find((l) => l.name === "Lo")!.valley;

/**
 * High-side clamp: Cc from Vin to node c, Q2 from c (drain) to Q1's drain.
 * The clamp capacitor and Lm barely damp each other, so the run starts from
 * the periodic state at Q1's turn-on (Vc = Vin·D·Ts/(Ts − D·Ts − t2);
 * magnetizing current −ΔIm/2 with ΔIm = Vin·D·Ts/Lm; output inductor at the
 * calculator's valley, carried by the forward rectifier); the steady-state
 * checks on Vc and Vout would catch a start that is not periodic.
 */
function clampBench(spec: ConverterSpec, p: OperatingPoint): Bench {
  const T = 1 / p.fsw;
  const n = spec.turnsRatio!;
  const lm = spec.magnetizingInductance!;
  const [t1, t2] = spec.deadTimes ?? [0, 0];
  const tOn = p.duty * T;
  const vc = (spec.vin * tOn) / (T - tOn - t2);
  const dIm = (spec.vin * tOn) / lm;
  const valley = loValley(p);
  return {
    title: "active-clamp forward",
    periods: 200,
    circuit: [
      `Vin in 0 DC ${sp(spec.vin)}`,
      // Winding currents at t = 0: primary valley/n − ΔIm/2, secondary −valley (out of its dot into the rectifier).
      `Lp in dp ${sp(lm)} IC=${sp(valley / n - dIm / 2)}`,
      `Ls s1 0 ${sp(lm / (n * n))} IC=${sp(-valley)}`,
      `K1 Lp Ls ${K}`,
      mosfet("q1", "dp", "0", "g1"),
      gate("g1", "g1", 0, tOn, T),
      `Cc c in 2.2u IC=${sp(vc)}`,
      mosfet("q2", "c", "dp", "g2"),
      gate("g2", "g2", tOn + t1, T - t2, T),
      // SR1 conducts from T − t2 (it carries n·ΔIm/2 while both primaries are off); gate t1 later.
      ...secondary(spec, T, tOn, [T - t2 + t1, tOn - t2], valley),
    ],
    probes: { ...probes, Q2: { current: "i(viq2)", body: "i(vbq2)", vds: "v(c)-v(dp)" } },
    vout: "v(out)",
    iin: "-i(vin)",
    steady: { vclamp: "v(c)-v(in)" },
  };
}

// 48 V → 12 V / 10 A: reset winding at 200 kHz, Np:Ns = 1.5, Np:Nr = 1, Lm 400 µH,
// Lo 10 µH; active clamp at 250 kHz, Lm 150 µH, Lo 6.8 µH, dead times 60 ns / 60 ns.
const reset: ConverterSpec = {
  topology: "forward", forwardReset: "reset-winding", vin: 48, vout: 12, iout: 10, fsw: 200e3, efficiency: 1,
  turnsRatio: 1.5, resetTurnsRatio: 1, magnetizingInductance: 400e-6, filterInductance: 10e-6,
  rectifier: "synchronous", deadTimes: [60e-9, 60e-9], mode: "auto",
};
const clamp: ConverterSpec = {
  ...reset, forwardReset: "active-clamp", fsw: 250e3, magnetizingInductance: 150e-6, filterInductance: 6.8e-6,
};
benchSuite("forward", {
  "reset winding ccm": { spec: reset, mode: "continuous", bench: resetBench },
  "reset winding dcm": { spec: { ...reset, iout: 1, rectifier: "diode" }, mode: "discontinuous", bench: resetBench },
  "active clamp ccm": { spec: clamp, mode: "continuous", bench: clampBench },
  "active clamp, diodes": { spec: { ...clamp, rectifier: "diode" }, mode: "continuous", bench: clampBench },
});
