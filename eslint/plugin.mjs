// Heatsplit's own lint rules: the house plan (eslint/layers.mjs) checked on
// every import, and the server-only marker where it belongs.
import fs from "node:fs";
import path from "node:path";
import { importProblem, markerProblem } from "./layers.mjs";

const ROOT = path.resolve(import.meta.dirname, "..");
const EXTENSIONS = ["", ".ts", ".tsx", ".mts", ".mjs", ".js", "/index.ts", "/index.tsx"];

/** Repository-relative path of the file `spec` names from `fromFile`, or null for a package. */
function resolveSpec(fromFile, spec) {
  let base;
  if (spec.startsWith("@/")) base = path.join(ROOT, spec.slice(2));
  else if (spec.startsWith("./") || spec.startsWith("../")) base = path.resolve(path.dirname(fromFile), spec);
  else return null;
  const hit = EXTENSIONS.map((e) => base + e).find((p) => fs.existsSync(p) && fs.statSync(p).isFile());
  return path
    .relative(ROOT, hit ?? base)
    .split(path.sep)
    .join("/");
}

const layers = {
  meta: { type: "problem", docs: { description: "Imports point down the layers of docs/ARCHITECTURE.md" }, schema: [] },
  create(context) {
    const from = path.relative(ROOT, context.filename).split(path.sep).join("/");
    const check = (node, source, typeOnly) => {
      if (!source || typeof source.value !== "string") return;
      const to = resolveSpec(context.filename, source.value);
      if (!to) return;
      const problem = importProblem({ from, to, typeOnly });
      if (problem) context.report({ node: source, message: problem });
    };
    const typeOnlyImport = (node) => node.importKind === "type" || (node.specifiers?.length > 0 && node.specifiers.every((s) => s.importKind === "type"));
    return {
      ImportDeclaration: (node) => check(node, node.source, typeOnlyImport(node)),
      ExportNamedDeclaration: (node) => check(node, node.source, node.exportKind === "type"),
      ExportAllDeclaration: (node) => check(node, node.source, node.exportKind === "type"),
      ImportExpression: (node) => check(node, node.source, false),
    };
  },
};

const serverOnly = {
  meta: {
    type: "problem",
    docs: { description: 'services/ and db/queries/ start with import "server-only"; lib/, models/ and components/ never do' },
    schema: [],
  },
  create(context) {
    const file = path.relative(ROOT, context.filename).split(path.sep).join("/");
    return {
      Program(program) {
        const importsServerOnly = program.body.some((n) => n.type === "ImportDeclaration" && n.source.value === "server-only");
        const problem = markerProblem({ file, importsServerOnly });
        if (problem) context.report({ node: program, message: problem });
      },
    };
  },
};

const plugin = { meta: { name: "heatsplit" }, rules: { layers, "server-only": serverOnly } };
export default plugin;
