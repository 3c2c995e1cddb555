// The reference cases of the drive decks in simulation/: invented circuits
// (values from memory of typical parts, not any one product), shared by the
// reference-drive tests and scripts/spice-drive-reference.ts.
import { BJT_PAIRS, type BjtFamily } from "@/simulation/bjtCards";
import { logSpaced, type DatasheetConditions } from "@/simulation/bjtDatasheet";
import type { ClampCase } from "@/simulation/clamp";
import type { LimitedCase } from "@/simulation/driveLimited";
import type { ControllerPin, FollowerCase, PinStage } from "@/simulation/follower";
import { gateCurve } from "@/simulation/gateLoad";
import { SWITCH_60V } from "@/simulation/gateLoadVdmos";
import type { ForwardGateCase } from "@/simulation/windingReset";

/** Datasheet test conditions of each class (common practice). */
export const DATASHEET_CONDITIONS: Record<BjtFamily, DatasheetConditions> = {
  small: { ics: logSpaced(1e-4, 1, 12), hfeVce: 2, vbeIc: 0.1, vceSatIc: 0.1, cobVcb: 10, cibVeb: 0.5, ftIc: 10e-3, ftVce: 5 },
  high: { ics: logSpaced(1e-3, 5, 12), hfeVce: 2, vbeIc: 1, vceSatIc: 1, cobVcb: 10, cibVeb: 0.5, ftIc: 0.1, ftVce: 5 },
};

// Two gate loads as datasheets give them (Qg at Vgs = 10 V).
export const GATE_20NC = gateCurve({ qgs: 5e-9, qgd: 6e-9, qg: 20e-9, vTest: 10, vpl: 4.5, ciss: 1.1e-9 });
export const GATE_100NC = gateCurve({ qgs: 25e-9, qgd: 30e-9, qg: 100e-9, vTest: 10, vpl: 5, ciss: 5e-9 });
export const GATES = { "20nC": GATE_20NC, "100nC": GATE_100NC };
export type GateName = keyof typeof GATES;

export const VCC = 12;
/** A PWM controller's output pin: 6 Ω up, 3 Ω down, 3 ns edges. */
export const PIN: ControllerPin = { vcc: VCC, rSource: 6, rSink: 3, edge: 3e-9 };
export const R_GATE = 2.2;
export const RG_INT = 1;
export const R_GS = 10e3;

export interface FollowerSpec {
  family: BjtFamily;
  gate: GateName | "switch";
  fsw: number;
  rBase: number;
  stage: PinStage;
  vNeg?: number;
  limits?: { source: number; sink: number };
  direct?: boolean;
}

export function followerId(s: FollowerSpec): string {
  const parts = [s.direct ? "direct" : s.family, s.gate, `${s.fsw / 1e3}kHz`, `Rb${s.rBase}`, s.stage];
  if (s.vNeg) parts.push(`Vneg${s.vNeg}`);
  if (s.limits) parts.push(`lim${s.limits.source}/${s.limits.sink}A`);
  return parts.join(" ");
}

export function followerCase(s: FollowerSpec): FollowerCase {
  const pin: ControllerPin = { ...PIN, stage: s.stage, sourceLimit: s.limits?.source, sinkLimit: s.limits?.sink };
  const load = s.gate === "switch"
    ? { kind: "switch" as const, card: SWITCH_60V, stage: { vBus: 48, iLoad: 10 } }
    : { kind: "charge" as const, gate: GATES[s.gate] };
  return { pin, vNeg: s.vNeg ?? 0, rBase: s.rBase, ...BJT_PAIRS[s.family], rGate: R_GATE, rgInt: RG_INT, rGs: R_GS, load, fsw: s.fsw, direct: s.direct };
}

const FAMILIES: BjtFamily[] = ["small", "high"];
const FREQUENCIES = [100e3, 500e3];

/**
 * Each family × gate × frequency × base resistor with the Thevenin pin, the same at 500 kHz with
 * the push-pull pin (the stage changes only what happens inside the pin's own edge), then the extras.
 */
export const FOLLOWER_SPECS: FollowerSpec[] = [
  ...FAMILIES.flatMap((family) => (["20nC", "100nC"] as GateName[]).flatMap((gate) => [0, 4.7].flatMap((rBase) => [
    ...FREQUENCIES.map((fsw) => ({ family, gate, fsw, rBase, stage: "thevenin" as const })),
    { family, gate, fsw: 500e3, rBase, stage: "push-pull" as const },
  ]))),
  // A large base resistor: the pin's base current times hFE(Ic) caps the gate current.
  ...FAMILIES.map((family) => ({ family, gate: "100nC" as const, fsw: 100e3, rBase: 100, stage: "thevenin" as const })),
  // The pin straight into the gate resistor: what the follower takes off the controller.
  ...(["20nC", "100nC"] as GateName[]).flatMap((gate) => (["thevenin", "push-pull"] as PinStage[]).map((stage) =>
    ({ family: "small" as const, gate, fsw: 500e3, rBase: 0, stage, direct: true }))),
  // A real switch (VDMOS, 48 V / 10 A clamped inductive load) as the gate.
  ...FAMILIES.map((family) => ({ family, gate: "switch" as const, fsw: 100e3, rBase: 4.7, stage: "thevenin" as const })),
  // The PNP's collector at −5 V, and a pin with source/sink current limits.
  { family: "high", gate: "20nC", fsw: 100e3, rBase: 4.7, stage: "thevenin", vNeg: -5 },
  { family: "high", gate: "100nC", fsw: 100e3, rBase: 0, stage: "thevenin", limits: { source: 0.3, sink: 0.5 } },
];

