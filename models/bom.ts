/**
 * Part count and cost of a design's gate-drive chain from the `cost` fields
 * of the document (unit costs, USD). The gate network's `cost` is the total
 * for its resistors and diode; a clamp's cost covers follower, zener and
 * bias resistor. Parts without a cost count as parts at 0 USD and are listed
 * in `unpriced`.
 */
import type { Design } from "./input/schema";

export interface BomLine {
  ref: string;
  partNumber: string | null;
  quantity: number;
  unitCost: number | null;
}

export interface Bom {
  lines: BomLine[];
  partCount: number;
  cost: number;
  unpriced: string[];
}

export function designBom(design: Design): Bom {
  const lines: BomLine[] = [];
  const add = (ref: string, partNumber: string | undefined, quantity: number, unitCost: number | undefined) =>
    lines.push({ ref, partNumber: partNumber ?? null, quantity, unitCost: unitCost ?? null });
  add("controller", design.controller.partNumber, 1, design.controller.cost);
  for (const p of design.positions) {
    add(p.id, p.mosfet.partNumber, p.mosfet.count, p.mosfet.cost);
    const d = p.drive;
    if (p.conduction.mode === "body-diode" || d.kind === "none") continue;
    const gateParts = 1 + (p.gate.rTurnOff !== undefined ? 1 : 0) + (p.gate.steeringDiode ? 1 : 0);
    lines.push({ ref: `${p.id}.gate`, partNumber: null, quantity: gateParts, unitCost: p.gate.cost !== undefined ? p.gate.cost / gateParts : null });
    if (d.kind === "bjt-follower") {
      add(`${p.id}.npn`, d.npn.partNumber, 1, d.npn.cost);
      add(`${p.id}.pnp`, d.pnp.partNumber, 1, d.pnp.cost);
    }
    if (d.kind === "driver-ic") add(`${p.id}.driver`, d.partNumber, 1, d.cost);
    if (d.kind === "transformer") {
      add(`${p.id}.gdt`, d.partNumber, 1, d.cost);
      if (d.driver) add(`${p.id}.driver`, d.driver.partNumber, 1, d.driver.cost);
    }
    if (d.kind === "self-driven" && d.clamp)
      lines.push({ ref: `${p.id}.clamp`, partNumber: d.clamp.partNumber ?? null, quantity: 3, unitCost: d.clamp.cost !== undefined ? d.clamp.cost / 3 : null });
  }
  return {
    lines,
    partCount: lines.reduce((s, l) => s + l.quantity, 0),
    cost: lines.reduce((s, l) => s + l.quantity * (l.unitCost ?? 0), 0),
    unpriced: lines.filter((l) => l.unitCost === null).map((l) => l.ref),
  };
}
