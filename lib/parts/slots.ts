/**
 * Where library parts plug into a design document. Each slot has the key
 * its part reference is recorded under (option_revision.part_refs), the
 * document path its datasheet values are copied into, and the library kind
 * it takes. Client-safe: the editor's part pickers and the demo seed (which
 * resolves part numbers to library ids) read the same list.
 */
// relative import: the demo seed loads this file under tsx, outside Next's aliases
import { PART_KIND_DEFS, type PartKind } from "./kinds";
import { getAt } from "../../models/documentPath";

export interface PartSlot {
  /** part_refs key, e.g. "positions.0.drive.npn" or "positions.1.drive.clamp.zener". */
  ref: string;
  /** Document path the part's values are copied into. */
  target: string;
  kind: PartKind;
  label: string;
  /** The field in the target that names the part. */
  partNumberKey: string;
  /** Only these keys of the library block are copied (the clamp takes part of a transistor). */
  pick?: string[];
}

type Doc = Record<string, unknown>;

const CLAMP_TRANSISTOR_KEYS = ["partNumber", "cost", "vbe", "icMax", "pMax", "rthJA", "tjMax"];

export function partSlots(doc: unknown): PartSlot[] {
  const slots: PartSlot[] = [{ ref: "controller", target: "controller", kind: "controller", label: "PWM controller", partNumberKey: "partNumber" }];
  const positions = (getAt(doc, "positions") as Doc[] | undefined) ?? [];
  positions.forEach((p, i) => {
    const at = `positions.${i}`;
    const id = String(p?.id ?? i + 1);
    slots.push({ ref: `${at}.mosfet`, target: `${at}.mosfet`, kind: "mosfet", label: `${id} MOSFET`, partNumberKey: "partNumber" });
    const drive = (p?.drive ?? {}) as Doc;
    if (drive.kind === "bjt-follower") {
      slots.push({ ref: `${at}.drive.npn`, target: `${at}.drive.npn`, kind: "bjt", label: `${id} NPN follower`, partNumberKey: "partNumber" });
      slots.push({ ref: `${at}.drive.pnp`, target: `${at}.drive.pnp`, kind: "bjt", label: `${id} PNP follower`, partNumberKey: "partNumber" });
    }
    if (drive.kind === "driver-ic") slots.push({ ref: `${at}.drive`, target: `${at}.drive`, kind: "driver-ic", label: `${id} driver IC`, partNumberKey: "partNumber" });
    if (drive.kind === "transformer") {
      slots.push({ ref: `${at}.drive`, target: `${at}.drive`, kind: "gate-transformer", label: `${id} gate-drive transformer`, partNumberKey: "partNumber" });
      if (drive.driver) slots.push({ ref: `${at}.drive.driver`, target: `${at}.drive.driver`, kind: "driver-ic", label: `${id} transformer driver`, partNumberKey: "partNumber" });
    }
    if (drive.kind === "self-driven" && drive.clamp) {
      slots.push({ ref: `${at}.drive.clamp`, target: `${at}.drive.clamp`, kind: "bjt", label: `${id} clamp transistor`, partNumberKey: "partNumber", pick: CLAMP_TRANSISTOR_KEYS });
      slots.push({ ref: `${at}.drive.clamp.zener`, target: `${at}.drive.clamp`, kind: "zener", label: `${id} clamp zener`, partNumberKey: "zenerPartNumber" });
    }
    const gate = (p?.gate ?? {}) as Doc;
    if (gate.steeringDiode) slots.push({ ref: `${at}.gate.steeringDiode`, target: `${at}.gate.steeringDiode`, kind: "diode", label: `${id} steering diode`, partNumberKey: "" });
  });
  return slots;
}

/** Design choices a part kind may carry but a part without them must not erase (rails, parallel count, base resistor). */
const DESIGN_KEYS = new Set(["supply", "vNeg", "count", "rBase", "kind", "mode", "vPos", "driver"]);

/** Keys a library part of this kind owns in its target block (cleared before copying, so no stale value stays). */
export function ownedKeys(slot: PartSlot, block: Record<string, unknown>): string[] {
  if (slot.pick) return slot.pick;
  const fromDefs = PART_KIND_DEFS[slot.kind].fields.map((f) => f.key.split(".")[0]).filter((k) => !DESIGN_KEYS.has(k));
  return [...new Set([...fromDefs, ...Object.keys(block).filter((k) => k !== "kind"), "partNumber", "cost", "tolerance"])];
}

/**
 * The target block after copying `block` (a library part as the model's
 * datasheet block) into it: the part's own keys replaced, design choices
 * (count, rBase, kind, rails, clamp zener) kept.
 */
export function applyPartBlock(slot: PartSlot, current: unknown, block: Record<string, unknown>): Record<string, unknown> {
  const next: Record<string, unknown> = { ...((current as Record<string, unknown>) ?? {}) };
  const picked = slot.pick ? Object.fromEntries(Object.entries(block).filter(([k]) => slot.pick!.includes(k))) : block;
  if (slot.kind === "zener" || slot.kind === "diode") return { ...next, ...picked };
  for (const k of ownedKeys(slot, picked)) delete next[k];
  return { ...next, ...picked };
}
