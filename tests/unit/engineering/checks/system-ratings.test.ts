import { describe, expect, test } from "vitest";
import { DesignInputError, checkDcToAcRatio, checkModuleCount, systemRatings } from "@/lib/engineering";
import { coldSite, microDesign, stringDesign } from "../fixtures";

describe("system ratings (arithmetic)", () => {
  // 20 × 400 W = 8.0 kW DC; 7.6 kW AC; 8 / 7.6 = 1.0526
  test("string design: 8 kW DC, 7.6 kW AC, ratio 1.05", () => {
    const r = systemRatings(stringDesign());
    expect(r).toMatchObject({ moduleCount: 20, dcKw: 8, acKw: 7.6 });
    expect(r.dcToAcRatio).toBeCloseTo(1.0526, 4);
  });

  // 20 micro-inverters × 300 W = 6 kW AC → 8 / 6 = 1.333
  test("micro design: 6 kW AC, ratio 1.33", () => {
    expect(systemRatings(microDesign()).dcToAcRatio).toBeCloseTo(1.3333, 4);
  });

  // 30 × 400 W = 12 kW / 7.6 kW = 1.58 > 1.5 (common practice)
  test("a DC/AC ratio above 1.5 warns (common practice)", () => {
    const design = stringDesign({ roofPlanes: [{ id: "a", label: "A", moduleCount: 30, attachmentCount: 30, rackingWeightLb: 200 }] });
    expect(checkDcToAcRatio(design, coldSite)[0]).toMatchObject({ status: "warn", value: 1.58, limit: 1.5 });
  });

  test("zero modules is an input error", () => {
    const design = stringDesign({ roofPlanes: [{ id: "a", label: "A", moduleCount: 0, attachmentCount: 1, rackingWeightLb: 0 }] });
    expect(() => systemRatings(design)).toThrow(DesignInputError);
  });

  test.each([
    [20, "pass"],
    [22, "fail"],
  ])("strings hold 20 modules, roof holds %d → %s", (onRoof, status) => {
    const design = stringDesign({ roofPlanes: [{ id: "a", label: "A", moduleCount: onRoof, attachmentCount: 24, rackingWeightLb: 180 }] });
    expect(checkModuleCount(design, coldSite)[0]).toMatchObject({ status, value: 20, limit: onRoof });
  });

  test("micro-inverter designs have no strings to count", () => {
    expect(checkModuleCount(microDesign(), coldSite)).toEqual([]);
  });
});
