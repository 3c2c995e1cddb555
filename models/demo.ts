/**
 * Demo: five gate-drive options for one INVENTED converter, "HX-240":
 * isolated active-clamp forward, 36–75 V in, 12 V / 20 A out (240 W),
 * 250 kHz, Npri:Nsec = 3:2, ambient up to 85 °C. Waveform values are hand
 * estimates for that topology (duty ≈ 12 V / (Vin·2/3) plus a little for
 * losses; primary current = reflected 20 A plus magnetizing; clamp voltage
 * Vin/(1−D)). The small active-clamp switch and its high-side drive are not
 * modelled. Options 1–4 change only the primary drive (the SRs use
 * secondary driver ICs); option 5 keeps option 3's primary and drives the
 * SRs from windings. Every part and number is invented (see demoParts.ts).
 */
import type { DesignInput } from "./input/schema";
import {
  clampQZ12, controllerHRGPC72, driverHRGLS9T, driverHRGSR5K, mosfetQN080S3, mosfetQN150F12,
  npnQTN3HC, npnQTN6SL, pnpQTP3HC, pnpQTP6SL, transformerGRWT16,
} from "./demoParts";

export { demoParts, type DemoPart } from "./demoParts";

type PositionInput = DesignInput["positions"][number];

const corners: DesignInput["corners"] = [
  { id: "vmin", label: "36 V, full load, 85 °C", vin: "36 V", ambient: "85 °C", fsw: "250 kHz", outputPower: "240 W" },
  { id: "vnom", label: "48 V, full load, 85 °C", vin: "48 V", ambient: "85 °C", fsw: "250 kHz", outputPower: "240 W" },
  { id: "vmax", label: "75 V, full load, 85 °C", vin: "75 V", ambient: "85 °C", fsw: "250 kHz", outputPower: "240 W" },
  { id: "light", label: "48 V, 20 % load, 25 °C", vin: "48 V", ambient: "25 °C", fsw: "250 kHz", loadFraction: 0.2, outputPower: "48 W" },
];

/** Main switch: hard turn-on at ≈ Vin, turn-off against the clamp voltage Vin/(1−D). */
const q1Conduction = {
  switching: "hard" as const,
  points: [
    { vin: "36 V", duty: 0.52, turnOnVds: "36 V", turnOnId: "12 A", turnOffVds: "75 V", turnOffId: "15 A", iRms: "9.7 A", iAvg: "7.0 A" },
    { vin: "48 V", duty: 0.39, turnOnVds: "48 V", turnOnId: "12 A", turnOffVds: "79 V", turnOffId: "15 A", iRms: "8.4 A", iAvg: "5.3 A" },
    { vin: "75 V", duty: 0.25, turnOnVds: "75 V", turnOnId: "12 A", turnOffVds: "100 V", turnOffId: "15 A", iRms: "6.8 A", iAvg: "3.4 A" },
  ],
};

/**
 * SRs turn on and off with their body diode conducting (ZVS; the turn-off
 * edge is clamped by the diode). turnOffVds is the voltage each blocks next, used
 * for its reverse recovery.
 */
const sr1Conduction = {
  switching: "zvs" as const, deadTimes: ["30 ns", "40 ns"] as [string, string],
  points: [
    { vin: "36 V", duty: 0.52, turnOnVds: "0 V", turnOnId: "18 A", turnOffVds: "26 V", turnOffId: "22 A", iRms: "14.4 A", iAvg: "10.4 A" },
    { vin: "48 V", duty: 0.39, turnOnVds: "0 V", turnOnId: "18 A", turnOffVds: "20.5 V", turnOffId: "22 A", iRms: "12.5 A", iAvg: "7.8 A" },
    { vin: "75 V", duty: 0.25, turnOnVds: "0 V", turnOnId: "18 A", turnOffVds: "16.7 V", turnOffId: "22 A", iRms: "10 A", iAvg: "5 A" },
  ],
};
const sr2Conduction = {
  switching: "zvs" as const, deadTimes: ["40 ns", "30 ns"] as [string, string],
  points: [
    { vin: "36 V", duty: 0.48, turnOnVds: "0 V", turnOnId: "22 A", turnOffVds: "24 V", turnOffId: "18 A", iRms: "13.9 A", iAvg: "9.6 A" },
    { vin: "48 V", duty: 0.61, turnOnVds: "0 V", turnOnId: "22 A", turnOffVds: "32 V", turnOffId: "18 A", iRms: "15.6 A", iAvg: "12.2 A" },
    { vin: "75 V", duty: 0.75, turnOnVds: "0 V", turnOnId: "22 A", turnOffVds: "50 V", turnOffId: "18 A", iRms: "17.3 A", iAvg: "15 A" },
  ],
};

const gateOnOff = { rTurnOn: "2.2 Ω", rTurnOff: "1 Ω", steeringDiode: { vf: "0.7 V" }, cost: "0.03 USD" };

function q1(drive: PositionInput["drive"], gate: PositionInput["gate"] = gateOnOff): PositionInput {
  return { id: "Q1", role: "primary", label: "Main switch", mosfet: mosfetQN150F12, drive, gate, conduction: q1Conduction };
}

const srWithDrivers: PositionInput[] = [
  { id: "SR1", role: "synchronous-rectifier", label: "Forward SR", mosfet: mosfetQN080S3,
    drive: { kind: "driver-ic", ...driverHRGSR5K }, gate: { rTurnOn: "1 Ω", cost: "0.005 USD" }, conduction: sr1Conduction },
  { id: "SR2", role: "synchronous-rectifier", label: "Freewheel SR (2 in parallel)", mosfet: { ...mosfetQN080S3, count: 2 },
    drive: { kind: "driver-ic", ...driverHRGSR5K }, gate: { rTurnOn: "1 Ω", cost: "0.005 USD" }, conduction: sr2Conduction },
];

