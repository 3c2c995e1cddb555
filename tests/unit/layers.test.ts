// The house plan (eslint/layers.mjs, enforced by ESLint's heatsplit/layers
// rule in npm test): the rule's answers on known cases, and a walk of the
// whole tree's imports that must find nothing pointing up.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
// @ts-expect-error -- plain ESM module shared with the ESLint config, no type declarations
import { importProblem, markerProblem } from "../../eslint/layers.mjs";

const ROOT = path.resolve(__dirname, "../..");
const allowed = (from: string, to: string, typeOnly = false) => importProblem({ from, to, typeOnly }) === null;

describe("the layer rule", () => {
  it("lets imports point down", () => {
    expect(allowed("app/(workspace)/parts/page.tsx", "services/parts/service.ts")).toBe(true);
    expect(allowed("services/parts/service.ts", "db/queries/parts.ts")).toBe(true);
    expect(allowed("db/queries/parts.ts", "lib/parts/values.ts")).toBe(true);
    expect(allowed("lib/parts/values.ts", "models/input/schemaParts.ts")).toBe(true);
    expect(allowed("models/evaluate.ts", "models/thermal.ts")).toBe(true);
    expect(allowed("tests/unit/x.test.ts", "app/_lib/access.ts")).toBe(true);
  });

  it("refuses imports that point up or sideways", () => {
    expect(allowed("db/queries/parts.ts", "app/_lib/errors.ts")).toBe(false);
    expect(allowed("db/queries/parts.ts", "services/parts/service.ts")).toBe(false);
    expect(allowed("lib/parts/values.ts", "services/parts/service.ts")).toBe(false);
    expect(allowed("components/report/JobProgress.tsx", "app/(workspace)/projects/_components/fetchJson.ts")).toBe(false);
    expect(allowed("components/budget/BudgetView.tsx", "models/input/units.ts")).toBe(false);
    expect(allowed("models/evaluate.ts", "simulation/ngspice.ts")).toBe(false);
    expect(allowed("models/evaluate.ts", "lib/format.ts")).toBe(false);
  });

  it("lets types through where the browser never loads them, and only there", () => {
    expect(allowed("components/budget/BudgetView.tsx", "models/input/schema.ts", true)).toBe(true);
    expect(allowed("models/evaluate.ts", "models/input/schema.ts", true)).toBe(true);
    expect(allowed("models/evaluate.ts", "models/input/schema.ts", false)).toBe(false);
    expect(allowed("db/queries/parts.ts", "services/parts/service.ts", true)).toBe(false);
  });

  it("keeps route folders private", () => {
    expect(allowed("app/api/v1/parts/route.ts", "app/(workspace)/parts/_components/PartForm.tsx")).toBe(false);
    expect(allowed("app/api/v1/parts/route.ts", "app/(workspace)/parts/schema.ts")).toBe(false);
    expect(allowed("app/(workspace)/parts/new/page.tsx", "app/(workspace)/parts/_components/PartForm.tsx")).toBe(true);
    expect(allowed("app/(workspace)/parts/page.tsx", "app/_lib/access.ts")).toBe(true);
  });

  it("wants the server-only marker in services/ and db/queries/, and nowhere client-safe", () => {
    expect(markerProblem({ file: "services/parts/service.ts", importsServerOnly: false })).not.toBeNull();
    expect(markerProblem({ file: "db/queries/parts.ts", importsServerOnly: true })).toBeNull();
    expect(markerProblem({ file: "lib/parts/values.ts", importsServerOnly: true })).not.toBeNull();
    expect(markerProblem({ file: "lib/parts/values.ts", importsServerOnly: false })).toBeNull();
  });
});

const IMPORT = /(?:^|\n)\s*(?:import|export)\s+(type\s+)?(?:[^'";]*?\s+from\s+)?["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g;

function resolve(files: Set<string>, from: string, spec: string): string | null {
  let base: string;
  if (spec.startsWith("@/")) base = spec.slice(2);
  else if (spec.startsWith(".")) base = path.posix.normalize(path.posix.join(path.posix.dirname(from), spec));
  else return null;
  for (const ext of ["", ".ts", ".tsx", ".mts", ".mjs", "/index.ts", "/index.tsx"]) if (files.has(base + ext)) return base + ext;
  return base;
}

describe("the tree", () => {
  it("has no import that breaks the plan and every marker in place", () => {
    const listed = execFileSync("git", ["ls-files", "-co", "--exclude-standard"], { cwd: ROOT, encoding: "utf8" }).split("\n");
    const files = listed.filter((f) => /\.(ts|tsx|mts|mjs)$/.test(f) && fs.existsSync(path.join(ROOT, f)));
    const known = new Set(files);
    const problems: string[] = [];
    for (const f of files) {
      const src = fs.readFileSync(path.join(ROOT, f), "utf8");
      const marker = markerProblem({ file: f, importsServerOnly: /^import "server-only";/m.test(src) });
      if (marker) problems.push(`${f}: ${marker}`);
      for (const m of src.matchAll(IMPORT)) {
        const to = resolve(known, f, m[2] ?? m[3]);
        const problem = to && importProblem({ from: f, to, typeOnly: Boolean(m[1]) });
        if (problem) problems.push(`${f}: ${problem}`);
      }
    }
    expect(files.length).toBeGreaterThan(300);
    expect(problems).toEqual([]);
  });

  it("routes only read through db/: every write goes through a service", () => {
    const listed = execFileSync("git", ["ls-files", "-co", "--exclude-standard", "app"], { cwd: ROOT, encoding: "utf8" }).split("\n");
    const writes: string[] = [];
    for (const f of listed.filter((x) => /\.(ts|tsx)$/.test(x) && fs.existsSync(path.join(ROOT, x)))) {
      const src = fs.readFileSync(path.join(ROOT, f), "utf8");
      for (const m of src.matchAll(/import\s+(type\s+)?\{([^}]*)\}\s+from\s+"@\/db\/queries\/[^"]+"/g)) {
        if (m[1]) continue;
        const names = m[2]
          .split(",")
          .map((n) => n.trim())
          .filter((n) => n && !n.startsWith("type "));
        for (const n of names) if (!/^(get|list|count)[A-Z]/.test(n)) writes.push(`${f}: ${n}`);
      }
    }
    expect(writes).toEqual([]);
  });
});
