// A commissioning document input for template and render tests: an invented installer,
// customer and equipment, with results computed by the real commissioning checks.
import { checkCommissioning, commissioningComplete, type CommissioningRecord } from "@/lib/engineering/commissioning";
import type { CommissioningDocumentInput, CommissioningDocumentKind } from "@/lib/documents/commissioning/input";

export const REQUIRED_PROFILE = "IEEE 1547-2018 Category B, utility default settings";

/** Letters for string ids: A, B, … L for twelve strings. */
const stringId = (i: number) => String.fromCharCode(65 + i);

/**
 * "complete": every reading in and passing.
 * "open": string B reads 38.6 V shut down (fails), the activation card names another serial
 * (fails), the AC voltage sits in the occasional range (review), and the first power reading and
 * the rapid shutdown time are not recorded yet. With `monitoring`, the devices report: in the open
 * record 20 of 22 have been found so far (waiting) and 21 of 22 modules report (fails).
 */
export type CommissioningScenario = "complete" | "open";

/** Two strings: one 7.6 kW inverter on a 240 V service. More: a larger system of 8-module strings and three inverters on 208 V. */
function systemSize(strings: number) {
  return strings <= 2
    ? {
        modulesPerString: 11,
        nominalServiceV: 240,
        acV: { open: 253.1, complete: 243.6 },
        acRatingW: 7600,
        inverters: "1 × Quillon QS-7600 (7,600 W AC)",
      }
    : {
        modulesPerString: 8,
        nominalServiceV: 208,
        acV: { open: 219.4, complete: 210.2 },
        acRatingW: 34200,
        inverters: "3 × Quillon QS-11400 (11,400 W AC)",
      };
}

// The demo module (Larkspur LK-405M-54H): Voc 37.2 V, −0.27 %/°C. At a 45 °C module, 11 in series:
// 11 × 37.2 × (1 + 20 × −0.0027) = 387.1 V (8 in series: 281.5 V).
const MODULE_TEMP_C = 45;
const stringVocAt45 = (modules: number) => Math.round(modules * 37.2 * (1 + (20 * -0.27) / 100) * 10) / 10;

export function commissioningRecord({
  scenario = "open",
  strings = 2,
  monitoring = false,
}: { scenario?: CommissioningScenario; strings?: number; monitoring?: boolean } = {}): CommissioningRecord {
  const open = scenario === "open";
  const size = systemSize(strings);
  const modulesPerString = size.modulesPerString;
  const modules = strings * modulesPerString;
  const ids = Array.from({ length: strings }, (_, i) => stringId(i));
  return {
    edition: 2023,
    stringTests: ids.map((id) => ({
      id,
      modulesInSeries: modulesPerString,
      moduleVocV: 37.2,
      vocTempCoeff: { value: -0.27, unit: "%/C" },
      vocApplies: true,
      polarity: "correct",
      vocV: stringVocAt45(modulesPerString) - 0.6,
      insulationMohm: 220,
    })),
    vocTemperature: { tempC: MODULE_TEMP_C, source: "module" },
    inverters: [
      {
        id: "inv-1",
        label: "Inverter",
        model: "Quillon QS-7600",
        serial: "QN0730411",
        cardSerial: open ? "QN0730412" : "qn-0730411",
        activated: !open,
      },
    ],
    acceptedGridProfiles: [REQUIRED_PROFILE, "IEEE 1547-2018 Category B, volt-watt on"],
    gridProfileSet: "IEEE 1547-2018 category B, utility default settings",
    pairing: monitoring
      ? {
          word: "optimizers",
          installed: modules,
          found: open ? modules - 2 : modules,
          strings: ids.map((id) => ({ id, installed: modulesPerString, found: null })),
        }
      : null,
    nominalServiceV: size.nominalServiceV,
    acVoltageV: size.acV[scenario],
    strings: ids.map((id, i) => ({
      id,
      devicesInSeries: modulesPerString,
      wiringLeavesArray: true,
      measuredV: open && i === 1 ? 38.6 : (modulesPerString * 10 + 2 + (i % 5)) / 10,
    })),
    moduleMonitoring: monitoring,
    modulesInstalled: modules,
    modulesReporting: monitoring ? (open ? modules - 1 : modules) : null,
    acRatingW: size.acRatingW,
    firstPowerW: open ? null : Math.round(size.acRatingW * 0.68),
    firstPowerTime: open ? null : "12:40",
    rapidShutdownTest: { boundary: "outside", measuredV: 0.8, seconds: open ? null : 14 },
  };
}

export function commissioningFixture({
  kind = "report",
  scenario = "open",
  strings = 2,
  monitoring = false,
}: {
  kind?: CommissioningDocumentKind;
  scenario?: CommissioningScenario;
  strings?: number;
  monitoring?: boolean;
} = {}): CommissioningDocumentInput {
  const record = commissioningRecord({ scenario, strings, monitoring });
  const results = checkCommissioning(record);
  const completion = commissioningComplete(results);
  return {
    kind,
    // 8:05 pm on December 3 in Denver (the organization's zone), already December 4 in UTC.
    generatedAt: "2026-12-04T03:05:00.000Z",
    organization: {
      name: "Quillmoor Solar Electric",
      licenseNumber: "EC-40718 (demo)",
      phone: "(555) 014-2210",
      timeZone: "America/Denver",
    },
    project: {
      number: 1042,
      customerName: "Imogen Halvorsen",
      address: "120 Larkin Mill Rd, Brackenford, CO 80913",
      jurisdictionName: "City of Brackenford Building Division",
      utilityName: "Brackenford Municipal Light & Power",
      utilityAccountNumber: "BL-4410000",
      meterNumber: "M72000000",
    },
    system: {
      dcKw: (record.modulesInstalled * 405) / 1000,
      acKw: record.acRatingW / 1000,
      moduleCount: record.modulesInstalled,
      moduleSummary: `${record.modulesInstalled} × Larkspur LK-405M-54H (405 W)`,
      inverterSummary: systemSize(strings).inverters,
      shutdownSummary: `${record.modulesInstalled} × Stavemoor SR-1 Shutdown Unit`,
    },
    installer: { name: "Dana Okafor", email: "dana@quillmoor.example" },
    record,
    results,
    completion,
    recordUpdatedAt: "2026-12-02T20:14:00.000Z",
    completedAt: completion.complete ? "2026-12-02T20:20:00.000Z" : null,
  };
}
