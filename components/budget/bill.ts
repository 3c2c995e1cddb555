/**
 * Part count and drive-chain cost from the design document's own `cost`
 * fields (parsed design, USD). The chain is everything the gate drive
 * decision touches: the controller, each MOSFET (times its parallel count),
 * buffer transistors, driver ICs, gate transformer, clamp and zener, and the
 * gate network (rTurnOn; rTurnOff and the steering diode when present). Parts
 * without a cost are counted and named in `missingCost`, so a total that
 * leaves something out says so. Pure.
 */
import type { Design } from "@/models/input/schema";

export interface DriveChainBill {
  partCount: number;
  /** Sum of the costs given, USD. */
  cost: number;
  /** Parts that carry no cost in the document. */
  missingCost: string[];
}

export function driveChainBill(design: Design): DriveChainBill {
  let partCount = 0;
  let cost = 0;
  const missingCost: string[] = [];
  /** `n` parts; `priced` of them at `c` each (a group priced as one has priced = 1). */
  const add = (name: string, c: number | undefined, n = 1, priced = n) => {
    partCount += n;
    if (c === undefined) missingCost.push(name);
    else cost += c * priced;
  };
  add("controller", design.controller.cost);
  for (const p of design.positions) {
    add(`${p.id} MOSFET`, p.mosfet.cost, p.mosfet.count);
    const d = p.drive;
    if (d.kind === "bjt-follower") {
      add(`${p.id} NPN`, d.npn.cost);
      add(`${p.id} PNP`, d.pnp.cost);
    } else if (d.kind === "driver-ic") add(`${p.id} driver IC`, d.cost);
    else if (d.kind === "transformer") {
      add(`${p.id} gate transformer`, d.cost);
      if (d.driver) add(`${p.id} transformer driver`, d.driver.cost);
    } else if (d.kind === "self-driven" && d.clamp) add(`${p.id} clamp (transistor and zener)`, d.clamp.cost, 2, 1);
    if (d.kind !== "none") {
      // The gate network's one cost covers all of its parts.
      const n = 1 + (p.gate.rTurnOff !== undefined ? 1 : 0) + (p.gate.steeringDiode ? 1 : 0);
      add(`${p.id} gate network`, p.gate.cost, n, 1);
    }
  }
  return { partCount, cost, missingCost };
}
