/**
 * Naming of the parts a design produces. Junction parts have a Tj; loss
 * buckets (resistors, transformer windings, the zener string) only collect
 * watts.
 *
 *   controller                  the PWM controller IC
 *   <pos>                       the MOSFET position (all `count` devices)
 *   <pos>.npn / <pos>.pnp       follower transistors
 *   <pos>.driver                driver IC (direct or on a transformer primary)
 *   <pos>.clamp                 self-driven clamp transistor
 *   <pos>.rgOn / <pos>.rgOff    external gate resistors (bucket)
 *   <pos>.rBase                 follower base resistors (bucket)
 *   <pos>.gdt / <pos>.winding   gate transformer / drive winding copper (bucket)
 *   <pos>.zener                 clamp zener and its bias resistor (bucket)
 */

export type PartKind = "controller" | "mosfet" | "bjt" | "driver-ic" | "clamp" | "resistor" | "transformer" | "zener";

interface PositionLike {
  id: string;
  drive: { kind: string; driver?: unknown; clamp?: unknown };
}

/** Ids of the parts with a junction (the ones thermal coupling may name). */
export function junctionPartIds(positions: readonly PositionLike[]): string[] {
  const ids = ["controller"];
  for (const p of positions) {
    ids.push(p.id);
    const k = p.drive.kind;
    if (k === "bjt-follower") ids.push(`${p.id}.npn`, `${p.id}.pnp`);
    if (k === "driver-ic" || (k === "transformer" && p.drive.driver)) ids.push(`${p.id}.driver`);
    if (k === "self-driven" && p.drive.clamp) ids.push(`${p.id}.clamp`);
  }
  return ids;
}

export const POSITION_ID_PATTERN = /^[A-Za-z][A-Za-z0-9_-]{0,19}$/;
