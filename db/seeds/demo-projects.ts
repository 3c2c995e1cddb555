// Demo project: the INVENTED "HX-240" isolated brick (active-clamp forward,
// 36–75 V in, 12 V / 20 A out, 250 kHz, 85 °C ambient) with the five worked
// gate-drive options of models/demo.ts, each as its revision 1. Part
// references are resolved by part number against this workspace's library
// (seeded just before by demo-parts.ts); a part that is missing is simply
// not referenced, the values stay in the document.
//
// Idempotent by fixed ids: a project or option whose id exists is left
// alone, so a second run adds nothing and never overwrites user edits.
import type { Knex } from "knex";
import { demoOptions } from "../../models/demo";
import { getAt } from "../../models/documentPath";
import { partSlots } from "../../lib/parts/slots";

export const DEMO_PROJECT_ID = "prj_demo_hx240";
const DEMO_AUTHOR_ID = "usr_demo_designer";

const demoOptionId = (key: string) => `opt_demo_${key.replace(/[^A-Za-z0-9]+/g, "_")}`;

/** part_refs for a document: slot -> library id, for every slot whose part number the library has. */
async function resolvePartRefs(trx: Knex.Transaction, workspaceId: string, document: unknown): Promise<Record<string, string>> {
  const wanted = partSlots(document)
    .filter((s) => s.partNumberKey)
    .map((s) => ({ ref: s.ref, mpn: getAt(document, `${s.target}.${s.partNumberKey}`) }))
    .filter((w): w is { ref: string; mpn: string } => typeof w.mpn === "string");
  if (!wanted.length || !(await trx.schema.hasTable("part"))) return {};
  const rows = await trx("part").where("workspace_id", workspaceId).whereIn("mpn", [...new Set(wanted.map((w) => w.mpn))]).select<{ id: string; mpn: string }[]>("id", "mpn");
  const byMpn = new Map(rows.map((r) => [r.mpn, r.id]));
  return Object.fromEntries(wanted.flatMap((w) => (byMpn.has(w.mpn) ? [[w.ref, byMpn.get(w.mpn)!]] : [])));
}

export async function seedDemoProjects(trx: Knex.Transaction, workspaceId: string): Promise<number> {
  let added = 0;
  const author = (await trx("auth_user").where({ id: DEMO_AUTHOR_ID }).first("id")) ? DEMO_AUTHOR_ID : null;
  if (!(await trx("project").where({ id: DEMO_PROJECT_ID }).first("id"))) {
    await trx("project").insert({
      id: DEMO_PROJECT_ID,
      workspace_id: workspaceId,
      name: "HX-240 isolated brick",
      topology: "active-clamp-forward",
      vin_min: 36,
      vin_nom: 48,
      vin_max: 75,
      outputs: JSON.stringify([{ label: "Main", voltage: 12, current: 20 }]),
      fsw: 250e3,
      ambient_max: 85,
      efficiency_target: 0.92,
      notes: "Invented demo converter: 240 W telecom-style brick, Npri:Nsec = 3:2. Five ways of driving the gates to compare.",
      status: "design",
      created_by: author,
    });
    added++;
  }
  for (const o of demoOptions) {
    const id = demoOptionId(o.key);
    if (await trx("design_option").where({ id }).first("id")) continue;
    await trx("design_option").insert({ id, workspace_id: workspaceId, project_id: DEMO_PROJECT_ID, name: o.name, summary: o.summary, latest_revision: 1, created_by: author });
    await trx("option_revision").insert({
      option_id: id,
      revision: 1,
      document: JSON.stringify(o.input),
      part_refs: JSON.stringify(await resolvePartRefs(trx, workspaceId, o.input)),
      note: "Demo template",
      created_by: author,
    });
    added++;
  }
  return added;
}
