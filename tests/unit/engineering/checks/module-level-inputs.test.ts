import { describe, expect, test } from "vitest";
import { checkModuleLevelInputs } from "@/lib/engineering";
import { coldSite, fenwickOptimizer, larkspurModule, microDesign, stringDesign } from "../fixtures";

describe("each module's cold Voc against its device input (690.7(A) with 110.3(B))", () => {
  // 40.0 × 1.126 = 45.04 V ≤ 60 V optimizer input
  test("optimizer input: 45.04 V passes against 60 V; 12.2 A Isc against 14.5 A", () => {
    const checks = checkModuleLevelInputs(stringDesign({ moduleLevelDevice: fenwickOptimizer }), coldSite);
    expect(checks.map((c) => [c.id, c.status, c.value, c.limit])).toEqual([
      ["device-input-voltage:module-level-device", "pass", 45.04, 60],
      ["device-input-current:module-level-device", "pass", 12.2, 14.5],
    ]);
  });

  // A high-voltage module: Voc 55 V × 1.126 = 61.93 V > 60 V
  test("a 55 V Voc module is too much for a 60 V micro-inverter input at −20 °C", () => {
    const design = microDesign({ module: { ...larkspurModule, vocV: 55, vmpV: 46 } });
    const v = checkModuleLevelInputs(design, coldSite).find((c) => c.id === "device-input-voltage:micro")!;
    expect(v).toMatchObject({ status: "fail", value: 61.93, limit: 60 });
    expect(v.fix).toMatch(/62 V/);
  });

  test("no module-level device and no micro-inverter: nothing to check", () => {
    expect(checkModuleLevelInputs(stringDesign({ moduleLevelDevice: undefined }), coldSite)).toEqual([]);
  });
});
