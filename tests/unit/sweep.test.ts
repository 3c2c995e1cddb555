import { describe, expect, it } from "vitest";
import { demoOptions, evaluateDesign } from "@/models";
import { parseDesign, type Design } from "@/models/input";
import { contourOf, mergeSweepChunks, sweepGrid, SweepSpecError, type SweepAxis, type SweepSpec } from "@/models/sweep";

function demo(key: string): Design {
  const opt = demoOptions.find((o) => o.key === key);
  if (!opt) throw new Error(`no demo ${key}`);
  const r = parseDesign(opt.input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

/** The design with one cell's knobs written into it: what the sweep must reproduce. */
function modified(design: Design, cornerId: string, axes: [SweepAxis, number][]): Design {
  const d = structuredClone(design);
  const c = d.corners.find((k) => k.id === cornerId)!;
  for (const [a, v] of axes) {
    if (a.axis === "fsw") c.fsw = v;
    else if (a.axis === "ambient") c.ambient = v;
    else if (a.axis === "vin") c.vin = v;
    else if (a.axis === "qgScale") {
      for (const p of d.positions) {
        if (a.position !== undefined && p.id !== a.position) continue;
        const m = p.mosfet;
        m.qgs *= v;
        m.qgd *= v;
        m.qg *= v;
        if (m.ciss !== undefined) m.ciss *= v;
      }
    } else {
      const g = d.positions.find((p) => p.id === a.position)!.gate;
      const edge = a.edge ?? "both";
      if (edge === "off") g.rTurnOff = v;
      else {
        if (edge === "both" && g.rTurnOff !== undefined) g.rTurnOff = (g.rTurnOff * v) / g.rTurnOn;
        g.rTurnOn = v;
      }
    }
  }
  return d;
}

/** Reference value of a cell from a full evaluation of the modified design. */
function reference(design: Design, spec: SweepSpec, cornerId: string, xv: number, yv: number): number | null {
  const d = modified(design, cornerId, [[spec.x, xv], [spec.y, yv]]);
  const r = evaluateDesign(d, { corners: [cornerId] }).corners[0];
  const metric = spec.metric ?? "rise";
  if (spec.part === "all") return r.runaway ? null : r.totalLoss;
  const p = r.parts.find((q) => q.id === spec.part)!;
  if (p.junction?.runaway) return null;
  if (metric === "rise") return p.junction!.runaway ? null : p.junction!.tj - r.ambient;
  if (metric === "tj") return p.junction!.runaway ? null : p.junction!.tj;
  return spec.mechanism ? p.losses[spec.mechanism] : p.total;
}

function expectCellsMatch(design: Design, spec: SweepSpec, cells: [number, number][]): void {
  const s = sweepGrid(design, spec);
  for (const [i, j] of cells) {
    const want = reference(design, spec, s.cornerId, s.x.values[i], s.y.values[j]);
    const got = s.z[j][i];
    if (want === null) expect(got, `cell ${i},${j}`).toBeNull();
    else {
      expect(got, `cell ${i},${j}`).not.toBeNull();
      expect(Math.abs((got as number) - want), `cell ${i},${j}: ${got} vs ${want}`).toBeLessThanOrEqual(1e-9 * Math.max(Math.abs(want), 1e-12));
    }
  }
}

const sample: [number, number][] = [[0, 0], [29, 0], [0, 19], [29, 19], [7, 11], [15, 3], [22, 16], [11, 9]];

describe("sweepGrid matches a full evaluateDesign of the modified design (to 1e-9)", () => {
  it("direct drive: controller ΔT over fsw (log) × Qg scale of Q1", () => {
    expectCellsMatch(demo("direct"), {
      part: "controller", x: { axis: "fsw", from: 50e3, to: 2e6, steps: 30, scale: "log" },
      y: { axis: "qgScale", from: 0.3, to: 3, steps: 20, position: "Q1" },
    }, sample);
  });

  it("fsw high enough to cap the edges at half a period, Q1 Tj", () => {
    expectCellsMatch(demo("direct"), {
      part: "Q1", metric: "tj", corner: "vmin", x: { axis: "fsw", from: 100e3, to: 8e6, steps: 30, scale: "log" },
      y: { axis: "qgScale", from: 1, to: 6, steps: 20 },
    }, sample);
  });

  it("small-signal follower: NPN Tj over gate resistance (both edges) × Vin", () => {
    expectCellsMatch(demo("bjt-small"), {
      part: "Q1.npn", metric: "tj", x: { axis: "rGate", position: "Q1", from: 0, to: 10, steps: 30 },
      y: { axis: "vin", from: 36, to: 75, steps: 20 },
    }, sample);
  });

  it("transformer drive: Q1 turn-off loss over ambient × Vin (duty moves the AC-coupled levels)", () => {
    expectCellsMatch(demo("transformer"), {
      part: "Q1", metric: "loss", mechanism: "turnOff", corner: "vnom", x: { axis: "ambient", from: -20, to: 110, steps: 30 },
      y: { axis: "vin", from: 36, to: 75, steps: 20 },
    }, sample);
  });

  it("transformer drive: winding loss (gate share + magnetizing ∝ 1/fsw²) and driver Tj over fsw × Vin", () => {
    const d = demo("transformer");
    const x: SweepAxis = { axis: "fsw", from: 20e3, to: 1e6, steps: 30, scale: "log" };
    const y: SweepAxis = { axis: "vin", from: 36, to: 75, steps: 20 };
    expectCellsMatch(d, { part: "Q1.gdt", metric: "loss", x, y }, sample);
    expectCellsMatch(d, { part: "Q1.driver", metric: "tj", x, y }, sample);
    // Down to 100 Hz, where the magnetizing ramp hits the primary's resistive limit.
    const low: SweepAxis = { axis: "fsw", from: 100, to: 5e3, steps: 30, scale: "log" };
    expectCellsMatch(d, { part: "Q1.gdt", metric: "loss", mechanism: "gateDrive", x: low, y }, sample);
  });

  it("total modelled loss over Qg scale of every MOSFET × turn-off resistor of SR1", () => {
    expectCellsMatch(demo("self-driven-sr"), {
      part: "all", metric: "loss", corner: "vmax", x: { axis: "qgScale", from: 0.5, to: 2, steps: 30 },
      y: { axis: "rGate", position: "SR1", edge: "off", from: 0.2, to: 5, steps: 20 },
    }, sample);
  });

  it("driver-IC controller loss and the gate-drive mechanism of the driver", () => {
    const d = demo("driver-ic");
    const x: SweepAxis = { axis: "fsw", from: 100e3, to: 1e6, steps: 30 };
    const y: SweepAxis = { axis: "rGate", position: "Q1", edge: "on", from: 0.5, to: 8, steps: 20 };
    expectCellsMatch(d, { part: "Q1.driver", metric: "loss", mechanism: "gateDrive", x, y }, sample);
    expectCellsMatch(d, { part: "Q1", metric: "loss", x, y }, sample);
    expectCellsMatch(d, { part: "Q1", metric: "loss", mechanism: "conduction", x, y }, sample);
  });

  it("exponential Rds(on)(T) fit (Newton path of thermal.ts) for every MOSFET: Q1 and SR2 Tj over fsw × Qg", () => {
    const d = demo("bjt-small");
    for (const p of d.positions) p.mosfet.rdsModel = "exponential";
    const x: SweepAxis = { axis: "fsw", from: 50e3, to: 1e6, steps: 30 };
    const y: SweepAxis = { axis: "qgScale", from: 0.5, to: 3, steps: 20 };
    expectCellsMatch(d, { part: "Q1", metric: "tj", x, y }, sample);
    expectCellsMatch(d, { part: "SR2", metric: "tj", x, y }, sample);
  });

  it("the design point is the nominal evaluation at the part's worst corner", () => {
    const d = demo("bjt-small");
    const s = sweepGrid(d, { part: "controller", x: { axis: "fsw", from: 1e5, to: 5e5, steps: 5 }, y: { axis: "qgScale", from: 0.5, to: 2, steps: 5 } });
    const ev = evaluateDesign(d);
    const worst = ev.parts.find((p) => p.id === "controller")!;
    expect(s.cornerId).toBe(worst.worstCornerId);
    const corner = d.corners.find((c) => c.id === s.cornerId)!;
    const j = worst.junction!;
    expect(j.runaway).toBe(false);
    if (j.runaway) return;
    expect(s.designPoint.z).toBeCloseTo(j.tj - corner.ambient, 9);
    expect(s.designPoint).toMatchObject({ x: corner.fsw, y: 1, inRange: true });
    expect(s.limit).toBeCloseTo(j.limit - corner.ambient, 12);
  });
});

describe("sweep trends and runaway", () => {
  it("direct drive: controller ΔT rises with fsw along every row and with Qg along every column", () => {
    const s = sweepGrid(demo("direct"), {
      part: "controller", x: { axis: "fsw", from: 50e3, to: 1e6, steps: 25 }, y: { axis: "qgScale", from: 0.25, to: 4, steps: 25, position: "Q1" },
    });
    for (let j = 0; j < 25; j++)
      for (let i = 0; i < 25; i++) {
        const v = s.z[j][i] as number;
        expect(v).not.toBeNull();
        if (i > 0) expect(v).toBeGreaterThan(s.z[j][i - 1] as number);
        if (j > 0) expect(v).toBeGreaterThan(s.z[j - 1][i] as number);
      }
  });

  it("cells without an electro-thermal fixed point are null, agree with evaluateDesign, and nothing is NaN", () => {
    // Q1 on a poor heatsink: loop gain Θ·I²·dRds/dT passes 1 at low Vin (high I_rms).
    const d = demo("direct");
    d.positions[0].mosfet.rthSA = 160;
    const spec: SweepSpec = { part: "Q1", corner: "vnom", x: { axis: "vin", from: 36, to: 75, steps: 30 }, y: { axis: "fsw", from: 1e5, to: 4e5, steps: 20 } };
    const s = sweepGrid(d, spec);
    const flat = s.z.flat();
    expect(flat.some((v) => v === null)).toBe(true);
    expect(flat.some((v) => v !== null)).toBe(true);
    expect(flat.every((v) => v === null || Number.isFinite(v))).toBe(true);
    expect(s.runawayCells).toBe(flat.filter((v) => v === null).length);
    expect(s.z[0][0]).toBeNull();
    expect(s.z[19][29]).not.toBeNull();
    expectCellsMatch(d, spec, [[0, 0], [29, 19], [14, 10], [10, 2], [20, 15]]);
  });
});

describe("limit contour", () => {
  it("every vertex sits on a grid edge whose two ends lie on opposite sides of the limit", () => {
    const s = sweepGrid(demo("direct"), {
      part: "controller", x: { axis: "fsw", from: 50e3, to: 1.5e6, steps: 40, scale: "log" },
      y: { axis: "qgScale", from: 0.25, to: 4, steps: 30, position: "Q1" },
    });
    expect(s.limit).not.toBeNull();
    const lim = s.limit as number;
    expect(s.contour.length).toBeGreaterThan(0);
    let vertices = 0;
    for (const line of s.contour)
      for (const p of line) {
        vertices++;
        const onColumn = Number.isInteger(p.i);
        expect(onColumn || Number.isInteger(p.j)).toBe(true);
        const [i0, j0] = [Math.floor(p.i), Math.floor(p.j)];
        const a = s.z[j0][i0] as number;
        const b = (onColumn ? s.z[Math.min(j0 + 1, 29)][i0] : s.z[j0][Math.min(i0 + 1, 39)]) as number;
        expect(Math.sign(a - lim) * Math.sign(b - lim)).toBeLessThanOrEqual(0);
        expect(p.x).toBeGreaterThanOrEqual(50e3 * (1 - 1e-12));
        expect(p.x).toBeLessThanOrEqual(1.5e6 * (1 + 1e-12));
      }
    // Every straddling pair of neighbours along a row is crossed by the contour.
    let straddles = 0;
    for (let j = 0; j < 30; j++)
      for (let i = 0; i < 39; i++) if (((s.z[j][i] as number) >= lim) !== ((s.z[j][i + 1] as number) >= lim)) straddles++;
    const onRows = s.contour.flat().filter((p) => Number.isInteger(p.j) && !Number.isInteger(p.i)).length;
    expect(onRows).toBe(straddles);
    expect(vertices).toBeGreaterThan(straddles);
  });

  it("a Vin sweep of ΔT across ambient uses limit − Ta per column", () => {
    const s = sweepGrid(demo("direct"), {
      part: "controller", corner: "vmax", x: { axis: "ambient", from: 0, to: 100, steps: 11 }, y: { axis: "fsw", from: 1e5, to: 1e6, steps: 10 },
    });
    expect(s.limit).toBeNull();
    expect(s.limitAlong?.axis).toBe("x");
    expect(s.limitAlong?.values[0]).toBeCloseTo(125 - 0, 9);
    expect(s.limitAlong?.values[10]).toBeCloseTo(125 - 100, 9);
    expect(contourOf(s)).toEqual(s.contour);
  });
});

describe("progress, cancellation and chunking", () => {
  const spec: SweepSpec = {
    part: "controller", x: { axis: "fsw", from: 50e3, to: 1e6, steps: 20 }, y: { axis: "qgScale", from: 0.25, to: 4, steps: 16 },
  };

  it("reports progress once per row, ending at 1", () => {
    const seen: number[] = [];
    sweepGrid(demo("direct"), { ...spec, onProgress: (f) => seen.push(f) });
    expect(seen).toHaveLength(16);
    expect(seen[15]).toBe(1);
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThan(seen[i - 1]);
  });

  it("stops between rows when asked and says it is incomplete", () => {
    let rows = 0;
    const s = sweepGrid(demo("direct"), { ...spec, onProgress: () => rows++, shouldStop: () => rows >= 3 });
    expect(s.complete).toBe(false);
    expect(s.z).toHaveLength(3);
    expect(s.rowRange).toEqual({ from: 0, to: 3 });
    expect(s.contour).toEqual([]);
  });

  it("row chunks merge into the same grid and contour as one run", () => {
    const d = demo("direct");
    const whole = sweepGrid(d, spec);
    const parts = [sweepGrid(d, { ...spec, rows: { from: 10, to: 16 } }), sweepGrid(d, { ...spec, rows: { from: 0, to: 10 } })];
    expect(parts[0].contour).toEqual([]);
    const merged = mergeSweepChunks(parts);
    expect(merged.z).toEqual(whole.z);
    expect(merged.contour).toEqual(whole.contour);
    expect(merged.complete).toBe(true);
    expect(() => mergeSweepChunks([parts[0]])).not.toThrow();
    expect(() => mergeSweepChunks([parts[0], sweepGrid(d, { ...spec, rows: { from: 0, to: 9 } })])).toThrow(SweepSpecError);
  });
});

describe("spec errors are reported, not computed", () => {
  const d = demo("bjt-small");
  const x: SweepAxis = { axis: "fsw", from: 1e5, to: 1e6, steps: 5 };
  it.each([
    [{ part: "nope", x, y: { axis: "ambient", from: 0, to: 50, steps: 5 } }, /no part/],
    [{ part: "Q1", x, y: { ...x } }, /differ/],
    [{ part: "Q1", x, y: { axis: "rGate", from: 0, to: 5, steps: 5 } }, /name the position/],
    [{ part: "Q1.rgOn", x, y: { axis: "ambient", from: 0, to: 50, steps: 5 } }, /no junction/],
    [{ part: "Q1", x, y: { axis: "fsw", from: 0, to: 1, steps: 1 } }, /differ|steps/],
    [{ part: "Q1", corner: "hot", x, y: { axis: "ambient", from: 0, to: 50, steps: 5 } }, /no corner/],
  ] as [SweepSpec, RegExp][])("%#", (spec, msg) => {
    expect(() => sweepGrid(d, spec)).toThrow(msg);
  });
});
