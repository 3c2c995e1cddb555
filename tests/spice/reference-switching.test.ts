// The hard-switching reference decks (simulation/switching*.ts) checked on
// their own terms, for every reference case: closed windows, energy
// bookkeeping, where Eoss goes, closed forms (V = L·di/dt; a capacitance-
// dominated voltage edge takes ΔQoss/I) and the trends a designer expects.
// Nothing here involves the Heatsplit model.
import { beforeAll, describe, expect, it } from "vitest";
import { SJ_650V, TRENCH_60V, type ReferencePart } from "@/simulation/mosfetCards";
import { curveIntegral } from "@/simulation/mosfetCurve";
import { extractSheet, type Datasheet } from "@/simulation/mosfetSheet";
import { SWITCHING_CASES, findCase, type SwitchingCase } from "@/simulation/switchingCases";
import { runAllCycles, type CycleFigures } from "@/simulation/switchingRun";

let results: Map<SwitchingCase, CycleFigures>;
const sheets = new Map<ReferencePart, Datasheet>();

beforeAll(async () => {
  for (const p of [TRENCH_60V, SJ_650V]) sheets.set(p, await extractSheet(p));
  results = await runAllCycles(SWITCHING_CASES);
}, 240_000);

const of = (c: SwitchingCase) => results.get(c)!;
const get = (part: ReferencePart, o: Parameters<typeof findCase>[1]) => of(findCase(part, o));
const eossAtBus = (c: SwitchingCase) => {
  const s = sheets.get(c.part)!;
  expect(s.eoss.vds).toBe(c.circuit.vBus);
  return s.eoss.e;
};
const LOADS = [
  { part: TRENCH_60V, iLoad: 10 },
  { part: SJ_650V, iLoad: 5 },
  { part: SJ_650V, iLoad: 1 },
];
const DRIVES = [0, -5].flatMap((vLow) => [0, 10e-9].map((lLoop) => ({ vLow, lLoop })));

describe.each(SWITCHING_CASES.map((c) => [c.id, c] as const))("%s", (_, c) => {
  it("windows close and the energy bookkeeping holds", () => {
    const r = of(c);
    for (const e of [r.on, r.off]) {
      // Cutting the window to 80 % moves the terminal energy by under 1 %.
      expect(e.windowSensitivity).toBeLessThan(0.01);
      // Probe check: the sources' energy equals what the elements absorb (Tellegen's theorem,
      // exact on the same samples): a wrong sign or a missing element shows here.
      expect(Math.abs(e.balance)).toBeLessThan(1e-6);
    }
    // The switch's own balance: terminals = channel + internal resistors + change of the
    // capacitances' energy, the last from a separate slow-ramp deck.
    expect(Math.abs(r.deviceBalance.on)).toBeLessThan(0.02);
    expect(Math.abs(r.deviceBalance.off)).toBeLessThan(0.02);
    // Over a cycle Coss nets out, so terminal and channel heat agree; the terminal figure
    // also holds the card's own Rd, Rs and Rg heat (Coss discharges through Rd), ≤ 3 % here.
    expect(Math.abs(r.switchHeat / r.channelHeat - 1)).toBeLessThan(0.03);
  });

  it("Eoss lies between the channel and terminal energies of each edge (±25 %)", () => {
    // Turn-on: the channel also discharges Coss; turn-off: the load current charges it instead
    // of flowing in the channel. Eoss here is the Coss energy at the bus with the gate held at
    // V− (the datasheet Eoss when V− = 0, checked below). The rest of the difference is the
    // gate side's stored energy (Cgs, Cgd) exchanged through the gate port, up to about 20 %
    // of Eoss on the 60 V part at 48 V; the exact relation is deviceBalance above.
    const r = of(c);
    if (c.circuit.vLow === 0) expect(Math.abs(r.eossAtVLow / eossAtBus(c) - 1)).toBeLessThan(0.01);
    const on = (r.on.energy.channel - r.on.energy.terminal) / r.eossAtVLow;
    const off = (r.off.energy.terminal - r.off.energy.channel) / r.eossAtVLow;
    for (const x of [on, off]) {
      expect(x).toBeGreaterThan(0.8);
      expect(x).toBeLessThan(1.25);
    }
  });

});

describe.each(SWITCHING_CASES.filter((c) => c.circuit.lLoop > 0).map((c) => [c.id, c] as const))("%s", (_, c) => {
  it("turn-off overshoot is L·di/dt on top of the clamp (within 10 %)", () => {
    // V = L·di/dt (closed form) plus the freewheel diode's forward drop, read from the same case
    // without loop inductance; the damping resistor across L takes a little of the current.
    const base = get(c.part, { ...c.circuit, lLoop: 0 }).off.vdsOvershoot;
    const e = of(c).off;
    expect(Math.abs(e.vdsOvershoot / (c.circuit.lLoop * e.didtMax + base) - 1)).toBeLessThan(0.1);
  });
});

