// Mapping the calculator's output at several corners onto the design
// document's waveform points (scheme in models/input/schemaOperating.ts; the
// waveform fields under their new names turnOnVds/turnOnId/turnOffVds/turnOffId).
import { describe, expect, it } from "vitest";
import { toDesignWaveforms } from "@/models/converter/designPoints";
import type { ConverterSpec } from "@/models/converter/types";
import { pointOf, positionOf } from "./converter-helpers";

const flyback = (vin: number, iout: number): ConverterSpec => ({
  topology: "flyback", vin, vout: 5, iout, fsw: 100e3, efficiency: 0.9, turnsRatio: 2,
  magnetizingInductance: 10e-6, rectifier: "synchronous", deadTimes: [50e-9, 30e-9], mode: "auto",
});

const corners = [
  { id: "vmax", point: pointOf(flyback(36, 6)) },
  { id: "vmin", point: pointOf(flyback(9, 6)) },
  { id: "light", point: pointOf(flyback(36, 2)) },
];

describe("design waveform points from corners", () => {
  const r = toDesignWaveforms(corners);
  if (!r.ok) throw new Error(r.message);
  const { positions, corners: out } = r.waveforms;
  const q1 = positions.find((p) => p.id === "Q1")!;
  const sr = positions.find((p) => p.id === "SR1")!;

  it("full-load corners become points in rising Vin, with the new field names", () => {
    expect(q1.conduction.points.map((p) => p.vin)).toEqual([9, 36]);
    expect(Object.keys(q1.conduction.points[0]).sort()).toEqual(
      ["duty", "iAvg", "iRms", "turnOffId", "turnOffVds", "turnOnId", "turnOnVds", "vin"],
    );
    const at9 = positionOf(corners[1].point, "Q1");
    expect(q1.conduction.points[0]).toMatchObject({
      turnOnVds: at9.turnOn.vds, turnOnId: at9.turnOn.id, turnOffVds: at9.turnOff.vds, turnOffId: at9.turnOff.id,
      iRms: at9.iRms, iAvg: at9.iAvg, duty: at9.duty,
    });
  });

  it("the light-load (DCM) corner is an override with its own values, not a scaled point", () => {
    const light = out.find((c) => c.id === "light")!;
    expect(light.loadFraction).toBeCloseTo(1 / 3, 12);
    expect(light.waveforms?.Q1.turnOnId).toBe(0);
    expect(light.waveforms?.Q1.turnOnVds).toBe(36);
    expect(out.find((c) => c.id === "vmin")!.waveforms).toBeUndefined();
  });

  it("switching, mode and dead times per position", () => {
    expect(q1.conduction).toMatchObject({ switching: "hard", mode: "channel" });
    expect(sr.role).toBe("synchronous-rectifier");
    expect(sr.conduction.switching).toBe("zvs");
    expect(sr.conduction.deadTimes[0]).toBeCloseTo(50e-9, 15);
    expect(sr.conduction.deadTimes[1]).toBeCloseTo(30e-9, 15);
    // The SR's turn-off value is the voltage it recovers against (Vout + Vin/n), the
    // evaluator holding the edge itself at Vsd; its average is the whole device current.
    expect(sr.conduction.points[0].turnOffVds).toBeCloseTo(5 + 9 / 2, 12);
    expect(sr.conduction.points[0].iAvg).toBeCloseTo(6, 12);
  });

  it("a diode rectifier maps to a body-diode position", () => {
    const d = toDesignWaveforms([{ id: "a", point: pointOf({ ...flyback(24, 6), rectifier: "diode" }) }]);
    if (!d.ok) throw new Error(d.message);
    expect(d.waveforms.positions[1]).toMatchObject({ id: "D1", role: "other", conduction: { mode: "body-diode" } });
  });

  it("refuses mixed topologies and two different full-load points at one Vin", () => {
    const buck = pointOf({ topology: "buck", vin: 24, vout: 5, iout: 6, fsw: 1e5, efficiency: 0.9, filterInductance: 10e-6, rectifier: "diode", mode: "auto" });
    expect(toDesignWaveforms([corners[0], { id: "b", point: buck }]).ok).toBe(false);
    const other = pointOf({ ...flyback(36, 6), fsw: 150e3 });
    const r2 = toDesignWaveforms([corners[0], { id: "fast", point: other }]);
    expect(r2.ok).toBe(false);
    if (!r2.ok) expect(r2.message).toMatch(/share Vin/);
  });
});
