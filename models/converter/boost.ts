/**
 * Boost converter, Q1 the low-side switch, SR1/D1 the high-side rectifier.
 * Erickson & Maksimović 3rd ed. (2020): ch. 2 (volt-second balance
 * M = 1/(1 − D), capacitor charge balance I_L = I/(1 − D), ripple
 * 2ΔiL = Vg·D·Ts/L) and ch. 5 (DCM, boost row of Table 5.2; see dcm.ts).
 * Assumptions as for the buck (buck.ts); in the DCM idle interval the
 * switch node rests at Vin.
 */
import { formatQuantity } from "../quantityFormat";
import { inductor, isRefusal, rampEnds, stageFields, stageOrRefusal, type BuildResult, type Context } from "./built";
import { primarySwitch, rectifier } from "./positions";
import { conducts, off, on } from "./spans";

export function buildBoost(c: Context): BuildResult {
  const { vin, vout, iout } = c.spec;
  const l = c.spec.filterInductance as number;
  // Below Vin the rectifier conducts straight through and nothing regulates.
  if (vout <= vin)
    return {
      field: "vout",
      message: `a boost converter steps up: Vout (${formatQuantity(vout, "voltage")}) must be above Vin (${formatQuantity(vin, "voltage")}); choose a buck`,
    };
  const st = stageOrRefusal({ family: "boost", m: vout / c.vinE, r: vout / iout, l, period: c.period, mode: c.spec.mode }, "filterInductance", "the inductor current");
  if (isRefusal(st)) return st;
  const T = st.period;
  const rise = (c.vinE * st.d * T) / l;
  const [valley, peak] = rampEnds(st.mode, iout / (1 - st.d), rise);
  const q1 = primarySwitch("Q1", "Boost switch");
  const r = rectifier(c.sync, 1, "Output rectifier");
  const rect = conducts(c.sync);
  return {
    timeline: {
      period: T,
      positions: [q1, r],
      spans: [
        { dt: st.d * T, dev: { Q1: on(valley, peak), [r.id]: off(vout) } },
        { dt: st.d2 * T, dev: { Q1: off(vout), [r.id]: rect(peak, valley) } },
        { dt: (1 - st.d - st.d2) * T, dev: { Q1: off(vin), [r.id]: off(vout - vin) } },
      ],
    },
    inductors: [inductor("L", "Inductor", valley, peak, st.d + st.d2)],
    input: [{ id: "Q1", sign: 1 }, { id: r.id, sign: 1 }],
    ...stageFields(st, c.spec.fsw),
  };
}
