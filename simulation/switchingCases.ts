// The reference cases the switching-loss model is compared with (issue 12):
// each part at its load points, gate resistance 4.7 or 15 Ω, turn-off bias
// 0 or −5 V, V+ 12 V, power-loop inductance 0 or 10 nH; and two cases with
// 2 nH of common-source inductance for its trend.
import { SJ_650V, TRENCH_60V, type ReferencePart } from "./mosfetCards";
import type { ClampedCircuit } from "./switchingDeck";

export interface SwitchingCase {
  /** Fixed identifier built from the case's numbers. */
  id: string;
  part: ReferencePart;
  circuit: ClampedCircuit;
}

const V_HIGH = 12;
const R_GATES = [4.7, 15];
const V_LOWS = [0, -5];
const L_LOOPS = [0, 10e-9];
const L_CS = 2e-9;

const LOADS: { part: ReferencePart; vBus: number; iLoad: number }[] = [
  { part: TRENCH_60V, vBus: 48, iLoad: 10 },
  { part: SJ_650V, vBus: 400, iLoad: 5 },
  { part: SJ_650V, vBus: 400, iLoad: 1 },
];

function makeCase(part: ReferencePart, vBus: number, iLoad: number, rGate: number, vLow: number, lLoop: number, lCommonSource = 0): SwitchingCase {
  const nh = (l: number) => `${Math.round(l * 1e9)}nH`;
  const id = `${part.card.name}-${vBus}V-${iLoad}A-${rGate}R-${vLow}V-${nh(lLoop)}${lCommonSource > 0 ? `-cs${nh(lCommonSource)}` : ""}`;
  return { id, part, circuit: { card: part.card, vBus, iLoad, vHigh: V_HIGH, vLow, rGate, lLoop, lCommonSource } };
}

export const SWITCHING_CASES: SwitchingCase[] = [
  ...LOADS.flatMap(({ part, vBus, iLoad }) =>
    R_GATES.flatMap((r) => V_LOWS.flatMap((vl) => L_LOOPS.map((l) => makeCase(part, vBus, iLoad, r, vl, l)))),
  ),
  makeCase(TRENCH_60V, 48, 10, 4.7, 0, 0, L_CS),
  makeCase(SJ_650V, 400, 5, 4.7, 0, 0, L_CS),
];

export function findCase(part: ReferencePart, o: { iLoad: number; rGate: number; vLow: number; lLoop: number; lCommonSource?: number }): SwitchingCase {
  const c = SWITCHING_CASES.find(
    (x) =>
      x.part.card.name === part.card.name &&
      x.circuit.iLoad === o.iLoad &&
      x.circuit.rGate === o.rGate &&
      x.circuit.vLow === o.vLow &&
      x.circuit.lLoop === o.lLoop &&
      x.circuit.lCommonSource === (o.lCommonSource ?? 0),
  );
  if (!c) throw new Error(`no reference case ${part.card.name} ${JSON.stringify(o)}`);
  return c;
}
