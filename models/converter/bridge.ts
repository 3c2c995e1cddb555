/**
 * Half- and full-bridge converters (hard-switched, not phase-shifted) with
 * a centre-tapped secondary, n = Np/Ns for each half. Each primary switch
 * (pair) conducts for D·Ts, D < 1/2; the rectified voltage is Vg/n (full
 * bridge) or Vg/(2n) (half bridge: the primary sees half the input across
 * the capacitor divider) for 2·D of each half period, so the output filter
 * is a buck stage at 2·fsw with duty 2D (outputStage.ts).
 * Erickson & Maksimović 3rd ed. (2020), ch. 6 (full-bridge and half-bridge
 * isolated buck converters: with Erickson's 1:n and his D defined over the
 * half period, M = n·D for the full bridge and n·D/2 for the half bridge;
 * here D is each switch's conduction fraction of the full period, so
 * M = 2D·Ns/Np and D·Ns/Np).
 * While all primary switches are off the two secondary halves share the
 * output inductor current equally (ampere-turn balance with zero primary
 * current) and the winding voltage is zero; each off rectifier blocks twice
 * the half-winding voltage.
 * Assumptions: magnetizing current neglected (Lm large against the load),
 * leakage ignored (instant commutation), and while every switch is off each
 * one is taken to rest at Vg/2 (the ringing of the leakage with the device
 * capacitances is ignored: common practice); in DCM idle each rectifier
 * blocks Vout. Losses lumped at the input (built.ts).
 */
import { inductor, isRefusal, stageFields, type BuildResult, type Context } from "./built";
import { outputStage } from "./outputStage";
import { primarySwitch, rectifier } from "./positions";
import { conducts, off, on, spansBetween, type DeviceState } from "./spans";

export function buildBridge(c: Context, full: boolean): BuildResult {
  const { vin, vout } = c.spec;
  const n = c.spec.turnsRatio as number;
  const vs = full ? vin / n : vin / (2 * n);
  const limit = full ? "a full bridge needs D = n·Vout/(2·η·Vin) below 1/2" : "a half bridge needs D = n·Vout/(η·Vin) below 1/2";
  const lo = outputStage(c, full ? c.vinE / n : c.vinE / (2 * n), c.period / 2, limit);
  if (isRefusal(lo)) return lo;
  const half = lo.period;
  const T = 2 * half;
  const tOn = lo.d * half;
  const tFree = tOn + lo.d2 * half;
  const rect = conducts(c.sync);
  const r1 = rectifier(c.sync, 1, "Rectifier, first half-winding");
  const r2 = rectifier(c.sync, 2, "Rectifier, second half-winding");
  const primaries = full
    ? [primarySwitch("Q1", "Leg A high-side switch"), primarySwitch("Q2", "Leg A low-side switch"),
       primarySwitch("Q3", "Leg B high-side switch"), primarySwitch("Q4", "Leg B low-side switch")]
    : [primarySwitch("Q1", "High-side switch"), primarySwitch("Q2", "Low-side switch")];
  // Which primaries conduct in each power interval: Q1(+Q4) first, Q2(+Q3) second.
  const firstSet = full ? ["Q1", "Q4"] : ["Q1"];
  const secondSet = full ? ["Q2", "Q3"] : ["Q2"];
  const spans = spansBetween(T, [tOn, tFree, half, half + tOn, half + tFree], (a, b, m) => {
    const second = m >= half;
    const [ta, tb, tm] = second ? [a - half, b - half, m - half] : [a, b, m];
    const [i0, i1] = [lo.at(ta), lo.at(tb)];
    const dev: Record<string, DeviceState> = {};
    if (tm < tOn) {
      const conducting = second ? secondSet : firstSet;
      for (const p of primaries) dev[p.id] = conducting.includes(p.id) ? on(i0 / n, i1 / n) : off(vin);
      dev[second ? r2.id : r1.id] = rect(i0, i1);
      dev[second ? r1.id : r2.id] = off(2 * vs);
    } else {
      for (const p of primaries) dev[p.id] = off(vin / 2);
      const shared = tm < tFree ? rect(i0 / 2, i1 / 2) : off(vout);
      dev[r1.id] = shared;
      dev[r2.id] = shared;
    }
    return dev;
  });
  const highSides = full ? ["Q1", "Q3"] : ["Q1"];
  return {
    timeline: { period: T, positions: [...primaries, r1, r2], spans },
    inductors: [inductor("Lo", "Output inductor (ripple at twice the switching frequency)", lo.valley, lo.peak, lo.d + lo.d2)],
    input: highSides.map((id) => ({ id, sign: 1 as const })),
    ...stageFields(lo, c.spec.fsw, 2),
  };
}
