/**
 * The buck-type output filter of a forward or bridge converter: a
 * rectified pulse of vs volts for a fraction d of the stage period, then
 * freewheeling. Erickson & Maksimović 3rd ed. (2020) ch. 6 treats these
 * converters as transformer-isolated bucks, so the buck rows of ch. 5
 * (dcm.ts) give the mode and the duty; the inductor current rises at
 * (vs − V)/L and falls at V/L.
 */
import { formatQuantity } from "../quantityFormat";
import { isRefusal, stageOrRefusal, type Context } from "./built";
import type { StageSolution } from "./dcm";
import type { Refusal } from "./types";

export interface OutputStage extends StageSolution {
  valley: number;
  peak: number;
  /** Inductor current at time t of the stage period (t in [0, period)). */
  at: (t: number) => number;
}

/**
 * vsE: the rectified pulse voltage of the ideal (η·Vin-fed) converter;
 * dutyName: how the stage duty relates to the switch duty, for the refusal.
 */
export function outputStage(c: Context, vsE: number, stagePeriod: number, limitText: string): OutputStage | Refusal {
  const { vout, iout } = c.spec;
  const l = c.spec.filterInductance as number;
  if (vout >= vsE)
    return {
      field: "turnsRatio",
      message: `the rectified secondary voltage (${formatQuantity(vsE, "voltage")} with the efficiency estimate) is not above Vout ` +
        `(${formatQuantity(vout, "voltage")}): ${limitText}; lower Np/Ns`,
    };
  const st = stageOrRefusal({ family: "buck", m: vout / vsE, r: vout / iout, l, period: stagePeriod, mode: c.spec.mode }, "filterInductance", "the output inductor current");
  if (isRefusal(st)) return st;
  const T = st.period;
  const rise = ((vsE - vout) * st.d * T) / l;
  const [valley, peak] = st.mode === "continuous" ? [iout - rise / 2, iout + rise / 2] : [0, rise];
  const tOn = st.d * T;
  const tFall = st.d2 * T;
  // In CCM the fall lasts to the end of the period; rounding must not make the last instant idle.
  const fallEnd = st.mode === "discontinuous" ? tOn + tFall : T;
  const eps = T * 1e-12;
  const at = (t: number): number => {
    if (t <= tOn) return valley + ((peak - valley) * t) / tOn;
    if (t <= fallEnd + eps) return peak - ((peak - valley) * Math.min(t - tOn, tFall)) / tFall;
    return 0;
  };
  return { ...st, valley, peak, at };
}
