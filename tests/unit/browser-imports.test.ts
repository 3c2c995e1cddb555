// The budget dashboard runs these modules in the browser (what-if trials and
// the thermal-map worker), and the model's barrel (models/index.ts) is its
// browser-safe core. They must not pull in the input layer (models/input/:
// the unit parser on mathjs, the zod schema): that stays on the server, which
// is what keeps the page's JavaScript small. The converter operating-point calculator is kept
// browser-safe in the same way, so a page can run it without the server.
// esbuild bundles each entry as the browser would get it and lists every
// file it read.
import path from "node:path";
import { build } from "esbuild";
import { describe, expect, it } from "vitest";

const ROOT = path.resolve(__dirname, "../..");
const ENTRIES = ["models/index.ts", "models/evaluate.ts", "models/sweep.ts", "models/converter/index.ts", "components/budget/trialEdits.ts", "components/budget/shape.ts", "components/charts/sweep.worker.ts"];

async function inputsOf(entry: string): Promise<string[]> {
  const r = await build({
    entryPoints: [path.join(ROOT, entry)],
    bundle: true,
    write: false,
    metafile: true,
    format: "esm",
    platform: "browser",
    logLevel: "silent",
    alias: { "@": ROOT },
  });
  return Object.keys(r.metafile.inputs);
}

describe("browser-side model modules load no parser", () => {
  it.each(ENTRIES)("%s bundles without zod, mathjs or the schema modules", async (entry) => {
    const inputs = await inputsOf(entry);
    expect(inputs.length).toBeGreaterThan(0);
    expect(inputs.filter((i) => i.includes("node_modules"))).toEqual([]);
    expect(inputs.filter((i) => i.includes("models/input/"))).toEqual([]);
  });

  it("the check notices a module that does load the parser", async () => {
    const inputs = await inputsOf("models/input/index.ts");
    expect(inputs.some((i) => i.includes("node_modules/zod"))).toBe(true);
    expect(inputs.some((i) => i.includes("node_modules/mathjs"))).toBe(true);
  });
});
