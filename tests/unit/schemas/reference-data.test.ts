import { describe, expect, it } from "vitest";
import { JurisdictionInput, UtilityInput } from "@/lib/schemas/reference-data";

type Parsed = { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } };
const messages = (result: Parsed) => Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

const jurisdiction = {
  name: "Town of Fenmoor Permits",
  state: "co",
  necEdition: "2020",
  recordLowTempC: "-21",
  highDesignTempC: "33",
  notes: "",
};

describe("JurisdictionInput", () => {
  it("reads form strings", () => {
    expect(JurisdictionInput.parse(jurisdiction)).toEqual({
      name: "Town of Fenmoor Permits",
      state: "CO",
      necEdition: 2020,
      recordLowTempC: -21,
      highDesignTempC: 33,
      reviewDays: 10,
      permitValidDays: 180,
      requiredInspections: ["final"],
      notes: "",
      // Left blank: the published residential ESS limits apply.
      essCode: null,
      essPerUnitKwh: null,
      essGarageKwh: null,
      essOutdoorKwh: null,
      essUtilitySpaceKwh: null,
    });
  });

  it("keeps the AHJ's adopted ESS siting figures", () => {
    const out = JurisdictionInput.parse({ ...jurisdiction, essCode: "IRC 2021 as amended", essGarageKwh: "60", essPerUnitKwh: "" });
    expect(out).toMatchObject({ essCode: "IRC 2021 as amended", essGarageKwh: 60, essPerUnitKwh: null });
  });

  it.each([
    [{ name: "" }, "name", "Enter the authority's name"],
    [{ state: "Colorado" }, "state", "Use the two-letter state code"],
    [{ necEdition: "2014" }, "necEdition", "Choose the adopted NEC edition: 2017, 2020, 2023"],
    [{ recordLowTempC: "" }, "recordLowTempC", "Record low is required"],
    [{ recordLowTempC: "-80" }, "recordLowTempC", "Record low must be between -60 and 20 °C"],
    [{ recordLowTempC: "15", highDesignTempC: "12" }, "highDesignTempC", "The high design temperature must be above the record low"],
    [{ reviewDays: "0" }, "reviewDays", "Usual review time must be between 1 and 365 days"],
    [{ permitValidDays: "ten" }, "permitValidDays", "Permit validity must be a number"],
    [{ requiredInspections: ["meter_set"] }, "requiredInspections.0", "Choose from the inspections listed"],
    [{ essGarageKwh: "-5" }, "essGarageKwh", "Garage limit must be between 0 and 1000 kWh"],
  ])("refuses %j with a readable message", (patch, path, message) => {
    expect(messages(JurisdictionInput.safeParse({ ...jurisdiction, ...patch }))[path]).toBe(message);
  });
});

describe("UtilityInput", () => {
  it("takes service voltages one per line from a form and as a list from the API", () => {
    const fromForm = UtilityInput.parse({ name: "Fenmoor Power", serviceVoltages: "120/240 V split-phase\n\n 120/208 V three-phase \n" });
    expect(fromForm).toEqual({
      name: "Fenmoor Power",
      serviceVoltages: ["120/240 V split-phase", "120/208 V three-phase"],
      acceptedGridProfiles: [],
      reviewDays: 15,
      requiredInspections: [],
      notes: "",
    });
    expect(
      UtilityInput.parse({ name: "Fenmoor Power", serviceVoltages: ["120/240 V"], acceptedGridProfiles: ["IEEE 1547-2018 Category B"] })
        .acceptedGridProfiles,
    ).toEqual(["IEEE 1547-2018 Category B"]);
  });

  it("reads the required visits from ticked boxes: none ticked is none, left out is the usual", () => {
    const base = { name: "Fenmoor Power", serviceVoltages: "120/240 V" };
    expect(UtilityInput.parse({ ...base, requiredInspections: false }).requiredInspections).toEqual([]);
    expect(UtilityInput.parse({ ...base, requiredInspections: "meter_set" }).requiredInspections).toEqual(["meter_set"]);
    expect(UtilityInput.parse({ ...base, requiredInspections: ["witness_test", "meter_set", "meter_set"] }).requiredInspections).toEqual([
      "witness_test",
      "meter_set",
    ]);
    expect(JurisdictionInput.parse({ ...jurisdiction, requiredInspections: false }).requiredInspections).toEqual([]);
    expect(JurisdictionInput.parse({ ...jurisdiction, reviewDays: "21" }).reviewDays).toBe(21);
  });

  it("takes accepted grid profiles one per line from a form, blank lines and repeats dropped", () => {
    const parsed = UtilityInput.parse({
      name: "Fenmoor Power",
      serviceVoltages: "120/240 V",
      acceptedGridProfiles: " IEEE 1547-2018 Category B \n\nRule 21, volt-var on\nIEEE 1547-2018 Category B",
    });
    expect(parsed.acceptedGridProfiles).toEqual(["IEEE 1547-2018 Category B", "Rule 21, volt-var on"]);
  });

  it.each([
    [{ serviceVoltages: "" }, "serviceVoltages", "Enter at least one service voltage"],
    [{ serviceVoltages: ["x".repeat(41)] }, "serviceVoltages.0", "Each service voltage is at most 40 characters"],
    [{ acceptedGridProfiles: ["x".repeat(301)] }, "acceptedGridProfiles.0", "Each grid profile is at most 300 characters"],
    [{ acceptedGridProfiles: Array.from({ length: 13 }, (_, i) => `Profile ${i}`) }, "acceptedGridProfiles", "At most 12 grid profiles"],
  ])("refuses %j with a readable message", (patch, path, message) => {
    expect(messages(UtilityInput.safeParse({ name: "Fenmoor Power", serviceVoltages: "120/240 V", ...patch }))[path]).toBe(message);
  });
});
