/**
 * Single-switch forward converter with a reset winding: Q1 the main switch,
 * D3 the reset-winding diode, SR1/D1 the forward and SR2/D2 the
 * freewheeling rectifier; n = Np/Ns, a = Np/Nr.
 * Erickson & Maksimović 3rd ed. (2020), ch. 6 (the forward converter):
 * M = D·Ns/Np; the magnetizing current rises by Vg·D·Ts/Lm while Q1 is on
 * and the reset winding returns it to the input in D·Ts·Nr/Np, so the core
 * resets only if D ≤ 1/(1 + Nr/Np); Q1 blocks Vg·(1 + Np/Nr) during the
 * reset and Vg once it is over. The output filter is a buck stage
 * (outputStage.ts).
 * Assumptions: ideal transformer apart from Lm (leakage ignored: no spike,
 * instant commutation), reset completes each period (checked), losses
 * lumped at the input (built.ts), the Lm ringing after the reset ignored.
 */
import { formatQuantity } from "../quantityFormat";
import { boundaryNote, inductor, isRefusal, stageFields, type BuildResult, type Context } from "./built";
import { outputStage } from "./outputStage";
import { primarySwitch, rectifier } from "./positions";
import { conducts, diode, off, on, spansBetween } from "./spans";

export function buildForwardResetWinding(c: Context): BuildResult {
  const { vin, vout } = c.spec;
  const n = c.spec.turnsRatio as number;
  const a = c.spec.resetTurnsRatio ?? 1;
  const lm = c.spec.magnetizingInductance as number;
  const dMax = a / (1 + a);
  const lo = outputStage(c, c.vinE / n, c.period, "a forward converter needs D = n·Vout/(η·Vin) below 1");
  if (isRefusal(lo)) return lo;
  const { d } = lo;
  if (d > dMax * (1 + 1e-12))
    return {
      field: "turnsRatio",
      message: `the core cannot reset: D = ${d.toFixed(3)} but with Np/Nr = ${a} the reset takes D·Nr/Np of the period, ` +
        `so D must stay at or below ${dMax.toFixed(3)}; lower Np/Ns or use fewer reset turns`,
    };
  const T = lo.period;
  const tOn = d * T;
  const tReset = tOn / a;
  const tFree = tOn + lo.d2 * T;
  const dIm = (c.vinE * tOn) / lm;
  const im = (t: number) => (t <= tOn ? (dIm * t) / tOn : Math.max(0, dIm * (1 - (t - tOn) / tReset)));
  const rect = conducts(c.sync);
  const q1 = primarySwitch("Q1", "Main switch");
  const d3 = { id: "D3", role: "other" as const, label: "Reset-winding diode", device: "diode" as const, natural: true };
  const r1 = rectifier(c.sync, 1, "Forward rectifier");
  const r2 = rectifier(c.sync, 2, "Freewheeling rectifier");
  const spans = spansBetween(T, [tOn, tOn + tReset, tFree], (t0, t1, m) => {
    const powering = m < tOn;
    const resetting = !powering && m < tOn + tReset;
    const freewheeling = !powering && m < tFree;
    const x = powering ? vin / n : freewheeling ? 0 : vout; // freewheel-diode cathode
    const w = powering ? vin / n : resetting ? (-a * vin) / n : 0; // secondary winding
    return {
      Q1: powering ? on(lo.at(t0) / n + im(t0), lo.at(t1) / n + im(t1)) : off(resetting ? vin * (1 + a) : vin),
      D3: powering ? off(vin * (1 + 1 / a)) : resetting ? diode(a * im(t0), a * im(t1)) : off(vin),
      [r1.id]: powering ? rect(lo.at(t0), lo.at(t1)) : off(x - w),
      [r2.id]: powering ? off(vin / n) : freewheeling ? rect(lo.at(t0), lo.at(t1)) : off(vout),
    };
  });
  const notes = [...boundaryNote(lo.mode, 1 / T, c.spec.fsw)];
  if (tOn + tReset > T * (1 - 1e-9))
    notes.push(`the reset takes the whole off time at D = ${d.toFixed(3)}: Q1 turns on at Vin·(1 + Np/Nr) = ${formatQuantity(vin * (1 + a), "voltage")}`);
  return {
    timeline: { period: T, positions: [q1, d3, r1, r2], spans },
    inductors: [
      inductor("Lo", "Output inductor", lo.valley, lo.peak, d + lo.d2),
      { name: "Lm", label: "Magnetizing inductance (primary-referred)", avg: (dIm / 2) * (d + d / a), peak: dIm, valley: 0, ripple: dIm },
    ],
    input: [{ id: "Q1", sign: 1 }, { id: "D3", sign: -1 }],
    ...stageFields(lo, c.spec.fsw),
    notes,
  };
}
