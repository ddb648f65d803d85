import { describe, expect, test } from "vitest";
import { DesignInputError, reviewArray, reviewDesign } from "@/lib/engineering";
import { acRun, coldSite, fenwickOptimizer, microDesign, northmereOptimizerInverter, stringDesign, stringRun } from "./fixtures";

// JSON would turn NaN into null, so walk the result itself.
function noNaN(value: unknown): void {
  if (typeof value === "number") expect(Number.isFinite(value)).toBe(true);
  else if (typeof value === "string") expect(value).not.toMatch(/NaN|undefined|Infinity/);
  else if (value && typeof value === "object") Object.values(value).forEach(noNaN);
}

describe("reviewDesign", () => {
  test("a sound string design: every check passes and the summary holds the ratings", () => {
    const r = reviewDesign(stringDesign(), coldSite);
    expect(r.summary).toMatchObject({
      warn: 0,
      fail: 0,
      status: "pass",
      maxDcVoltageV: 450.4,
      maxDcCircuitCurrentA: 15.25,
      largestPvBreakerA: 40,
    });
    expect(r.summary.pass).toBe(r.checks.length);
    // 8 kW × 5 h × 365 × 0.859243 = 12 544.95 → 12 545 kWh (NREL/TP-6A20-62641 default losses)
    expect(r.summary.ratings).toEqual({ moduleCount: 20, dcKw: 8, acKw: 7.6, dcToAcRatio: 1.05 });
    expect(r.summary.annualProductionKwh).toBe(12545);
    expect(new Set(r.checks.map((c) => c.id)).size).toBe(r.checks.length);
    expect(r.checks.every((c) => c.edition === 2020)).toBe(true);
    noNaN(r);
  });

  test("covers every area of the review", () => {
    const prefixes = new Set(reviewDesign(stringDesign(), coldSite).checks.map((c) => c.id.split(":")[0]));
    for (const p of [
      "string-voltage",
      "mppt-min",
      "ampacity-terminal",
      "ampacity-conditions",
      "ocpd-rating",
      "egc",
      "voltage-drop",
      "voltage-drop-path",
      "conduit-fill",
      "pv-breaker-size",
      "point-of-connection",
      "rapid-shutdown",
      "dc-ac-ratio",
      "roof-dead-load",
      "data-sheet",
      "system-voltage",
      "arc-fault",
      "ground-fault",
      "pv-disconnect",
      "dc-disconnect",
      "rapid-shutdown-initiator",
      "wiring-exposed",
    ]) {
      expect(prefixes).toContain(p);
    }
  });

  test.each([
    [2017, "NEC 2017 705.12(B)(2)(3)(b)", "NEC 2017 690.8(B), 110.14(C), Table 310.15(B)(16)"],
    [2023, "NEC 2023 705.12(B)(2)", "NEC 2023 705.28(B), 110.14(C), Table 310.16"],
  ] as const)("NEC %d clauses follow the site's edition", (edition, poc, acAmpacity) => {
    const r = reviewDesign(stringDesign(), { ...coldSite, necEdition: edition });
    expect(r.checks.find((c) => c.id === "point-of-connection")!.clause).toBe(poc);
    expect(r.checks.find((c) => c.id === "ampacity-terminal:r2")!.clause).toBe(acAmpacity);
  });

  test("micro-inverter design: no DC strings, no DC voltage, no DC label", () => {
    const r = reviewDesign(microDesign(), coldSite);
    expect(r.checks.some((c) => c.id.startsWith("string-voltage"))).toBe(false);
    expect(r.summary).toMatchObject({ maxDcVoltageV: null, maxDcCircuitCurrentA: null, status: "pass" });
    expect(r.labels.map((l) => l.id)).not.toContain("dc-max-voltage");
    noNaN(r);
  });

  test("optimizer design: the string sits at the regulated 380 V", () => {
    const r = reviewDesign(
      stringDesign({
        inverters: [{ ...northmereOptimizerInverter, id: "inv-1" }],
        moduleLevelDevice: fenwickOptimizer,
      }),
      coldSite,
    );
    expect(r.summary.maxDcVoltageV).toBe(380);
    expect(r.checks.find((c) => c.id === "string-power:S1")).toMatchObject({ status: "pass", value: 4000 });
    expect(r.checks.some((c) => c.id.startsWith("mppt-min"))).toBe(false);
  });

  test("a failing design reports the failure and its fix", () => {
    const design = stringDesign({
      strings: [
        { id: "S1", inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 14 },
        { id: "S2", inverterId: "inv-1", mpptIndex: 2, modulesInSeries: 6 },
      ],
    });
    const r = reviewDesign(design, coldSite);
    expect(r.summary.status).toBe("fail");
    expect(r.checks.find((c) => c.id === "string-voltage:S1")).toMatchObject({
      status: "fail",
      fix: "Use at most 13 modules in this string.",
    });
  });

  test.each([
    ["a negative length", { ...stringRun, lengthFt: -10 }, /must be zero or more/],
    [
      "an unknown conductor size",
      { ...acRun, id: "r1", conductor: { ...acRun.conductor, size: "7" as never } },
      /not in the ampacity table/,
    ],
  ])("a run with %s becomes a failed check, and the rest still run", (_what, badRun, message) => {
    const r = reviewDesign(stringDesign({ runs: [badRun, acRun], paths: [] }), coldSite);
    const input = r.checks.find((c) => c.id === "input:run:r1")!;
    expect(input).toMatchObject({ status: "fail", value: null });
    expect(input.message).toMatch(message);
    expect(r.checks.some((c) => c.id === "ampacity-terminal:r2")).toBe(true);
    noNaN(r);
  });

  test.each([
    ["zero modules", stringDesign({ roofPlanes: [] }), coldSite],
    ["an unsupported edition", stringDesign(), { ...coldSite, necEdition: 2011 as never }],
  ])("%s throws a DesignInputError", (_what, design, site) => {
    expect(() => reviewDesign(design, site)).toThrow(DesignInputError);
  });

  test("every check names the entry it needs when it warns about missing data", () => {
    const bare = stringDesign({
      pvDisconnect: undefined,
      rapidShutdownInitiator: undefined,
      runs: [{ ...stringRun, insideBuilding: undefined }, acRun],
    });
    const r = reviewDesign(bare, coldSite);
    const warned = r.checks.filter((c) => c.status === "warn");
    expect(warned.map((c) => c.field)).toEqual(
      expect.arrayContaining(["pvDisconnect.kind", "rapidShutdownInitiator.kind", "runs.r1.insideBuilding", "strings.S2"]),
    );
  });
});

// The live review flags what the equipment and strings alone can show, before the rest is entered.
describe("reviewArray", () => {
  test("a 25-module string is flagged with no service or runs", () => {
    const d = stringDesign();
    const checks = reviewArray(
      { ...d, strings: [{ id: "S1", inverterId: "inv-1", modulesInSeries: 25 }] },
      { ...coldSite, necEdition: 2023 },
    );
    // 25 × 45.04 = 1126 V > 600 V
    expect(checks.find((c) => c.id === "string-voltage:S1")).toMatchObject({ status: "fail", value: 1126, clause: "NEC 2023 690.7(A)" });
    expect(checks.some((c) => c.id.startsWith("ampacity") || c.id === "point-of-connection")).toBe(false);
  });

  test("with no strings yet it still checks the data sheets", () => {
    const checks = reviewArray({ ...stringDesign(), strings: [] }, coldSite);
    expect(checks.map((c) => c.id)).toContain("data-sheet");
  });
});
