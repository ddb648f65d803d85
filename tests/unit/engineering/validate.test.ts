import { describe, expect, test } from "vitest";
import { DesignInputError, validateDesign, validateSite } from "@/lib/engineering";
import type { Design, Site } from "@/lib/engineering";
import { coldSite, larkspurModule, microDesign, stringDesign } from "./fixtures";

describe("input validation gives typed, readable errors", () => {
  test.each([
    ["an unsupported edition", { ...coldSite, necEdition: 2014 as never }, "site.necEdition"],
    ["a missing temperature", { ...coldSite, recordLowTempC: NaN }, "site.recordLowTempC"],
    ["a low above the high", { ...coldSite, recordLowTempC: 40 }, "site.recordLowTempC"],
    ["zero peak sun hours", { ...coldSite, peakSunHours: 0 }, "site.peakSunHours"],
  ] as [string, Site, string][])("site with %s", (_what, site, field) => {
    expect(() => validateSite(site)).toThrow(DesignInputError);
    try {
      validateSite(site);
    } catch (err) {
      expect((err as DesignInputError).field).toBe(field);
      expect((err as DesignInputError).code).toBe("INVALID_DESIGN");
    }
  });

  test.each([
    [
      "a zero Voc",
      stringDesign({ module: { ...larkspurModule, vocV: 0 } }),
      /open-circuit voltage \(Voc\) must be a number greater than zero/,
    ],
    ["Vmp above Voc", stringDesign({ module: { ...larkspurModule, vmpV: 41 } }), /Vmp and Imp/],
    ["no inverter", stringDesign({ inverters: [] }), /no inverter/],
    ["a string inverter without strings", stringDesign({ strings: [] }), /no strings/],
    [
      "zero modules",
      stringDesign({ roofPlanes: [{ id: "a", label: "A", moduleCount: 0, attachmentCount: 4, rackingWeightLb: 10 }] }),
      /zero modules/,
    ],
    ["a negative busbar", stringDesign({ service: { ...stringDesign().service, busbarA: -200 } }), /busbar rating/],
    [
      "a blank Pmax coefficient",
      stringDesign({ module: { ...larkspurModule, pmaxTempCoeffPctPerC: NaN } }),
      /Pmax temperature coefficient must be a number/,
    ],
    [
      "a zero MPPT minimum",
      stringDesign({ inverters: [{ ...stringDesign().inverters[0]!, mpptMinV: 0 }] }),
      /NS-7600's MPPT minimum voltage/,
    ],
    [
      "zero modules in a string",
      stringDesign({ strings: [{ id: "S1", inverterId: "inv-1", modulesInSeries: 0 }] }),
      /number of modules in string S1 must be a whole number/,
    ],
    [
      "a fractional plane module count",
      stringDesign({ roofPlanes: [{ id: "a", label: "A", moduleCount: 2.5, attachmentCount: 4, rackingWeightLb: 10 }] }),
      /modules on A must be a whole number/,
    ],
    [
      "a blank breaker on the bus",
      stringDesign({ service: { ...stringDesign().service, otherBreakersA: [20, NaN] } }),
      /Each breaker rating/,
    ],
  ] as [string, Design, RegExp][])("design with %s", (_what, design, message) => {
    expect(() => validateDesign(design)).toThrow(message);
  });

  test("valid string and micro-inverter designs pass", () => {
    expect(() => validateDesign(stringDesign())).not.toThrow();
    expect(() => validateDesign(microDesign())).not.toThrow();
  });
});
