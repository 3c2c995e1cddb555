import { describe, expect, it } from "vitest";
import { marginSummary, marginWords } from "@/components/ui/MarginBar";

describe("marginSummary", () => {
  it("gives the headroom below the derated limit", () => {
    expect(marginSummary(92.4, 125, 150)).toEqual({ kelvin: expect.closeTo(32.6, 9), relation: "below the derated limit" });
    expect(marginSummary(125, 125, 150).relation).toBe("below the derated limit");
  });

  it("says how far past the limit, and past Tj max first", () => {
    expect(marginSummary(139.6, 135, 150)).toEqual({ kelvin: expect.closeTo(4.6, 9), relation: "over the derated limit" });
    expect(marginSummary(163, 135, 150)).toEqual({ kelvin: 13, relation: "above Tj max" });
  });

  it("refuses to invent a margin without a temperature", () => {
    expect(marginSummary(Number.NaN, 125, 150)).toEqual({ kelvin: null, relation: "no temperature" });
  });

  it("prints the words with the kelvin figure", () => {
    expect(marginWords(139.6, 135, 150).replace(/\u00a0/g, " ")).toBe("4.6 K over the derated limit");
  });
});
