import { describe, expect, test } from "vitest";
import { DesignInputError, checkRoofLoad, roofPlaneLoad } from "@/lib/engineering";
import { coldSite, stringDesign } from "../fixtures";

const plane = { id: "south", label: "South roof", moduleCount: 20, attachmentCount: 24, rackingWeightLb: 180 };

describe("roof dead load (arithmetic; 5 lb/ft² expedited ceiling is common practice)", () => {
  // Area: 69.1 in × 44.6 in = 3081.86 in² / 144 = 21.4018 ft² × 20 = 428.036 ft²
  // Weight: 20 × 48.5 lb + 180 lb = 1150 lb → 1150 / 428.036 = 2.687 lb/ft²; 1150 / 24 = 47.92 lb per attachment
  test("20 modules with 180 lb of racking: 2.69 lb/ft², 47.9 lb per attachment", () => {
    const load = roofPlaneLoad(stringDesign(), plane);
    expect(load.arrayAreaFt2).toBeCloseTo(428.036, 3);
    expect(load.totalWeightLb).toBe(1150);
    expect(load.deadLoadPsf).toBeCloseTo(2.6867, 4);
    expect(load.loadPerAttachmentLb).toBeCloseTo(47.917, 3);
  });

  // (970 + 1200) / 428.036 = 5.07 lb/ft² > 5
  test("heavy racking above 5 lb/ft² warns", () => {
    const [dead] = checkRoofLoad(stringDesign(), coldSite, { ...plane, rackingWeightLb: 1200 });
    expect(dead).toMatchObject({ status: "warn", value: 5.07, limit: 5, unit: "lb/ft²" });
  });

  // 47.92 lb > 40 lb rating → at least ⌈1150 / 40⌉ = 29 attachments
  test("load per attachment above its rating fails and names the attachment count", () => {
    const [, per] = checkRoofLoad(stringDesign({ attachmentRatedLoadLb: 40 }), coldSite, plane);
    expect(per).toMatchObject({ status: "fail", value: 47.92, limit: 40, fix: "Use at least 29 attachments." });
  });

  test("zero attachments is a readable input error", () => {
    expect(() => roofPlaneLoad(stringDesign(), { ...plane, attachmentCount: 0 })).toThrow(DesignInputError);
  });

  test("ground mounts put no load on a roof", () => {
    expect(checkRoofLoad(stringDesign({ mount: "ground" }), coldSite, plane)).toEqual([]);
  });
});
