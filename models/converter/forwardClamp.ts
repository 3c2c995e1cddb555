/**
 * Active-clamp forward converter: Q1 the main switch, Q2 the clamp switch
 * in series with the clamp capacitor across the primary, SR1/D1 the forward
 * and SR2/D2 the freewheeling rectifier; n = Np/Ns; dead times [t1, t2]
 * (t1: Q1 off → Q2 on, t2: Q2 off → Q1 on).
 * Relations: the output filter is a buck stage (outputStage.ts; Erickson &
 * Maksimović 3rd ed. 2020, ch. 6, forward converter M = D·Ns/Np).
 * Volt-second balance on Lm (ch. 2 applied to the magnetizing inductance):
 * Vg·D·Ts = Vc·(Ts − D·Ts − t2), so the clamp holds the winding at
 * Vc = Vg·D/(1 − D − t2/Ts) and Q1 blocks Vg + Vc (Vg/(1 − D) with t2 = 0).
 * Charge balance on the clamp capacitor (ch. 2): it carries the magnetizing
 * current only while Q2 or its body diode conducts, so that current swings
 * symmetrically, ±ΔIm/2 with ΔIm = Vg·D·Ts/Lm, and averages zero.
 * During t2 both Q1 and Q2 are off; with no device capacitance the drain
 * falls to Vg, both rectifiers conduct (winding voltage zero) and the
 * secondary carries the magnetizing current: n·ΔIm/2 in the forward
 * rectifier, the rest of the output current in the freewheeling one.
 * Assumptions: ideal transformer apart from Lm (leakage ignored, so the
 * drain does not swing below Vg and Q1 turns on hard at Vg), clamp
 * capacitor large (constant Vc), losses lumped at the input (built.ts).
 */
import { formatQuantity } from "../quantityFormat";
import { inductor, isRefusal, stageFields, type BuildResult, type Context } from "./built";
import { outputStage } from "./outputStage";
import { primarySwitch, rectifier } from "./positions";
import { conducts, diode, off, on, spansBetween } from "./spans";

export function buildForwardActiveClamp(c: Context): BuildResult {
  const { vin, vout } = c.spec;
  const n = c.spec.turnsRatio as number;
  const lm = c.spec.magnetizingInductance as number;
  const [t1, t2] = c.deadTimes;
  const lo = outputStage(c, c.vinE / n, c.period, "a forward converter needs D = n·Vout/(η·Vin) below 1");
  if (isRefusal(lo)) return lo;
  const { d } = lo;
  const T = lo.period;
  const tOn = d * T;
  if (tOn + t1 + t2 >= T)
    return {
      field: "turnsRatio",
      message: `D = ${d.toFixed(3)} leaves no on-time for the clamp switch after the dead times; lower Np/Ns or shorten the dead times`,
    };
  const tClampEnd = T - t2;
  const vc = (vin * tOn) / (tClampEnd - tOn);
  const dIm = (c.vinE * tOn) / lm;
  if (t2 > 0 && lo.valley < (n * dIm) / 2)
    return {
      field: "magnetizingInductance",
      message:
        `at Q1's turn-on the magnetizing current (${formatQuantity(dIm / 2, "current")}) exceeds the output inductor current reflected to the primary ` +
        `(${formatQuantity(lo.valley / n, "current")}): in the dead time t2 the drain would swing to zero (zero-voltage turn-on), which is not modelled; ` +
        `raise Lm, set t2 to 0 or raise the load`,
    };
  const im = (t: number) => (t <= tOn ? -dIm / 2 + (dIm * t) / tOn : t <= tClampEnd ? dIm / 2 - (dIm * (t - tOn)) / (tClampEnd - tOn) : -dIm / 2);
  const tFree = tOn + lo.d2 * T;
  const rect = conducts(c.sync);
  const q1 = primarySwitch("Q1", "Main switch");
  const q2 = { id: "Q2", role: "other" as const, label: "Active-clamp switch", device: "mosfet" as const, natural: true };
  const r1 = rectifier(c.sync, 1, "Forward rectifier");
  const r2 = rectifier(c.sync, 2, "Freewheeling rectifier");
  const share = (n * dIm) / 2;
  const spans = spansBetween(T, [tOn, tOn + t1, tClampEnd, tFree], (a, b, m) => {
    const powering = m < tOn;
    const clamping = !powering && m < tClampEnd;
    const freewheeling = !powering && m < tFree;
    const x = freewheeling ? 0 : vout; // freewheel-rectifier cathode while the winding is negative
    if (powering)
      return {
        Q1: on(lo.at(a) / n + im(a), lo.at(b) / n + im(b)),
        Q2: off(vin + vc),
        [r1.id]: rect(lo.at(a), lo.at(b)),
        [r2.id]: off(vin / n),
      };
    if (clamping)
      return {
        Q1: off(vin + vc),
        // Q2's drain-to-source current is −im: negative (body diode) first, then forward.
        Q2: m < tOn + t1 ? diode(-im(a), -im(b)) : on(-im(a), -im(b)),
        [r1.id]: off(vc / n + x),
        [r2.id]: freewheeling ? rect(lo.at(a), lo.at(b)) : off(vout),
      };
    return {
      Q1: off(vin),
      Q2: off(vc),
      [r1.id]: rect(share, share),
      [r2.id]: rect(lo.at(a) - share, lo.at(b) - share),
    };
  });
  const fields = stageFields(lo, c.spec.fsw);
  return {
    timeline: { period: T, positions: [q1, q2, r1, r2], spans },
    inductors: [
      inductor("Lo", "Output inductor", lo.valley, lo.peak, d + lo.d2),
      { name: "Lm", label: "Magnetizing inductance (primary-referred)", avg: ((-dIm / 2) * t2) / T, peak: dIm / 2, valley: -dIm / 2, ripple: dIm },
    ],
    // The clamp capacitor's charge balance makes Q2's average current zero: only Q1 draws from the input.
    input: [{ id: "Q1", sign: 1 }],
    ...fields,
    notes: [...fields.notes, `clamp voltage ${formatQuantity(vc, "voltage")} across the winding while Q2 conducts`],
  };
}
