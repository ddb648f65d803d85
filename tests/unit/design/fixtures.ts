import { newDesignDraft } from "@/lib/design/defaults";
import type { DesignFormValues } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";

// Invented equipment with realistic figures, for tests only.
export const MODULE: EquipmentDto = {
  id: "11111111-1111-4111-8111-111111111111",
  kind: "module",
  maker: "Larkspur",
  model: "LS-400",
  listing: "UL 61730",
  isArchived: false,
  datasheet: null,
  specs: {
    powerW: 400,
    vocV: 40,
    vmpV: 33.5,
    iscA: 12.5,
    impA: 11.9,
    vocTempCoeff: { value: -0.28, unit: "%/C" },
    pmaxTempCoeffPctPerC: -0.35,
    maxSeriesFuseA: 25,
    lengthIn: 68,
    widthIn: 40,
    weightLb: 46,
  },
};
export const INVERTER: EquipmentDto = {
  id: "22222222-2222-4222-8222-222222222222",
  kind: "inverter",
  maker: "Northmere",
  model: "NM-7600",
  listing: "UL 1741",
  isArchived: false,
  datasheet: null,
  specs: {
    inverterKind: "string",
    acPowerW: 7600,
    acOutputCurrentA: 32,
    acVoltageV: 240,
    phase: 1,
    maxDcInputV: 600,
    mpptMinV: 150,
    mpptMaxV: 480,
    maxInputIscA: 20,
    mpptCount: 2,
    certification: "UL 1741 / IEEE 1547-2018",
    meetsRapidShutdownWithDevices: true,
  },
};
export const DEVICE: EquipmentDto = {
  id: "33333333-3333-4333-8333-333333333333",
  kind: "device",
  maker: "Quillon",
  model: "QS-1",
  listing: "UL 1741 PVRSE",
  isArchived: false,
  datasheet: null,
  specs: { deviceKind: "shutdown-device", maxInputV: 80, maxInputIscA: 15, shutdownOutputV: 1 },
};
export const CATALOG = [MODULE, INVERTER, DEVICE];
export const CONDITIONS = { recordLowTempC: -20, highDesignTempC: 33, necEdition: 2020 as const };

/** A whole design as the editor holds it: 2 strings of 10 modules on a 200 A panel with a 200 A main. */
export function completeDraft(): DesignFormValues {
  const d = newDesignDraft({ serviceVoltageV: 240, servicePhases: 1, busbarA: 200, mainBreakerA: 200 });
  d.equipment.moduleId = MODULE.id;
  d.equipment.inverters[0].equipmentId = INVERTER.id;
  d.equipment.deviceId = DEVICE.id;
  d.array.roofPlanes[0] = { ...d.array.roofPlanes[0], tiltDeg: "22", moduleCount: "20", attachmentCount: "24", rackingWeightLb: "110" };
  d.array.strings[0] = { ...d.array.strings[0], modulesInSeries: "10", parallelCount: "2" };
  d.service.pvBreakerA = "40";
  d.runs[0] = { ...d.runs[0], lengthFt: "45" };
  d.runs[1] = { ...d.runs[1], lengthFt: "30" };
  return d;
}
