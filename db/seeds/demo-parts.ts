// Demo parts library. Every part the demo options use (models/demoParts.ts,
// the same blocks models/demo.ts builds its options from, so library and
// options agree), plus a few extras. INVENTED: manufacturers, part numbers,
// values and prices describe no real company or product. Figures a library
// kind needs that the demo blocks do not carry (the zener's power rating,
// the transformer's volt-second rating) are invented here and marked.
//
// Idempotent: a part is inserted only when its (workspace, mpn) is missing,
// so a second run adds nothing and a user's edits are never overwritten.
import type { Knex } from "knex";
import { demoParts, type DemoPart } from "../../models/demoParts";
import { validatePartDraft, type PartDraft, type PartValues } from "../../lib/parts/values";
import { flattenPaths } from "../../models/documentPath";
import type { PartKind } from "../../lib/parts/kinds";
import { newRecordId } from "../ids";

const MAKER_BY_PREFIX: [RegExp, string][] = [
  [/^HRG-/, "Harrowgate Silicon (demo)"],
  [/^QN-|^QT-|^QZ-|^QD-/, "Quillmere Devices (demo)"],
  [/^GRW-/, "Greywell Magnetics (demo)"],
];

function makerOf(mpn: string): string {
  return MAKER_BY_PREFIX.find(([re]) => re.test(mpn))?.[1] ?? "Demo parts (invented)";
}

/** A demo block (design-document shape) as a library draft: part number, cost and tolerance move to their columns. */
function draftOf(p: DemoPart): PartDraft | null {
  const { partNumber: _pn, cost: _cost, tolerance, count: _count, ...block } = p.data as Record<string, unknown>;
  let kind: PartKind;
  let params: Record<string, unknown> = flattenPaths(block);
  switch (p.kind) {
    case "passive":
      return null; // gate resistors are part of a design's gate network, not library parts
    case "transformer":
      kind = "gate-transformer";
      params = { ...params, voltSecond: "40 V·µs", isolationVoltage: "1500 V" }; // invented ratings
      break;
    case "zener":
      // The demo clamp set names its zener; the library keeps the zener itself.
      kind = "zener";
      params = { vz: block.zenerVoltage, izTest: "5 mA", pzMax: "0.25 W", rthJA: "500 K/W" }; // invented ratings
      break;
    case "bjt":
      kind = "bjt";
      params = { ...params, polarity: /PNP/.test(p.description) ? "pnp" : "npn" };
      break;
    default:
      kind = p.kind;
  }
  return { kind, manufacturer: makerOf(p.partNumber), mpn: p.partNumber, description: `${p.description} (invented demo part)`, unitCost: p.unitCostUsd, params, tolerance: (tolerance ?? {}) as Record<string, unknown> };
}

/** Library-only demo parts beyond what the options use (invented). */
const EXTRA_DRAFTS: PartDraft[] = [
  {
    kind: "diode", manufacturer: makerOf("QD-"), mpn: "QD-SW75", description: "Fast switching diode for gate steering, SOD-323 (invented demo part)",
    unitCost: "0.01", params: { vf: "0.7 V", ifTest: "10 mA", vrrm: "75 V", trr: "4 ns", rthJA: "500 K/W", tjMax: "150 °C" }, tolerance: {},
  },
  {
    kind: "zener", manufacturer: makerOf("QZ-"), mpn: "QZ-15B", description: "15 V zener, SOD-123 (invented demo part)",
    unitCost: "0.02", params: { vz: "15 V", izTest: "5 mA", pzMax: "0.5 W", rthJA: "340 K/W", tjMax: "150 °C" }, tolerance: { rth: 0.15 },
  },
  {
    kind: "mosfet", manufacturer: makerOf("QN-"), mpn: "QN-100L7", description: "100 V 7 mΩ logic-level N-channel MOSFET (invented demo part)",
    unitCost: "0.85",
    params: { vdsMax: "100 V", qg: "28 nC", qgs: "7 nC", qgd: "6 nC", qgVgs: "4.5 V", vth: "1.8 V", vpl: "3 V", rgInt: "0.9 Ω", rds25: "7 mΩ", rdsHot: "12 mΩ", vgsMax: "16 V", rthJA: "45 K/W" },
    tolerance: { qg: 0.15, rdsOn: 0.2 },
  },
  {
    kind: "gate-transformer", manufacturer: makerOf("GRW-"), mpn: "GRW-T10", description: "1:1 gate-drive transformer, reinforced (invented demo part)",
    unitCost: "1.2", params: { turnsRatio: 1, magnetizingInductance: "450 µH", leakageInductance: "0.6 µH", voltSecond: "60 V·µs", isolationVoltage: "3000 V", primaryResistance: "0.2 Ω", secondaryResistance: "0.2 Ω" },
    tolerance: {},
  },
];

/** Every demo part as validated library values; throws when the demo data and the library schema disagree. */
export function demoPartValues(): PartValues[] {
  const drafts = [...demoParts.map(draftOf).filter((d): d is PartDraft => d !== null), ...EXTRA_DRAFTS];
  return drafts.map((d) => {
    const r = validatePartDraft(d);
    if (!r.ok) throw new Error(`demo part ${String(d.mpn)}: ${r.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`);
    return r.value;
  });
}

export async function seedDemoParts(trx: Knex | Knex.Transaction, workspaceId: string): Promise<number> {
  const rows = demoPartValues().map((v) => ({
    id: newRecordId("prt"),
    workspace_id: workspaceId,
    kind: v.kind,
    manufacturer: v.manufacturer,
    mpn: v.mpn,
    description: v.description,
    params: JSON.stringify(v.params),
    tolerance: JSON.stringify(v.tolerance),
    unit_cost: v.unitCost,
  }));
  const inserted = await trx("part").insert(rows).onConflict(["workspace_id", "mpn"]).ignore().returning("id");
  return inserted.length;
}
