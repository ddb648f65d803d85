import { describe, expect, test } from "vitest";
import { checkCommissioning, commissioningComplete, type CommissioningRecord } from "@/lib/engineering";
import { completeRecord } from "./fixtures";

describe("commissioningComplete", () => {
  test("every reading present and passing → complete", () => {
    const results = checkCommissioning(completeRecord);
    expect(results.every((r) => r.status === "pass")).toBe(true);
    expect(commissioningComplete(results)).toEqual({ complete: true, failing: [], missing: [], waiting: [] });
  });

  test("without module-level monitoring the record completes honestly with no modules-reporting count", () => {
    const results = checkCommissioning({ ...completeRecord, moduleMonitoring: false, pairing: null, modulesReporting: null });
    expect(commissioningComplete(results)).toEqual({ complete: true, failing: [], missing: [], waiting: [] });
  });

  test("devices still being found hold the record open without failing it", () => {
    const results = checkCommissioning({ ...completeRecord, pairing: { ...completeRecord.pairing!, found: 17 } });
    expect(commissioningComplete(results)).toEqual({ complete: false, failing: [], missing: [], waiting: ["device-pairing"] });
  });

  test("one failing value blocks completion and names it", () => {
    const results = checkCommissioning({ ...completeRecord, modulesReporting: 19 });
    expect(commissioningComplete(results)).toEqual({ complete: false, failing: ["modules-reporting"], missing: [], waiting: [] });
  });

  test("a serial that does not match its card blocks completion", () => {
    const results = checkCommissioning({ ...completeRecord, inverters: [{ ...completeRecord.inverters![0]!, cardSerial: "CB600413" }] });
    expect(commissioningComplete(results).failing).toEqual(["inverter-serial:inv-1"]);
  });

  test("a saved, half-filled record is incomplete but nothing throws", () => {
    const partial: CommissioningRecord = {
      ...completeRecord,
      acVoltageV: null,
      strings: [{ id: "S1", devicesInSeries: 10 }],
      firstPowerW: null,
      rapidShutdownTest: undefined,
      inverters: [{ id: "inv-1", label: "Inverter" }],
    };
    const c = commissioningComplete(checkCommissioning(partial));
    expect(c.complete).toBe(false);
    expect(c.failing).toEqual([]);
    expect(c.missing).toEqual([
      "inverter-serial:inv-1",
      "inverter-activation:inv-1",
      "string-shutdown:S1",
      "ac-voltage",
      "first-power",
      "rapid-shutdown-voltage",
      "rapid-shutdown-time",
    ]);
  });

  test("a warning alone does not block completion", () => {
    const results = checkCommissioning({ ...completeRecord, acVoltageV: 253 }); // ANSI C84.1 Range B (from memory)
    expect(results.find((r) => r.kind === "ac-voltage")!.status).toBe("warn");
    expect(commissioningComplete(results).complete).toBe(true);
  });

  test("results without a required kind are incomplete", () => {
    const results = checkCommissioning(completeRecord).filter((r) => r.kind !== "rapid-shutdown-time");
    expect(commissioningComplete(results)).toMatchObject({ complete: false, missing: ["rapid-shutdown-time"] });
  });

  test("no number in any result is NaN, even with bad readings", () => {
    const bad: CommissioningRecord = {
      ...completeRecord,
      stringTests: [{ ...completeRecord.stringTests![0]!, vocApplies: true, vocV: Number.NaN, insulationMohm: Number.NaN }],
      vocTemperature: { tempC: Number.NaN, source: "module" },
      pairing: { ...completeRecord.pairing!, found: Number.NaN },
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
    expect(commissioningComplete(results).failing).toHaveLength(9);
  });

  test("no basis printed for users carries a rule-of-thumb or recall mark", () => {
    for (const r of checkCommissioning({
      ...completeRecord,
      stringTests: completeRecord.stringTests!.map((s) => ({ ...s, vocApplies: true, vocV: 400 })),
      vocTemperature: { tempC: 30, source: "ambient" },
    })) {
      expect(`${r.clause} ${r.message} ${r.fix ?? ""}`).not.toMatch(/common practice|from memory/i);
    }
  });
});
