import { describe, expect, test } from "vitest";
import { checkCommissioning, type CommissioningRecord } from "@/lib/engineering";
import { completeRecord } from "./fixtures";

const kinds = (record: CommissioningRecord) => checkCommissioning(record).map((r) => r.id);

describe("checkCommissioning: the order of the work", () => {
  test("strings tested before energizing, then the inverter, the profile, the devices, the shut-down strings, the AC side", () => {
    expect(kinds(completeRecord)).toEqual([
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
    const record = { ...completeRecord, stringTests: completeRecord.stringTests!.map((s) => ({ ...s, vocApplies: true })) };
    expect(kinds(record).filter((id) => id.startsWith("string-voc:"))).toEqual(["string-voc:S1", "string-voc:S2"]);
  });

  test("modules reporting and devices found are asked only with module-level monitoring", () => {
    const ids = kinds({ ...completeRecord, moduleMonitoring: false, pairing: null });
    expect(ids).not.toContain("modules-reporting");
    expect(ids).not.toContain("device-pairing");
  });
});
