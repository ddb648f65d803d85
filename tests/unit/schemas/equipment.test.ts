import { describe, expect, it } from "vitest";
import {
  BatterySpecs,
  DeviceSpecs,
  EquipmentInput,
  EquipmentListQuery,
  InverterSpecs,
  ModuleSpecs,
  TempCoefficientSchema,
  UpdateEquipmentInput,
  listingsOf,
} from "@/lib/schemas/equipment";

type Parsed = { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } };
const messages = (result: Parsed) => Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

// Figures of an invented 405 W module, as a form sends them (strings).
const moduleForm = {
  powerW: "405",
  vocV: "37.2",
  vmpV: "31.0",
  iscA: "13.85",
  impA: "13.07",
  vocTempCoeff: { value: "-0.27", unit: "%/C" },
  pmaxTempCoeffPctPerC: "-0.34",
  maxSeriesFuseA: "",
  lengthIn: "67.8",
  widthIn: "44.6",
  weightLb: "46.3",
};
const stringInverter = {
  inverterKind: "string",
  acPowerW: 7600,
  acOutputCurrentA: 32,
  acVoltageV: 240,
  phase: 1,
  maxDcInputV: 600,
  mpptMinV: 200,
  mpptMaxV: 480,
};

describe("ModuleSpecs", () => {
  it("turns form strings into numbers and blanks into absent values", () => {
    const out = ModuleSpecs.parse(moduleForm);
    expect(out).toMatchObject({
      powerW: 405,
      vocV: 37.2,
      vmpV: 31,
      vocTempCoeff: { value: -0.27, unit: "%/C" },
      pmaxTempCoeffPctPerC: -0.34,
    });
    expect(out.maxSeriesFuseA).toBeUndefined();
  });

  it("drops a coefficient whose value is left blank even though the unit was sent", () => {
    expect(ModuleSpecs.parse({ ...moduleForm, vocTempCoeff: { value: "", unit: "V/C" } }).vocTempCoeff).toBeUndefined();
  });

  it.each([
    [{ powerW: "" }, "powerW", "Pmax is required"],
    [{ vocV: "thirty-seven" }, "vocV", "Voc must be a number"],
    [{ iscA: "45" }, "iscA", "Isc must be between 0.1 and 30 A"],
    [{ vmpV: "38" }, "vmpV", "Vmp must be lower than Voc"],
    [{ impA: "14.2" }, "impA", "Imp must be lower than Isc"],
    [{ powerW: "450" }, "powerW", "Pmax should be close to Vmp × Imp; check the three values"],
    [
      { vocTempCoeff: { value: "0.27", unit: "%/C" } },
      "vocTempCoeff.value",
      "Voc falls as modules warm, so the coefficient is negative (e.g. −0.27 %/°C)",
    ],
    [
      { vocTempCoeff: { value: "-2.7", unit: "%/C" } },
      "vocTempCoeff.value",
      "That coefficient is too large; check the unit (%/°C or V/°C)",
    ],
    [{ vocTempCoeff: { value: "-0.1", unit: "K" } }, "vocTempCoeff.unit", "Choose %/°C or V/°C"],
    [{ pmaxTempCoeffPctPerC: "0.4" }, "pmaxTempCoeffPctPerC", "Pmax coefficient must be between -2 and 0 %/°C"],
    [{ weightLb: "Infinity" }, "weightLb", "Weight must be a number"],
  ])("refuses %j with a readable message", (patch, path, message) => {
    expect(messages(ModuleSpecs.safeParse({ ...moduleForm, ...patch }))[path]).toBe(message);
  });

  it("takes the listed maximum system voltage, blank as not known", () => {
    expect(ModuleSpecs.parse({ ...moduleForm, maxSystemVoltageV: "1000" }).maxSystemVoltageV).toBe(1000);
    expect(ModuleSpecs.parse({ ...moduleForm, maxSystemVoltageV: "" }).maxSystemVoltageV).toBeUndefined();
  });

  it("reports a cross-field rule beside unrelated errors", () => {
    const found = messages(ModuleSpecs.safeParse({ ...moduleForm, vmpV: "38", lengthIn: "" }));
    expect(found).toEqual({ vmpV: "Vmp must be lower than Voc", lengthIn: "Length is required" });
  });
});

