import { describe, expect, it } from "vitest";
import { centreScale, contourPath, polylinePath, rampInterpolator, thinTicks } from "@/components/charts/geometry";

describe("centreScale", () => {
  it("interpolates between cell centres, also for uneven axis values", () => {
    const s = centreScale([100e3, 200e3, 400e3], [10, 30, 50]);
    expect(s(100e3)).toBe(10);
    expect(s(150e3)).toBe(20);
    expect(s(300e3)).toBe(40);
    expect(s(400e3)).toBe(50);
    expect(s(500e3)).toBe(60); // extrapolates past the last centre
  });

  it("handles a descending axis (y drawn top-down)", () => {
    const s = centreScale([1, 2, 3], [90, 50, 10]);
    expect(s(1.5)).toBe(70);
    expect(s(3)).toBe(10);
  });
});

describe("paths", () => {
  it("turns a polyline into SVG path data", () => {
    expect(polylinePath([{ x: 0, y: 0 }, { x: 1.234, y: 5 }, { x: 2, y: -0.001 }])).toBe("M0 0L1.23 5L2 0");
    expect(polylinePath([{ x: 1, y: 1 }])).toBe("");
  });

  it("maps a contour in axis values to pixels", () => {
    const mapX = centreScale([0, 1], [0, 100]);
    const mapY = centreScale([0, 1], [200, 0]);
    const d = contourPath([[{ x: 0, y: 0 }, { x: 0.5, y: 0.5 }], [{ x: 1, y: 1 }, { x: 1, y: 0 }]], mapX, mapY);
    expect(d).toBe("M0 200L50 100 M100 0L100 200");
  });
});

describe("ticks and colours", () => {
  it("thins ticks but keeps both ends", () => {
    const t = thinTicks([...Array(30).keys()], 6);
    expect(t[0]).toBe(0);
    expect(t[t.length - 1]).toBe(29);
    expect(t.length).toBeLessThanOrEqual(6);
  });
  it("interpolates colour stops", () => {
    const f = rampInterpolator(["#000000", "#ffffff"]);
    expect(f(0)).toBe("rgb(0, 0, 0)");
    expect(f(0.5)).toBe("rgb(128, 128, 128)");
    expect(f(2)).toBe("rgb(255, 255, 255)");
  });
});
