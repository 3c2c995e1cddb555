// `npm run faults`: runs inside the faults stack (scripts/stack.ts faults,
// fresh database, own ports), in the stack's own process so it can stop and
// start the PostgreSQL child. Prints each check; true when all hold.
import { runDbRestart, type DbControl } from "./db-restart";
import { runInterrupted } from "./interrupted";
import { runUncleanStop } from "./unclean-stop";

export async function runFaults({ db }: { env: NodeJS.ProcessEnv; origin: string; db: DbControl }): Promise<boolean> {
  const sections = [
    { name: "database restart under load", run: () => runDbRestart(db) },
    { name: "interrupted import and upload", run: runInterrupted },
    { name: "start after an unclean stop", run: () => runUncleanStop() },
  ];
  let ok = true;
  for (const s of sections) {
    console.log(`\n=== faults: ${s.name} ===`);
    const r = await s.run().catch((e: Error) => ({ ok: false, lines: [`  FAIL ${e.stack ?? e.message}`] }));
    for (const line of r.lines) console.log(line);
    ok &&= r.ok;
  }
  console.log(ok ? "\nfaults: all checks hold" : "\nfaults: some checks failed");
  return ok;
}
