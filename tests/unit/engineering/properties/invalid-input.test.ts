import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { DesignInputError, checkStringVoltage, reviewDesign, runVoltageDrop, validateDesign } from "@/lib/engineering";
import type { Design, Site } from "@/lib/engineering";
import { acRun, coldSite, microDesign, stringDesign, stringRun } from "../fixtures";
import { num } from "./arbitraries";

// A bad entry must come back as a DesignInputError naming the field (the form shows the message
// beside it) or, for a fault confined to one run or roof plane, as a failed "input:" check.
// Never a TypeError, never a NaN on a screen or a PDF.
const BAD_VALUES = { numRuns: 40 } as const;

const nonFinite = fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY);
const negative = num(-1e6, -1e-6);
const notPositive = fc.oneof(nonFinite, negative, fc.constant(0));
const notWhole = fc.oneof(
  nonFinite,
  fc.integer({ min: -5, max: 0 }),
  num(0.01, 50).filter((x) => !Number.isInteger(x)),
);

/** Sentence case, ends with a full stop, and shows no raw value a person could not act on. */
function expectReadable(message: string): void {
  expect(message).toMatch(/^["A-Z0-9].{8,}\.$/s);
  expect(message).not.toMatch(/NaN|Infinity|undefined|\[object/);
}

type Outcome = { thrown: DesignInputError } | { failedChecks: { id: string; message: string }[] };

/** Runs the review and returns what the person entering the design would see. */
function outcome(design: Design, site: Site): Outcome {
  try {
    const r = reviewDesign(design, site);
    // JSON would hide NaN as null, so look at the numbers themselves.
    const numbers = [...r.checks.flatMap((c) => [c.value, c.limit]), ...r.labels.flatMap((l) => Object.values(l.values))];
    expect(numbers.filter((n) => n !== null && !Number.isFinite(n))).toEqual([]);
    for (const text of [...r.checks.map((c) => c.message), ...r.labels.map((l) => l.text)])
      expect(text).not.toMatch(/NaN|Infinity|undefined/);
    return { failedChecks: r.checks.filter((c) => c.id.startsWith("input:") && c.status === "fail") };
  } catch (err) {
    // Anything but a DesignInputError is a crash.
    expect(err).toBeInstanceOf(DesignInputError);
    return { thrown: err as DesignInputError };
  }
}

interface Mutation {
  what: string;
  bad: fc.Arbitrary<number>;
  apply: (bad: number) => [Design, Site];
  rejected: { field: string } | { check: string };
}

const base = stringDesign();
const onString = (bad: number): [Design, Site] => [
  stringDesign({ strings: [{ ...base.strings[0]!, modulesInSeries: bad }, base.strings[1]!] }),
  coldSite,
];
const onModule =
  (key: "vocV" | "iscA" | "powerW" | "weightLb") =>
  (bad: number): [Design, Site] => [stringDesign({ module: { ...base.module, [key]: bad } }), coldSite];
const onRun =
  (patch: (bad: number) => Partial<typeof stringRun>) =>
  (bad: number): [Design, Site] => [stringDesign({ runs: [{ ...stringRun, ...patch(bad) }, acRun] }), coldSite];
const onService =
  (key: "busbarA" | "mainBreakerA" | "pvBreakerA") =>
  (bad: number): [Design, Site] => [stringDesign({ service: { ...base.service, [key]: bad } }), coldSite];
const onPlane =
  (patch: (bad: number) => object) =>
  (bad: number): [Design, Site] => [stringDesign({ roofPlanes: [{ ...base.roofPlanes[0]!, ...patch(bad) }] }), coldSite];

const MUTATIONS: Mutation[] = [
  {
    what: "zero, negative, fractional or non-finite modules in series",
    bad: notWhole,
    apply: onString,
    rejected: { field: "strings.S1.modulesInSeries" },
  },
  { what: "a non-positive or non-finite module Voc", bad: notPositive, apply: onModule("vocV"), rejected: { field: "module.vocV" } },
  { what: "a non-positive or non-finite module Isc", bad: notPositive, apply: onModule("iscA"), rejected: { field: "module.iscA" } },
  { what: "a non-positive or non-finite module power", bad: notPositive, apply: onModule("powerW"), rejected: { field: "module.powerW" } },
  {
    what: "a non-positive or non-finite module weight",
    bad: notPositive,
    apply: onModule("weightLb"),
    rejected: { field: "module.weightLb" },
  },
  {
    what: "a non-finite Voc coefficient",
    bad: nonFinite,
    apply: (bad) => [stringDesign({ module: { ...base.module, vocTempCoeff: { value: bad, unit: "%/C" } } }), coldSite],
    rejected: { field: "module.vocTempCoeff" },
  },
  {
    what: "a non-finite record low",
    bad: nonFinite,
    apply: (bad) => [base, { ...coldSite, recordLowTempC: bad }],
    rejected: { field: "site.recordLowTempC" },
  },
  {
    what: "a non-finite high design temperature",
    bad: nonFinite,
    apply: (bad) => [base, { ...coldSite, highDesignTempC: bad }],
    rejected: { field: "site.highDesignTempC" },
  },
  {
    what: "non-positive or non-finite peak sun hours",
    bad: notPositive,
    apply: (bad) => [base, { ...coldSite, peakSunHours: bad }],
    rejected: { field: "site.peakSunHours" },
  },
  {
    what: "a non-positive or non-finite inverter output current",
    bad: notPositive,
    apply: (bad) => [stringDesign({ inverters: [{ ...base.inverters[0]!, acOutputCurrentA: bad }] }), coldSite],
    rejected: { field: "inverters.inv-1.acOutputCurrentA" },
  },
  {
    what: "a zero, fractional or non-finite micro-inverter quantity",
    bad: notWhole,
    apply: (bad) => [microDesign({ inverters: [{ ...microDesign().inverters[0]!, quantity: bad }] }), coldSite],
    rejected: { field: "inverters.micro.quantity" },
  },
  {
    what: "a non-positive or non-finite busbar rating",
    bad: notPositive,
    apply: onService("busbarA"),
    rejected: { field: "service.busbarA" },
  },
  {
    what: "a non-positive or non-finite main breaker",
    bad: notPositive,
    apply: onService("mainBreakerA"),
    rejected: { field: "service.mainBreakerA" },
  },
  {
    what: "a non-positive or non-finite PV breaker",
    bad: notPositive,
    apply: onService("pvBreakerA"),
    rejected: { field: "service.pvBreakerA" },
  },
  {
    what: "a non-finite breaker on the bus",
    bad: nonFinite,
    apply: (bad) => [stringDesign({ service: { ...base.service, otherBreakersA: [20, bad] } }), coldSite],
    rejected: { field: "service.otherBreakersA" },
  },
  {
    what: "a non-finite shutdown voltage per device",
    bad: notPositive,
    apply: (bad) => [stringDesign({ moduleLevelDevice: { ...base.moduleLevelDevice!, shutdownOutputV: bad } }), coldSite],
    rejected: { field: "moduleLevelDevice.shutdownOutputV" },
  },
  {
    what: "a non-finite cell temperature rise",
    bad: nonFinite,
    apply: (bad) => [stringDesign({ cellTempRiseC: bad }), coldSite],
    rejected: { field: "cellTempRiseC" },
  },
  {
    what: "a fractional or non-finite roof-plane module count",
    bad: fc.oneof(
      nonFinite,
      num(0.01, 50).filter((x) => !Number.isInteger(x)),
      fc.integer({ min: -5, max: -1 }),
    ),
    apply: onPlane((bad) => ({ moduleCount: bad })),
    rejected: { field: "roofPlanes.south.moduleCount" },
  },
  {
    what: "a negative or non-finite run length",
    bad: fc.oneof(nonFinite, negative),
    apply: onRun((bad) => ({ lengthFt: bad })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a non-finite ambient temperature on a run",
    bad: nonFinite,
    apply: onRun((bad) => ({ ambientTempC: bad })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a negative or non-finite height above the roof",
    bad: fc.oneof(nonFinite, negative),
    apply: onRun((bad) => ({ roofClearanceIn: bad })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a non-finite conductor temperature",
    bad: nonFinite,
    apply: onRun((bad) => ({ conductorTempC: bad })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a non-positive or non-finite run OCPD",
    bad: notPositive,
    apply: onRun((bad) => ({ ocpdA: bad })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a zero, fractional or non-finite count of current-carrying conductors",
    bad: notWhole,
    apply: onRun((bad) => ({ currentCarryingConductors: bad })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a non-positive or non-finite wire area in a raceway",
    bad: notPositive,
    apply: onRun((bad) => ({ raceway: { type: "EMT", tradeSize: "1", wires: [{ size: "10", count: 2, areaIn2: bad }] } })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a zero, fractional or non-finite wire count in a raceway",
    bad: notWhole,
    apply: onRun((bad) => ({ raceway: { type: "EMT", tradeSize: "1", wires: [{ size: "10", count: bad }] } })),
    rejected: { check: "input:run:r1" },
  },
  {
    what: "a zero, fractional or non-finite attachment count",
    bad: notWhole,
    apply: onPlane((bad) => ({ attachmentCount: bad })),
    rejected: { check: "input:roof:south" },
  },
  {
    what: "a negative or non-finite racking weight",
    bad: fc.oneof(nonFinite, negative),
    apply: onPlane((bad) => ({ rackingWeightLb: bad })),
    rejected: { check: "input:roof:south" },
  },
];

describe("invalid input is rejected with a field and a readable message, never a crash or NaN", () => {
  test.each(MUTATIONS.map((m) => [m.what, m] as const))("%s", (_what, m) => {
    fc.assert(
      fc.property(m.bad, (bad) => {
        const seen = outcome(...m.apply(bad));
        if ("field" in m.rejected) {
          expect("thrown" in seen, `expected a DesignInputError for ${bad}`).toBe(true);
          const err = (seen as { thrown: DesignInputError }).thrown;
          expect(err.field).toBe(m.rejected.field);
          expect(err.code).toBe("INVALID_DESIGN");
          expectReadable(err.message);
        } else {
          expect("failedChecks" in seen, `expected a failed input check for ${bad}`).toBe(true);
          const failed = (seen as { failedChecks: { id: string; message: string }[] }).failedChecks;
          expect(failed.map((c) => c.id)).toContain(m.rejected.check);
          failed.forEach((c) => expectReadable(c.message));
        }
      }),
      BAD_VALUES,
    );
  });

  test("the check functions themselves throw a DesignInputError naming the field", () => {
    fc.assert(
      fc.property(fc.oneof(nonFinite, negative), notWhole, (lengthFt, modulesInSeries) => {
        for (const [fn, field] of [
          [() => runVoltageDrop(stringDesign(), { ...stringRun, lengthFt }), "runs.r1.lengthFt"],
          [
            () => checkStringVoltage(stringDesign(), coldSite, { id: "S9", inverterId: "inv-1", modulesInSeries }),
            "strings.S9.modulesInSeries",
          ],
          [() => validateDesign(onString(modulesInSeries)[0]), "strings.S1.modulesInSeries"],
        ] as const) {
          const err = thrownBy(fn);
          expect(err).toBeInstanceOf(DesignInputError);
          expect((err as DesignInputError).field).toBe(field);
          expectReadable((err as DesignInputError).message);
        }
      }),
      BAD_VALUES,
    );
  });
});

function thrownBy(fn: () => unknown): unknown {
  try {
    fn();
  } catch (err) {
    return err;
  }
  return undefined;
}
