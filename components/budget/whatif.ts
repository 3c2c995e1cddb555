/**
 * What-if knobs on a design document: read the current values, and write
 * new ones into a copy of the raw document (SI numbers, which the schema
 * accepts beside unit strings). The dashboard re-parses and re-evaluates the
 * copy with the same models code the server runs, and the same copy is what
 * "Save as new revision" sends. Pure; unit-tested.
 *
 * Choices (documented in the help text):
 *  - fsw and ambient move every corner together: fsw is scaled by one
 *    factor, the ambient shifted by one offset, so the corner structure
 *    (e.g. a cold light-load corner) is kept. The knob shows the value of
 *    the reference corner (fsw: the first corner; ambient: the hottest).
 *  - gate resistance: the chosen position's rOn; a separate rOff is scaled
 *    by the same factor so the on/off ratio is kept.
 *  - drive voltage: the rail that sets the chosen position's gate high
 *    level: its driver or follower `supply` when given, a DC-restored
 *    transformer's vPos, otherwise the controller's Vcc (which also feeds
 *    every other stage that defaults to it).
 */
import type { Design } from "@/models/schema";

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
  return { positionIndex, positionId: p.id, driveElement, rOnElement: `positions.${positionIndex}.gate.rOn` };
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
    rOn: design.positions[t.positionIndex].gate.rOn,
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
    if (gate.rOff !== undefined && now.rOn > 0) setNumber(doc, `positions.${t.positionIndex}.gate.rOff`, (gate.rOff * knobs.rOn) / now.rOn);
  }
  if (t.driveElement && knobs.driveVoltage !== null && knobs.driveVoltage !== now.driveVoltage) setNumber(doc, t.driveElement, knobs.driveVoltage);
  return doc;
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
