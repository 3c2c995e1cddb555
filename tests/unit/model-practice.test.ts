/**
 * Rules of thumb of the trade, checked against the model and the demo parts.
 * Each is "common practice": no published source, the trade's experience.
 */
import { describe, expect, it } from "vitest";
import { parseDesign, type Design, type DesignInput } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { hfeAt, peakHfe } from "@/models/driveStage";
import { controllerHRGPC72, mosfetQN080S3, npnQTN3HC, npnQTN6SL, pnpQTP3HC, pnpQTP6SL } from "@/models/demoParts";

type PositionInput = DesignInput["positions"][number];

function build(position: Partial<PositionInput> & Pick<PositionInput, "drive" | "mosfet">): Design {
  const input: DesignInput = {
    schemaVersion: 2,
    name: "practice",
    corners: [{ id: "a", vin: "48 V", ambient: "25 °C", fsw: "100 kHz" }],
    controller: controllerHRGPC72,
    positions: [{
      id: "Q1", role: "primary", gate: { rTurnOn: "0 Ω" },
      conduction: { switching: "zvs", points: [{ vin: 48, turnOnVds: 0, turnOnId: 0, turnOffVds: 0, turnOffId: 0, iRms: 0, iAvg: 0, duty: 0.5 }] },
      ...position,
    }],
  };
  const r = parseDesign(input);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

/** A 10 nF linear gate: Q = 10 nF · V. */
const gate10nF = { qgs: "40 nC", qgd: "0 nC", qg: "100 nC", qgVgs: "10 V", vth: "3 V", vpl: "4 V", ciss: "10 nF", rgInt: "0.5 Ω", rds25: "10 mΩ", rthJA: "40 K/W" };
const parsed = (pts: { ic: string; hfe: number }[]) => pts.map((p) => ({ ic: Number.parseFloat(p.ic) * (p.ic.includes("mA") ? 1e-3 : 1), hfe: p.hfe }));

describe("common practice", () => {
  it("common practice: a small-signal NPN/PNP follower pushes peaks above 2 A into a 10 nF gate, for a short edge", () => {
    const c = evaluateDesign(build({ mosfet: gate10nF, drive: { kind: "bjt-follower", npn: npnQTN6SL, pnp: pnpQTP6SL } })).corners[0];
    const p = c.positions[0];
    expect(p.iOnPeak).toBeGreaterThan(2);
    expect(p.iOffPeak).toBeGreaterThan(2);
    // The whole swing takes well under 100 ns at that current.
    expect(p.deltaQ / p.iOnPlateau).toBeLessThan(100e-9);
  });

  it("common practice: small-signal transistors lose most gain by ~0.5 A; high-current small-package types keep usable gain to 3–4 A", () => {
    const small = parsed(npnQTN6SL.hfe);
    const big = parsed(npnQTN3HC.hfe);
    expect(hfeAt(small, 0.5)).toBeLessThan(0.3 * peakHfe(small));
    expect(hfeAt(big, 3.5)).toBeGreaterThan(0.35 * peakHfe(big));
    expect(hfeAt(big, 3.5)).toBeGreaterThan(100);
  });

  it("common practice: an SR channel drops ~0.1 V where the body diode drops 0.7–1 V", () => {
    const sr = (mode: "channel" | "body-diode") =>
      build({
        role: "synchronous-rectifier", mosfet: mosfetQN080S3, drive: { kind: "driver-ic", sourceResistance: "2 Ω", sinkResistance: "1 Ω", rthJA: "150 K/W" },
        conduction: { switching: "zvs", mode, points: [{ vin: 48, turnOnVds: 0, turnOnId: 20, turnOffVds: 0, turnOffId: 20, iRms: 20, iAvg: 20, duty: 1 }] },
      });
    const ch = evaluateDesign(sr("channel")).corners[0].parts.find((p) => p.id === "Q1")!;
    const bd = evaluateDesign(sr("body-diode")).corners[0].parts.find((p) => p.id === "Q1")!;
    const vChannel = ch.losses.conduction / 20;
    const vDiode = bd.losses.diodeConduction / 20;
    expect(vChannel).toBeGreaterThan(0.04);
    expect(vChannel).toBeLessThan(0.15);
    expect(vDiode).toBeGreaterThan(0.7);
    expect(vDiode).toBeLessThan(1.0);
    expect(ch.losses.conduction / bd.losses.diodeConduction).toBeLessThan(0.2);
  });

  it("common practice: a negative turn-off bias of 10–15 V shortens turn-off", () => {
    const mosfet = { qgs: "13 nC", qgd: "9 nC", qg: "42 nC", vth: "3.1 V", vpl: "4.8 V", rds25: "12 mΩ", rthJA: "30 K/W" };
    const drv = (vNeg: string) => build({
      mosfet, drive: { kind: "driver-ic", vNeg, sourceResistance: "2 Ω", sinkResistance: "1 Ω", rthJA: "150 K/W" }, gate: { rTurnOn: "2.2 Ω" },
      conduction: { switching: "hard", points: [{ vin: 48, turnOnVds: 48, turnOnId: 10, turnOffVds: 80, turnOffId: 12, iRms: 6, iAvg: 3, duty: 0.4 }] },
    });
    const t = (v: string) => { const e = evaluateDesign(drv(v)).corners[0].positions[0].turnOff!; return e.ti + e.tv; };
    // Plateau current (Vpl − V−)/R: (4.8 + 12)/4.8 ≈ 3.5× at −12 V.
    expect(t("-12 V")).toBeLessThan(0.5 * t("0 V"));
    expect(t("0 V") / t("-12 V")).toBeCloseTo((4.8 + 12) / 4.8, 6);
  });

  it("common practice: a buffer moves most gate heat out of the controller (its share falls by about hFE + 1)", () => {
    const mosfet = { qgs: "13 nC", qgd: "9 nC", qg: "42 nC", vth: "3.1 V", vpl: "4.8 V", rds25: "12 mΩ", rthJA: "30 K/W" };
    const ctl = (drive: PositionInput["drive"]) =>
      evaluateDesign(build({ mosfet, drive, gate: { rTurnOn: "2.2 Ω" } })).corners[0];
    const direct = ctl({ kind: "direct" }).parts.find((p) => p.id === "controller")!.losses.gateDrive;
    const c = ctl({ kind: "bjt-follower", npn: npnQTN3HC, pnp: pnpQTP3HC });
    const buffered = c.parts.find((p) => p.id === "controller")!.losses.gateDrive;
    const hMin = Math.min(...[npnQTN3HC, pnpQTP3HC].map((t) => hfeAt(parsed(t.hfe), Math.max(c.positions[0].iOnPeak, c.positions[0].iOffPeak))));
    expect(buffered).toBeLessThan(0.05 * direct);
    expect(direct / buffered).toBeGreaterThan(hMin + 1);
  });
});
