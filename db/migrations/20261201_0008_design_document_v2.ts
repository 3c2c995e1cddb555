import type { Knex } from "knex";
import {
  MOSFET_RENAMES_V1,
  OUTPUT_CAPACITANCE_RENAMES_V1,
  upgradeDesignDocument,
  upgradeMosfetBlockV1,
} from "../../models/schemaUpgrade";

// Design document version 2 (models/schemaUpgrade.ts): every stored
// revision document is rewritten from version 1 (no schemaVersion) to
// version 2 by the same pure function parseDesign runs, and the parts
// library's MOSFET params get the same renames (vTest -> qgVgs,
// outputCapacitance.vTest -> outputCapacitance.vds). Templates are code
// (models/demo.ts), not rows, so nothing else carries the old names.
//
// option_revision_frozen (20261201_0007_review.ts) refuses any change to the
// document of a revision frozen for review. This migration disables that
// trigger for its own updates and enables it again before it ends, inside
// the same transaction (knex runs each migration in one), so no other
// session ever sees the table unguarded. That is honest only because the
// upgrade is a lossless rename: every value, unit string and array order a
// reviewer approved stays as it was; only field names change and
// schemaVersion: 2 is added, and the revision evaluates to the same numbers.
// The activity log is not touched (its trigger logs inserts only).

const BATCH = 500;

type Json = Record<string, unknown>;

async function eachRevision(knex: Knex, visit: (row: { option_id: string; revision: number; document: unknown }) => Promise<void>): Promise<void> {
  let after: [string, number] = ["", 0];
  for (;;) {
    const rows = await knex("option_revision")
      .whereRaw("(option_id, revision) > (?, ?)", after)
      .orderBy([{ column: "option_id" }, { column: "revision" }])
      .limit(BATCH)
      .select("option_id", "revision", "document");
    for (const r of rows) await visit(r);
    if (rows.length < BATCH) return;
    const last = rows[rows.length - 1];
    after = [last.option_id, last.revision];
  }
}

export async function up(knex: Knex): Promise<void> {
  await knex.raw("alter table option_revision disable trigger option_revision_frozen");
  await eachRevision(knex, async (r) => {
    const { document, fromVersion } = upgradeDesignDocument(r.document);
    if (fromVersion !== 1 || document === r.document) return;
    await knex("option_revision").where({ option_id: r.option_id, revision: r.revision }).update({ document: JSON.stringify(document) });
  });
  await knex.raw("alter table option_revision enable trigger option_revision_frozen");

  const parts = await knex("part").where({ kind: "mosfet" }).select<{ id: string; params: Json }[]>("id", "params");
  for (const p of parts) {
    const params = upgradeMosfetBlockV1(p.params ?? {});
    if (JSON.stringify(params) !== JSON.stringify(p.params)) await knex("part").where({ id: p.id }).update({ params: JSON.stringify(params) });
  }
}

/** The reverse renames, for a rollback to code that reads version 1 only. */
function invert(renames: Readonly<Record<string, string>>): Record<string, string> {
  return Object.fromEntries(Object.entries(renames).map(([a, b]) => [b, a]));
}

function renameKeys(obj: unknown, renames: Record<string, string>): unknown {
  if (!obj || typeof obj !== "object" || Array.isArray(obj)) return obj;
  return Object.fromEntries(Object.entries(obj).map(([k, v]) => [renames[k] ?? k, v]));
}

const GATE_V1 = { rTurnOn: "rOn", rTurnOff: "rOff" };
const WAVEFORM_V1 = { turnOnVds: "vdsOn", turnOnId: "idOn", turnOffVds: "vdsOff", turnOffId: "idOff" };

function mosfetToV1(m: unknown): unknown {
  const out = renameKeys(m, invert(MOSFET_RENAMES_V1)) as Json;
  if (out && typeof out === "object" && out.outputCapacitance) out.outputCapacitance = renameKeys(out.outputCapacitance, invert(OUTPUT_CAPACITANCE_RENAMES_V1));
  return out;
}

/**
 * Version 2 -> version 1 names. Documents that use what only version 2
 * allows (Rg(int) = 0, several output-capacitance figures) keep their values
 * and will be refused by version-1 code until edited.
 */
function documentToV1(doc: unknown): unknown {
  if (!doc || typeof doc !== "object" || Array.isArray(doc) || (doc as Json).schemaVersion !== 2) return doc;
  const { schemaVersion: _v, ...rest } = doc as Json;
  const positions = Array.isArray(rest.positions)
    ? rest.positions.map((p: Json) => ({
        ...p,
        mosfet: mosfetToV1(p.mosfet),
        gate: renameKeys(p.gate, GATE_V1),
        conduction:
          p.conduction && Array.isArray((p.conduction as Json).points)
            ? { ...(p.conduction as Json), points: ((p.conduction as Json).points as unknown[]).map((pt) => renameKeys(pt, WAVEFORM_V1)) }
            : p.conduction,
      }))
    : rest.positions;
  const corners = Array.isArray(rest.corners)
    ? rest.corners.map((c: Json) =>
        c.waveforms && typeof c.waveforms === "object"
          ? { ...c, waveforms: Object.fromEntries(Object.entries(c.waveforms as Json).map(([id, w]) => [id, renameKeys(w, WAVEFORM_V1)])) }
          : c,
      )
    : rest.corners;
  return { ...rest, corners, positions };
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("alter table option_revision disable trigger option_revision_frozen");
  await eachRevision(knex, async (r) => {
    const document = documentToV1(r.document);
    if (document !== r.document) await knex("option_revision").where({ option_id: r.option_id, revision: r.revision }).update({ document: JSON.stringify(document) });
  });
  await knex.raw("alter table option_revision enable trigger option_revision_frozen");
  const parts = await knex("part").where({ kind: "mosfet" }).select<{ id: string; params: Json }[]>("id", "params");
  for (const p of parts) {
    const params = mosfetToV1(p.params ?? {});
    if (JSON.stringify(params) !== JSON.stringify(p.params)) await knex("part").where({ id: p.id }).update({ params: JSON.stringify(params) });
  }
}
