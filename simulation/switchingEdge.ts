// Measurements of one simulated edge (switchingDeck.ts), in SI.
//
// Times are from the gate command (the middle of the drive source's edge).
// Turn-on: the current rises first, then the voltage falls; turn-off the
// reverse. Levels are fractions of the load current and of the bus voltage:
//  - delay to the current: to 10 % of the current change (Id = 10 % of the
//    load at turn-on, 90 % at turn-off); to the voltage: to 10 % of the
//    voltage change (Vds = 90 % of the bus at turn-on, 10 % at turn-off).
//    With loop inductance the turn-on Vds steps down by L·di/dt during the
//    current rise, so its 90 % crossing can come before the voltage edge
//    proper; it is reported as measured, as a bench would;
//  - rise and fall times 10-90 %, and the full-swing equivalent (/0.8);
//  - di/dt and dv/dt: the largest slope over any tenth of the 10-90 % time
//    within the 10-90 % interval (a chord, so a kink such as the current
//    collapsing when the diode clamps does not read as the time step's
//    resolution), and the 10-90 % average;
//  - gate current: the largest |Ig| in the window, and |Ig| on the plateau,
//    read when Vds crosses 50 % of the bus.
// Energies are integrals over one window, from the drive edge to the end of
// the run (set by the caller long enough for the gate to settle and loop
// ringing to decay; `windowSensitivity` is the relative change of the
// terminal energy when the window is cut to 80 %, which the tests hold
// below 1 %):
//  - terminal: ∫ (Vds·Id − Ron·Id²) dt with Id at the drain terminal (the
//    sense resistor) and Ron = Vds/Id of the conducting state (before a
//    turn-off, after a turn-on); the subtracted Ron·Id² is the conduction
//    the switch would have had fully on (`conduction`), so the figure is the
//    switching loss alone and does not grow with the window;
//  - channel: the same with ngspice's VDMOS channel current @m1[id] and
//    the internal drain-source voltage @m1[vds] (behind Rd and Rs): it
//    leaves out the capacitive currents, so at turn-on it includes the Eoss
//    the switch discharges into its own channel, and at turn-off it leaves
//    out the energy the load current puts into Coss;
//  - the bookkeeping terms of every element, raw (no conduction taken off):
//    bus, load (what the current source standing for the inductor absorbs),
//    freewheel diode, loop (inductance and damping), sense resistor,
//    common-source inductance, gate port of the switch, drive source and gate
//    resistor, and the card's internal Rg, Rd, Rs. Sources deliver what the elements absorb (Tellegen's
//    theorem); `balance` is the relative mismatch, a probe or sign error shows there.
import { COMMAND_TIME, PULSE_DELAY, SENSE_RESISTANCE, WAVE_COLUMNS, type ClampedCircuit } from "./switchingDeck";
import { crossing, integrate, maxOver, maxSlope, parseWrdata, valueAt, type Waveform } from "./waveform";

export interface EdgeEnergies {
  terminal: number;
  channel: number;
  conduction: number;
  terminalRaw: number;
  channelRaw: number;
  bus: number;
  load: number;
  diode: number;
  loop: number;
  sense: number;
  commonSource: number;
  gatePort: number;
  drive: number;
  gateResistor: number;
  /** Heat in the card's own Rg, Rd and Rs, from the terminal currents. */
  internalResistors: number;
}

export interface EdgeFigures {
  edge: "on" | "off";
  delayCurrent: number;
  delayVoltage: number;
  tCurrent: number;
  tCurrentFull: number;
  tVoltage: number;
  tVoltageFull: number;
  didtMax: number;
  didtAvg: number;
  dvdtMax: number;
  dvdtAvg: number;
  igPeak: number;
  igPlateau: number;
  /** Largest Vds in the window minus the bus voltage. */
  vdsOvershoot: number;
  /** Turn-on: bus minus Vds when the current is half way (the L·di/dt step); 0 at turn-off. */
  vdsDip: number;
  energy: EdgeEnergies;
  /** Relative mismatch of the energy bookkeeping (sources against elements). */
  balance: number;
  windowSensitivity: number;
  window: number;
}

