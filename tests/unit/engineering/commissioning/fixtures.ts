// Invented readings shared by the commissioning check tests: no real product or site.
import type { CommissioningRecord, InverterUnitReading, StringTestReading, TempCoefficient } from "@/lib/engineering";

// Invented demo modules: "Larkspur" Voc 37.2 V, −0.27 %/°C; "Fenwick" Voc 49.4 V, −0.136 V/°C.
export const LARKSPUR = { moduleVocV: 37.2, vocTempCoeff: { value: -0.27, unit: "%/C" } as TempCoefficient };
export const FENWICK = { moduleVocV: 49.4, vocTempCoeff: { value: -0.136, unit: "V/C" } as TempCoefficient };

/** One string of 11 Larkspur modules, tested before energizing. */
export const stringReading = (over: Partial<StringTestReading> = {}): StringTestReading => ({
  id: "S1",
  modulesInSeries: 11,
  ...LARKSPUR,
  vocApplies: true,
  ...over,
});

/** One inverter unit with the serial on its label and on its activation card (invented serials). */
export const inverterUnit = (serial: string | null, cardSerial: string | null, activated = false): InverterUnitReading => ({
  id: "inv-1",
  label: "Inverter",
  model: "Quillon QS-7600",
  serial,
  cardSerial,
  activated,
});

// Invented record: 20 modules in two strings of 10 behind optimizers that report, one 7.6 kW inverter on a 240 V service.
export const completeRecord: CommissioningRecord = {
  edition: 2020,
  stringTests: ["S1", "S2"].map((id) => ({
    id,
    modulesInSeries: 10,
    moduleVocV: 41.6,
    vocApplies: false,
    polarity: "correct",
    insulationMohm: 300,
  })),
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
