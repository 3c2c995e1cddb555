/**
 * Flyback converter: Q1 the primary switch, SR1/D1 the secondary rectifier,
 * turns ratio n = Np/Ns, magnetizing inductance Lm on the primary.
 * Erickson & Maksimović 3rd ed. (2020), ch. 6 (transformer-isolated
 * converters, the flyback as an isolated buck-boost): with Erickson's 1:n
 * written here as Np/Ns = n, M = V/Vg = D/(n·(1 − D)); Q1 blocks
 * Vg + n·V, the rectifier Vg/n + V. Referred to the primary the load is
 * R' = n²·V/I and the output V' = n·V, so the buck-boost rows of ch. 5
 * Table 5.2 give the mode and the DCM duty (dcm.ts). Magnetizing current:
 * average Iout/(n·(1 − D)) in CCM (charge balance on the output),
 * rise Vg·D·Ts/Lm.
 * Assumptions: ideal transformer apart from Lm (leakage inductance ignored,
 * so no turn-off spike and no clamp or snubber loss; commutation between
 * windings is instant), ideal switches, constant Vout, losses lumped at the
 * input (built.ts). In DCM idle the magnetizing current is zero, so Q1 sits
 * at Vin and the rectifier at Vout: the ringing of Lm with the device
 * capacitances (valley switching) is ignored, and the Vds reported before a
 * DCM or boundary turn-on is that ideal value, not the valley.
 */
import { inductor, isRefusal, rampEnds, stageFields, stageOrRefusal, type BuildResult, type Context } from "./built";
import { primarySwitch, rectifier } from "./positions";
import { conducts, off, on } from "./spans";

export function buildFlyback(c: Context): BuildResult {
  const { vin, vout, iout } = c.spec;
  const n = c.spec.turnsRatio as number;
  const lm = c.spec.magnetizingInductance as number;
  const st = stageOrRefusal(
    { family: "buck-boost", m: (n * vout) / c.vinE, r: (n * n * vout) / iout, l: lm, period: c.period, mode: c.spec.mode },
    "magnetizingInductance",
    "the magnetizing current",
  );
  if (isRefusal(st)) return st;
  const T = st.period;
  const rise = (c.vinE * st.d * T) / lm;
  const [valley, peak] = rampEnds(st.mode, iout / (n * (1 - st.d)), rise);
  const q1 = primarySwitch("Q1", "Primary switch");
  const r = rectifier(c.sync, 1, "Secondary rectifier");
  const rect = conducts(c.sync);
  return {
    timeline: {
      period: T,
      positions: [q1, r],
      spans: [
        { dt: st.d * T, dev: { Q1: on(valley, peak), [r.id]: off(vout + vin / n) } },
        { dt: st.d2 * T, dev: { Q1: off(vin + n * vout), [r.id]: rect(n * peak, n * valley) } },
        { dt: (1 - st.d - st.d2) * T, dev: { Q1: off(vin), [r.id]: off(vout) } },
      ],
    },
    inductors: [inductor("Lm", "Magnetizing inductance (primary-referred)", valley, peak, st.d + st.d2)],
    input: [{ id: "Q1", sign: 1 }],
    ...stageFields(st, c.spec.fsw),
  };
}
