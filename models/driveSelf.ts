/**
 * Self-driven synchronous rectifier (DOMAIN item 6).
 *
 * The gate follows a transformer winding: k·Vin (a winding on the power
 * transformer) or a fixed, output-referenced level. With a wide input range
 * the Vin-scaled level can exceed Vgs(max), hence the optional clamp: an
 * NPN follower whose base sits on a zener biased from the winding, so the
 * gate reaches min(V_winding, Vz) − VBE. The charge for the turn-on edge
 * comes from the winding at V_winding, so the clamp transistor burns
 * (V_winding − V_gs,high)·ΔQ·fsw; the zener string (zener plus its bias
 * resistor) burns V_winding·I_z·D, booked whether or not the zener conducts
 * (conservative; below Vz the bias current feeds the base instead).
 * The winding is taken as stiff: no current limit, only its resistance.
 */
import { type StageContext, type StageResult, gateElements, seriesEdge } from "./driveCommon";

/** Winding levels (before any clamp) at an input voltage. */
export function windingLevels(winding: { ref: "vin"; k: number; kNeg: number } | { ref: "vout"; vHigh: number; vLow: number }, vin: number): {
  vHigh: number; vLow: number;
} {
  return winding.ref === "vin" ? { vHigh: winding.k * vin, vLow: -winding.kNeg * vin } : { vHigh: winding.vHigh, vLow: winding.vLow };
}

export function selfDrivenStage(ctx: StageContext): StageResult {
  const drive = ctx.position.drive;
  if (drive.kind !== "self-driven") throw new Error("not a self-driven drive");
  const { position } = ctx;
  const id = position.id;
  const w = windingLevels(drive.winding, ctx.vin);
  const clamp = drive.clamp;
  const vHigh = clamp ? Math.max(Math.min(w.vHigh, clamp.zenerVoltage) - clamp.vbe, 0) : w.vHigh;
  const vLow = Math.min(w.vLow, vHigh);
  const net = gateElements(ctx);
  const wind = { part: `${id}.winding`, r: drive.windingResistance };
  const swing = vHigh - vLow;
  const vpl = position.mosfet.vpl;
  const NO = Number.POSITIVE_INFINITY;
  const on = seriesEdge([wind, ...net.on], { peakDrive: swing, plateauDrive: vHigh - vpl, limit: NO });
  const off = seriesEdge([wind, ...net.off], { peakDrive: swing - net.offOffset, plateauDrive: vpl - vLow - net.offOffset, limit: NO });
  const el = `positions.${ctx.positionIndex}.drive`;
  return {
    vHigh, vLow, on, off,
    drops: clamp ? [{ part: `${id}.clamp`, mechanism: "clamp", volts: Math.max(w.vHigh - vHigh, 0) }] : [],
    fixed: clamp ? [{ part: `${id}.zener`, mechanism: "clamp", watts: Math.max(w.vHigh, 0) * clamp.zenerBiasCurrent * ctx.duty }] : [],
    magnetizing: null,
    transistors: clamp
      ? [{ part: `${id}.clamp`, icPeak: on.iPeak, icMax: clamp.icMax ?? null, pMax: clamp.pMax ?? null, element: `${el}.clamp` }]
      : [],
    windingHigh: w.vHigh,
    levelElement: clamp ? `${el}.clamp.zenerVoltage` : `${el}.winding`,
  };
}