describe("trends", () => {
  it.each(LOADS.flatMap((l) => DRIVES.map((d) => ({ ...l, ...d }))))(
    "$part.card.name at $iLoad A, V− $vLow V, L $lLoop H: 15 Ω against 4.7 Ω is slower and loses more, never faster",
    ({ part, iLoad, vLow, lLoop }) => {
      const a = get(part, { iLoad, rGate: 4.7, vLow, lLoop });
      const b = get(part, { iLoad, rGate: 15, vLow, lLoop });
      expect(b.on.delayCurrent).toBeGreaterThan(1.5 * a.on.delayCurrent);
      expect(b.off.delayVoltage).toBeGreaterThan(1.1 * a.off.delayVoltage);
      expect(b.on.tCurrent).toBeGreaterThan(1.5 * a.on.tCurrent);
      expect(b.on.tVoltage).toBeGreaterThan(1.5 * a.on.tVoltage);
      expect(b.switchHeat).toBeGreaterThan(a.switchHeat);
      // Turn-off edges are gate-limited on the 60 V part; on the 650 V part the load current
      // charging Coss sets the voltage rise, which the gate resistance then barely changes.
      expect(b.off.tVoltage).toBeGreaterThan((part === TRENCH_60V ? 1.5 : 0.995) * a.off.tVoltage);
    },
  );

  it.each(LOADS.flatMap((l) => [4.7, 15].flatMap((rGate) => [0, 10e-9].map((lLoop) => ({ ...l, rGate, lLoop })))))(
    "$part.card.name at $iLoad A, $rGate Ω, L $lLoop H: −5 V turn-off bias speeds turn-off",
    ({ part, iLoad, rGate, lLoop }) => {
      const z = get(part, { iLoad, rGate, vLow: 0, lLoop });
      const n = get(part, { iLoad, rGate, vLow: -5, lLoop });
      expect(n.off.delayVoltage).toBeLessThan(z.off.delayVoltage);
      expect(n.off.tVoltage).toBeLessThan(z.off.tVoltage);
      expect(n.off.energy.terminal).toBeLessThan(z.off.energy.terminal);
      expect(n.on.delayCurrent).toBeGreaterThan(z.on.delayCurrent);
      const cut = 1 - n.off.energy.terminal / z.off.energy.terminal;
      // Gate-limited turn-off (60 V part): a large cut; capacitance-dominated (650 V, 1 A): a small one.
      if (part === TRENCH_60V) expect(cut).toBeGreaterThan(0.3);
      if (part === SJ_650V && iLoad === 1) expect(cut).toBeLessThan(0.02);
    },
  );

  it.each(DRIVES.flatMap((d) => [4.7, 15].map((rGate) => ({ ...d, rGate }))))(
    "650 V at 1 A, $rGate Ω, V− $vLow V, L $lLoop H: turn-off is capacitance-dominated",
    ({ rGate, vLow, lLoop }) => {
      const c = findCase(SJ_650V, { iLoad: 1, rGate, vLow, lLoop });
      const e = of(c).off;
      const s = sheets.get(SJ_650V)!;
      const v = c.circuit.vBus;
      // The channel is off while Vds rises: almost nothing is lost in it, the terminal
      // energy is the Eoss put into Coss ...
      expect(e.energy.channel).toBeLessThan(0.01 * e.energy.terminal);
      expect(Math.abs(e.energy.terminal / eossAtBus(c) - 1)).toBeLessThan(0.03);
      // ... and the 10-90 % rise takes the Coss charge between the levels, plus the freewheel
      // diode's junction charge (Cjo 50 pF, M 0.5, Vj 1 V: Q = 2·Cjo·Vj·√(1 + Vr/Vj)), over the load
      // current (closed form; the gate bias shifts Vdg by 5 V, which matters little at these voltages).
      const qj = (vr: number) => 2 * 50e-12 * (Math.sqrt(1 + vr) - 1);
      const dq = curveIntegral(s.capacitance, "coss", 0.1 * v, 0.9 * v, 0) + qj(0.9 * v) - qj(0.1 * v);
      expect(Math.abs(e.tVoltage / (dq / c.circuit.iLoad) - 1)).toBeLessThan(0.05);
    },
  );

  it.each(LOADS.flatMap((l) => [4.7, 15].flatMap((rGate) => [0, -5].map((vLow) => ({ ...l, rGate, vLow })))))(
    "$part.card.name at $iLoad A, $rGate Ω, V− $vLow V: loop inductance lowers the turn-on energy (Vds steps down by L·di/dt)",
    ({ part, iLoad, rGate, vLow }) => {
      const a = get(part, { iLoad, rGate, vLow, lLoop: 0 });
      const b = get(part, { iLoad, rGate, vLow, lLoop: 10e-9 });
      expect(b.on.vdsDip).toBeGreaterThan(5);
      expect(b.on.energy.terminal).toBeLessThan(a.on.energy.terminal);
      expect(b.off.vdsOvershoot).toBeGreaterThan(a.off.vdsOvershoot + 5);
    },
  );

  it.each([["60 V", TRENCH_60V], ["650 V", SJ_650V]] as const)("%s part: common-source inductance (2 nH) slows the current edges and raises the heat", (_, part) => {
    const iLoad = part === TRENCH_60V ? 10 : 5;
    const a = get(part, { iLoad, rGate: 4.7, vLow: 0, lLoop: 0 });
    const b = get(part, { iLoad, rGate: 4.7, vLow: 0, lLoop: 0, lCommonSource: 2e-9 });
    expect(b.on.tCurrent).toBeGreaterThan(1.5 * a.on.tCurrent);
    expect(b.on.didtAvg).toBeLessThan(a.on.didtAvg);
    expect(b.off.tCurrent).toBeGreaterThan(a.off.tCurrent);
    expect(b.switchHeat).toBeGreaterThan(a.switchHeat);
  });
});
