import { describe, expect, it } from "vitest";
import { groupWarnings } from "@/models/warningGroups";
import type { Warning } from "@/models/warnings";
import { evaluateDesign } from "@/models/evaluate";
import { parseDesign } from "@/models/input/schema";
import { demoOptions } from "@/models/demo";

const w = (cornerId: string, severity: Warning["severity"], code = "vgs-near-max", partId = "q1"): Warning =>
  ({ code, severity, partId, cornerId, element: `positions.0.mosfet`, message: `${severity} at ${cornerId}` }) as Warning;

describe("groupWarnings: one report entry per warning, with its corners", () => {
  it("merges the same code on the same part across corners and keeps the most severe wording", () => {
    const g = groupWarnings([w("lo", "warning"), w("hi", "error"), w("nom", "warning"), w("lo", "info", "other-code")]);
    expect(g).toHaveLength(2);
    expect(g[0]).toMatchObject({ severity: "error", message: "error at hi", cornerIds: ["lo", "hi", "nom"] });
    expect(g[1]).toMatchObject({ code: "other-code", cornerIds: ["lo"] });
  });

  it("loses no warning of the demo options: every (code, part, element, corner) is in exactly one group", () => {
    let merged = 0;
    for (const o of demoOptions) {
      const p = parseDesign(o.input);
      if (!p.ok) throw new Error(o.key);
      const raw = evaluateDesign(p.design).warnings;
      const groups = groupWarnings(raw);
      const fromGroups = groups.flatMap((g) => g.cornerIds.map((c) => `${g.code}|${g.partId}|${g.element}|${c}`)).sort();
      const fromRaw = [...new Set(raw.map((x) => `${x.code}|${x.partId}|${x.element}|${x.cornerId}`))].sort();
      expect(fromGroups).toEqual(fromRaw);
      merged += raw.length - groups.length;
    }
    expect(merged, "some demo warning repeats over corners").toBeGreaterThan(0);
  });
});
