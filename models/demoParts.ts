/**
 * INVENTED parts for the demo converter. Part numbers, values and prices are
 * made up to look like plausible datasheet entries; they describe no real
 * product. Each entry carries its unit cost (USD) and the input block the
 * design document uses, so a parts library can import them as they are.
 */

export type DemoPartKind = "controller" | "mosfet" | "bjt" | "driver-ic" | "transformer" | "zener" | "passive";

export interface DemoPart {
  partNumber: string;
  kind: DemoPartKind;
  description: string;
  unitCostUsd: number;
  /** Datasheet block as written in a design document (unit strings). */
  data: Record<string, unknown>;
}

const cost = (usd: number) => `${usd} USD`;

export const controllerHRGPC72 = {
  partNumber: "HRG-PC72", cost: cost(1.1),
  vcc: "12 V", iq: "6 mA",
  pin: { sourceResistance: "6 Ω", sinkResistance: "3 Ω", sourceCurrentLimit: "1 A", sinkCurrentLimit: "2 A" },
  rthJA: "95 K/W", tjMax: "150 °C",
  tolerance: { iq: 0.2, resistance: 0.3, rth: 0.15 },
};

/** 150 V primary switch, baseplate-mounted. */
export const mosfetQN150F12 = {
  partNumber: "QN-150F12", cost: cost(1.45),
  qgs: "13 nC", qgd: "9 nC", qg: "42 nC", qgVgs: "10 V", vth: "3.1 V", vpl: "4.8 V", ciss: "2.9 nF", rgInt: "1 Ω",
  outputCapacitance: { vds: "75 V", eoss: "1.6 µJ" },
  qrr: "120 nC", rds25: "12 mΩ", rdsHot: "21 mΩ", tHot: "125 °C", vsd: "0.88 V",
  vgsMax: "20 V", tjMax: "175 °C", rthJC: "0.7 K/W", rthCS: "0.8 K/W", rthSA: "7 K/W",
  tolerance: { qg: 0.15, rdsOn: 0.2, vpl: 0.1, rth: 0.15 },
};

/** 80 V synchronous rectifier on board copper. */
export const mosfetQN080S3 = {
  partNumber: "QN-080S3", cost: cost(0.95),
  qgs: "15 nC", qgd: "9 nC", qg: "52 nC", qgVgs: "10 V", vth: "2.6 V", vpl: "4.3 V", rgInt: "1.2 Ω",
  outputCapacitance: { vds: "40 V", eoss: "1.1 µJ" },
  qrr: "40 nC", rds25: "2.8 mΩ", rdsHot: "4.8 mΩ", tHot: "125 °C", vsd: "0.82 V", rDiode: "5 mΩ",
  vgsMax: "20 V", tjMax: "175 °C", rthJC: "1.2 K/W", rthCS: "1 K/W", rthSA: "14 K/W",
  tolerance: { qg: 0.15, rdsOn: 0.2, rth: 0.15 },
};

/**
 * General-purpose SOT-23 pair: hFE about 150 at a few tens of mA, above 100
 * up to 150 mA, below 50 by 0.4 A and single figures past 1.5 A (the shape
 * small-signal gain curves take; values invented). icMax is the pulsed rating.
 */
const smallSignalHfe = [
  { ic: "2 mA", hfe: 110 }, { ic: "20 mA", hfe: 150 }, { ic: "120 mA", hfe: 125 }, { ic: "250 mA", hfe: 80 },
  { ic: "420 mA", hfe: 42 }, { ic: "800 mA", hfe: 20 }, { ic: "1.6 A", hfe: 7 },
];
export const npnQTN6SL = {
  partNumber: "QT-N6SL", cost: cost(0.03), hfe: smallSignalHfe, vbe: "0.85 V", vceSat: "0.3 V",
  icMax: "1 A", pMax: "0.35 W", rthJA: "350 K/W", tjMax: "150 °C", tolerance: { hfe: 0.4, vbe: 0.05 },
};
export const pnpQTP6SL = { ...npnQTN6SL, partNumber: "QT-P6SL" };

/** High-current SOT-23 pair: hFE near 300 to a few hundred mA and above 100 up to 3.5 A (values invented). */
const highCurrentHfe = [
  { ic: "20 mA", hfe: 280 }, { ic: "200 mA", hfe: 300 }, { ic: "0.8 A", hfe: 250 }, { ic: "1.8 A", hfe: 190 },
  { ic: "2.7 A", hfe: 145 }, { ic: "3.8 A", hfe: 105 }, { ic: "5.5 A", hfe: 50 },
];
export const npnQTN3HC = {
  partNumber: "QT-N3HC", cost: cost(0.12), hfe: highCurrentHfe, vbe: "0.9 V", vceSat: "0.15 V",
  icMax: "5 A", pMax: "0.6 W", rthJA: "210 K/W", tjMax: "150 °C", tolerance: { hfe: 0.3, vbe: 0.05 },
};
export const pnpQTP3HC = { ...npnQTN3HC, partNumber: "QT-P3HC" };