export function measureEdge(text: string, c: ClampedCircuit, edge: "on" | "off", window: number): EdgeFigures {
  const w = parseWrdata(text, WAVE_COLUMNS);
  const { t } = w;
  const col = (n: (typeof WAVE_COLUMNS)[number]) => w.cols[n];
  const [vds, id, ig] = [col("vds"), col("id"), col("ig")];
  const tc = COMMAND_TIME;
  const tEnd = t[t.length - 1];
  const on = edge === "on";
  const I = c.iLoad;
  const V = c.vBus;
  const ti10 = crossing(t, id, on ? 0.1 * I : 0.9 * I, on ? "up" : "down", tc);
  const ti90 = crossing(t, id, on ? 0.9 * I : 0.1 * I, on ? "up" : "down", tc);
  const tv10 = crossing(t, vds, on ? 0.9 * V : 0.1 * V, on ? "down" : "up", tc);
  const tv90 = crossing(t, vds, on ? 0.1 * V : 0.9 * V, on ? "down" : "up", tc);
  const tv50 = crossing(t, vds, 0.5 * V, on ? "down" : "up", tc);
  const ti50 = crossing(t, id, 0.5 * I, on ? "up" : "down", tc);
  const tCurrent = ti90 - ti10;
  const tVoltage = tv90 - tv10;
  const energy = energies(w, c, on, tEnd);
  const shorter = energies(w, c, on, tc + 0.8 * (tEnd - tc)).terminal;
  const sources = energy.bus + energy.drive;
  const sinks = energy.load + energy.terminalRaw + energy.gatePort + energy.diode + energy.loop + energy.sense + energy.commonSource + energy.gateResistor;
  const figures: EdgeFigures = {
    edge,
    delayCurrent: ti10 - tc,
    delayVoltage: tv10 - tc,
    tCurrent,
    tCurrentFull: tCurrent / 0.8,
    tVoltage,
    tVoltageFull: tVoltage / 0.8,
    didtMax: maxSlope(t, id, Math.min(ti10, ti90) - 0.1 * tCurrent, Math.max(ti10, ti90), 0.1 * tCurrent),
    didtAvg: (0.8 * I) / tCurrent,
    dvdtMax: maxSlope(t, vds, Math.min(tv10, tv90) - 0.1 * tVoltage, Math.max(tv10, tv90), 0.1 * tVoltage),
    dvdtAvg: (0.8 * V) / tVoltage,
    igPeak: maxOver(t, (i) => Math.abs(ig[i]), tc, tEnd),
    igPlateau: Math.abs(valueAt(t, ig, tv50)),
    vdsOvershoot: maxOver(t, (i) => vds[i], tc, tEnd) - V,
    vdsDip: on ? V - valueAt(t, vds, ti50) : 0,
    energy,
    balance: (sources - sinks) / Math.max(Math.abs(sources), Math.abs(sinks)),
    windowSensitivity: Math.abs(shorter / energy.terminal - 1),
    window,
  };
  const missing = Object.entries(figures).find(([, v]) => typeof v === "number" && !Number.isFinite(v));
  if (missing) throw new Error(`turn-${edge} of ${c.card.name}: ${missing[0]} not found (the window may be too short)`);
  return figures;
}

function energies(w: Waveform, c: ClampedCircuit, on: boolean, b: number): EdgeEnergies {
  const { t, cols } = w;
  const [vds, id, ich, vdsi, vgs, ig, ibus, vbi, vsw, vsrc, vdrv] = [
    cols.vds, cols.id, cols.ich, cols.vdsi, cols.vgs, cols.ig, cols.ibus, cols.vbi, cols.vsw, cols.vsrc, cols.vdrv,
  ];
  // Conducting state: the first sample before a turn-off, the last one after a turn-on.
  const k = on ? t.length - 1 : 0;
  const ronT = vds[k] / id[k];
  const ronC = vdsi[k] / ich[k];
  const a = PULSE_DELAY;
  const I = c.iLoad;
  const p = c.card.params;
  const int = (f: (i: number) => number) => integrate(t, f, a, b);
  const terminalRaw = int((i) => vds[i] * id[i]);
  const channelRaw = int((i) => vdsi[i] * ich[i]);
  const conduction = int((i) => ronT * id[i] * id[i]);
  return {
    terminal: terminalRaw - conduction,
    channel: channelRaw - int((i) => ronC * ich[i] * ich[i]),
    conduction,
    terminalRaw,
    channelRaw,
    bus: int((i) => c.vBus * ibus[i]),
    load: int((i) => (vbi[i] - vsw[i]) * I),
    diode: int((i) => (vsw[i] - vbi[i]) * (I - id[i])),
    loop: int((i) => (c.vBus - vbi[i]) * ibus[i]),
    sense: int((i) => id[i] * id[i] * SENSE_RESISTANCE),
    commonSource: int((i) => vsrc[i] * (id[i] + ig[i])),
    gatePort: int((i) => vgs[i] * ig[i]),
    drive: int((i) => vdrv[i] * ig[i]),
    gateResistor: int((i) => ig[i] * ig[i] * c.rGate),
    internalResistors: int((i) => ig[i] * ig[i] * (p.rg ?? 0) + ich[i] * ich[i] * ((p.rd ?? 0) + (p.rs ?? 0))),
  };
}
