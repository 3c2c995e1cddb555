// Prints every reference drive case's ngspice measurements as one JSON
// document (SI units: J, C, A, V, s, F, Hz): the transistor cards' datasheet
// figures, the emitter-follower cases, the current-limited driver, the
// zener-clamped self-driven gate and the forward converter's off level.
// Run: node --import tsx scripts/spice-drive-reference.ts > reference.json
import { BJT_PAIRS, type BjtFamily } from "../simulation/bjtCards";
import { extractDatasheet } from "../simulation/bjtDatasheet";
import { simulateClamp } from "../simulation/clamp";
import { simulateLimited } from "../simulation/driveLimited";
import { simulateFollower } from "../simulation/followerResult";
import { simulateForwardGate } from "../simulation/windingReset";
import {
  CLAMP_CASES, DATASHEET_CONDITIONS, FOLLOWER_SPECS, FORWARD_CASES, LIMITED_CASES, followerCase, followerId, mapLimited,
} from "../tests/spice/reference-drive-cases";

async function main(): Promise<void> {
  const t0 = performance.now();
  const cards = await mapLimited(Object.entries(BJT_PAIRS).flatMap(([family, pair]) => [pair.npn, pair.pnp].map((card) => ({ family, card }))),
    async ({ family, card }) => ({ card: card.name, family, polarity: card.polarity, gp: card.gp, datasheet: await extractDatasheet(card, DATASHEET_CONDITIONS[family as BjtFamily]) }));
  const followers = await mapLimited(FOLLOWER_SPECS, async (spec) => ({ id: followerId(spec), spec, result: await simulateFollower(followerCase(spec)) }));
  const limited = await mapLimited(LIMITED_CASES, async ({ id, c }) => ({ id, result: await simulateLimited(c) }));
  const clamp = await mapLimited(CLAMP_CASES, async ({ id, c }) => ({ id, result: await simulateClamp(c) }));
  const forward = await mapLimited(FORWARD_CASES, async ({ id, c }) => ({ id, result: await simulateForwardGate(c) }));
  const wallSeconds = (performance.now() - t0) / 1000;
  process.stdout.write(`${JSON.stringify({ cards, followers, limited, clamp, forward, wallSeconds }, null, 2)}\n`);
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
