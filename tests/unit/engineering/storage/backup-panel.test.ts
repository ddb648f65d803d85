import { describe, expect, test } from "vitest";
import { type BackupLoadsPanel, type StandAloneOutput, reviewDesign } from "@/lib/engineering";
import { coldSite } from "../fixtures";
import { dcStorage, storedDesign } from "./fixtures";

const check = (r: ReturnType<typeof reviewDesign>, id: string) => r.checks.find((c) => c.id === id);
const panel = (p: Partial<BackupLoadsPanel> = {}, out: Partial<StandAloneOutput> = {}) => {
  const base = dcStorage();
  return reviewDesign(
    storedDesign(dcStorage({ backupPanel: { ...base.backupPanel!, ...p }, backupOutput: { ...base.backupOutput!, ...out } })),
    coldSite,
  );
};

// 705.12 applied to the backup loads panel the multimode inverter feeds (REFERENCE.md, code arithmetic): the inverter's
// 32 A counts at 125 % = 40 A beside the panel's main.
describe("705.12 on the backup loads panel", () => {
  test.each([
    [{ busbarA: 125, mainBreakerA: 100, inverterBreakerAtOppositeEnd: true }, "pass", 140, 150], // 40 + 100 ≤ 1.2 × 125
    [{ busbarA: 125, mainBreakerA: 100, inverterBreakerAtOppositeEnd: false }, "fail", 140, 125], // only the 100 % rule
    [{ busbarA: 200, mainBreakerA: 100, inverterBreakerAtOppositeEnd: false }, "pass", 140, 200], // 100 % rule
    [{ busbarA: 100, mainBreakerA: 100, inverterBreakerAtOppositeEnd: true }, "fail", 140, 120], // 100/100 allows 20 A only
    [{ busbarA: 125, mainBreakerA: null, otherBreakersA: [20, 20, 15] }, "pass", 95, 125], // sum: 40 + 55 ≤ 125
    [{ busbarA: 125, mainBreakerA: null, otherBreakersA: [30, 30, 30] }, "fail", 130, 125],
  ] as const)("%j → %s (%d A against %d A)", (p, status, value, limit) => {
    expect(check(panel(p as Partial<BackupLoadsPanel>), "backup-panel-busbar")).toMatchObject({ status, value, limit });
  });

  test("main lugs with no breaker list warns and asks for the breakers", () => {
    expect(check(panel({ mainBreakerA: null }), "backup-panel-busbar")).toMatchObject({
      status: "warn",
      field: "storage.backupPanel.otherBreakersA",
    });
  });

  test("the inverter's breaker in the backup panel is sized at 125 % of the larger of its outputs", () => {
    expect(check(panel({ inverterBreakerA: 40 }), "backup-inverter-breaker")).toMatchObject({ status: "pass", limit: 40 });
    expect(check(panel({ inverterBreakerA: 35 }), "backup-inverter-breaker")).toMatchObject({ status: "fail" });
    // a 40 A stand-alone output above the 32 A grid-tied output: 50 A needed
    expect(check(panel({ inverterBreakerA: 40 }, { continuousA: 40 }), "backup-inverter-breaker")).toMatchObject({
      status: "fail",
      limit: 50,
    });
  });
});

// 710.15(A) (from memory): a stand-alone supply may be smaller than the calculated load but not smaller than the
// largest single load it serves. 710.15(C) (from memory): a single 120 V supply may feed a 120/240 V panel only with no
// 240 V loads and no multiwire branch circuits, and the panel is marked.
describe("the stand-alone supply against the backup panel (710.15)", () => {
  test.each([
    [[{ name: "well pump", currentA: 30, voltageV: 240 }], "pass"], // 30 A ≤ 32 A
    [[{ name: "well pump", currentA: 33, voltageV: 240 }], "fail"],
    [
      [
        { name: "well pump", currentA: 20, voltageV: 240 },
        { name: "range", currentA: 25, voltageV: 240 },
      ],
      "pass", // 45 A together is more than 32 A: permitted, the largest alone decides
    ],
  ] as const)("loads %j → %s", (loads, status) => {
    const c = check(panel({ loads: loads.map((l) => ({ ...l })) }), "backup-supply")!;
    expect(c).toMatchObject({ status, limit: 32, clause: "NEC 2020 710.15(A)" });
  });

  test("no loads listed, or no backup output entered, warns and names the field", () => {
    expect(check(panel({ loads: [] }), "backup-supply")).toMatchObject({ status: "warn", field: "storage.backupPanel.loads" });
    const noOutput = reviewDesign(storedDesign(dcStorage({ backupOutput: undefined })), coldSite);
    expect(check(noOutput, "backup-supply")).toMatchObject({ status: "warn", field: "storage.backupOutput.continuousA" });
  });

  const fridge = { name: "refrigerator", currentA: 6, voltageV: 120 as const };
  test.each([
    [[fridge], false, "pass"],
    [[fridge], undefined, "warn"],
    [[fridge], true, "fail"],
    [[fridge, { name: "well pump", currentA: 10, voltageV: 240 as const }], false, "fail"],
  ] as const)("a single 120 V supply, loads %j, multiwire %s → %s (710.15(C))", (loads, mwbc, status) => {
    const r = panel({ loads: [...loads], multiwireBranchCircuits: mwbc }, { voltageV: 120 });
    expect(check(r, "backup-single-120")).toMatchObject({ status, clause: "NEC 2020 710.15(C)" });
    expect(r.labels.some((l) => l.id === "single-120-supply")).toBe(true);
  });

  test("a 120/240 V supply needs no single-supply check or label", () => {
    const r = panel();
    expect(check(r, "backup-single-120")).toBeUndefined();
    expect(r.labels.some((l) => l.id === "single-120-supply")).toBe(false);
  });
});