describe("InverterSpecs", () => {
  // What a plan review asks of the inverter's listing (690.11, 690.41(B), 690.15, 110.14(C)); blank stays unknown.
  it.each([
    [
      { dcArcFaultProtection: "yes", dcGroundFaultProtection: "no", terminalTempC: "75" },
      { dcArcFaultProtection: true, dcGroundFaultProtection: false, terminalTempC: 75 },
    ],
    [
      { dcArcFaultProtection: true, terminalTempC: 90 },
      { dcArcFaultProtection: true, terminalTempC: 90 },
    ],
  ])("reads the listing answers %j", (patch, expected) => {
    expect(InverterSpecs.parse({ ...stringInverter, ...patch })).toMatchObject(expected);
  });

  it("keeps blank answers unknown, never a silent no", () => {
    const out = InverterSpecs.parse({ ...stringInverter, terminalTempC: "", dcArcFaultProtection: "", dcDisconnect: "" });
    expect([out.terminalTempC, out.dcArcFaultProtection, out.dcDisconnect]).toEqual([undefined, undefined, undefined]);
  });

  it("refuses a terminal rating that is not 60, 75 or 90 °C", () => {
    expect(messages(InverterSpecs.safeParse({ ...stringInverter, terminalTempC: "80" })).terminalTempC).toBe(
      "Terminal ratings are 60, 75 or 90 °C",
    );
  });

  it("accepts a string inverter and reads 'false' as false", () => {
    const out = InverterSpecs.parse({ ...stringInverter, phase: "1", meetsRapidShutdownWithDevices: "false" });
    expect(out).toMatchObject({ phase: 1, meetsRapidShutdownWithDevices: false, certification: "" });
  });

  it("accepts an inverter for optimizer strings with its regulated voltage and per-string limit", () => {
    const out = InverterSpecs.parse({
      ...stringInverter,
      acPowerW: 6000,
      acOutputCurrentA: 25,
      maxDcInputV: 480,
      mpptMinV: "",
      mpptMaxV: "",
      regulatedStringV: "380",
      maxStringPowerW: "5700",
      meetsRapidShutdownWithDevices: true,
    });
    expect(out).toMatchObject({ regulatedStringV: 380, maxStringPowerW: 5700, meetsRapidShutdownWithDevices: true });
  });

  it.each([
    [{ inverterKind: "hybrid" }, "inverterKind", "Choose string or micro"],
    [{ phase: "2" }, "phase", "Phases must be 1 or 3"],
    [{ mpptMinV: 500, mpptMaxV: 400 }, "mpptMaxV", "The MPPT window maximum must be above its minimum"],
    [{ mpptMaxV: 650 }, "mpptMaxV", "The MPPT window cannot reach above the maximum DC input voltage"],
    [
      { regulatedStringV: 650, maxStringPowerW: 5700 },
      "regulatedStringV",
      "The regulated string voltage cannot exceed the maximum DC input voltage",
    ],
    [
      { regulatedStringV: 380 },
      "maxStringPowerW",
      "Inverters for optimizer strings need both the regulated string voltage and the maximum power per string",
    ],
    // 7600 W at 240 V needs about 31.7 A; 3.2 A is a misplaced decimal point.
    [{ acOutputCurrentA: 3.2 }, "acOutputCurrentA", "The output current is too low for the rated power at the nominal voltage"],
    [{ mpptCount: "0" }, "mpptCount", "Number of MPPTs must be between 1 and 12"],
  ])("refuses %j with a readable message", (patch, path, message) => {
    expect(messages(InverterSpecs.safeParse({ ...stringInverter, ...patch }))[path]).toBe(message);
  });

  it("counts √3 for three phases: 20 kW at 480 V fits through 24.1 A", () => {
    expect(
      InverterSpecs.safeParse({
        ...stringInverter,
        acPowerW: 20_000,
        acVoltageV: 480,
        phase: 3,
        acOutputCurrentA: 24.1,
        maxDcInputV: 1000,
        mpptMaxV: 850,
      }).success,
    ).toBe(true);
  });
});

describe("DeviceSpecs", () => {
  it("accepts an optimizer with only the required maximum input voltage", () => {
    expect(DeviceSpecs.parse({ deviceKind: "optimizer", maxInputV: "60", shutdownOutputV: "" })).toEqual({
      deviceKind: "optimizer",
      maxInputV: 60,
    });
  });

  it.each([
    [{ deviceKind: "combiner" }, "deviceKind", "Choose optimizer or shutdown device"],
    [{ maxInputV: "" }, "maxInputV", "Maximum input voltage is required"],
    [{ shutdownOutputV: "-1" }, "shutdownOutputV", "Voltage held while shut down must be between 0 and 30 V"],
  ])("refuses %j with a readable message", (patch, path, message) => {
    expect(messages(DeviceSpecs.safeParse({ deviceKind: "optimizer", maxInputV: 60, ...patch }))[path]).toBe(message);
  });
});

// An invented 13.5 kWh battery unit as a form sends it.
const battery = {
  usableKwh: "12.8",
  nameplateKwh: "13.5",
  maxContinuousChargeA: "26",
  maxContinuousDischargeA: "26",
  maxChargeKw: "5",
  maxDischargeKw: "5",
  nominalVoltageV: "400",
  maxUnitsInParallel: "",
};

