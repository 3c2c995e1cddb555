/**
 * What-if knobs (components/budget/WhatIf.tsx draws them): read the current
 * values from the parsed design, and turn new values into ONE list of edits,
 * each an SI number at a document path. The edits are the trial: written
 * into a copy of the raw document (the schema accepts SI numbers beside unit
 * strings) they are what "Save as new revision" sends, and written into the
 * server's parsed design (whose paths are the document's) they give the
 * trial design the dashboard evaluates with the same models code the server
 * runs, so the browser needs neither the schema nor the unit parser. Both
 * writes go through models/documentPath.ts; `trialIssues` checks the edits
 * against the schema's bounds, and the server validates the raw copy again
 * on save. A unit test holds the trial design equal to a parse of the
 * edited document. Pure.
 *
 * Choices (documented in the help text):
 *  - fsw and ambient move every corner together: fsw is scaled by one
 *    factor, the ambient shifted by one offset, so the corner structure
 *    (e.g. a cold light-load corner) is kept. The knob shows the value of
 *    the reference corner (fsw: the first corner; ambient: the hottest).
 *  - gate resistance: the chosen position's rTurnOn; a separate rTurnOff is scaled
 *    by the same factor so the on/off ratio is kept.
 *  - drive voltage: the rail that sets the chosen position's gate high
 *    level: its driver or follower `supply` when given, a DC-restored
 *    transformer's vPos, otherwise the controller's Vcc (which also feeds
 *    every other stage that defaults to it).
 */
import type { Design } from "@/models/input/schema";
import { AMBIENT_RANGE_C, FSW_RANGE_HZ } from "@/models/bounds";
import { DIMENSIONS, formatQuantity, type Dimension } from "@/models/quantityFormat";
import { getAt, setAt } from "@/models/documentPath";

export interface Knobs {
  fsw: number;
  ambient: number;
  rOn: number | null;
  driveVoltage: number | null;
}

export interface KnobTargets {
  positionIndex: number;
  positionId: string;
  /** Document path of the drive-voltage rail, null when the gate has none (self-driven, undriven). */
  driveElement: string | null;
  rOnElement: string;
}

export function knobTargets(design: Design, positionIndex: number): KnobTargets {
  const p = design.positions[positionIndex];
  const d = p.drive;
  const base = `positions.${positionIndex}.drive`;
  let driveElement: string | null = "controller.vcc";
  if ((d.kind === "bjt-follower" || d.kind === "driver-ic") && d.supply !== undefined) driveElement = `${base}.supply`;
  else if (d.kind === "transformer" && d.mode === "dc-restored") driveElement = `${base}.vPos`;
  else if (d.kind === "transformer" && d.driver?.supply !== undefined) driveElement = `${base}.driver.supply`;
  else if (d.kind === "self-driven" || d.kind === "none") driveElement = null;
  return { positionIndex, positionId: p.id, driveElement, rOnElement: `positions.${positionIndex}.gate.rTurnOn` };
}

/** Current knob values, read from the parsed (SI) design. */
export function readKnobs(design: Design, t: KnobTargets): Knobs {
  return {
    fsw: design.corners[0].fsw,
    ambient: Math.max(...design.corners.map((c) => c.ambient)),
    rOn: design.positions[t.positionIndex].gate.rTurnOn,
    driveVoltage: t.driveElement ? numberAt(design, t.driveElement) : null,
  };
}

const numberAt = (doc: unknown, path: string): number | null => {
  const v = getAt(doc, path);
  return typeof v === "number" ? v : null;
};

/** One knob's write: an SI value at a document path. */
export interface TrialEdit {
  path: string;
  value: number;
}

/** The knobs as edits, computed once from the parsed original (SI values to scale from). */
export function knobEdits(design: Design, t: KnobTargets, knobs: Knobs): TrialEdit[] {
  const edits: TrialEdit[] = [];
  const now = readKnobs(design, t);
  const fswFactor = now.fsw > 0 ? knobs.fsw / now.fsw : 1;
  const ambientShift = knobs.ambient - now.ambient;
  design.corners.forEach((c, i) => {
    if (fswFactor !== 1) edits.push({ path: `corners.${i}.fsw`, value: c.fsw * fswFactor });
    if (ambientShift !== 0) edits.push({ path: `corners.${i}.ambient`, value: c.ambient + ambientShift });
  });
  const gate = design.positions[t.positionIndex].gate;
  if (knobs.rOn !== null && now.rOn !== null && knobs.rOn !== now.rOn) {
    edits.push({ path: t.rOnElement, value: knobs.rOn });
    if (gate.rTurnOff !== undefined && now.rOn > 0) edits.push({ path: `positions.${t.positionIndex}.gate.rTurnOff`, value: (gate.rTurnOff * knobs.rOn) / now.rOn });
  }
  if (t.driveElement && knobs.driveVoltage !== null && knobs.driveVoltage !== now.driveVoltage) edits.push({ path: t.driveElement, value: knobs.driveVoltage });
  return edits;
}

/** A copy of `doc` (the raw document, or the parsed design) with the edits written; every other field as it was. */
export function withEdits<T>(doc: T, edits: readonly TrialEdit[]): T {
  return edits.reduce<unknown>((d, e) => setAt(d, e.path, e.value), doc) as T;
}

/**
 * Why trial values would not make a valid design, in the schema's words
 * ("path: message"); empty when they would. The bounds are the schema's own
 * (models/bounds.ts, and the plausibility range of each dimension).
 */
export function trialIssues(edits: readonly TrialEdit[]): string[] {
  const issues: string[] = [];
  /** The schema's rule for one value: at least `min` (above it when `above`), at most `max`. */
  const check = (path: string, v: number, dim: Dimension, min: number, max: number, above = false) => {
    if (Number.isFinite(v) && (above ? v > min : v >= min) && v <= max) return;
    issues.push(`${path}: must be ${above ? "above" : "at least"} ${formatQuantity(min, dim)} and at most ${formatQuantity(max, dim)}, got ${formatQuantity(v, dim, 4)}`);
  };
  for (const { path, value } of edits) {
    const leaf = path.slice(path.lastIndexOf(".") + 1);
    if (path.startsWith("corners.") && leaf === "fsw") check(path, value, "frequency", FSW_RANGE_HZ.min, FSW_RANGE_HZ.max);
    else if (path.startsWith("corners.") && leaf === "ambient") check(path, value, "temperature", AMBIENT_RANGE_C.min, AMBIENT_RANGE_C.max);
    else if (leaf === "rTurnOn" || leaf === "rTurnOff") check(path, value, "resistance", DIMENSIONS.resistance.min, DIMENSIONS.resistance.max);
    else check(path, value, "voltage", 0, DIMENSIONS.voltage.max, true); // a drive rail
  }
  return issues;
}

export function knobsChanged(a: Knobs, b: Knobs): boolean {
  return a.fsw !== b.fsw || a.ambient !== b.ambient || a.rOn !== b.rOn || a.driveVoltage !== b.driveVoltage;
}

/** Slider ranges around the design value (our choice: wide enough to find the edge). */
export function knobRanges(k: Knobs) {
  return {
    fsw: { min: Math.max(10e3, k.fsw * 0.25), max: k.fsw * 3, step: 5e3 },
    ambient: { min: -40, max: Math.max(125, k.ambient + 20), step: 1 },
    rOn: { min: 0, max: Math.max(22, (k.rOn ?? 0) * 4), step: 0.1 },
    driveVoltage: { min: 4, max: Math.max(20, (k.driveVoltage ?? 0) * 1.5), step: 0.1 },
  };
}
