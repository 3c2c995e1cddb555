// Design document versions: a version-1 document (as the product stored it
// before version 2: tests/fixtures/demo-driver-ic-v1.json is demo option 3
// written by that code, only its part numbers renamed since) upgrades to
// exactly today's demo document and evaluates to the same numbers.
import { describe, expect, it } from "vitest";
import v1DriverIc from "../fixtures/demo-driver-ic-v1.json";
import { upgradeDesignDocument } from "@/models/schemaUpgrade";
import { designInputSchema, parseDesign, type Design } from "@/models/input/schema";
import { evaluateDesign } from "@/models/evaluate";
import { demoOptions } from "@/models/demo";

const demoV2 = () => JSON.parse(JSON.stringify(demoOptions.find((o) => o.key === "driver-ic")!.input));

function parsed(doc: unknown): Design {
  const r = parseDesign(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.design;
}

describe("upgradeDesignDocument", () => {
  it("turns the stored version-1 demo option into exactly the version-2 demo document", () => {
    const before = JSON.stringify(v1DriverIc);
    const { document, fromVersion } = upgradeDesignDocument(v1DriverIc);
    expect(fromVersion).toBe(1);
    expect(document).toStrictEqual(demoV2());
    expect(JSON.stringify(v1DriverIc)).toBe(before); // pure: the input is untouched
  });

  it("evaluates the version-1 document to the same numbers as the version-2 one", () => {
    expect(evaluateDesign(parsed(v1DriverIc))).toStrictEqual(evaluateDesign(parsed(demoV2())));
  });

  it("leaves a version-2 document as it is", () => {
    const doc = demoV2();
    const r = upgradeDesignDocument(doc);
    expect(r.fromVersion).toBe(2);
    expect(r.document).toBe(doc);
  });

  it("renames corner overrides as well as the waveform points", () => {
    const v1 = structuredClone(v1DriverIc) as Record<string, any>;
    v1.corners[0].waveforms = { Q1: { vdsOn: "30 V", idOff: "9 A", duty: 0.5 } };
    const v2 = demoV2();
    v2.corners[0].waveforms = { Q1: { turnOnVds: "30 V", turnOffId: "9 A", duty: 0.5 } };
    expect(upgradeDesignDocument(v1).document).toStrictEqual(v2);
    const c = evaluateDesign(parsed(v1)).corners[0].positions[0];
    expect([c.waveform.vdsOn, c.waveform.idOff, c.waveform.duty]).toEqual([30, 9, 0.5]);
  });

  it("is what the API's schema runs too, so old clients keep working", () => {
    const r = designInputSchema.safeParse(v1DriverIc);
    expect(r.success).toBe(true);
    expect(r.data?.positions[0].gate.rTurnOn).toBeCloseTo(2.2, 12);
  });

  it("refuses a document that mixes an old name with its new one, naming the old field", () => {
    const v1 = structuredClone(v1DriverIc) as Record<string, any>;
    v1.positions[0].gate.rTurnOn = "3.3 Ω"; // rOn is still there
    const r = parseDesign(v1);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => i.path)).toContain("positions.0.gate");
    if (!r.ok) expect(r.issues.map((i) => i.message).join(" ")).toMatch(/rOn/);
  });

  it("refuses a version it does not know, in plain words at schemaVersion", () => {
    const r = parseDesign({ ...demoV2(), schemaVersion: 3 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues).toContainEqual({ path: "schemaVersion", message: expect.stringMatching(/version 1 .* and 2/) });
  });
});
