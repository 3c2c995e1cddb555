// Runs both hard-switched edges of a clamped inductive load and sums them
// into the switch heat per cycle.
//
// Window: each edge runs for WINDOW_TAUS gate time constants (external +
// internal Rg times Cgs + Cgdmax of the card: the largest input capacitance
// the gate sees), plus the time the load current needs to carry the card's
// Coss charge across the bus, plus LOOP_SETTLE for the damped loop ringing.
// That is generous on purpose: the energies have the conduction taken off
// and stop growing once the edge is over (`windowSensitivity`). Time step:
// at most 1/WINDOW_STEPS of the window and 100 ps; when the run shows a
// 10-90 % edge shorter than EDGE_STEPS such steps, it is rerun with steps
// of 1/EDGE_STEPS of that edge (the sub-nanosecond current edges, whose
// di/dt max needs them). Tolerances: reltol 1e-4 (ngspice's default is
// 1e-3), abstol 10 nA, Gear integration (the trapezoidal rule rings at the
// step where the diode clamps). `tighten: k` divides the step by k and
// reltol by k², for the convergence check (tests/spice/reference-convergence).
import type { ClampedCircuit } from "./switchingDeck";
import { WAVE_FILE, clampedEdgeDeck, storedEnergyDeck } from "./switchingDeck";
import { measureEdge, type EdgeFigures } from "./switchingEdge";
import { runNgspice, valueOf } from "./ngspice";

const WINDOW_TAUS = 5;
const LOOP_SETTLE = 150e-9;
const WINDOW_STEPS = 12_000;
const MAX_STEP = 100e-12;
const EDGE_STEPS = 40;
const RELTOL = 1e-4;

export interface CycleFigures {
  on: EdgeFigures;
  off: EdgeFigures;
  /** Switch heat per cycle excluding conduction: the terminal energies of both edges (Coss storage nets out). */
  switchHeat: number;
  /** The same from the channel energies. */
  channelHeat: number;
  /** Energy in the switch's capacitances fully on (Vds ≈ 0, Vgs = V+) and off (Vds = bus, Vgs = V−), J. */
  storedOn: number;
  storedOff: number;
  /** Coss energy at the bus voltage with the gate held at V− (Eoss itself when V− = 0), J. */
  eossAtVLow: number;
  /**
   * Energy balance of the switch per edge, relative to what entered it:
   * (terminal + gate port − channel − internal resistors − change of stored
   * energy) / the larger of (terminal + |gate port|) and channel, all raw
   * over the window. The stored energies come from a separate slow-ramp
   * deck, so this ties the channel current, the terminal probes and the
   * capacitances together.
   */
  deviceBalance: { on: number; off: number };
}

export interface EdgeOptions {
  /** Tightening for the convergence check: the time step divided by it, reltol by its square (1: as used). */
  tighten?: number;
}

export function edgeWindow(c: ClampedCircuit): number {
  const p = c.card.params;
  const tau = (c.rGate + (p.rg ?? 0)) * ((p.cgs ?? 0) + (p.cgdmax ?? 0));
  return WINDOW_TAUS * tau + junctionCharge(c) / c.iLoad + (c.lLoop > 0 ? LOOP_SETTLE : 0);
}

/** Body-diode junction charge at the bus voltage (depletion formula, M ≠ 1; ngspice defaults M 0.5, Vj 0.8 V) plus Cgdmin·Vbus, C: about the Coss charge. */
function junctionCharge(c: ClampedCircuit): number {
  const p = c.card.params;
  const m = p.m ?? 0.5;
  const vj = p.vj ?? 0.8;
  const qj = ((p.cjo ?? 0) * vj * ((1 + c.vBus / vj) ** (1 - m) - 1)) / (1 - m);
  return qj + (p.cgdmin ?? 0) * c.vBus;
}

export async function runEdge(c: ClampedCircuit, edge: "on" | "off", o: EdgeOptions = {}): Promise<EdgeFigures> {
  const k = o.tighten ?? 1;
  const window = edgeWindow(c);
  const once = async (tMax: number) => {
    const r = await runNgspice(clampedEdgeDeck(c, { edge, window, tMax: tMax / k, reltol: RELTOL / k ** 2 }), { files: [WAVE_FILE], timeoutMs: 60_000 });
    return measureEdge(r.files[WAVE_FILE], c, edge, window);
  };
  const coarse = Math.min(window / WINDOW_STEPS, MAX_STEP);
  const first = await once(coarse);
  const fine = Math.min(first.tCurrent, first.tVoltage) / EDGE_STEPS;
  return fine < coarse ? once(fine) : first;
}

export async function runCycle(c: ClampedCircuit, o: EdgeOptions = {}): Promise<CycleFigures> {
  const [on, off, st] = await Promise.all([
    runEdge(c, "on", o),
    runEdge(c, "off", o),
    runNgspice(storedEnergyDeck(c.card, { vHigh: c.vHigh, vLow: c.vLow, vBus: c.vBus })),
  ]);
  const storedOn = valueOf(st, "e_on_state");
  const storedOff = valueOf(st, "e_off_state");
  const balance = (e: EdgeFigures, change: number) => {
    const x = e.energy;
    return (x.terminalRaw + x.gatePort - x.channelRaw - x.internalResistors - change) / Math.max(x.terminalRaw + Math.abs(x.gatePort), x.channelRaw);
  };
  return {
    on, off,
    switchHeat: on.energy.terminal + off.energy.terminal,
    channelHeat: on.energy.channel + off.energy.channel,
    storedOn, storedOff,
    eossAtVLow: storedOff - valueOf(st, "e_off_gate"),
    deviceBalance: { on: balance(on, storedOn - storedOff), off: balance(off, storedOff - storedOn) },
  };
}

/** Runs the cycle of every item, at most `parallel` at a time (each cycle already starts three ngspice processes). */
export async function runAllCycles<T extends { circuit: ClampedCircuit }>(items: T[], parallel = 2): Promise<Map<T, CycleFigures>> {
  const out = new Map<T, CycleFigures>();
  let next = 0;
  const worker = async () => {
    while (next < items.length) {
      const item = items[next++];
      out.set(item, await runCycle(item.circuit));
    }
  };
  await Promise.all(Array.from({ length: Math.min(parallel, items.length) }, worker));
  return out;
}
