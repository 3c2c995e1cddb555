/**
 * Drive stages: what each kind of drive puts on the gate (levels, series
 * paths, current limits) and where its energy goes. Direct and driver-IC
 * drives live here; followers, transformers and self-driven windings have
 * their own files. Every stage returns a `StageResult` (driveCommon.ts)
 * that does not depend on fsw or the gate charge.
 */
import { NO_LIMIT, type StageContext, type StageResult, gateElements, seriesEdge, zeroEdge } from "./driveCommon";
import { bjtFollowerStage } from "./driveBjt";
import { transformerStage } from "./driveTransformer";
import { selfDrivenStage } from "./driveSelf";

export * from "./driveCommon";
export { hfeAt, followerCurrent, peakHfe } from "./driveBjt";
export { acCoupledLevels } from "./driveTransformer";
export { windingLevels } from "./driveSelf";

/** Controller pin straight to the gate: 0 … Vcc through the pin's source/sink resistance. */
function directStage(ctx: StageContext): StageResult {
  const { controller, position } = ctx;
  const net = gateElements(ctx);
  const vHigh = controller.vcc;
  const vpl = position.mosfet.vpl;
  const on = seriesEdge([{ part: "controller", r: controller.pin.sourceResistance }, ...net.on], {
    peakDrive: vHigh, plateauDrive: vHigh - vpl, limit: controller.pin.sourceCurrentLimit ?? NO_LIMIT,
  });
  const off = seriesEdge([{ part: "controller", r: controller.pin.sinkResistance }, ...net.off], {
    peakDrive: vHigh - net.offOffset, plateauDrive: vpl - net.offOffset, limit: controller.pin.sinkCurrentLimit ?? NO_LIMIT,
  });
  return {
    vHigh, vLow: 0, on, off, drops: [], fixed: [], magnetizing: null, transistors: [], windingHigh: null,
    levelElement: "controller.vcc",
  };
}

/** Gate-driver IC between its rails (supply default the controller Vcc, vNeg ≤ 0). */
function driverIcStage(ctx: StageContext): StageResult {
  const drive = ctx.position.drive;
  if (drive.kind !== "driver-ic") throw new Error("not a driver-ic drive");
  const { controller, position } = ctx;
  const id = position.id;
  const net = gateElements(ctx);
  const vHigh = drive.supply ?? controller.vcc;
  const vLow = drive.vNeg;
  const vpl = position.mosfet.vpl;
  const part = `${id}.driver`;
  const on = seriesEdge([{ part, r: drive.sourceResistance }, ...net.on], {
    peakDrive: vHigh - vLow, plateauDrive: vHigh - vpl, limit: drive.sourcePeakCurrent ?? NO_LIMIT,
  });
  const off = seriesEdge([{ part, r: drive.sinkResistance }, ...net.off], {
    peakDrive: vHigh - vLow - net.offOffset, plateauDrive: vpl - vLow - net.offOffset, limit: drive.sinkPeakCurrent ?? NO_LIMIT,
  });
  return {
    vHigh, vLow, on, off, drops: [],
    fixed: [
      { part, mechanism: "quiescent", watts: (vHigh - vLow) * drive.iq },
      // The driver input is a load on the controller pin while it is high.
      { part: "controller", mechanism: "gateDrive", watts: controller.vcc * drive.inputCurrent * ctx.duty },
    ],
    magnetizing: null, transistors: [], windingHigh: null,
    levelElement: `positions.${ctx.positionIndex}.drive.supply`,
  };
}

/** Gate held off (body-diode rectifier): no drive energy. */
function noStage(ctx: StageContext): StageResult {
  return {
    vHigh: 0, vLow: 0, on: zeroEdge(), off: zeroEdge(), drops: [], fixed: [], magnetizing: null, transistors: [],
    windingHigh: null, levelElement: `positions.${ctx.positionIndex}.drive`,
  };
}

export function driveStage(ctx: StageContext): StageResult {
  if (ctx.position.conduction.mode === "body-diode") return noStage(ctx);
  switch (ctx.position.drive.kind) {
    case "direct":
      return directStage(ctx);
    case "bjt-follower":
      return bjtFollowerStage(ctx);
    case "driver-ic":
      return driverIcStage(ctx);
    case "transformer":
      return transformerStage(ctx);
    case "self-driven":
      return selfDrivenStage(ctx);
    case "none":
      return noStage(ctx);
  }
}
