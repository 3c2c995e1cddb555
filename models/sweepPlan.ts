/**
 * Loss plan of a sweep (models/sweep.ts) at one fixed drive stage (corner,
 * Vin, gate resistors). Every loss the budget assembly computes
 * (evaluatePosition.ts `computePosition`) is one of
 *   constant · 1, · fsw, · k·fsw  (k = gate-charge scale)
 * or an overlap edge ½·Vds·Id·min(k·T, ½/fsw)·fsw (hardEdge with its cap), or
 * a gate-transformer magnetizing term min(k/fsw, Ipp,max)²/12·R;
 * only conduction needs the electro-thermal solve. buildPlan collects those
 * coefficients once per stage, mirroring computePosition term by term.
 */
import { MECH_INDEX as M } from "./losses";
import { NM, type Prepared } from "./evaluateCore";
import { swingCharge } from "./gateCharge";
import { driveStage } from "./driveStage";
import { eossAt } from "./switching";
import { deadTimeLoss, diodeLoss, recoveryLoss } from "./conduction";
import { cornerWaveform } from "./waveform";

/** Coefficients of every (part, mechanism) loss at one drive stage; see the file comment. */
export interface Plan {
  c0: Float64Array; // × 1
  cF: Float64Array; // × fsw
  cKF: Float64Array; // × k·fsw
  edgeSlot: Int32Array; // part·NM + mechanism
  edgeW: Float64Array; // ½·Vds·Id
  edgeT: Float64Array; // (Qgs2 + Qgd)/Ig at k = 1
  edgeScaled: Uint8Array;
  // Magnetizing ripple of a gate transformer: min(k/fsw, ippMax)²/12 · R.
  magSlot: Int32Array;
  magK: Float64Array;
  magMax: Float64Array;
  magR: Float64Array;
  condCoef: Float64Array; // per part: I_rms²/n
  // Per-part sums of c0 / cF / cKF over the mechanisms.
  p0: Float64Array;
  pF: Float64Array;
  pKF: Float64Array;
}

export interface StageKnobs {
  vin: number;
  /** Gate-resistor override for one position, or null. */
  rGate: { position: string; rOn: number; rOff: number | undefined } | null;
}

export function buildPlan(prep: Prepared, ci: number, knobs: StageKnobs, scaled: (id: string) => boolean): Plan {
  const { design } = prep;
  const corner = design.corners[ci];
  const size = prep.parts.length * NM;
  const c0 = new Float64Array(size), cF = new Float64Array(size), cKF = new Float64Array(size);
  const slots: number[] = [], ws: number[] = [], ts: number[] = [], sc: number[] = [];
  const mSlot: number[] = [], mK: number[] = [], mMax: number[] = [], mR: number[] = [];
  const condCoef = new Float64Array(prep.parts.length);
  const part = (id: string) => {
    const i = prep.partIndex.get(id);
    if (i === undefined) throw new Error(`internal: unknown part ${id}`);
    return i;
  };
  c0[M.quiescent] += design.controller.vcc * design.controller.iq;
  for (const pp of prep.positions) {
    const p = pp.position;
    const m = p.mosfet;
    const n = m.count;
    const w = cornerWaveform(p, corner, knobs.vin);
    const mine = knobs.rGate !== null && knobs.rGate.position === p.id;
    const rOn = mine ? knobs.rGate!.rOn : p.gate.rTurnOn;
    const rOff = mine ? knobs.rGate!.rOff : p.gate.rTurnOff;
    const st = driveStage({ controller: design.controller, position: p, positionIndex: pp.index, vin: knobs.vin, duty: w.duty, rOn, rOff });
    const k = scaled(p.id);
    const perK = k ? cKF : cF;
    const dq1 = n * swingCharge(pp.curve, st.vHigh, st.vLow);
    const halfE = 0.5 * dq1 * (st.vHigh - st.vLow);
    for (const s of st.on.shares) perK[part(s.part) * NM + M.gateDrive] += halfE * s.fraction;
    for (const s of st.off.shares) perK[part(s.part) * NM + M.gateDrive] += halfE * s.fraction;
    for (const d of st.drops) perK[part(d.part) * NM + M[d.mechanism]] += d.volts * dq1;
    for (const f of st.fixed) c0[part(f.part) * NM + M[f.mechanism]] += f.watts;
    if (st.magnetizing) {
      for (const q of st.magnetizing.parts) {
        mSlot.push(part(q.part) * NM + M.gateDrive);
        mK.push(st.magnetizing.k);
        mMax.push(st.magnetizing.ippMax);
        mR.push(q.resistance);
      }
    }
    const me = pp.part * NM;
    const edge = (mech: number, vds: number, id: number, iGate: number) => {
      const ig = Math.max(iGate, 1e-9);
      slots.push(me + mech);
      ws.push(0.5 * vds * id);
      ts.push((n * pp.qgs2) / ig + (n * m.qgd) / ig);
      sc.push(k ? 1 : 0);
    };
    const channel = p.conduction.mode === "channel" && p.drive.kind !== "none";
    if (channel) {
      if (p.conduction.switching === "hard") {
        edge(M.turnOn, w.vdsOn, w.idOn, st.on.iPlateau);
        cF[me + M.coss] += n * eossAt(m.outputCapacitance, w.vdsOn);
        cF[me + M.reverseRecovery] += recoveryLoss({ qrr: p.conduction.opposingQrr, v: w.vdsOn, fsw: 1 });
      }
      const srDiodeCatches = p.role === "synchronous-rectifier" && p.conduction.deadTimes[1] > 0;
      edge(M.turnOff, srDiodeCatches ? Math.min(m.vsd, w.vdsOff) : w.vdsOff, w.idOff, st.off.iPlateau);
      const [t1, t2] = p.conduction.deadTimes;
      cF[me + M.diodeConduction] += deadTimeLoss({ idOn: w.idOn, idOff: w.idOff, t1, t2, vsd: m.vsd, rDiode: m.rDiode, count: n, fsw: 1 });
    } else {
      c0[me + M.diodeConduction] += diodeLoss({ iAvg: w.iAvg, iRms: w.iRms, vsd: m.vsd, rDiode: m.rDiode, count: n });
    }
    if (p.role === "synchronous-rectifier" && (!channel || p.conduction.deadTimes[1] > 0))
      cF[me + M.reverseRecovery] += recoveryLoss({ qrr: n * m.qrr, v: w.vdsOff, fsw: 1 });
    condCoef[pp.part] = channel ? (w.iRms * w.iRms) / n : 0;
  }
  const np = prep.parts.length;
  const p0 = new Float64Array(np), pF = new Float64Array(np), pKF = new Float64Array(np);
  for (let i = 0; i < np; i++)
    for (let k = 0; k < NM; k++) {
      p0[i] += c0[i * NM + k];
      pF[i] += cF[i * NM + k];
      pKF[i] += cKF[i * NM + k];
    }
  return {
    c0, cF, cKF, edgeSlot: Int32Array.from(slots), edgeW: Float64Array.from(ws), edgeT: Float64Array.from(ts),
    edgeScaled: Uint8Array.from(sc), magSlot: Int32Array.from(mSlot), magK: Float64Array.from(mK),
    magMax: Float64Array.from(mMax), magR: Float64Array.from(mR), condCoef, p0, pF, pKF,
  };
}