/** Current-limited outputs into the gate (issue #18 item 2): a pin and a driver IC, with and without limits. */
export const LIMITED_CASES: Array<{ id: string; c: LimitedCase }> = [
  { id: "pin 2nF unlimited", c: { driver: { vHigh: 12, vLow: 0, rSource: 6, rSink: 3 }, rExt: 2.2, rgInt: 1, gate: { kind: "linear", c: 2e-9 }, halfPeriod: 1e-6 } },
  { id: "pin 2nF 0.5A", c: { driver: { vHigh: 12, vLow: 0, rSource: 6, rSink: 3, sourceLimit: 0.5, sinkLimit: 0.5 }, rExt: 2.2, rgInt: 1, gate: { kind: "linear", c: 2e-9 }, halfPeriod: 1e-6 } },
  { id: "pin 100nC unlimited", c: { driver: { vHigh: 12, vLow: 0, rSource: 6, rSink: 3 }, rExt: 2.2, rgInt: 1, gate: GATE_100NC, halfPeriod: 4e-6 } },
  { id: "pin 100nC 0.5/0.8A", c: { driver: { vHigh: 12, vLow: 0, rSource: 6, rSink: 3, sourceLimit: 0.5, sinkLimit: 0.8 }, rExt: 2.2, rgInt: 1, gate: GATE_100NC, halfPeriod: 4e-6 } },
  { id: "driver 100nC 12/-5V 2/3A", c: { driver: { vHigh: 12, vLow: -5, rSource: 1.5, rSink: 0.8, sourceLimit: 2, sinkLimit: 3 }, rExt: 2.2, rgInt: 1, gate: GATE_100NC, halfPeriod: 2e-6 } },
];

// Forward converter at a fixed output: Vin·D = 18 V (36 V → D 0.5, 48 V → 0.375, 75 V → 0.24).
const LINE = [[36, 0.5], [48, 0.375], [75, 0.24]] as const;

/** Zener-clamped self-driven rectifier gate: winding k = 0.5, off level from the winding's volt-second balance. */
export const CLAMP_CASES: Array<{ id: string; c: ClampCase }> = FAMILIES.flatMap((family) => LINE.map(([vin, duty]) => ({
  id: `${family} ${vin}V`,
  c: {
    vOn: 0.5 * vin, vOff: (-0.5 * vin * duty) / (1 - duty), rWinding: 0.3, edge: 20e-9, fsw: 200e3, duty,
    rZ: 2.2e3, zener: { bv: 12, ibv: 1e-3, rs: 3, cjo: 40e-12 },
    npn: BJT_PAIRS[family].npn, pnp: BJT_PAIRS[family].pnp, rGate: R_GATE, rgInt: RG_INT, gate: GATE_100NC, vth: 3,
  },
})));

const FORWARD = { fsw: 200e3, lm: 50e-6, k: 0.2, lLeak: 20e-9, cNode: 200e-12, rGate: R_GATE, rgInt: RG_INT, cGate: 10e-9 };

/** Self-driven gate off level against duty: active-clamp reset at three line points, a reset winding at two duties. */
export const FORWARD_CASES: Array<{ id: string; c: ForwardGateCase }> = [
  ...LINE.map(([vin, duty]) => ({
    id: `active clamp ${vin}V D${duty}`,
    c: { ...FORWARD, vin, duty, reset: { kind: "active-clamp" as const, cClamp: 470e-9, rClamp: 4 }, periods: 80 },
  })),
  ...[0.375, 0.2].map((duty) => ({
    id: `reset winding 48V D${duty}`,
    c: { ...FORWARD, vin: 48, duty, reset: { kind: "reset-winding" as const, turnsRatio: 1 }, periods: 3 },
  })),
];

/** Runs fn over items, at most `concurrency` at once (the machine's two cores are shared), in order. */
export async function mapLimited<T, R>(items: T[], fn: (item: T) => Promise<R>, concurrency = 2): Promise<R[]> {
  const out: R[] = new Array(items.length);
  let next = 0;
  const worker = async () => {
    while (next < items.length) {
      const k = next++;
      out[k] = await fn(items[k]);
    }
  };
  await Promise.all(Array.from({ length: Math.min(concurrency, items.length) }, worker));
  return out;
}
