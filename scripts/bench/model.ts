// Model speed: evaluations per second of each demo option, a 200×200 sweep,
// 1,000 Monte Carlo samples, and ngspice on the same gate network for scale.
// `node --import tsx scripts/bench/model.ts` (exits 1 when a target is missed),
// or through scripts/bench/index.ts (`npm run bench`).
// Timings are medians of warmed-up runs (the first run of a fresh process also
// pays for JIT compilation; it is printed as "cold" but not judged). The targets
// are judged on this process's CPU time ("on one core": the model is single-
// threaded), which other load on the machine inflates far less than wall time;
// both are printed.
import { demoOptions } from "../../models/demo";
import { parseDesign, type Design } from "../../models/input/schema";
import { evaluateDesign } from "../../models/evaluate";
import { sweepGrid, type SweepSpec } from "../../models/sweep";
import { monteCarlo } from "../../models/spread";
import { findNgspice, runNgspice } from "../../simulation/ngspice";
import { splitNetlist, type GateNetwork } from "../../tests/spice/netlists";
import { curveLoad } from "../../tests/spice/fromModel";

const SWEEP_TARGET_MS = 100;
const MC_TARGET_MS = 200;
const MC_SAMPLES = 1000;
const RUNS = 7;

const SWEEP: SweepSpec = {
  part: "controller",
  x: { axis: "fsw", from: 50e3, to: 1e6, steps: 200, scale: "log" },
  y: { axis: "qgScale", from: 0.25, to: 4, steps: 200, position: "Q1" },
};

function design(key: string): Design {
  const opt = demoOptions.find((o) => o.key === key);
  const r = opt && parseDesign(opt.input);
  if (!r || !r.ok) throw new Error(`demo option ${key} does not parse`);
  return r.design;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
}

function timeRuns(fn: () => void, runs: number): { cold: number; wall: number; cpu: number } {
  const t = (): [number, number] => {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    const c = process.cpuUsage(c0);
    return [performance.now() - t0, (c.user + c.system) / 1000];
  };
  const cold = t()[0];
  const all = Array.from({ length: runs }, t);
  return { cold, wall: median(all.map((x) => x[0])), cpu: median(all.map((x) => x[1])) };
}

function evalsPerSecond(d: Design): number {
  for (let i = 0; i < 20; i++) evaluateDesign(d);
  let n = 0;
  const t0 = performance.now();
  while (performance.now() - t0 < 300) {
    evaluateDesign(d);
    n++;
  }
  return (n * 1000) / (performance.now() - t0);
}

/** Q1 gate network of the driver-IC option (the split netlist of tests/spice/split.test.ts). */
function splitNetworkOf(d: Design): GateNetwork {
  const q1 = d.positions[0];
  if (q1.drive.kind !== "driver-ic") throw new Error("option 3 is expected to use a driver IC");
  const m = q1.mosfet;
  return {
    vHigh: q1.drive.supply ?? d.controller.vcc, vLow: q1.drive.vNeg, rSource: q1.drive.sourceResistance, rSink: q1.drive.sinkResistance,
    rExtOn: q1.gate.rTurnOn, rExtOff: q1.gate.rTurnOff ?? q1.gate.rTurnOn, rgInt: m.rgInt,
    gate: curveLoad({ qgs: m.qgs, qgd: m.qgd, qg: m.qg, qgVgs: m.qgVgs, vth: m.vth, vpl: m.vpl, ciss: m.ciss }),
  };
}

const fmt = (x: number, d = 1) => x.toFixed(d);
const timing = (s: { cold: number; wall: number; cpu: number }) =>
  `median cpu ${fmt(s.cpu).padStart(6)} ms, wall ${fmt(s.wall).padStart(6)} ms (cold wall ${fmt(s.cold)} ms)`;
const verdict = (ok: boolean) => (ok ? "PASS" : "FAIL");

export async function runModelBench(): Promise<{ ok: boolean; lines: string[] }> {
  const lines: string[] = [];
  let ok = true;
  const evalUs: Record<string, number> = {};
  for (const opt of demoOptions) {
    const rate = evalsPerSecond(design(opt.key));
    evalUs[opt.key] = 1e6 / rate;
    lines.push(`evaluateDesign ${opt.key.padEnd(15)} ${fmt(rate, 0).padStart(7)} evaluations/s (${design(opt.key).corners.length} corners each)`);
  }
  for (const opt of demoOptions) {
    const d = design(opt.key);
    const s = timeRuns(() => sweepGrid(d, SWEEP), RUNS);
    const pass = s.cpu < SWEEP_TARGET_MS;
    ok &&= pass;
    lines.push(`sweep 200×200 ${opt.key.padEnd(15)} ${timing(s)}  target < ${SWEEP_TARGET_MS} ms  ${verdict(pass)}`);
  }
  for (const opt of demoOptions) {
    const d = design(opt.key);
    const s = timeRuns(() => monteCarlo(d, { samples: MC_SAMPLES, seed: 1 }), 5);
    const pass = s.cpu < MC_TARGET_MS;
    ok &&= pass;
    lines.push(`monteCarlo ${MC_SAMPLES} ${opt.key.padEnd(15)} ${timing(s)}  target < ${MC_TARGET_MS} ms  ${verdict(pass)}`);
  }
  if (!findNgspice()) {
    lines.push("ngspice: not installed, model-vs-ngspice ratio skipped (install the Debian package ngspice)");
  } else {
    const d = design("driver-ic");
    const { netlist } = splitNetlist(splitNetworkOf(d));
    const walls: number[] = [];
    for (let i = 0; i < 3; i++) walls.push((await runNgspice(netlist)).wallMs);
    const spiceMs = median(walls);
    const modelMs = evalUs["driver-ic"] / 1000 / d.corners.length;
    lines.push(
      `ngspice one switching cycle of Q1's gate network (driver-ic): ${fmt(spiceMs)} ms wall; ` +
        `model one corner of the whole design: ${fmt(modelMs * 1000)} µs -> model ${fmt(spiceMs / modelMs, 0)}× faster`,
    );
  }
  return { ok, lines };
}

if (require.main === module) {
  runModelBench().then(
    (r) => {
      for (const l of r.lines) console.log(l);
      process.exit(r.ok ? 0 : 1);
    },
    (err: unknown) => {
      console.error(err);
      process.exit(1);
    },
  );
}
