// `npm start` after an unclean stop: scripts/lib/postgres.ts must clear a
// killed server's postmaster.pid and socket files (even when the PID in it
// now belongs to another live process) and refuse while a server really runs.
// The check starts and SIGKILLs a PostgreSQL of its own (scripts/faults).
import { expect, it } from "vitest";
import { runUncleanStop } from "@/scripts/faults/unclean-stop";

it("starts cleanly after the postmaster was killed, and refuses a second server on a live data dir", async () => {
  const r = await runUncleanStop();
  expect(r.lines.filter((l) => l.includes("FAIL"))).toEqual([]);
  expect(r.lines.filter((l) => l.includes("PASS"))).toHaveLength(3);
  expect(r.ok).toBe(true);
}, 90_000);
