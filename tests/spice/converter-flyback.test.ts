// Flyback operating point: the calculator against an ngspice transient of an
// ideal-switch flyback (switches with Ron = 1 mΩ, steep diodes, coupled
// inductors with K = 0.99999 and a clamp diode to a fixed rail that takes the
// tiny leakage energy), run to periodic steady state from Vout at its spec
// value and the magnetizing current at its computed valley. The primary is
// driven open loop with the calculator's duty, so the output voltage the
// simulation settles at checks the duty; every other figure is measured
// with `meas` over the last period (converterBench.ts).
import type { ConverterSpec, OperatingPoint } from "@/models/converter/types";
import { sp } from "@/simulation/ngspice";
import { diodePos, gate, mosfet } from "./converterDeck";
import { benchSuite, type Bench } from "./converterBench";

/** Secondary dot arranged so the rectifier blocks while Q1 conducts; current-sink load with an RC damper. */
function bench(spec: ConverterSpec, p: OperatingPoint): Bench {
  const T = 1 / p.fsw;
  const n = spec.turnsRatio!;
  const lm = spec.magnetizingInductance!;
  const [t1, t2] = spec.deadTimes ?? [0, 0];
  const sync = spec.rectifier === "synchronous";
  const tOn = p.duty * T;
  return {
    title: "flyback",
    periods: 200,
    circuit: [
      `Vin in 0 DC ${sp(spec.vin)}`,
      // Start at Q1's turn-on in the calculator's periodic state: magnetizing current at its valley.
      `Lp in dp ${sp(lm)} IC=${sp(p.inductors[0].valley)}`,
      `Ls 0 sa ${sp(lm / (n * n))}`,
      "K1 Lp Ls 0.99999",
      mosfet("q1", "dp", "0", "g1"),
      gate("g1", "g1", 0, tOn, T),
      "Dcl dp cl DI",
      `Vcl cl 0 DC ${sp(1.5 * (spec.vin + n * spec.vout))}`,
      sync ? [mosfet("sr1", "out", "sa", "gsr"), gate("gsr", "gsr", tOn + t1, T - t2, T)].join("\n") : diodePos("d1", "sa", "out"),
      `Cout out 0 200u IC=${sp(spec.vout)}`,
      `Cd out dmp 1m IC=${sp(spec.vout)}`,
      "Rd dmp 0 0.15",
      `Iload out 0 DC ${sp(spec.iout)}`,
    ],
    probes: {
      Q1: { current: "i(viq1)", body: "i(vbq1)", vds: "v(dp)" },
      SR1: { current: "-i(visr1)", body: "i(vbsr1)", vds: "v(out)-v(sa)" },
      D1: { current: "i(vid1)", vds: "v(out)-v(sa)" },
    },
    vout: "v(out)",
    iin: "-i(vin)",
  };
}

// 24 V (CCM, synchronous, dead times 100 ns / 50 ns) and 36 V at 2 A (DCM, diode),
// 36 V at 6 A in boundary mode; all 5 V out, 100 kHz, Np:Ns = 2, Lm = 10 µH.
const base: ConverterSpec = {
  topology: "flyback", vin: 24, vout: 5, iout: 6, fsw: 100e3, efficiency: 1, turnsRatio: 2,
  magnetizingInductance: 10e-6, rectifier: "synchronous", deadTimes: [100e-9, 50e-9], mode: "auto",
};
// Boundary: the rectifier current reaches zero just as Q1 turns on, so a sample a hair
// before turn-on sits on the collapsing edge of Vds: not compared there.
const onEdge = () => ({ opts: { skipTurnOnVds: true } });

benchSuite("flyback", {
  ccm: { spec: base, mode: "continuous", bench },
  dcm: { spec: { ...base, vin: 36, iout: 2, rectifier: "diode" }, mode: "discontinuous", bench },
  bcm: { spec: { ...base, vin: 36, rectifier: "diode", mode: "boundary" }, mode: "boundary", bench, position: onEdge },
});
