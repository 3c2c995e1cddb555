/**
 * The per-corner computation on a prepared design, written for speed: it
 * fills preallocated arrays and reuses drive-stage results, so a sweep can
 * call it tens of thousands of times. Reports are built from the arrays in
 * evaluateReport.ts. Position losses: evaluatePosition.ts; thermal groups:
 * evaluateThermal.ts; shared shapes: evaluateTypes.ts.
 */
import type { Design, Position } from "./input/schema";
import { qgs2, type GateChargeCurve } from "./gateCharge";
import { cornerWaveform } from "./waveform";
import { buildParts, buildThermalGroups } from "./registry";
import { M, NM, type CornerOverrides, type Prepared, type PositionWork } from "./evaluateTypes";
import { computePosition } from "./evaluatePosition";
import { groupSolver, solveGroup } from "./evaluateThermal";

export { NM } from "./evaluateTypes";
export type { CornerOverrides, Prepared, PreparedPosition, PositionWork } from "./evaluateTypes";

export function prepare(design: Design): Prepared {
  const parts = buildParts(design);
  const partIndex = new Map(parts.map((p, i) => [p.id, i]));
  const positions = design.positions.map((position, index) => {
    const m = position.mosfet;
    const curve: GateChargeCurve = { qgs: m.qgs, qgd: m.qgd, qg: m.qg, qgVgs: m.qgVgs, vth: m.vth, vpl: m.vpl, ciss: m.ciss };
    return {
      position, index, part: partIndex.get(position.id) as number, curve, qgs2: qgs2(curve),
      cornerWaveforms: design.corners.map((c) => cornerWaveform(position, c)), memo: null,
      work: null as unknown as PositionWork,
    };
  });
  const groups = buildThermalGroups(design, parts, partIndex);
  const groupOfPart = new Int32Array(parts.length).fill(-1);
  groups.forEach((g, gi) => g.nodes.forEach((p) => (groupOfPart[p] = gi)));
  // Every drive except a self-driven winding loads the controller (pin current or driver input).
  const touchesController = (p: Position) =>
    p.conduction.mode === "channel" && p.drive.kind !== "self-driven" && p.drive.kind !== "none";
  const groupPositions = groups.map((g) =>
    positions
      .filter((pp) => g.nodes.some((n) => parts[n].positionIndex === pp.index || (n === 0 && touchesController(pp.position))))
      .map((pp) => pp.index),
  );
  const prep: Prepared = {
    design, parts, partIndex, groups, solvers: groups.map((g) => groupSolver({ parts, design }, g)), positions,
    loss: new Float64Array(parts.length * NM), tj: new Float64Array(parts.length), runaway: new Uint8Array(parts.length),
    condCoef: new Float64Array(parts.length), work: [], last: { corner: -1, fsw: 0, ambient: 0, vin: 0 },
    complete: false, groupOfPart, groupPositions,
  };
  for (const pp of positions) {
    computePosition(prep, pp, 0, design.corners[0], {}, design.corners[0].fsw, design.corners[0].vin);
  }
  prep.work = positions.map((pp) => pp.work);
  return prep;
}


/**
 * Compute corner `ci` (with optional sweep overrides) into prep.loss /
 * prep.tj / prep.runaway / prep.work. Returns false if any group ran away.
 */
export function computeCorner(prep: Prepared, ci: number, ov: CornerOverrides = {}): boolean {
  const design = prep.design;
  const corner = design.corners[ci];
  const fsw = ov.fsw ?? corner.fsw;
  const ambient = ov.ambient ?? corner.ambient;
  const vin = ov.vin ?? corner.vin;
  prep.loss.fill(0);
  prep.condCoef.fill(0);
  prep.runaway.fill(0);
  const c = design.controller;
  prep.loss[0 * NM + M.quiescent] += c.vcc * c.iq;
  for (let i = 0; i < prep.positions.length; i++) computePosition(prep, prep.positions[i], ci, corner, ov, fsw, vin);
  let ok = true;
  for (const g of prep.solvers) if (!solveGroup(prep, g, ambient)) ok = false;
  prep.complete = true;
  const last = prep.last;
  last.corner = ci;
  last.fsw = fsw;
  last.ambient = ambient;
  last.vin = vin;
  return ok;
}


/**
 * Temperature rise of one part at a corner, K; null on runaway or for a part
 * without a junction. Computes only the part's thermal group (the sweep's
 * hot path); the Prepared object is then incomplete for buildCornerResult.
 */
export function partRise(prep: Prepared, ci: number, part: number, ov: CornerOverrides = {}): number | null {
  const gi = prep.groupOfPart[part];
  if (gi < 0) return null;
  const corner = prep.design.corners[ci];
  const fsw = ov.fsw ?? corner.fsw;
  const ambient = ov.ambient ?? corner.ambient;
  const vin = ov.vin ?? corner.vin;
  prep.loss.fill(0);
  prep.condCoef.fill(0);
  prep.runaway.fill(0);
  const c = prep.design.controller;
  prep.loss[M.quiescent] = c.vcc * c.iq;
  const list = prep.groupPositions[gi];
  for (let i = 0; i < list.length; i++) computePosition(prep, prep.positions[list[i]], ci, corner, ov, fsw, vin);
  const ok = solveGroup(prep, prep.solvers[gi], ambient);
  prep.complete = false;
  return ok ? prep.tj[part] - ambient : null;
}

