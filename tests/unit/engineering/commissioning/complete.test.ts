import { describe, expect, test } from "vitest";
import { checkCommissioning, commissioningComplete, type CommissioningRecord } from "@/lib/engineering";

// Invented record: 20 modules in two strings of 10 shutdown devices, 7.6 kW AC on a 240 V service.
const done: CommissioningRecord = {
  edition: 2020,
  requiredGridProfile: "IEEE 1547-2018",
  gridProfileSet: "IEEE 1547-2018",
  nominalServiceV: 240,
  acVoltageV: 243,
  strings: [
    { id: "S1", devicesInSeries: 10, measuredV: 10.4 },
    { id: "S2", devicesInSeries: 10, measuredV: 10.2 },
  ],
  modulesInstalled: 20,
  modulesReporting: 20,
  acRatingW: 7600,
  firstPowerW: 5400,
  firstPowerTime: "11:45",
  rapidShutdownTest: { boundary: "outside", measuredV: 11, seconds: 14 },
};

describe("commissioningComplete", () => {
  test("every reading present and passing → complete", () => {
    const results = checkCommissioning(done);
    expect(results).toHaveLength(8); // profile, voltage, 2 strings, modules, power, shutdown V and s
    expect(results.every((r) => r.status === "pass")).toBe(true);
    expect(commissioningComplete(results)).toEqual({ complete: true, failing: [], missing: [] });
  });

  test("one failing value blocks completion and names it", () => {
    const results = checkCommissioning({ ...done, modulesReporting: 19 });
    expect(commissioningComplete(results)).toEqual({ complete: false, failing: ["modules-reporting"], missing: [] });
  });

  test("a saved, half-filled record is incomplete but nothing throws", () => {
    const partial: CommissioningRecord = { ...done, acVoltageV: null, strings: [{ id: "S1", devicesInSeries: 10 }], firstPowerW: null, rapidShutdownTest: undefined };
    const c = commissioningComplete(checkCommissioning(partial));
    expect(c.complete).toBe(false);
    expect(c.failing).toEqual([]);
    expect(c.missing).toEqual(["ac-voltage", "string-shutdown:S1", "first-power", "rapid-shutdown-voltage", "rapid-shutdown-time"]);
  });

  test("a warning alone does not block completion", () => {
    const results = checkCommissioning({ ...done, acVoltageV: 253 }); // Range B, from memory
    expect(results.find((r) => r.kind === "ac-voltage")!.status).toBe("warn");
    expect(commissioningComplete(results).complete).toBe(true);
  });

  test("results without a required kind are incomplete", () => {
    const results = checkCommissioning(done).filter((r) => r.kind !== "rapid-shutdown-time");
    expect(commissioningComplete(results)).toMatchObject({ complete: false, missing: ["rapid-shutdown-time"] });
  });

  test("no number in any result is NaN, even with bad readings", () => {
    const bad: CommissioningRecord = {
      ...done,
      acVoltageV: Number.NaN,
      strings: [{ id: "S1", devicesInSeries: 10, measuredV: -3 }],
      modulesReporting: Number.NaN,
      firstPowerW: Number.NaN,
      rapidShutdownTest: { measuredV: Number.NaN, seconds: Number.NaN },
    };
    const results = checkCommissioning(bad);
    for (const r of results) {
      for (const n of [r.value, r.limit]) expect(n === null || Number.isFinite(n)).toBe(true);
    }
    expect(commissioningComplete(results).failing).toHaveLength(6);
  });
});
