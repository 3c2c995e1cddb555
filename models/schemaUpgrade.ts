/**
 * Versions of the design document, and the upgrade of an old one to the
 * current form. Pure and dependency-free: parseDesign runs it before
 * validation (so API clients sending version 1 keep working), and the
 * database migration that rewrites stored revisions runs the same function.
 *
 * Version 1 (no `schemaVersion` field) used one name for two meanings and
 * names that read like on-state values; version 2 gives one name per
 * meaning. The upgrade is a lossless rename:
 *   mosfet.vTest                   -> mosfet.qgVgs (gate voltage of the Qg figure)
 *   mosfet.outputCapacitance.vTest -> mosfet.outputCapacitance.vds (test Vds)
 *   waveform vdsOn, idOn, vdsOff, idOff (conduction.points[], corners[].waveforms[id])
 *                                  -> turnOnVds, turnOnId, turnOffVds, turnOffId
 *   gate.rOn, gate.rOff            -> gate.rTurnOn, gate.rTurnOff
 * A renamed key is moved only when the new name is absent; a document that
 * carries both keeps the old one, and the strict schema then names it.
 */

export const CURRENT_SCHEMA_VERSION = 2;

type Json = Record<string, unknown>;

export const MOSFET_RENAMES_V1: Readonly<Record<string, string>> = { vTest: "qgVgs" };
export const OUTPUT_CAPACITANCE_RENAMES_V1: Readonly<Record<string, string>> = { vTest: "vds" };
export const WAVEFORM_RENAMES_V1: Readonly<Record<string, string>> = {
  vdsOn: "turnOnVds",
  idOn: "turnOnId",
  vdsOff: "turnOffVds",
  idOff: "turnOffId",
};
export const GATE_RENAMES_V1: Readonly<Record<string, string>> = { rOn: "rTurnOn", rOff: "rTurnOff" };

const isObject = (v: unknown): v is Json => typeof v === "object" && v !== null && !Array.isArray(v);

/** A copy of `obj` with keys renamed in place of the old ones (key order kept). */
function renameKeys(obj: Json, renames: Readonly<Record<string, string>>): Json {
  const out: Json = {};
  for (const [k, v] of Object.entries(obj)) {
    const to = renames[k];
    if (to !== undefined && !(to in obj)) out[to] = v;
    else out[k] = v;
  }
  return out;
}

/** Apply `fix` to obj[key] when it is an object; other values pass through untouched. */
function mapField(obj: Json, key: string, fix: (v: Json) => Json): Json {
  return isObject(obj[key]) ? { ...obj, [key]: fix(obj[key] as Json) } : obj;
}

function mapArray(obj: Json, key: string, fix: (v: Json) => Json): Json {
  const list = obj[key];
  return Array.isArray(list) ? { ...obj, [key]: list.map((x) => (isObject(x) ? fix(x) : x)) } : obj;
}

/** A MOSFET block (design document or parts library params) from version 1 names to version 2. */
export function upgradeMosfetBlockV1(m: Json): Json {
  return mapField(renameKeys(m, MOSFET_RENAMES_V1), "outputCapacitance", (oc) => renameKeys(oc, OUTPUT_CAPACITANCE_RENAMES_V1));
}

function upgradePositionV1(p: Json): Json {
  let out = mapField(p, "mosfet", upgradeMosfetBlockV1);
  out = mapField(out, "gate", (g) => renameKeys(g, GATE_RENAMES_V1));
  out = mapField(out, "conduction", (c) => mapArray(c, "points", (pt) => renameKeys(pt, WAVEFORM_RENAMES_V1)));
  return out;
}

function upgradeCornerV1(c: Json): Json {
  return mapField(c, "waveforms", (w) =>
    Object.fromEntries(Object.entries(w).map(([id, v]) => [id, isObject(v) ? renameKeys(v, WAVEFORM_RENAMES_V1) : v])),
  );
}

/** Version 1 -> version 2; `schemaVersion` goes first so a reader sees it. */
function v1ToV2(doc: Json): Json {
  const { schemaVersion: _old, ...rest } = doc;
  let out: Json = { schemaVersion: 2, ...rest };
  out = mapArray(out, "positions", upgradePositionV1);
  out = mapArray(out, "corners", upgradeCornerV1);
  return out;
}

/** The version a raw document declares: no field = 1; anything else as given (validation judges it). */
export function documentVersion(raw: unknown): unknown {
  if (!isObject(raw) || raw.schemaVersion === undefined) return 1;
  return raw.schemaVersion;
}

/**
 * The document in the current version, and the version it came in. Never
 * mutates `raw`. A document that is not an object, or declares a version
 * this code does not know, comes back unchanged for validation to refuse.
 */
export function upgradeDesignDocument(raw: unknown): { document: unknown; fromVersion: unknown } {
  const fromVersion = documentVersion(raw);
  if (!isObject(raw)) return { document: raw, fromVersion };
  if (fromVersion === 1) return { document: v1ToV2(raw), fromVersion };
  return { document: raw, fromVersion };
}
