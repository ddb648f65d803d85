import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { CONDUCTOR_SIZES, runVoltageDrop, voltageDropV } from "@/lib/engineering";
import type { ConductorRun, ConductorSize, Stranding } from "@/lib/engineering";
import { acRun, microDesign, stringDesign, stringRun } from "../fixtures";
import { RUNS, listedSizes, materialArb, num } from "./arbitraries";

// Chapter 9 Table 8 method (REFERENCE.md): Vd = k × L × R × I / 1000, k = 2 (DC, single phase) or √3.
// Drop grows with length; a larger conductor of the same material has less resistance.
const systemArb = fc.constantFrom("dc" as const, "1-phase" as const, "3-phase" as const);
const runArb = fc.constantFrom(
  { design: stringDesign(), run: stringRun },
  { design: stringDesign(), run: acRun },
  { design: microDesign(), run: microDesign().runs[0]! },
);
const conductorTempArb = fc.option(num(-20, 150), { nil: undefined });

/** Sizes Table 8 lists for a material and stranding: solid copper stops at 8 AWG; no solid aluminum. */
function table8Sizes(material: "Cu" | "Al", stranding: Stranding): readonly ConductorSize[] {
  if (stranding === "stranded") return material === "Al" ? listedSizes("Al") : CONDUCTOR_SIZES;
  return material === "Cu" ? ["14", "12", "10", "8"] : [];
}

describe("voltage drop: longer runs lose more, larger conductors lose less", () => {
  test("a longer run never lowers the voltage drop (the formula)", () => {
    fc.assert(
      fc.property(systemArb, num(0, 2000), num(0, 2000), num(0.01, 6), num(0, 200), (system, a, b, ohmPerKft, currentA) => {
        const [shortFt, longFt] = a <= b ? [a, b] : [b, a];
        expect(voltageDropV(system, longFt, ohmPerKft, currentA)).toBeGreaterThanOrEqual(
          voltageDropV(system, shortFt, ohmPerKft, currentA),
        );
      }),
      RUNS,
    );
  });

  test("a longer run never lowers the voltage drop of a design's run", () => {
    fc.assert(
      fc.property(runArb, num(0, 1000), num(0, 1000), ({ design, run }, a, b) => {
        const [shortFt, longFt] = a <= b ? [a, b] : [b, a];
        const longer = runVoltageDrop(design, { ...run, lengthFt: longFt });
        const shorter = runVoltageDrop(design, { ...run, lengthFt: shortFt });
        expect(longer.dropV).toBeGreaterThanOrEqual(shorter.dropV);
        expect(longer.percent).toBeGreaterThanOrEqual(shorter.percent);
      }),
      RUNS,
    );
  });

  test("a larger conductor of the same material and stranding never raises the voltage drop", () => {
    const caseArb = fc
      .record({ material: materialArb, solid: fc.boolean() })
      .map(({ material, solid }) => ({ material, stranding: (solid && material === "Cu" ? "solid" : "stranded") as Stranding }))
      .chain(({ material, stranding }) => {
        const sizes = table8Sizes(material, stranding);
        return fc.record({
          material: fc.constant(material),
          stranding: fc.constant(stranding),
          smaller: fc.integer({ min: 0, max: sizes.length - 1 }),
          larger: fc.integer({ min: 0, max: sizes.length - 1 }),
          sizes: fc.constant(sizes),
        });
      });
    fc.assert(
      fc.property(runArb, caseArb, conductorTempArb, num(1, 500), ({ design, run }, c, conductorTempC, lengthFt) => {
        const [i, j] = c.smaller <= c.larger ? [c.smaller, c.larger] : [c.larger, c.smaller];
        const sized: ConductorRun = {
          ...run,
          lengthFt,
          conductorTempC,
          conductor: { ...run.conductor, material: c.material, stranding: c.stranding },
        };
        const smaller = runVoltageDrop(design, sized, c.sizes[i]);
        const larger = runVoltageDrop(design, sized, c.sizes[j]);
        expect(larger.dropV).toBeLessThanOrEqual(smaller.dropV);
      }),
      RUNS,
    );
  });

  test("copper never drops more than aluminum of the same size", () => {
    fc.assert(
      fc.property(runArb, fc.constantFrom(...listedSizes("Al")), num(1, 500), ({ design, run }, size, lengthFt) => {
        const as = (material: "Cu" | "Al") =>
          runVoltageDrop(design, { ...run, lengthFt, conductor: { ...run.conductor, material, stranding: "stranded" } }, size);
        expect(as("Cu").dropV).toBeLessThanOrEqual(as("Al").dropV);
      }),
      RUNS,
    );
  });
});
