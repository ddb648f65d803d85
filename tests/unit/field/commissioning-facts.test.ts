import { describe, expect, it, test } from "vitest";
import { checkCommissioning, commissioningComplete } from "@/lib/engineering/commissioning";
import type { Design } from "@/lib/engineering";
import { commissioningFacts, emptyReadings, toCommissioningRecord } from "@/lib/field/commissioning-facts";
import { CommissioningReadings } from "@/lib/schemas/commissioning";

// Invented demo design: two strings of 15 modules behind module-level shutdown devices.
const design = {
  module: {},
  inverters: [],
  moduleLevelDevice: { kind: "shutdown-device", maker: "Demo", model: "SD-1", maxInputV: 80, shutdownOutputV: 1 },
  strings: [
    { id: "A", inverterId: "inv", modulesInSeries: 15 },
    { id: "B", inverterId: "inv", modulesInSeries: 12 },
  ],
  service: { voltageV: 240 },
  runs: [],
  roofPlanes: [],
} as unknown as Design;

const facts = commissioningFacts({ design, edition: 2023, requiredGridProfile: "  IEEE 1547-2018 Cat B ", moduleCount: 27, acKw: 7.6 });

describe("commissioning facts from the design", () => {
  it("takes strings, service voltage, module count and AC rating from the design", () => {
    expect(facts).toEqual({
      edition: 2023,
      requiredGridProfile: "IEEE 1547-2018 Cat B",
      nominalServiceV: 240,
      strings: [
        { id: "A", devicesInSeries: 15, perDeviceV: 1, wiringLeavesArray: true },
        { id: "B", devicesInSeries: 12, perDeviceV: 1, wiringLeavesArray: true },
      ],
      modulesInstalled: 27,
      acRatingW: 7600,
    });
  });

  it("expects no shut-down string readings without module-level devices (micro-inverters, listed systems)", () => {
    const plain = { ...design, moduleLevelDevice: undefined } as Design;
    expect(commissioningFacts({ design: plain, edition: 2020, requiredGridProfile: "", moduleCount: 10, acKw: 3.2 })).toMatchObject({ strings: [], requiredGridProfile: null, acRatingW: 3200 });
  });

  it("an empty record has one blank line per string and completes nothing", () => {
    const record = toCommissioningRecord(facts, emptyReadings(facts));
    const results = checkCommissioning(record);
    expect(results.filter((r) => r.kind === "string-shutdown").map((r) => r.id)).toEqual(["string-shutdown:A", "string-shutdown:B"]);
    expect(results.every((r) => r.reading === "missing")).toBe(true);
    expect(commissioningComplete(results).complete).toBe(false);
  });

  // The issue's example: 15 devices at 1 V each read about 15–16 V (common practice).
  test.each([
    [15.4, "pass"],
    [40, "fail"],
  ])("string A read at %s V with the array shut down → %s", (measuredV, status) => {
    const readings = { ...emptyReadings(facts), strings: [{ id: "A", measuredV }] };
    const result = checkCommissioning(toCommissioningRecord(facts, readings)).find((r) => r.id === "string-shutdown:A");
    expect(result?.status).toBe(status);
  });

  it("keeps readings of strings that still exist after a design change and asks for new ones", () => {
    const readings = { ...emptyReadings(facts), strings: [{ id: "A", measuredV: 15.2 }, { id: "Z", measuredV: 9 }] };
    const record = toCommissioningRecord(facts, readings);
    expect(record.strings.map((s) => [s.id, s.measuredV])).toEqual([
      ["A", 15.2],
      ["B", null],
    ]);
  });
});

describe("commissioning readings as typed on a phone", () => {
  test.each([
    ["", null],
    ["  ", null],
    ["241.5", 241.5],
    ["1,204", 1204],
    [" -3 ", -3], // passed through so the check can flag it with its reason
    [242, 242],
  ])("AC voltage %j → %j", (typed, expected) => {
    expect(CommissioningReadings.parse({ acVoltageV: typed }).acVoltageV).toBe(expected);
  });

  it("refuses text that is not a number, naming the field", () => {
    const parsed = CommissioningReadings.safeParse({ acVoltageV: "two-forty", strings: [{ id: "A", measuredV: "15V" }] });
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.map((i) => i.path.join("."))).toEqual(["acVoltageV", "strings.0.measuredV"]);
    expect(parsed.error!.issues[0].message).toMatch(/number/);
  });

  test.each([
    ["12:30", true],
    ["7:05", true],
    ["24:00", false],
    ["noon", false],
  ])("time of day %j valid: %s", (time, ok) => {
    expect(CommissioningReadings.safeParse({ firstPowerTime: time }).success).toBe(ok);
  });

  it("modules reporting must be whole", () => {
    expect(CommissioningReadings.safeParse({ modulesReporting: "21.5" }).success).toBe(false);
  });

  it("defaults everything so a fresh record parses", () => {
    expect(CommissioningReadings.parse({})).toEqual({ gridProfileSet: null, acVoltageV: null, strings: [], modulesReporting: null, firstPowerW: null, firstPowerTime: null, rapidShutdown: { boundary: "outside", measuredV: null, seconds: null } });
  });
});
