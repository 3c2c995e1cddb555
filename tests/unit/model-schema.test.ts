import { describe, expect, it } from "vitest";
import { designJsonSchema, parseDesign, type DesignInput } from "@/models/input/schema";
import { demoOptions } from "@/models/demo";

/** A one-switch design written with unit strings, as a user would. */
function oneSwitch(): DesignInput {
  return {
    schemaVersion: 2,
    name: "schema test",
    corners: [{ id: "nom", vin: "48 V", ambient: "85 °C", fsw: "250 kHz" }],
    controller: { vcc: "12 V", iq: "5 mA", pin: { sourceResistance: "5 Ω", sinkResistance: "2 Ω" }, rthJA: "90 °C/W" },
    positions: [{
      id: "Q1", role: "primary",
      mosfet: { qgs: "17 nC", qgd: "13 nC", qg: "58 nC", vth: "3 V", vpl: "4.9 V", rds25: "10 mΩ", rthJA: "30 K/W" },
      drive: { kind: "direct" }, gate: { rTurnOn: "2.2 ohm" },
      conduction: { points: [{ vin: "48 V", turnOnVds: "48 V", turnOnId: "10 A", turnOffVds: "80 V", turnOffId: "12 A", iRms: "8 A", iAvg: "4 A", duty: 0.4 }] },
    }],
  };
}

describe("parseDesign", () => {
  it("parses unit strings to SI and fills documented defaults", () => {
    const r = parseDesign(oneSwitch());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const m = r.design.positions[0].mosfet;
    expect(m.qg / 58e-9).toBeCloseTo(1, 12);
    expect(m.qgVgs).toBe(10); // Qg test gate voltage default (policy.ts)
    expect(m.rgInt).toBe(1);
    expect(r.design.corners[0].fsw).toBe(250e3);
    expect(r.design.corners[0].ambient).toBeCloseTo(85, 12);
    expect(r.design.controller.rthJA).toBe(90);
    expect(r.design.derating.vgsMaxFraction).toBe(0.8);
    expect(r.design.positions[0].conduction.deadTimes).toEqual([0, 0]);
  });

  it("refuses a wrong dimension and names the field path", () => {
    const input = oneSwitch();
    (input.positions[0].mosfet as Record<string, unknown>).qg = "4.7 V";
    const r = parseDesign(input);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues).toContainEqual({ path: "positions.0.mosfet.qg", message: 'expected a charge (e.g. "47 nC"), got "4.7 V"' });
  });

  it("reports unknown fields (strict objects) and cross-field mistakes", () => {
    const input = oneSwitch() as unknown as { positions: Record<string, unknown>[]; thermal?: unknown };
    input.positions[0].colour = "red";
    const r = parseDesign(input);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.some((i) => i.path === "positions.0" && /colour/.test(i.message))).toBe(true);

    const bad = oneSwitch();
    Object.assign(bad.positions[0].mosfet, { vth: "5 V" });
    const r2 = parseDesign(bad);
    expect(r2.ok).toBe(false);
    if (!r2.ok) expect(r2.issues.map((i) => i.path)).toContain("positions.0.mosfet.vth");

    const coupled = { ...oneSwitch(), thermal: { coupling: [{ from: "Q1", to: "Q9", theta: "3 K/W" }] } };
    const r3 = parseDesign(coupled);
    expect(r3.ok).toBe(false);
    if (!r3.ok) expect(r3.issues.map((i) => i.path)).toContain("thermal.coupling.0.to");
  });

  it("produces a JSON schema of the input document with unit strings allowed", () => {
    const js = designJsonSchema() as { properties: Record<string, { properties?: Record<string, unknown> }> };
    expect(js.properties.corners).toBeDefined();
    expect(JSON.stringify(js.properties.controller.properties?.vcc)).toContain("string");
    expect(JSON.stringify(js)).toContain("bjt-follower");
  });

  it("parses every demo option", () => {
    for (const o of demoOptions) expect(parseDesign(o.input).ok, o.key).toBe(true);
  });
});
