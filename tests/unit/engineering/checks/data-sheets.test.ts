import { describe, expect, test } from "vitest";
import { checkDataSheets, checkStringVoltage, coldModuleVoc, reviewDesign } from "@/lib/engineering";
import type { TempCoefficient } from "@/lib/engineering";
import { coldSite, larkspurModule, northmereString, quillonShutdown, stringDesign } from "../fixtures";

const withCoeff = (vocTempCoeff: TempCoefficient) => stringDesign({ module: { ...larkspurModule, vocTempCoeff } });
const problem = (design: ReturnType<typeof stringDesign>, id: string) => checkDataSheets(design, coldSite).find((c) => c.id === id);

// Crystalline Voc coefficients are about −0.2 to −0.5 %/°C; a V/°C figure is about Voc × that (issue 11
// item 4; common practice). Outside −0.1 to −0.7 %/°C the figure is a unit slip and fails.
describe("data-sheet plausibility: Voc temperature coefficient (common practice ranges)", () => {
  test.each([
    [{ value: -0.28, unit: "%/C" }, undefined],
    [{ value: -0.112, unit: "V/C" }, undefined], // −0.112 / 40 V = −0.28 %/°C
    [{ value: -0.55, unit: "%/C" }, "warn"], // unusual, not impossible
    [{ value: -0.15, unit: "%/C" }, "warn"],
    [{ value: -0.0027, unit: "%/C" }, "fail"], // a fraction per °C typed as %/°C
    [{ value: -0.4, unit: "V/C" }, "fail"], // −1 %/°C of a 40 V module: a %/°C figure typed as V/°C
    [{ value: -0.28, unit: "V/C" }, "warn"], // −0.7 %/°C: at the edge of what a module can have
    [{ value: -1.5, unit: "%/C" }, "fail"],
  ] as const)("%j → %s", (coeff, status) => {
    const r = problem(withCoeff(coeff), "data-sheet:module.vocTempCoeff");
    if (status === undefined) expect(r).toBeUndefined();
    else expect(r).toMatchObject({ status, field: "module.vocTempCoeff" });
  });

  // Issue 11 item 4: −0.0027 entered as %/°C would leave a 15-module string of 40 V modules at
  // 15 × 40 × (1 + 45 × 0.000027) = 600.73 V... and a 14-module one "passes" at 560.7 V where Table
  // 690.7(A) gives 14 × 40 × 1.18 = 660.8 V at −20 °C (REFERENCE.md). The cold voltage must not drop.
  test("an implausible coefficient never removes the cold correction: the table factor sets a floor", () => {
    const design = { ...withCoeff({ value: -0.0027, unit: "%/C" }), strings: [{ id: "S1", inverterId: "inv-1", modulesInSeries: 14 }] };
    const cold = coldModuleVoc(design.module, -20);
    expect(cold).toMatchObject({ method: "table", factor: 1.18, coefficientSetAside: true });
    const [r] = checkStringVoltage(design, coldSite, design.strings[0]!);
    expect(r).toMatchObject({ status: "fail", value: 660.8, limit: 600 });
    expect(r!.message).toContain("outside the usual range");
    expect(reviewDesign(design, coldSite).summary.status).toBe("fail");
  });

  test("the rule, not one number: for any coefficient and temperature the cold Voc is at least the lower of the two methods, and never below the table outside the typical band", () => {
    for (let pct = -1.5; pct <= -0.001; pct += 0.037) {
      for (const tempC of [-40, -25, -10, 0, 10, 24]) {
        const m = { ...larkspurModule, vocTempCoeff: { value: pct, unit: "%/C" as const } };
        const v = coldModuleVoc(m, tempC).vocV;
        const table = coldModuleVoc({ ...m, vocTempCoeff: undefined }, tempC).vocV;
        const typical = pct >= -0.5 && pct <= -0.2;
        if (!typical) expect(v).toBeGreaterThanOrEqual(table - 1e-9);
        expect(v).toBeGreaterThanOrEqual(m.vocV);
      }
    }
  });
});

describe("data-sheet plausibility: other figures the review uses (common practice ranges)", () => {
  test("a sound data sheet gives one passing result", () => {
    expect(checkDataSheets(stringDesign(), coldSite)).toEqual([expect.objectContaining({ id: "data-sheet", status: "pass" })]);
  });

  test.each([
    ["Pmax far from Vmp × Imp", { powerW: 480 }, "data-sheet:module.powerW"], // 33.6 × 11.9 = 399.8 W
    ["Vmp too close to Voc", { vmpV: 39.5, powerW: 470 }, "data-sheet:module.vmpV"],
    ["Imp too far below Isc", { impA: 9.9, powerW: 333 }, "data-sheet:module.impA"],
    ["a Pmax coefficient typed as a fraction", { pmaxTempCoeffPctPerC: -0.0035 }, "data-sheet:module.pmaxTempCoeffPctPerC"],
  ] as const)("%s warns and names the field", (_what, patch, id) => {
    const r = problem(stringDesign({ module: { ...larkspurModule, ...patch } }), id);
    expect(r).toMatchObject({ status: "warn", field: id.replace("data-sheet:", "") });
  });

  // A 7600 W, 240 V inverter needs 31.67 A; 3.2 A (a misplaced decimal) would size a 15 A breaker.
  test("an inverter current too low for its rated power fails: breakers and conductors are sized from it", () => {
    const r = problem(
      stringDesign({ inverters: [{ ...northmereString, acOutputCurrentA: 3.2 }] }),
      "data-sheet:inverters.inv-1.acOutputCurrentA",
    );
    expect(r).toMatchObject({ status: "fail", value: 3.2, limit: 31.67, field: "inverters.inv-1.acOutputCurrentA" });
  });

  test("three-phase inverters divide by √3 × V", () => {
    // 10 kW at 208 V three-phase: 10000 / (208 × 1.732) = 27.76 A; 28 A is plausible
    const inv = { ...northmereString, acPowerW: 10000, acVoltageV: 208, phase: 3 as const, acOutputCurrentA: 28 };
    expect(problem(stringDesign({ inverters: [inv] }), "data-sheet:inverters.inv-1.acOutputCurrentA")).toBeUndefined();
  });

  test("an MPPT window above the maximum DC input warns", () => {
    const r = problem(stringDesign({ inverters: [{ ...northmereString, mpptMaxV: 650 }] }), "data-sheet:inverters.inv-1.mpptMaxV");
    expect(r).toMatchObject({ status: "warn" });
  });

  test.each([
    [0.6, undefined],
    [0.06, "warn"], // 0.6 typed with a slipped decimal
    [12, "warn"],
  ] as const)("a device holding %d V while shut down → %s", (shutdownOutputV, status) => {
    const r = problem(
      stringDesign({ moduleLevelDevice: { ...quillonShutdown, shutdownOutputV } }),
      "data-sheet:moduleLevelDevice.shutdownOutputV",
    );
    if (status === undefined) expect(r).toBeUndefined();
    else expect(r).toMatchObject({ status, field: "moduleLevelDevice.shutdownOutputV" });
  });
});
