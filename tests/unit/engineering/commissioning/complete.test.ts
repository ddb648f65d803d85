import { describe, expect, test } from "vitest";
import { checkCommissioning, commissioningComplete, type CommissioningRecord } from "@/lib/engineering";

// Invented record: 20 modules in two strings of 10 behind optimizers that report, one 7.6 kW inverter on a 240 V service.
const done: CommissioningRecord = {
  edition: 2020,
  stringTests: ["S1", "S2"].map((id) => ({ id, modulesInSeries: 10, moduleVocV: 41.6, vocApplies: false, polarity: "correct", insulationMohm: 300 })),
  vocTemperature: { tempC: null, source: "module" },
  inverters: [{ id: "inv-1", label: "Inverter (Calderby CB-6000R)", serial: "CB6-00412", cardSerial: "CB600412", activated: true }],
  acceptedGridProfiles: ["IEEE 1547-2018"],
  gridProfileSet: "IEEE 1547-2018",
  pairing: { word: "optimizers", installed: 20, found: 20, strings: [] },
  nominalServiceV: 240,
  acVoltageV: 243,
  strings: [
    { id: "S1", devicesInSeries: 10, measuredV: 10.4 },
    { id: "S2", devicesInSeries: 10, measuredV: 10.2 },
  ],
  moduleMonitoring: true,
  modulesInstalled: 20,
  modulesReporting: 20,
  acRatingW: 7600,
  firstPowerW: 5400,
  firstPowerTime: "11:45",
  rapidShutdownTest: { boundary: "outside", measuredV: 11, seconds: 14 },
};

const kinds = (record: CommissioningRecord) => checkCommissioning(record).map((r) => r.id);

describe("checkCommissioning: the order of the work", () => {
  test("strings tested before energizing, then the inverter, the profile, the devices, the shut-down strings, the AC side", () => {
    expect(kinds(done)).toEqual([
      "string-polarity:S1",
      "string-insulation:S1", // optimizer strings: no Voc test
      "string-polarity:S2",
      "string-insulation:S2",
      "inverter-serial:inv-1",
      "inverter-activation:inv-1",
      "grid-profile",
      "device-pairing",
      "string-shutdown:S1",
      "string-shutdown:S2",
      "ac-voltage",
      "first-power",
      "modules-reporting",
      "rapid-shutdown-voltage",
      "rapid-shutdown-time",
    ]);
  });

  test("strings without optimizers get a Voc test", () => {
    const record = { ...done, stringTests: done.stringTests!.map((s) => ({ ...s, vocApplies: true })) };
    expect(kinds(record).filter((id) => id.startsWith("string-voc:"))).toEqual(["string-voc:S1", "string-voc:S2"]);
  });

  test("modules reporting and devices found are asked only with module-level monitoring", () => {
    const ids = kinds({ ...done, moduleMonitoring: false, pairing: null });
    expect(ids).not.toContain("modules-reporting");
    expect(ids).not.toContain("device-pairing");
  });
});

describe("commissioningComplete", () => {
  test("every reading present and passing → complete", () => {
    const results = checkCommissioning(done);
    expect(results.every((r) => r.status === "pass")).toBe(true);
    expect(commissioningComplete(results)).toEqual({ complete: true, failing: [], missing: [], waiting: [] });
  });

  test("without module-level monitoring the record completes honestly with no modules-reporting count", () => {
    const results = checkCommissioning({ ...done, moduleMonitoring: false, pairing: null, modulesReporting: null });
    expect(commissioningComplete(results)).toEqual({ complete: true, failing: [], missing: [], waiting: [] });
  });

  test("devices still being found hold the record open without failing it", () => {
    const results = checkCommissioning({ ...done, pairing: { ...done.pairing!, found: 17 } });
    expect(commissioningComplete(results)).toEqual({ complete: false, failing: [], missing: [], waiting: ["device-pairing"] });
  });

  test("one failing value blocks completion and names it", () => {
    const results = checkCommissioning({ ...done, modulesReporting: 19 });
    expect(commissioningComplete(results)).toEqual({ complete: false, failing: ["modules-reporting"], missing: [], waiting: [] });
  });

  test("a serial that does not match its card blocks completion", () => {
    const results = checkCommissioning({ ...done, inverters: [{ ...done.inverters![0]!, cardSerial: "CB600413" }] });
    expect(commissioningComplete(results).failing).toEqual(["inverter-serial:inv-1"]);
  });

  test("a saved, half-filled record is incomplete but nothing throws", () => {
    const partial: CommissioningRecord = { ...done, acVoltageV: null, strings: [{ id: "S1", devicesInSeries: 10 }], firstPowerW: null, rapidShutdownTest: undefined, inverters: [{ id: "inv-1", label: "Inverter" }] };
    const c = commissioningComplete(checkCommissioning(partial));
    expect(c.complete).toBe(false);
    expect(c.failing).toEqual([]);
    expect(c.missing).toEqual(["inverter-serial:inv-1", "inverter-activation:inv-1", "string-shutdown:S1", "ac-voltage", "first-power", "rapid-shutdown-voltage", "rapid-shutdown-time"]);
  });

  test("a warning alone does not block completion", () => {
    const results = checkCommissioning({ ...done, acVoltageV: 253 }); // ANSI C84.1 Range B (from memory)
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
      stringTests: [{ ...done.stringTests![0]!, vocApplies: true, vocV: Number.NaN, insulationMohm: Number.NaN }],
      vocTemperature: { tempC: Number.NaN, source: "module" },
      pairing: { ...done.pairing!, found: Number.NaN },
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
    for (const r of checkCommissioning({ ...done, stringTests: done.stringTests!.map((s) => ({ ...s, vocApplies: true, vocV: 400 })), vocTemperature: { tempC: 30, source: "ambient" } })) {
      expect(`${r.clause} ${r.message} ${r.fix ?? ""}`).not.toMatch(/common practice|from memory/i);
    }
  });
});
