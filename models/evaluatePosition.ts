/**
 * Losses of one position at a corner (everything but the Tj-dependent
 * channel conduction): drive stage (memoised while vin, duty and the gate
 * resistors stay put), gate energy split, buffer/clamp drops, switching
 * edges, Eoss, reverse recovery and diode conduction.
 */
import type { Corner } from "./input/schema";
import { swingCharge } from "./gateCharge";
import { driveStage } from "./driveStage";
import { hardEdge, eossAt, type HardEdge } from "./switching";
import { deadTimeLoss, diodeLoss, recoveryLoss } from "./conduction";
import { cornerWaveform } from "./waveform";
import { M, NM, type CornerOverrides, type Prepared, type PreparedPosition, type StageMemo } from "./evaluateTypes";

function idx(prep: Prepared, id: string): number {
  const i = prep.partIndex.get(id);
  if (i === undefined) throw new Error(`internal: unknown part ${id}`);
  return i;
}

function stageFor(prep: Prepared, pp: PreparedPosition, corner: number, vin: number, duty: number, rOn: number, rOff: number | undefined): StageMemo {
  const m = pp.memo;
  if (m && m.corner === corner && m.vin === vin && m.duty === duty && m.rOn === rOn && m.rOff === rOff) return m;
  const stage = driveStage({ controller: prep.design.controller, position: pp.position, positionIndex: pp.index, vin, duty, rOn, rOff });
  const shares = (s: { part: string; fraction: number }[]) => s.map((x) => ({ part: idx(prep, x.part), fraction: x.fraction }));
  const memo: StageMemo = {
    corner, vin, duty, rOn, rOff, stage, on: shares(stage.on.shares), off: shares(stage.off.shares),
    drops: stage.drops.map((d) => ({ part: idx(prep, d.part), mech: M[d.mechanism], volts: d.volts })),
    fixed: stage.fixed.map((f) => ({ part: idx(prep, f.part), mech: M[f.mechanism], watts: f.watts })),
    mag: stage.magnetizing
      ? { k: stage.magnetizing.k, ippMax: stage.magnetizing.ippMax, parts: stage.magnetizing.parts.map((p) => ({ part: idx(prep, p.part), resistance: p.resistance })) }
      : null,
  };
  pp.memo = memo;
  return memo;
}

/** Losses of one position at a corner, except the Tj-dependent channel conduction. */
export function computePosition(prep: Prepared, pp: PreparedPosition, ci: number, corner: Corner, ov: CornerOverrides, fsw: number, vin: number): void {
  const { position: p } = pp;
  const L = prep.loss;
  const mine = ov.position === undefined || ov.position === p.id;
  const w = ov.vin === undefined ? pp.cornerWaveforms[ci] : cornerWaveform(p, corner, vin);
  const rOn = mine && ov.rOn !== undefined ? ov.rOn : p.gate.rTurnOn;
  const rOff = mine && ov.rOff !== undefined ? ov.rOff : p.gate.rTurnOff;
  const k = mine && ov.qgScale !== undefined ? ov.qgScale : 1;
  const m = p.mosfet;
  const n = m.count;
  const memo = stageFor(prep, pp, ci, vin, w.duty, rOn, rOff);
  const st = memo.stage;
  const dq = n * k * swingCharge(pp.curve, st.vHigh, st.vLow);
  const swingEnergy = dq * (st.vHigh - st.vLow);
  const halfP = 0.5 * swingEnergy * fsw;
  for (const s of memo.on) L[s.part * NM + M.gateDrive] += halfP * s.fraction;
  for (const s of memo.off) L[s.part * NM + M.gateDrive] += halfP * s.fraction;
  for (const d of memo.drops) L[d.part * NM + d.mech] += d.volts * dq * fsw;
  for (const f of memo.fixed) L[f.part * NM + f.mech] += f.watts;
  if (memo.mag) {
    const ipp = Math.min(memo.mag.k / fsw, memo.mag.ippMax);
    const i2 = (ipp * ipp) / 12;
    for (const q of memo.mag.parts) L[q.part * NM + M.gateDrive] += i2 * q.resistance;
  }
  const me = pp.part * NM;
  const channel = p.conduction.mode === "channel" && p.drive.kind !== "none";
  let turnOn: HardEdge | null = null;
  let turnOff: HardEdge | null = null;
  if (channel) {
    const qgd = n * k * m.qgd;
    const q2 = n * k * pp.qgs2;
    if (p.conduction.switching === "hard") {
      turnOn = hardEdge({ vds: w.vdsOn, id: w.idOn, iGate: st.on.iPlateau, qgd, qgs2: q2, fsw });
      L[me + M.turnOn] += turnOn.energy * fsw;
      L[me + M.coss] += n * eossAt(m.outputCapacitance, w.vdsOn) * fsw;
      L[me + M.reverseRecovery] += recoveryLoss({ qrr: p.conduction.opposingQrr, v: w.vdsOn, fsw });
    }
    // An SR whose body diode takes over the current after turn-off (t2 > 0) has
    // only Vsd across it during the edge; turnOffVds is then the voltage it blocks later.
    const srDiodeCatches = p.role === "synchronous-rectifier" && p.conduction.deadTimes[1] > 0;
    const vOffEdge = srDiodeCatches ? Math.min(m.vsd, w.vdsOff) : w.vdsOff;
    turnOff = hardEdge({ vds: vOffEdge, id: w.idOff, iGate: st.off.iPlateau, qgd, qgs2: q2, fsw });
    L[me + M.turnOff] += turnOff.energy * fsw;
    const [t1, t2] = p.conduction.deadTimes;
    L[me + M.diodeConduction] += deadTimeLoss({ idOn: w.idOn, idOff: w.idOff, t1, t2, vsd: m.vsd, rDiode: m.rDiode, count: n, fsw });
  } else {
    L[me + M.diodeConduction] += diodeLoss({ iAvg: w.iAvg, iRms: w.iRms, vsd: m.vsd, rDiode: m.rDiode, count: n });
  }
  // The SR's own body diode recovers against the voltage it then blocks.
  if (p.role === "synchronous-rectifier" && (!channel || p.conduction.deadTimes[1] > 0))
    L[me + M.reverseRecovery] += recoveryLoss({ qrr: n * m.qrr, v: w.vdsOff, fsw });
  const condCoef = channel ? (w.iRms * w.iRms) / n : 0;
  prep.condCoef[pp.part] = condCoef;
  if (!pp.work) pp.work = { stage: st, waveform: w, deltaQ: 0, gatePower: 0, turnOn: null, turnOff: null, condCoef: 0 };
  const out = pp.work;
  out.stage = st;
  out.waveform = w;
  out.deltaQ = dq;
  out.gatePower = swingEnergy * fsw;
  out.turnOn = turnOn;
  out.turnOff = turnOff;
  out.condCoef = condCoef;
}

