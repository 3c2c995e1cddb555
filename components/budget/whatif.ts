/**
 * What-if knobs on a design document: read the current values, and write
 * new ones into a copy of the raw document (SI numbers, which the schema
 * accepts beside unit strings). The same writes applied to the server's
 * parsed design give the trial design the dashboard evaluates with the same
 * models code the server runs, so the browser needs neither the schema nor
 * the unit parser; `trialIssues` applies the schema's bounds for the four
 * knobs, and the server validates the raw copy again when "Save as new
 * revision" sends it. Unit tests hold the trial design equal to a parse of
 * the raw copy. Pure.
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
import type { Design } from "@/models/schema";
import { AMBIENT_RANGE_C, FSW_RANGE_HZ } from "@/models/bounds";
import { DIMENSIONS, formatQuantity, type Dimension } from "@/models/quantityFormat";

type Json = unknown;
type Obj = Record<string, Json>;

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

function get(design: unknown, path: string): number | undefined {
  let cur: Json = design;
  for (const k of path.split(".")) {
    if (cur === null || typeof cur !== "object") return undefined;
    cur = (cur as Obj)[k];
  }
  return typeof cur === "number" ? cur : undefined;
}

/** Current knob values, read from the parsed (SI) design. */
export function readKnobs(design: Design, t: KnobTargets): Knobs {
  return {
    fsw: design.corners[0].fsw,
    ambient: Math.max(...design.corners.map((c) => c.ambient)),
    rOn: design.positions[t.positionIndex].gate.rTurnOn,
    driveVoltage: t.driveElement ? (get(design, t.driveElement) ?? null) : null,
  };
}

function clone<T>(v: T): T {
  return JSON.parse(JSON.stringify(v)) as T;
}

function setNumber(doc: Obj, path: string, value: number): void {
  const keys = path.split(".");
  let cur: Obj = doc;
  for (const k of keys.slice(0, -1)) {
    const next = cur[k];
    if (next === null || typeof next !== "object") throw new Error(`no element "${path}" in the document`);
    cur = next as Obj;
  }
  cur[keys[keys.length - 1]] = value;
}

/**
 * A copy of the raw document with the knobs applied. `design` is the parsed
 * original (SI values to scale from); the raw document keeps every field
 * the knobs do not touch exactly as the user typed it.
 */
export function applyKnobs(document: unknown, design: Design, t: KnobTargets, knobs: Knobs): unknown {
  const doc = clone(document) as Obj;
  const now = readKnobs(design, t);
  const fswFactor = now.fsw > 0 ? knobs.fsw / now.fsw : 1;
  const ambientShift = knobs.ambient - now.ambient;
  design.corners.forEach((c, i) => {
    if (fswFactor !== 1) setNumber(doc, `corners.${i}.fsw`, c.fsw * fswFactor);
    if (ambientShift !== 0) setNumber(doc, `corners.${i}.ambient`, c.ambient + ambientShift);
  });
  const gate = design.positions[t.positionIndex].gate;
  if (knobs.rOn !== null && now.rOn !== null && knobs.rOn !== now.rOn) {
    setNumber(doc, t.rOnElement, knobs.rOn);
    if (gate.rTurnOff !== undefined && now.rOn > 0) setNumber(doc, `positions.${t.positionIndex}.gate.rTurnOff`, (gate.rTurnOff * knobs.rOn) / now.rOn);
  }
  if (t.driveElement && knobs.driveVoltage !== null && knobs.driveVoltage !== now.driveVoltage) setNumber(doc, t.driveElement, knobs.driveVoltage);
  return doc;
}

/** The parsed design with the knobs applied: what parseDesign(applyKnobs(document, ...)) gives, without parsing. */
export function applyKnobsToDesign(design: Design, t: KnobTargets, knobs: Knobs): Design {
  return applyKnobs(design, design, t, knobs) as Design;
}

/**
 * Why trial values would not make a valid design, in the schema's words
 * ("path: message"); empty when they would. The bounds are the schema's own
 * (models/bounds.ts, and the plausibility range of each dimension).
 */
export function trialIssues(design: Design, t: KnobTargets, knobs: Knobs): string[] {
  const issues: string[] = [];
  const now = readKnobs(design, t);
  /** The schema's rule for one value: at least `min` (above it when `above`), at most `max`. */
  const check = (path: string, v: number, dim: Dimension, min: number, max: number, above = false) => {
    if (Number.isFinite(v) && (above ? v > min : v >= min) && v <= max) return;
    issues.push(`${path}: must be ${above ? "above" : "at least"} ${formatQuantity(min, dim)} and at most ${formatQuantity(max, dim)}, got ${formatQuantity(v, dim, 4)}`);
  };
  const fswFactor = now.fsw > 0 ? knobs.fsw / now.fsw : 1;
  design.corners.forEach((c, i) => {
    check(`corners.${i}.fsw`, c.fsw * fswFactor, "frequency", FSW_RANGE_HZ.min, FSW_RANGE_HZ.max);
    check(`corners.${i}.ambient`, c.ambient + (knobs.ambient - now.ambient), "temperature", AMBIENT_RANGE_C.min, AMBIENT_RANGE_C.max);
  });
  if (knobs.rOn !== null) check(t.rOnElement, knobs.rOn, "resistance", DIMENSIONS.resistance.min, DIMENSIONS.resistance.max);
  if (t.driveElement && knobs.driveVoltage !== null) check(t.driveElement, knobs.driveVoltage, "voltage", 0, DIMENSIONS.voltage.max, true);
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
