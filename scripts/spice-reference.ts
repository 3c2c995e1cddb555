// Prints the reference simulations the switching-loss model is compared with
// (issue 12) as JSON: each part's card and ngspice-measured datasheet, and
// every switching case's per-edge figures (simulation/switchingEdge.ts says
// how each is measured). `node --import tsx scripts/spice-reference.ts`,
// or with `--table` a markdown summary instead.
import { SJ_650V, TRENCH_60V } from "../simulation/mosfetCards";
import { curveIntegral } from "../simulation/mosfetCurve";
import { extractSheet } from "../simulation/mosfetSheet";
import { SWITCHING_CASES } from "../simulation/switchingCases";
import { runAllCycles, type CycleFigures } from "../simulation/switchingRun";

async function main(): Promise<void> {
  const t0 = performance.now();
  const parts = await Promise.all(
    [TRENCH_60V, SJ_650V].map(async (p) => {
      const sheet = await extractSheet(p);
      // The Miller charge a Crss(Vds) curve shows up to the test voltage, beside the plateau length Qgd.
      const crssCharge = curveIntegral(sheet.capacitance, "crss", 0, sheet.qgVds, 0);
      return { name: p.card.name, card: p.card.params, conditions: p.sheet, sheet, crssChargeToQgVds: crssCharge };
    }),
  );
  const results = await runAllCycles(SWITCHING_CASES);
  const cases = SWITCHING_CASES.map((c) => {
    const { card, ...circuit } = c.circuit;
    return { id: c.id, part: card.name, circuit, ...(results.get(c) as CycleFigures) };
  });
  const wallSeconds = (performance.now() - t0) / 1000;
  if (process.argv.includes("--table")) printTable(cases);
  else console.log(JSON.stringify({ units: "SI (s, V, A, J, C, F, Ω, A/s, V/s)", wallSeconds, parts, cases }, null, 2));
}

function printTable(cases: ({ id: string } & CycleFigures)[]): void {
  const ns = (x: number) => (x * 1e9).toFixed(2);
  const uj = (x: number) => (x * 1e6).toFixed(3);
  const rate = (x: number) => (x * 1e-9).toFixed(2);
  console.log("| case | edge | td(I) ns | tI ns | tV ns | di/dt max/avg A/ns | dv/dt max/avg V/ns | Ig peak/plateau A | overshoot V | E term µJ | E chan µJ |");
  console.log("|---|---|---|---|---|---|---|---|---|---|---|");
  for (const c of cases) {
    for (const e of [c.on, c.off]) {
      const row = [c.id, e.edge, ns(e.delayCurrent), ns(e.tCurrent), ns(e.tVoltage), `${rate(e.didtMax)}/${rate(e.didtAvg)}`, `${rate(e.dvdtMax)}/${rate(e.dvdtAvg)}`,
        `${e.igPeak.toFixed(2)}/${e.igPlateau.toFixed(2)}`, e.vdsOvershoot.toFixed(1), uj(e.energy.terminal), uj(e.energy.channel)];
      console.log(`| ${row.join(" | ")} |`);
    }
    console.log(`| ${c.id} | cycle | | | | | | | | ${uj(c.switchHeat)} | ${uj(c.channelHeat)} |`);
  }
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
