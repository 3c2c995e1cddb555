// The edge decks' numerical settings do not move the results: two edges
// rerun with a third of the time step and reltol 1.1e-5 instead of 1e-4
// (simulation/switchingRun.ts, `tighten: 3`). Run over every reference
// edge during development, the largest moves were 1.7 % for di/dt max (the
// 650 V turn-on at 1 A, 4.7 Ω, 0 V, 10 nH: its sub-nanosecond current
// edge) and at most 0.7 % for everything else. Here that worst edge and a
// slow one, to keep the suite short.
import { describe, expect, it } from "vitest";
import { SJ_650V, TRENCH_60V } from "@/simulation/mosfetCards";
import { findCase } from "@/simulation/switchingCases";
import { runEdge } from "@/simulation/switchingRun";
import type { EdgeFigures } from "@/simulation/switchingEdge";

const EDGES = [
  { label: "650 V at 1 A, 4.7 Ω, 0 V, 10 nH turn-on", c: findCase(SJ_650V, { iLoad: 1, rGate: 4.7, vLow: 0, lLoop: 10e-9 }), edge: "on" as const },
  { label: "60 V, 15 Ω, 0 V, no loop inductance, turn-off", c: findCase(TRENCH_60V, { iLoad: 10, rGate: 15, vLow: 0, lLoop: 0 }), edge: "off" as const },
];

const FIGURES = ["delayCurrent", "delayVoltage", "tCurrent", "tVoltage", "didtMax", "dvdtMax", "igPeak", "igPlateau", "vdsOvershoot"] as const;

describe("convergence of the edge decks", () => {
  it.each(EDGES)("$label: times, slopes, gate currents and energies move by under 1 % (di/dt max 2 %) with tighter tolerances", async ({ c, edge }) => {
    const [a, b]: EdgeFigures[] = await Promise.all([runEdge(c.circuit, edge), runEdge(c.circuit, edge, { tighten: 3 })]);
    for (const k of FIGURES) expect(Math.abs(b[k] / a[k] - 1), k).toBeLessThan(k === "didtMax" ? 0.02 : 0.01);
    for (const k of ["terminal", "channel", "bus", "diode"] as const) {
      // The channel energy of the light-load turn-off is almost nothing; compare it to the terminal energy.
      const scale = k === "channel" ? a.energy.terminal : a.energy[k];
      expect(Math.abs(b.energy[k] - a.energy[k]) / scale, k).toBeLessThan(0.01);
    }
  }, 60_000);
});
