/**
 * Buck converter, Q1 the high-side switch, SR1/D1 the low-side rectifier.
 * Erickson & Maksimović 3rd ed. (2020): ch. 2 (inductor volt-second
 * balance, M = D; ripple 2ΔiL = (Vg − V)·D·Ts/L) and ch. 5 (DCM, buck
 * row of Table 5.2; see dcm.ts). Peak current in DCM: (Vg − V)·D·Ts/L.
 * Assumptions: ideal switches and inductor, output capacitor large enough
 * that Vout is constant over a period (small-ripple approximation), losses
 * lumped at the input (built.ts). In the idle interval of DCM the switch
 * node rests at Vout (its ringing with the device capacitances is ignored).
 */
import { formatQuantity } from "../quantityFormat";
import { inductor, isRefusal, rampEnds, stageFields, stageOrRefusal, type BuildResult, type Context } from "./built";
import { primarySwitch, rectifier } from "./positions";
import { conducts, off, on } from "./spans";

export function buildBuck(c: Context): BuildResult {
  const { vin, vout, iout } = c.spec;
  const l = c.spec.filterInductance as number;
  if (vout >= c.vinE)
    return {
      field: "vout",
      message: `a buck converter steps down: Vout (${formatQuantity(vout, "voltage")}) must be below Vin × efficiency ` +
        `(${formatQuantity(c.vinE, "voltage")} here); choose a boost or an isolated topology`,
    };
  const st = stageOrRefusal({ family: "buck", m: vout / c.vinE, r: vout / iout, l, period: c.period, mode: c.spec.mode }, "filterInductance", "the inductor current");
  if (isRefusal(st)) return st;
  const T = st.period;
  const rise = ((c.vinE - vout) * st.d * T) / l;
  const [valley, peak] = rampEnds(st.mode, iout, rise);
  const q1 = primarySwitch("Q1", "High-side switch");
  const r = rectifier(c.sync, 1, "Low-side rectifier");
  const rect = conducts(c.sync);
  return {
    timeline: {
      period: T,
      positions: [q1, r],
      spans: [
        { dt: st.d * T, dev: { Q1: on(valley, peak), [r.id]: off(vin) } },
        { dt: st.d2 * T, dev: { Q1: off(vin), [r.id]: rect(peak, valley) } },
        { dt: (1 - st.d - st.d2) * T, dev: { Q1: off(vin - vout), [r.id]: off(vout) } },
      ],
    },
    inductors: [inductor("L", "Inductor", valley, peak, st.d + st.d2)],
    input: [{ id: "Q1", sign: 1 }],
    ...stageFields(st, c.spec.fsw),
  };
}