/**
 * Self-driven SRs: SR1 from a power-transformer winding (k = 0.27, so 9.7 V
 * at 36 V but 20 V at 75 V: the clamp holds it near 11 V); SR2 from an
 * output-inductor winding, referenced to Vout (≈ 10 V whatever Vin).
 */
const srSelfDriven: PositionInput[] = [
  { ...srWithDrivers[0],
    drive: { kind: "self-driven", winding: { ref: "vin", k: 0.27, kNeg: 0.08 }, windingResistance: "0.2 Ω", clamp: clampQZ12 },
    gate: { rTurnOn: "4.7 Ω", rTurnOff: "1 Ω", steeringDiode: { vf: "0.4 V" }, cost: "0.03 USD" } },
  { ...srWithDrivers[1],
    drive: { kind: "self-driven", winding: { ref: "vout", vHigh: "10 V", vLow: "0 V" }, windingResistance: "0.2 Ω" } },
];

const derating = {
  tjMargin: { controller: "25 K", mosfet: "25 K", bjt: "25 K", driverIc: "25 K", clamp: "25 K" },
  vgsMaxFraction: 0.8,
  minHeadroomAbovePlateau: "4 V",
};

function design(name: string, q: PositionInput, srs: PositionInput[], coupling: { from: string; to: string; theta: string }[]): DesignInput {
  return {
    schemaVersion: 2, name, corners, controller: controllerHRGPC72, positions: [q, ...srs],
    thermal: { coupling: [{ from: "controller", to: "Q1", theta: "3 K/W" }, { from: "SR1", to: "SR2", theta: "2 K/W" }, ...coupling] },
    derating,
  };
}

/** Follower bases through 4.7 Ω each (damps the base loop, common practice); turn-off through rTurnOn ∥ rTurnOff. */
const follower = (npn: typeof npnQTN6SL, pnp: typeof pnpQTP6SL) =>
  ({ kind: "bjt-follower" as const, npn: { ...npn, rBase: "4.7 Ω" }, pnp: { ...pnp, rBase: "4.7 Ω" } });
const followerGate = { rTurnOn: "2.2 Ω", rTurnOff: "2.2 Ω", steeringDiode: { vf: "0.7 V" }, cost: "0.03 USD" };

export const demoOptions: { key: string; name: string; summary: string; input: DesignInput }[] = [
  {
    key: "direct",
    name: "1 · Controller pin drives Q1",
    summary: "Fewest parts: the controller's 1 A / 2 A pin charges Q1's gate itself, so all of the gate power heats the controller and the edges are slow.",
    input: design("HX-240 option 1: direct drive", q1({ kind: "direct" }), srWithDrivers, []),
  },
  {
    key: "bjt-small",
    name: "2 · Small-signal NPN/PNP follower",
    summary: "Two SOT-23 small-signal transistors take the gate current off the pin. Their gain collapses above a few hundred mA, so peaks are gain-limited.",
    input: design("HX-240 option 2: small-signal follower", q1(follower(npnQTN6SL, pnpQTP6SL), followerGate), srWithDrivers, [
      { from: "Q1.npn", to: "Q1.pnp", theta: "60 K/W" },
      { from: "controller", to: "Q1.npn", theta: "15 K/W" },
    ]),
  },
  {
    key: "driver-ic",
    name: "3 · Gate-driver IC",
    summary: "A 4 A driver next to Q1: fast edges, gate heat in the driver and the gate resistors, the controller only feeds its input.",
    input: design("HX-240 option 3: driver IC", q1({ kind: "driver-ic", ...driverHRGLS9T }), srWithDrivers, [
      { from: "Q1.driver", to: "Q1", theta: "4 K/W" },
    ]),
  },
  {
    key: "transformer",
    name: "4 · Gate transformer with negative bias",
    summary: "Driver IC into a 1:1.6 AC-coupled gate transformer: isolation and about −5 … −10 V turn-off bias, but positive drive shrinks at high duty.",
    input: design("HX-240 option 4: AC-coupled gate transformer",
      q1({ kind: "transformer", mode: "ac-coupled", ...transformerGRWT16, driver: driverHRGLS9T }), srWithDrivers,
      [{ from: "Q1.driver", to: "Q1", theta: "2 K/W" }]),
  },
  {
    key: "self-driven-sr",
    name: "5 · Driver IC + self-driven SRs with clamp",
    summary: "Option 3's primary; the SR driver ICs go, SR1 is driven from a winding through a 12 V zener clamp (needed across 36–75 V), SR2 from an output winding.",
    input: design("HX-240 option 5: self-driven SRs", q1({ kind: "driver-ic", ...driverHRGLS9T }), srSelfDriven, [
      { from: "Q1.driver", to: "Q1", theta: "4 K/W" },
    ]),
  },
];

/** Variant of option 2 with high-current small-package transistors (gain held to 3–4 A). */
export const demoFollowerHighCurrent: { key: string; name: string; summary: string; input: DesignInput } = {
  key: "bjt-high-current",
  name: "2b · High-current NPN/PNP follower",
  summary: "Same follower with high-current SOT-23 transistors that keep their gain to 3–4 A: the gate is no longer starved.",
  input: design("HX-240 option 2b: high-current follower", q1(follower(npnQTN3HC, pnpQTP3HC), followerGate), srWithDrivers, [
    { from: "Q1.npn", to: "Q1.pnp", theta: "60 K/W" },
    { from: "controller", to: "Q1.npn", theta: "15 K/W" },
  ]),
};
