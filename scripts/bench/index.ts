// `npm run bench`: the speed figures, printed; exits non-zero when a target
// is missed. Runs inside the bench stack (scripts/stack.ts bench), so the
// app is up at APP_ORIGIN on its own ports with a fresh database.
import { runModelBench } from "./model";
import { runApiBench } from "./api";
import { runPageBench } from "./pages";

async function main(): Promise<void> {
  const sections = [
    { name: "model", run: runModelBench },
    { name: "api", run: runApiBench },
    { name: "pages", run: runPageBench },
  ];
  // BENCH_SECTIONS=api,pages runs only those (while working on one figure).
  const only = process.env.BENCH_SECTIONS?.split(",").map((x) => x.trim());
  let ok = true;
  for (const s of sections.filter((x) => !only || only.includes(x.name))) {
    console.log(`\n=== bench: ${s.name} ===`);
    const r = await s.run();
    for (const line of r.lines) console.log(line);
    ok &&= r.ok;
  }
  console.log(ok ? "\nbench: all targets met" : "\nbench: some targets missed");
  process.exit(ok ? 0 : 1);
}

void main();
