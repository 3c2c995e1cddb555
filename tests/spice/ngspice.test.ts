// The runner itself: values parsed from `meas`/`print`, problems reported, a missing binary named.
import { afterEach, describe, expect, it } from "vitest";
import { NgspiceError, parseValues, runNgspice, valueOf } from "@/simulation/ngspice";

const RC = `* RC step
V1 in 0 PULSE(0 1 1n 1p 1p 1 2)
R1 in out 1k
C1 out 0 1n
.control
op
tran 1n 5u
meas tran v_tau find v(out) at=1.001u
let e = integ(i(V1)*i(V1)*1k)
meas tran e_r find e at=5u
print v(out)[0]
.endc
.end
`;

describe("ngspice runner", () => {
  const saved = process.env.NGSPICE;
  afterEach(() => {
    if (saved === undefined) delete process.env.NGSPICE;
    else process.env.NGSPICE = saved;
  });

  it("reads meas results: RC step reaches 1 − 1/e at one time constant and burns ½CV² in R", async () => {
    const r = await runNgspice(RC);
    expect(valueOf(r, "v_tau")).toBeCloseTo(1 - Math.exp(-1), 2);
    expect(valueOf(r, "e_r")).toBeCloseTo(0.5e-9, 11);
    expect(r.wallMs).toBeGreaterThan(0);
  });

  it("parses name = value lines and ignores the rest", () => {
    expect(parseValues("Doing analysis at TEMP = 27\neoff  =  1.5e-06 from= 0 to= 1\nx = -2\n")).toEqual({ eoff: 1.5e-6, x: -2 });
  });

  it("throws on a failed measurement instead of returning a partial result", async () => {
    await expect(runNgspice(RC.replace("at=1.001u", "at=9u"))).rejects.toThrow(NgspiceError);
  });

  it("names the missing binary", async () => {
    process.env.NGSPICE = "/nonexistent/ngspice";
    await expect(runNgspice(RC)).rejects.toThrow(/ngspice not found/);
  });
});
