// Half- and full-bridge operating points: the calculator against ngspice
// transients of ideal-switch bridges (switches with Ron = 1 mΩ and body
// diodes, steep diodes, a transformer of three windings coupled with
// K = 0.999999 and a magnetizing inductance large against the load,
// centre-tapped secondary),
// driven open loop with the calculator's duty from its periodic state and
// measured in the last period (converterBench.ts).
import type { ConverterSpec, OperatingPoint, PositionFigures } from "@/models/converter/types";
import { sp } from "@/simulation/ngspice";
import { diodePos, gate, mosfet } from "./converterDeck";
import { benchSuite, type Bench } from "./converterBench";

const K = "0.9999999";

/**
 * Magnetizing inductance large against the load, as the calculator assumes
 * (it neglects the magnetizing current): its swing over one power interval
 * is held to 1 % of the peak load current reflected to the primary.
 */
function magnetizing(p: OperatingPoint, vPrimary: number, n: number): number {
  return (vPrimary * p.duty) / p.fsw / (0.002 * (p.inductors[0].peak / n));
}

/** Primary winding from node a (dot) to node b; the switches around it depend on the bridge. */
function bench(spec: ConverterSpec, p: OperatingPoint, full: boolean): Bench {
  const T = 1 / p.fsw;
  const n = spec.turnsRatio!;
  const [t1, t2] = spec.deadTimes ?? [0, 0];
  const tOn = p.duty * T;
  const half = T / 2;
  const sync = spec.rectifier === "synchronous";
  const lo = spec.filterInductance!;
  const valley = p.inductors[0].valley;
  const vPrimary = full ? spec.vin : spec.vin / 2;
  const vSecondary = vPrimary / n;
  const leak = (v: number) => (1000 * v * v) / (spec.vout * spec.iout);
  const lm = magnetizing(p, vPrimary, n);
  // In DCM idle the simulated magnetizing current (which the calculator neglects) flows on
  // through a rectifier, n·ΔIm/2 at most: a diode counts as conducting above twice that.
  const faint = 2 * n * ((vPrimary * p.duty) / p.fsw / lm / 2);
  const primary = full
    ? [
        mosfet("q1", "in", "a", "g14"), mosfet("q2", "a", "0", "g23"), mosfet("q3", "in", "b", "g23"), mosfet("q4", "b", "0", "g14"),
        gate("g14", "g14", 0, tOn, T), gate("g23", "g23", half, half + tOn, T),
      ]
    : [
        mosfet("q1", "in", "a", "g1"), mosfet("q2", "a", "0", "g2"),
        gate("g1", "g1", 0, tOn, T), gate("g2", "g2", half, half + tOn, T),
        `C1 in b 100u IC=${sp(spec.vin / 2)}`, `C2 b 0 100u IC=${sp(spec.vin / 2)}`,
      ];
  const rect = sync
    ? [
        mosfet("sr1", "x", "s1", "gs1"), gate("gs1", "gs1", half + tOn + t1, half - t2, T),
        mosfet("sr2", "x", "s2", "gs2"), gate("gs2", "gs2", tOn + t1, T - t2, T),
      ]
    : [diodePos("d1", "s1", "x"), diodePos("d2", "s2", "x")];
  return {
    title: full ? "full bridge" : "half bridge",
    periods: 200,
    circuit: [
      `Vin in 0 DC ${sp(spec.vin)}`,
      ...primary,
      // Winding currents at the start of the first power interval: the load current
      // reflected on the primary, the first half carrying it out of its dot, the second none.
      `Lp a b ${sp(lm)} IC=${sp(valley / n)}`,
      `Ls1 s1 0 ${sp(lm / (n * n))} IC=${sp(-valley)}`,
      `Ls2 0 s2 ${sp(lm / (n * n))} IC=0`,
      `K1 Lp Ls1 ${K}`, `K2 Lp Ls2 ${K}`, `K3 Ls1 Ls2 ${K}`,
      // A path for the magnetizing current while every switch and rectifier is off (DCM idle),
      // which a real bridge has in its switches' capacitances, and resistors that keep the
      // secondary nodes from floating while both rectifiers block. Each is sized to burn
      // under 0.1 % of the output power at the voltage across it.
      `Rdamp a b ${sp(leak(vPrimary))}`,
      `Rs1 s1 0 ${sp(leak(2 * vSecondary))}`, `Rs2 s2 0 ${sp(leak(2 * vSecondary))}`, `Rx x 0 ${sp(leak(vSecondary))}`,
      ...rect,
      // Start at the first power interval in the calculator's periodic state.
      `Lo x out ${sp(lo)} IC=${sp(valley)}`,
      `Cout out 0 200u IC=${sp(spec.vout)}`,
      `Cd out dmp 1m IC=${sp(spec.vout)}`,
      `Rd dmp 0 ${sp(Math.sqrt(lo / 200e-6))}`,
      `Iload out 0 DC ${sp(spec.iout)}`,
    ],
    probes: {
      Q1: { current: "i(viq1)", body: "i(vbq1)", vds: "v(in)-v(a)" },
      Q2: { current: "i(viq2)", body: "i(vbq2)", vds: "v(a)" },
      Q3: { current: "i(viq3)", body: "i(vbq3)", vds: "v(in)-v(b)" },
      Q4: { current: "i(viq4)", body: "i(vbq4)", vds: "v(b)" },
      SR1: { current: "-i(visr1)", body: "i(vbsr1)", vds: "v(x)-v(s1)" },
      SR2: { current: "-i(visr2)", body: "i(vbsr2)", vds: "v(x)-v(s2)" },
      D1: { current: "i(vid1)", vds: "v(x)-v(s1)", dutyThreshold: faint },
      D2: { current: "i(vid2)", vds: "v(x)-v(s2)", dutyThreshold: faint },
    },
    vout: "v(out)",
    iin: "-i(vin)",
  };
}

