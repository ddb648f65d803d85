// Invented equipment with realistic figures; no real product is described here.
import type { ConductorRun, Design, Inverter, ModuleLevelDevice, PvModule, Site } from "@/lib/engineering";

export const larkspurModule: PvModule = {
  maker: "Larkspur",
  model: "LS-400M",
  powerW: 400,
  vocV: 40.0,
  vmpV: 33.6,
  iscA: 12.2,
  impA: 11.9,
  vocTempCoeff: { value: -0.28, unit: "%/C" },
  pmaxTempCoeffPctPerC: -0.35,
  maxSeriesFuseA: 25,
  maxSystemVoltageV: 1000,
  lengthIn: 69.1,
  widthIn: 44.6,
  weightLb: 48.5,
};

export const northmereString: Inverter = {
  id: "inv-1",
  maker: "Northmere",
  model: "NS-7600",
  kind: "string",
  quantity: 1,
  acPowerW: 7600,
  acOutputCurrentA: 32,
  acVoltageV: 240,
  phase: 1,
  maxDcInputV: 600,
  mpptMinV: 200,
  mpptMaxV: 480,
  maxInputIscA: 18,
  terminalTempC: 75,
  dcArcFaultProtection: true,
  dcGroundFaultProtection: true,
  dcDisconnect: true,
};

export const northmereOptimizerInverter: Inverter = {
  id: "inv-opt",
  maker: "Northmere",
  model: "NO-7600",
  kind: "string",
  quantity: 1,
  acPowerW: 7600,
  acOutputCurrentA: 32,
  acVoltageV: 240,
  phase: 1,
  maxDcInputV: 480,
  regulatedStringV: 380,
  maxStringPowerW: 5700,
  terminalTempC: 75,
  dcArcFaultProtection: true,
  dcGroundFaultProtection: true,
  dcDisconnect: true,
};

export const halvardMicro: Inverter = {
  id: "micro",
  maker: "Halvard",
  model: "HM-320",
  kind: "micro",
  quantity: 20,
  acPowerW: 300,
  acOutputCurrentA: 1.25,
  acVoltageV: 240,
  phase: 1,
  maxDcInputV: 60,
  mpptMinV: 27,
  mpptMaxV: 45,
  maxInputIscA: 15,
  terminalTempC: 75,
  dcGroundFaultProtection: true,
};

export const fenwickOptimizer: ModuleLevelDevice = {
  kind: "optimizer",
  maker: "Fenwick",
  model: "FO-450",
  maxInputV: 60,
  maxInputIscA: 14.5,
  maxOutputCurrentA: 15,
  maxSystemVoltageV: 1000,
};

export const quillonShutdown: ModuleLevelDevice = {
  kind: "shutdown-device",
  maker: "Quillon",
  model: "QR-1",
  maxInputV: 80,
  maxInputIscA: 15,
  maxSystemVoltageV: 600,
};

export const coldSite: Site = { recordLowTempC: -20, highDesignTempC: 35, necEdition: 2020, isDwelling: true, peakSunHours: 5 };

export const stringRun: ConductorRun = {
  id: "r1",
  label: "Array to inverter",
  circuit: { kind: "dc-strings", stringIds: ["S1"] },
  lengthFt: 100,
  conductor: { size: "10", material: "Cu", insulationTempC: 90, insulation: "PV wire" },
  roofClearanceIn: 1,
  egc: { size: "6", material: "Cu" }, // exposed in the array: 6 AWG needs no raceway (250.120(C))
  insideBuilding: false,
};

/** String S2's own run, the same as S1's. */
export const stringRun2: ConductorRun = {
  ...stringRun,
  id: "r3",
  label: "Array to inverter, string S2",
  circuit: { kind: "dc-strings", stringIds: ["S2"] },
};

export const acRun: ConductorRun = {
  id: "r2",
  label: "Inverter to panel",
  circuit: { kind: "ac-output", sources: [{ inverterId: "inv-1" }] },
  lengthFt: 50,
  conductor: { size: "8", material: "Cu", insulationTempC: 90, insulation: "THWN-2" },
  ocpdA: 40,
  egc: { size: "10", material: "Cu" },
  raceway: {
    type: "EMT",
    tradeSize: "3/4",
    wires: [
      { size: "8", count: 3, insulation: "THWN-2" },
      { size: "10", count: 1, insulation: "THWN-2" },
    ],
  },
};

/** A 20-module home system: two strings of 10 on one string inverter, 200 A panel with a 200 A main. */
export function stringDesign(overrides: Partial<Design> = {}): Design {
  return {
    module: larkspurModule,
    inverters: [northmereString],
    moduleLevelDevice: quillonShutdown,
    strings: [
      { id: "S1", inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 10 },
      { id: "S2", inverterId: "inv-1", mpptIndex: 2, modulesInSeries: 10 },
    ],
    service: {
      voltageV: 240,
      phase: 1,
      busbarA: 200,
      mainBreakerA: 200,
      connection: "load-side",
      pvBreakerA: 40,
      pvBreakerAtOppositeEnd: true,
      serviceLocation: "east wall",
      pvDisconnectLocation: "beside the meter",
    },
    runs: [stringRun, stringRun2, acRun],
    paths: [{ id: "p1", label: "String S1 to panel", runIds: ["r1", "r2"] }],
    roofPlanes: [{ id: "south", label: "South roof", moduleCount: 20, attachmentCount: 24, rackingWeightLb: 180 }],
    pvDisconnect: { kind: "pv-breaker" },
    rapidShutdownInitiator: { kind: "service-disconnect", outsideReadilyAccessible: true },
    ...overrides,
  };
}

/** The same 20 modules on micro-inverters: no DC strings at all. */
export function microDesign(overrides: Partial<Design> = {}): Design {
  return stringDesign({
    inverters: [halvardMicro],
    moduleLevelDevice: undefined,
    strings: [],
    runs: [{ ...acRun, circuit: { kind: "ac-output", sources: [{ inverterId: "micro" }] }, ocpdA: 40 }],
    paths: [],
    service: { ...stringDesign().service, pvBreakerA: 40 },
    ...overrides,
  });
}
