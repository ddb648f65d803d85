import { describe, expect, test } from "vitest";
import { fitScale, layoutSingleLine, sceneBounds, textWidthPt } from "@/lib/sld";
import { stringFixture } from "./sld-designs";

describe("scene helpers", () => {
  test("everything drawn lies inside the scene's own width and height", () => {
    const scene = layoutSingleLine(stringFixture());
    const b = sceneBounds(scene);
    expect(b.minX).toBeGreaterThanOrEqual(0);
    expect(b.minY).toBeGreaterThanOrEqual(0);
    expect(b.maxX).toBeLessThanOrEqual(scene.width);
    expect(b.maxY).toBeLessThanOrEqual(scene.height);
  });

  test("paths use absolute commands only, so any renderer can draw them", () => {
    const paths = layoutSingleLine(stringFixture()).items.filter((i) => i.kind === "path");
    expect(paths.length).toBeGreaterThan(0);
    for (const p of paths) expect(p.d).toMatch(/^M [\d.-]+ [\d.-]+( [MLCAZ][\d .-]*)*$/);
  });

  test("text width estimate never falls below chars × size × 0.55", () => {
    expect(textWidthPt("illicit", 10)).toBeCloseTo(38.5);
    expect(textWidthPt("MAIN", 10)).toBeGreaterThan(4 * 10 * 0.55);
    expect(textWidthPt("40 A", 10, { mono: true })).toBeCloseTo(24);
  });

  test.each([
    [{ width: 1000, height: 500 }, 500, 500, 0.5],
    [{ width: 1000, height: 500 }, 2000, 500, 1],
  ])("%j fits %d × %d at %d", (scene, w, h, scale) => {
    expect(fitScale(scene, w, h)).toBe(scale);
  });
});
