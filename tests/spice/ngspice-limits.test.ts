// What the runner adds for decks run on a user's behalf (issue 17): data
// files read back from the private folder, only plain file names, a cap on
// output size and a wall-time limit that kills the process.
import { describe, expect, it } from "vitest";
import { NgspiceError, runNgspice } from "@/simulation/ngspice";

const deck = (tEnd: string, extra = "") => `* RC step
V1 in 0 PULSE(0 1 1n 1p 1p 1 2)
R1 in out 1k
C1 out 0 1n
.control
set wr_singlescale
tran 1n ${tEnd}
${extra}
.endc
.end
`;

describe("ngspice runner limits", () => {
  it("reads back a file the deck wrote", async () => {
    const r = await runNgspice(deck("5u", "wrdata out.txt v(out)"), { files: ["out.txt"] });
    const rows = r.files["out.txt"].trim().split("\n");
    expect(rows.length).toBeGreaterThan(100);
    // Last row: v(out) after five time constants, 1 − e⁻⁵ (closed form of the RC step).
    const last = rows[rows.length - 1].trim().split(/\s+/).map(Number);
    expect(last[1]).toBeCloseTo(1 - Math.exp(-5 + 1e-3), 3);
  });

  it.each(["../out.txt", "/tmp/out.txt", "out", "a/b.txt"])("refuses the file name %j before running", async (name) => {
    await expect(runNgspice(deck("5u"), { files: [name] })).rejects.toThrow(/plain data file name/);
  });

  it("refuses a file over the output limit", async () => {
    await expect(runNgspice(deck("5u", "wrdata out.txt v(out)"), { files: ["out.txt"], maxOutputBytes: 1000 })).rejects.toThrow(/over the 1000-byte limit/);
  });

  it("refuses printed output over the limit", async () => {
    await expect(runNgspice(deck("5u", "print v(out)"), { maxOutputBytes: 1000 })).rejects.toThrow(NgspiceError);
  });

  it("kills a run past its wall-time limit", async () => {
    const t0 = performance.now();
    await expect(runNgspice(deck("100", ""), { timeoutMs: 300 })).rejects.toThrow(NgspiceError);
    expect(performance.now() - t0).toBeLessThan(5000);
  });
});
