/**
 * Conduction loss: channel and body diode (DOMAIN items 8–9).
 *
 * Channel: P = I_rms²·Rds(on)(Tj) (Erickson & Maksimović 3rd ed. 2020,
 * ch. 4/5 conduction loss; any text). n identical devices in parallel share
 * the current, each carries I/n, so the total is I_rms²·Rds/n.
 * Rds(on)(Tj) is fitted through the datasheet points at 25 °C and tHot:
 *  - "linear" (default): R25 + (Rhot − R25)·(Tj − 25)/(tHot − 25), the
 *    simplest fit that gives the electro-thermal loop a closed form;
 *  - "exponential": R25·exp(c·(Tj − 25)), c = ln(Rhot/R25)/(tHot − 25), the
 *    shape often quoted for silicon mobility over this range (from memory).
 * Both are floored at 0.1·R25 and the exponent capped, so extrapolation far
 * outside the datasheet range stays finite (it is not physics there).
 * Body diode: P = Vsd·I_avg + r_D·I_rms²/n (piecewise-linear diode, Mohan,
 * Undeland & Robbins 3rd ed. 2003, ch. 2 diode model). Dead times add the
 * diode drop while the channel is off; reverse recovery Qrr·V·fsw.
 */

export interface RdsModel {
  rds25: number;
  rdsHot?: number;
  tHot: number;
  rdsModel: "linear" | "exponential";
}

const T_REF = 25;
const RDS_FLOOR = 0.1;
const MAX_EXPONENT = 50;

function hotValue(m: RdsModel): number {
  // Default: silicon rises about 1.7× from 25 °C to 125 °C (policy.ts).
  return m.rdsHot ?? m.rds25 * 1.7;
}

export function rdsAt(m: RdsModel, tj: number): number {
  const span = Math.max(m.tHot - T_REF, 1);
  const hot = hotValue(m);
  if (m.rdsModel === "exponential") {
    const c = Math.log(Math.max(hot, 1e-12) / m.rds25) / span;
    return Math.max(m.rds25 * Math.exp(Math.min(c * (tj - T_REF), MAX_EXPONENT)), RDS_FLOOR * m.rds25);
  }
  return Math.max(m.rds25 + ((hot - m.rds25) * (tj - T_REF)) / span, RDS_FLOOR * m.rds25);
}

/** dRds/dTj, Ω/K (zero where the floor or the exponent cap holds). */
export function rdsSlope(m: RdsModel, tj: number): number {
  const span = Math.max(m.tHot - T_REF, 1);
  const hot = hotValue(m);
  if (m.rdsModel === "exponential") {
    const c = Math.log(Math.max(hot, 1e-12) / m.rds25) / span;
    if (c * (tj - T_REF) > MAX_EXPONENT) return 0;
    const r = rdsAt(m, tj);
    return r > RDS_FLOOR * m.rds25 ? c * r : 0;
  }
  const slope = (hot - m.rds25) / span;
  return m.rds25 + slope * (tj - T_REF) > RDS_FLOOR * m.rds25 ? slope : 0;
}

export function channelLoss({ iRms, rds, count }: { iRms: number; rds: number; count: number }): number {
  return (iRms * iRms * rds) / count;
}

export function diodeLoss({ iAvg, iRms, vsd, rDiode, count }: {
  iAvg: number; iRms: number; vsd: number; rDiode: number; count: number;
}): number {
  return vsd * iAvg + (rDiode * iRms * iRms) / count;
}

/**
 * Body-diode conduction in the dead times: t1 before the channel turns on
 * (carrying idOn), t2 after it turns off (carrying idOff).
 */
export function deadTimeLoss({ idOn, idOff, t1, t2, vsd, rDiode, count, fsw }: {
  idOn: number; idOff: number; t1: number; t2: number; vsd: number; rDiode: number; count: number; fsw: number;
}): number {
  const e = vsd * (idOn * t1 + idOff * t2) + (rDiode / count) * (idOn * idOn * t1 + idOff * idOff * t2);
  return e * fsw;
}

export function recoveryLoss({ qrr, v, fsw }: { qrr: number; v: number; fsw: number }): number {
  return qrr * v * fsw;
}