/** 4 A low-side gate driver, SOT-23-5. */
export const driverHRGLS9T = {
  partNumber: "HRG-LS9T", cost: cost(0.55),
  sourceResistance: "2 Ω", sinkResistance: "1 Ω", sourcePeakCurrent: "4 A", sinkPeakCurrent: "4 A",
  iq: "0.6 mA", inputCurrent: "50 µA", rthJA: "160 K/W", tjMax: "150 °C",
};

/** 2 A / 3 A secondary-side SR driver fed from a 10 V bias winding. */
export const driverHRGSR5K = {
  partNumber: "HRG-SR5K", cost: cost(0.4), supply: "10 V",
  sourceResistance: "2.5 Ω", sinkResistance: "1.2 Ω", sourcePeakCurrent: "2 A", sinkPeakCurrent: "3 A",
  iq: "0.4 mA", inputCurrent: "0 A", rthJA: "180 K/W", tjMax: "150 °C",
};

/** 1 : 1.6 gate-drive transformer (cost includes the blocking capacitor). */
export const transformerGRWT16 = {
  partNumber: "GRW-T16", cost: cost(0.92), turnsRatio: 1.6,
  primaryResistance: "0.15 Ω", secondaryResistance: "0.3 Ω", magnetizingInductance: "300 µH",
};

/**
 * Zener-referenced clamp for a self-driven SR: a high-current follower
 * (QT-N3HC on extra copper) + 12 V zener QZ-12B + bias resistor.
 */
export const clampQZ12 = {
  partNumber: "QT-N3HC", zenerPartNumber: "QZ-12B", cost: cost(0.16),
  zenerVoltage: "12 V", zenerBiasCurrent: "2 mA", vbe: "0.8 V", icMax: "5 A", pMax: "0.6 W",
  rthJA: "180 K/W", tjMax: "150 °C",
};

export const demoParts: DemoPart[] = [
  { partNumber: "HRG-PC72", kind: "controller", description: "Single-ended PWM controller with its own gate pin (sources 1 A, sinks 2 A)", unitCostUsd: 1.1, data: controllerHRGPC72 },
  { partNumber: "QN-150F12", kind: "mosfet", description: "150 V 12 mΩ N-channel MOSFET", unitCostUsd: 1.45, data: mosfetQN150F12 },
  { partNumber: "QN-080S3", kind: "mosfet", description: "80 V 2.8 mΩ N-channel MOSFET for synchronous rectification", unitCostUsd: 0.95, data: mosfetQN080S3 },
  { partNumber: "QT-N6SL", kind: "bjt", description: "Small-signal NPN, SOT-23, hFE above 100 up to 150 mA", unitCostUsd: 0.03, data: npnQTN6SL },
  { partNumber: "QT-P6SL", kind: "bjt", description: "Small-signal PNP, SOT-23, hFE above 100 up to 150 mA", unitCostUsd: 0.03, data: pnpQTP6SL },
  { partNumber: "QT-N3HC", kind: "bjt", description: "High-current NPN, SOT-23, hFE above 100 up to 3.5 A", unitCostUsd: 0.12, data: npnQTN3HC },
  { partNumber: "QT-P3HC", kind: "bjt", description: "High-current PNP, SOT-23, hFE above 100 up to 3.5 A", unitCostUsd: 0.12, data: pnpQTP3HC },
  { partNumber: "HRG-LS9T", kind: "driver-ic", description: "4 A low-side gate driver", unitCostUsd: 0.55, data: driverHRGLS9T },
  { partNumber: "HRG-SR5K", kind: "driver-ic", description: "2 A / 3 A synchronous-rectifier driver", unitCostUsd: 0.4, data: driverHRGSR5K },
  { partNumber: "GRW-T16", kind: "transformer", description: "Gate-drive transformer 1:1.6 with blocking capacitor", unitCostUsd: 0.92, data: transformerGRWT16 },
  { partNumber: "QZ-12B", kind: "zener", description: "12 V zener, SOD-323 (clamp reference)", unitCostUsd: 0.02, data: { zenerVoltage: "12 V" } },
  { partNumber: "QR-G1", kind: "passive", description: "Gate resistor or steering diode, each", unitCostUsd: 0.005, data: {} },
];
