/**
 * Gate-drive transformer (DOMAIN item 5).
 *
 * n = Nsec/Npri. The primary is switched between 0 and Vp by the controller
 * pin or a driver IC.
 *  - AC-coupled (series DC-blocking capacitor): the capacitor charges to the
 *    average D·Vp, so the winding sees Vp(1−D) and −Vp·D (volt-second
 *    balance of the magnetizing inductance, Erickson & Maksimović 3rd ed.
 *    2020 ch. 2 on inductor volt-second balance); the gate swings
 *    +n·Vp·(1−D) / −n·Vp·D. Positive drive shrinks as the duty grows.
 *  - DC-restored (diode + capacitor on the secondary): fixed vPos / vNeg.
 * Resistances on the primary appear × n² at the gate, currents ÷ n.
 * The magnetizing current (optional Lm) is a zero-average triangle of
 * peak-to-peak Vp·D·(1−D)/(Lm·fsw) (AC-coupled winding voltage × on-time),
 * RMS = Ipp/√12, burnt in the primary source and winding resistance.
 * Energy in the blocking capacitor's ESR and the restoring diodes is ignored.
 */
import { NO_LIMIT, type StageContext, type StageResult, gateElements, seriesEdge } from "./driveCommon";

/** Gate levels of an AC-coupled transformer drive: +nV(1−D), −nV·D. */
export function acCoupledLevels({ vPrimary, turnsRatio, duty }: { vPrimary: number; turnsRatio: number; duty: number }): {
  vHigh: number; vLow: number;
} {
  const d = Math.min(Math.max(duty, 0), 1);
  return { vHigh: turnsRatio * vPrimary * (1 - d), vLow: -turnsRatio * vPrimary * d };
}

export function transformerStage(ctx: StageContext): StageResult {
  const drive = ctx.position.drive;
  if (drive.kind !== "transformer") throw new Error("not a transformer drive");
  const { controller, position } = ctx;
  const id = position.id;
  const n = drive.turnsRatio;
  const drv = drive.driver;
  const srcPart = drv ? `${id}.driver` : "controller";
  const vPrimary = drv ? (drv.supply ?? controller.vcc) - drv.vNeg : controller.vcc;
  const rSrc = drv ? drv.sourceResistance : controller.pin.sourceResistance;
  const rSnk = drv ? drv.sinkResistance : controller.pin.sinkResistance;
  const limSrc = (drv ? drv.sourcePeakCurrent : controller.pin.sourceCurrentLimit) ?? NO_LIMIT;
  const limSnk = (drv ? drv.sinkPeakCurrent : controller.pin.sinkCurrentLimit) ?? NO_LIMIT;
  const levels =
    drive.mode === "ac-coupled"
      ? acCoupledLevels({ vPrimary, turnsRatio: n, duty: ctx.duty })
      : { vHigh: drive.vPos ?? 0, vLow: drive.vNeg ?? 0 };
  const { vHigh, vLow } = levels;
  const net = gateElements(ctx);
  const winding = { part: `${id}.gdt`, r: drive.primaryResistance * n * n + drive.secondaryResistance };
  const swing = vHigh - vLow;
  const vpl = position.mosfet.vpl;
  const on = seriesEdge([{ part: srcPart, r: rSrc * n * n }, winding, ...net.on], {
    peakDrive: swing, plateauDrive: vHigh - vpl, limit: limSrc / n,
  });
  const off = seriesEdge([{ part: srcPart, r: rSnk * n * n }, winding, ...net.off], {
    peakDrive: swing - net.offOffset, plateauDrive: vpl - vLow - net.offOffset, limit: limSnk / n,
  });
  const fixed: StageResult["fixed"] = [];
  if (drv) {
    fixed.push({ part: `${id}.driver`, mechanism: "quiescent", watts: vPrimary * drv.iq });
    fixed.push({ part: "controller", mechanism: "gateDrive", watts: controller.vcc * drv.inputCurrent * ctx.duty });
  }
  const d = Math.min(Math.max(ctx.duty, 0), 1);
  const magnetizing = drive.magnetizingInductance
    ? {
        k: (vPrimary * d * (1 - d)) / drive.magnetizingInductance,
        ippMax: (2 * vPrimary) / Math.max(0.5 * (rSrc + rSnk) + drive.primaryResistance, 1e-3),
        parts: [
          { part: srcPart, resistance: 0.5 * (rSrc + rSnk) },
          { part: `${id}.gdt`, resistance: drive.primaryResistance },
        ],
      }
    : null;
  return {
    vHigh, vLow, on, off, drops: [], fixed, magnetizing, transistors: [], windingHigh: null,
    levelElement: `positions.${ctx.positionIndex}.drive.${drive.mode === "ac-coupled" ? "turnsRatio" : "vPos"}`,
  };
}