describe("BatterySpecs", () => {
  it("reads a battery's data-sheet figures; units in parallel may be left out", () => {
    expect(BatterySpecs.parse(battery)).toEqual({
      usableKwh: 12.8,
      nameplateKwh: 13.5,
      maxContinuousChargeA: 26,
      maxContinuousDischargeA: 26,
      maxChargeKw: 5,
      maxDischargeKw: 5,
      nominalVoltageV: 400,
    });
  });

  it.each([
    [{ usableKwh: "14" }, "usableKwh", "The usable energy cannot exceed the nameplate energy"],
    [{ nameplateKwh: "" }, "nameplateKwh", "Nameplate energy is required"],
    [{ maxUnitsInParallel: "2.5" }, "maxUnitsInParallel", "Units allowed in parallel must be a whole number"],
    [{ nominalVoltageV: "5" }, "nominalVoltageV", "Nominal voltage must be between 12 and 1500 V"],
  ])("refuses %j with a readable message", (patch, path, message) => {
    expect(messages(BatterySpecs.safeParse({ ...battery, ...patch }))[path]).toBe(message);
  });

  it("splits the listing text into the listings the siting check reads", () => {
    expect(listingsOf("UL 9540, UL 9540A;UL 1973 ")).toEqual(["UL 9540", "UL 9540A", "UL 1973"]);
    expect(listingsOf("")).toEqual([]);
  });
});

describe("InverterSpecs storage fields", () => {
  it("reads a multimode inverter's backup output and power control listing; an inverter without them is PV only", () => {
    const out = InverterSpecs.parse({
      ...stringInverter,
      storageRole: "multimode",
      backupContinuousA: "32",
      backupVoltageV: "240",
      transferTimeS: "0.02",
      pcsListed: "yes",
      pcsCurrentLimitSettable: "yes",
    });
    expect(out).toMatchObject({ storageRole: "multimode", backupContinuousA: 32, backupVoltageV: 240, pcsListed: true });
    expect(InverterSpecs.parse(stringInverter).storageRole).toBeUndefined();
    expect(messages(InverterSpecs.safeParse({ ...stringInverter, backupVoltageV: "208" })).backupVoltageV).toBe(
      "The backup output is 120 V or 120/240 V (240)",
    );
  });
});

describe("TempCoefficientSchema", () => {
  it("takes V/°C figures in their own range", () => {
    expect(TempCoefficientSchema.parse({ value: "-0.136", unit: "V/C" })).toEqual({ value: -0.136, unit: "V/C" });
    expect(TempCoefficientSchema.safeParse({ value: "-1.5", unit: "V/C" }).success).toBe(false);
  });
});

describe("EquipmentInput", () => {
  it("picks the specification schema by kind and names the paths of the specs", () => {
    const found = messages(EquipmentInput.safeParse({ kind: "device", maker: " ", model: "X1", specs: { deviceKind: "optimizer" } }));
    expect(found).toEqual({ maker: "Enter the maker", "specs.maxInputV": "Maximum input voltage is required" });
  });

  it("names the kinds when the kind is unknown", () => {
    expect(messages(EquipmentInput.safeParse({ kind: "charger", maker: "A", model: "B", specs: {} })).kind).toBe(
      "Choose a kind: module, inverter, device, battery",
    );
  });

  it("keeps the item id beside the fields of an edit", () => {
    const out = UpdateEquipmentInput.parse({
      equipmentId: "6f1c1a3e-8d0e-4b7a-9a53-2f0d7f7c1b11",
      kind: "module",
      maker: "Larkspur",
      model: "LK-405",
      specs: moduleForm,
    });
    expect(out).toMatchObject({ equipmentId: "6f1c1a3e-8d0e-4b7a-9a53-2f0d7f7c1b11", kind: "module", listing: "" });
    expect(
      messages(UpdateEquipmentInput.safeParse({ equipmentId: "x", kind: "module", maker: "A", model: "B", specs: moduleForm })).equipmentId,
    ).toBe("Unknown catalog item");
  });
});

describe("EquipmentListQuery", () => {
  it("reads the kind filter and the archived switch", () => {
    expect(EquipmentListQuery.parse({})).toEqual({ kind: undefined, includeArchived: false });
    expect(EquipmentListQuery.parse({ kind: "inverter", includeArchived: "true" })).toEqual({ kind: "inverter", includeArchived: true });
    expect(messages(EquipmentListQuery.safeParse({ kind: "panel" })).kind).toBe("kind must be one of: module, inverter, device, battery");
  });
});
