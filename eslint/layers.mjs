// The house plan as a rule: which folder may import which. Read by the
// ESLint rule "heatsplit/layers" (eslint/plugin.mjs) and by
// scripts/layers.ts, which counts what breaks it. docs/ARCHITECTURE.md draws
// the same table.
//
//   app/         routes: pages, route handlers, server actions (thin adapters)
//   components/  reusable UI
//   services/    feature services, server-only (one folder per feature)
//   db/          knex, migrations, seeds, one query module per table family
//   lib/         client-safe shared code (schemas, kinds, formatters, errors)
//   models/      the engineering computation (browser-safe core; input layer in models/input/)
//   simulation/  ngspice: the independent check, imported by tests and scripts only
//
// Imports point down the list, never up. Everything else (tests/, scripts/,
// root config files, proxy.ts, instrumentation.ts) may import anything.
import path from "node:path";

const P = path.posix;

/** Folder -> the folders its files may import (their own included). */
export const MAY_IMPORT = {
  app: ["app", "components", "services", "db", "lib", "models", "models/input"],
  components: ["components", "lib", "models"],
  services: ["services", "db", "lib", "models", "models/input"],
  db: ["db", "lib", "models", "models/input"],
  lib: ["lib", "models", "models/input"],
  "models/input": ["models/input", "models"],
  models: ["models"],
  simulation: ["simulation"],
};

/**
 * Type-only imports that may point further (erased when compiled, so the
 * browser never loads them): reusable UI reads record and design types, the
 * model's core reads the document types its input layer defines.
 */
export const MAY_IMPORT_TYPES = {
  components: ["db", "services", "models/input"],
  models: ["models/input"],
};

/** The layer a repository path belongs to, or null for files outside the plan (tests, scripts, root files). */
export function layerOf(file) {
  const f = file.replace(/\\/g, "/");
  if (f.startsWith("models/input/")) return "models/input";
  const top = f.split("/")[0];
  return f.includes("/") && top in MAY_IMPORT ? top : null;
}

function isPrivateSegment(s) {
  return s.startsWith("_");
}

/**
 * Inside app/: app/_lib/ is open to every route; a route's private folder
 * (`_components/`, `_editor/`) only to that route and the routes below it;
 * any other route file only to its own folder and the folders below it.
 */
function appProblem(from, to) {
  if (to.startsWith("app/_lib/")) return null;
  const segs = to.split("/");
  const i = segs.findIndex((s, k) => k > 0 && isPrivateSegment(s));
  const owner = i > 0 ? segs.slice(0, i).join("/") : P.dirname(to);
  if (from.startsWith(`${owner}/`)) return null;
  return i > 0 ? `imports another route's private folder (${segs.slice(0, i + 1).join("/")})` : `imports a route folder it is not in (${owner})`;
}

/** Why `from` may not import `to` (repository-relative paths), or null when it may. */
export function importProblem({ from, to, typeOnly = false }) {
  const a = layerOf(from);
  if (a === null) return null;
  if (to.startsWith("app/") && from.startsWith("app/")) return appProblem(from, to);
  const b = layerOf(to) ?? (to.split("/")[0] === "app" ? "app" : null);
  if (b === null) return `${a}/ imports ${to}, which is outside the layers (tests, scripts, root files)`;
  if (MAY_IMPORT[a].includes(b)) return null;
  if (typeOnly && (MAY_IMPORT_TYPES[a] ?? []).includes(b)) return null;
  return `${a}/ may not import ${b}/ (${to}): imports point down app -> components -> services -> db -> lib -> models`;
}

/** services/ files run on the server only; lib/ files must stay loadable in the browser. */
export function markerProblem({ file, importsServerOnly }) {
  const layer = layerOf(file);
  if ((layer === "services" || (layer === "db" && file.startsWith("db/queries/"))) && !importsServerOnly)
    return `${layer}/ modules start with import "server-only"`;
  if ((layer === "lib" || layer === "models" || layer === "models/input" || layer === "components") && importsServerOnly)
    return `${layer}/ modules are client-safe: no import "server-only"`;
  return null;
}
