// Invented storage equipment with realistic figures; no real product is described here.
import type { BatteryUnit, Design, Storage } from "@/lib/engineering";
import { stringDesign } from "../fixtures";

export const brindleUnit: BatteryUnit = {
  maker: "Brindle",
  model: "BX-13",
  usableKwh: 12.6,
  nameplateKwh: 13.5,
  maxContinuousChargeA: 40,
  maxContinuousDischargeA: 50,
  maxChargeKw: 5,
  maxDischargeKw: 6,
  nominalVoltageV: 400,
  listings: ["UL 9540", "UL 9540A"],
  maxUnitsInParallel: 4,
};

/** DC-coupled through the design's string inverter (inv-1, 32 A, 7.6 kW) acting as the hybrid, with a backup panel. */
export function dcStorage(overrides: Partial<Storage> = {}): Storage {
  return {
    coupling: "dc",
    multimodeInverterId: "inv-1",
    banks: [{ id: "b1", unit: brindleUnit, quantity: 2, location: "garage" }],
    operatingMode: "self-consumption",
    disconnect: { kind: "integral" },
    backupOutput: { continuousA: 32, voltageV: 240, powerW: 7600, transferTimeS: 0.02 },
    backupPanel: {
      busbarA: 125,
      mainBreakerA: 100,
      inverterBreakerA: 40,
      inverterBreakerAtOppositeEnd: true,
      voltageV: 240,
      multiwireBranchCircuits: false,
      loads: [
        { name: "refrigerator", currentA: 6, voltageV: 120 },
        { name: "well pump", currentA: 10, voltageV: 240 },
      ],
    },
    circuits: [
      {
        id: "c1",
        label: "Batteries to inverter",
        kind: "battery-dc",
        conductor: { size: "1/0", material: "Cu", insulationTempC: 90, insulation: "THWN-2" },
        ocpdA: 125,
      },
    ],
    ...overrides,
  };
}

/** AC-coupled: a 24 A battery inverter on its own 30 A breaker beside the PV inverter's 40 A. */
export function acStorage(overrides: Partial<Storage> = {}): Storage {
  return {
    coupling: "ac",
    batteryInverter: { maker: "Brindle", model: "BI-5", acPowerW: 5760, acOutputCurrentA: 24, acVoltageV: 240, breakerA: 30 },
    banks: [{ id: "b1", unit: brindleUnit, quantity: 1, location: "outdoor-wall" }],
    operatingMode: "export",
    disconnect: { kind: "integral" },
    ...overrides,
  };
}

export function storedDesign(storage: Storage, overrides: Partial<Design> = {}): Design {
  return stringDesign({ storage, ...overrides });
}