// Half bridge 48 V → 5 V / 20 A, 200 kHz, Np:Ns = 3, Lo 2 µH, SRs with 30 ns / 30 ns (and diodes at 0.5 A);
// full bridge 400 V → 48 V, 100 kHz, Np:Ns = 3, Lo 47 µH, diodes, at 10 A and 1 A.
const hb: ConverterSpec = {
  topology: "half-bridge", vin: 48, vout: 5, iout: 20, fsw: 200e3, efficiency: 1, turnsRatio: 3,
  filterInductance: 2e-6, rectifier: "synchronous", deadTimes: [30e-9, 30e-9], mode: "auto",
};
const fb: ConverterSpec = {
  topology: "full-bridge", vin: 400, vout: 48, iout: 10, fsw: 100e3, efficiency: 1, turnsRatio: 3,
  filterInductance: 47e-6, rectifier: "diode", mode: "auto",
};
// DCM idle: with the magnetizing current neglected no device conducts and nothing sets
// the voltages (a real bridge rings around the calculator's Vin/2 and Vout on its
// capacitances); in the simulation the small magnetizing current flows on through a
// rectifier. So the voltages entering idle (primary Vds before turn-on, a rectifier's
// Vds after its zero-current turn-off) are not compared there.
const idle = (pos: PositionFigures) => ({
  opts: { skipTurnOnVds: pos.role === "primary", skipTurnOffVds: pos.role !== "primary" && pos.turnOff.zeroCurrent },
});
const halfBridge = (spec: ConverterSpec, p: OperatingPoint) => bench(spec, p, false);
const fullBridge = (spec: ConverterSpec, p: OperatingPoint) => bench(spec, p, true);

benchSuite("bridges", {
  "half bridge ccm": { spec: hb, mode: "continuous", bench: halfBridge },
  "half bridge dcm": { spec: { ...hb, iout: 0.5, rectifier: "diode" }, mode: "discontinuous", bench: halfBridge, position: idle },
  "full bridge ccm": { spec: fb, mode: "continuous", bench: fullBridge },
  "full bridge dcm": { spec: { ...fb, iout: 1 }, mode: "discontinuous", bench: fullBridge, position: idle },
});
