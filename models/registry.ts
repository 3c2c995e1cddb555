/**
 * The parts a design produces (naming in partIds.ts), their thermal nodes,
 * the coupling matrix and its connected groups. Built once per design.
 */
import type { Design, Position } from "./input/schema";
import type { PartKind } from "./partIds";
import type { PartType } from "./policy";

export interface JunctionDef {
  /** Own path to ambient as used in the network, K/W (per device ÷ count for MOSFETs). */
  theta: number;
  tjMax: number;
  /** Derated limit = tjMax − policy margin for the part type, °C. */
  limit: number;
  type: PartType;
  /** Input element of the thermal path, for warnings. */
  thermalElement: string;
}

export interface PartDef {
  id: string;
  label: string;
  kind: PartKind;
  positionIndex: number | null;
  junction: JunctionDef | null;
  /** Input element that defines the part, for warnings. */
  element: string;
}

export interface ThermalGroup {
  /** Part indices of the junction parts in this group. */
  nodes: number[];
  /** Row-major Θ over `nodes`. */
  theta: Float64Array;
}

function junction(design: Design, type: PartType, theta: number, tjMax: number, thermalElement: string): JunctionDef {
  return { theta, tjMax, limit: tjMax - design.derating.tjMargin[type], type, thermalElement };
}

function mosfetTheta(m: Position["mosfet"]): number {
  return m.rthJA ?? (m.rthJC ?? 0) + (m.rthCS ?? 0) + (m.rthSA ?? 0);
}

export function buildParts(design: Design): PartDef[] {
  const c = design.controller;
  const parts: PartDef[] = [
    {
      id: "controller", label: c.partNumber ? `Controller ${c.partNumber}` : "Controller", kind: "controller",
      positionIndex: null, junction: junction(design, "controller", c.rthJA, c.tjMax, "controller.rthJA"), element: "controller",
    },
  ];
  design.positions.forEach((p, i) => {
    const el = `positions.${i}`;
    const add = (suffix: string, label: string, kind: PartKind, j: JunctionDef | null, element: string) =>
      parts.push({ id: `${p.id}${suffix}`, label, kind, positionIndex: i, junction: j, element });
    const m = p.mosfet;
    const mosfetLabel = `${p.id}${m.partNumber ? ` ${m.partNumber}` : ""}${m.count > 1 ? ` ×${m.count}` : ""}`;
    add("", mosfetLabel, "mosfet",
      junction(design, "mosfet", mosfetTheta(m) / m.count, m.tjMax, `${el}.mosfet.${m.rthJA !== undefined ? "rthJA" : "rthSA"}`),
      `${el}.mosfet`);
    const d = p.drive;
    const driven = p.conduction.mode === "channel" && d.kind !== "none";
    if (!driven) return;
    add(".rgOn", `${p.id} gate resistor (on)`, "resistor", null, `${el}.gate.rTurnOn`);
    if (p.gate.rTurnOff !== undefined || p.gate.steeringDiode) add(".rgOff", `${p.id} gate resistor (off)`, "resistor", null, `${el}.gate.rTurnOff`);
    if (d.kind === "bjt-follower") {
      add(".npn", `${p.id} NPN ${d.npn.partNumber ?? ""}`.trim(), "bjt", junction(design, "bjt", d.npn.rthJA, d.npn.tjMax, `${el}.drive.npn.rthJA`), `${el}.drive.npn`);
      add(".pnp", `${p.id} PNP ${d.pnp.partNumber ?? ""}`.trim(), "bjt", junction(design, "bjt", d.pnp.rthJA, d.pnp.tjMax, `${el}.drive.pnp.rthJA`), `${el}.drive.pnp`);
      if (d.npn.rBase > 0 || d.pnp.rBase > 0) add(".rBase", `${p.id} base resistors`, "resistor", null, `${el}.drive.npn.rBase`);
    }
    if (d.kind === "driver-ic")
      add(".driver", `${p.id} driver ${d.partNumber ?? ""}`.trim(), "driver-ic", junction(design, "driverIc", d.rthJA, d.tjMax, `${el}.drive.rthJA`), `${el}.drive`);
    if (d.kind === "transformer") {
      add(".gdt", `${p.id} gate transformer ${d.partNumber ?? ""}`.trim(), "transformer", null, `${el}.drive`);
      if (d.driver)
        add(".driver", `${p.id} driver ${d.driver.partNumber ?? ""}`.trim(), "driver-ic",
          junction(design, "driverIc", d.driver.rthJA, d.driver.tjMax, `${el}.drive.driver.rthJA`), `${el}.drive.driver`);
    }
    if (d.kind === "self-driven") {
      add(".winding", `${p.id} drive winding`, "transformer", null, `${el}.drive.windingResistance`);
      if (d.clamp) {
        add(".clamp", `${p.id} clamp transistor ${d.clamp.partNumber ?? ""}`.trim(), "clamp",
          junction(design, "clamp", d.clamp.rthJA, d.clamp.tjMax, `${el}.drive.clamp.rthJA`), `${el}.drive.clamp`);
        add(".zener", `${p.id} clamp zener and bias ${d.clamp.zenerPartNumber ?? ""}`.trim(), "zener", null, `${el}.drive.clamp.zenerBiasCurrent`);
      }
    }
  });
  return parts;
}

/** Split the junction parts into groups connected by coupling; each group is solved alone. */
export function buildThermalGroups(design: Design, parts: PartDef[], index: Map<string, number>): ThermalGroup[] {
  const nodes = parts.map((p, i) => (p.junction ? i : -1)).filter((i) => i >= 0);
  const parent = new Map<number, number>(nodes.map((i) => [i, i]));
  const find = (i: number): number => {
    let r = i;
    while (parent.get(r) !== r) r = parent.get(r) as number;
    return r;
  };
  const links: [number, number, number][] = [];
  for (const c of design.thermal.coupling) {
    const a = index.get(c.from);
    const b = index.get(c.to);
    if (a === undefined || b === undefined || !parts[a].junction || !parts[b].junction || a === b) continue;
    links.push([a, b, c.theta]);
    parent.set(find(a), find(b));
  }
  const byRoot = new Map<number, number[]>();
  for (const i of nodes) {
    const r = find(i);
    byRoot.set(r, [...(byRoot.get(r) ?? []), i]);
  }
  return [...byRoot.values()].map((members) => {
    const n = members.length;
    const theta = new Float64Array(n * n);
    members.forEach((p, k) => (theta[k * n + k] = (parts[p].junction as JunctionDef).theta));
    for (const [a, b, t] of links) {
      const ia = members.indexOf(a);
      const ib = members.indexOf(b);
      if (ia < 0 || ib < 0) continue;
      // Reciprocity: one entry couples both ways.
      theta[ia * n + ib] += t;
      theta[ib * n + ia] += t;
    }
    return { nodes: members, theta };
  });
}
