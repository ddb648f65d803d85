// Commissioning readings for demo projects already past commissioning: plausible values that
// pass every check, worked out from each project's own design. Invented; for the demo only.
import { INSULATION_ROWS, shutdownWindow, stringVocWindow } from "@/lib/engineering/commissioning";
import type { CommissioningFacts, MonitoringItems } from "@/lib/field/commissioning-facts";
import { EMPTY_STORAGE_READINGS, type CommissioningReadings } from "@/lib/schemas/commissioning";
import type { DesignFormValues } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";

/** The catalog items a demo design names, as far as module-level monitoring goes. */
export function demoEquipment(draft: DesignFormValues, catalog: EquipmentDto[]): MonitoringItems {
  const item = (id: string | undefined) => catalog.find((c) => c.id === id);
  return {
    inverters: draft.equipment.inverters.flatMap((l) => {
      const found = item(l.equipmentId);
      return found?.kind === "inverter" ? [{ item: found }] : [];
    }),
    device: (() => {
      const found = item(draft.equipment.deviceId ?? undefined);
      return found?.kind === "device" ? found : null;
    })(),
  };
}

/** An invented serial number, the same on the unit's label and on its activation card. */
export function demoSerial(seed: number, unit: number): string {
  return `QN${String(730_411 + seed * 4_177 + unit * 13).padStart(7, "0")}`;
}

/** Readings a careful crew would have taken on a sunny late morning; `seed` varies them a little per project. */
export function passingDemoReadings(facts: CommissioningFacts, seed: number): CommissioningReadings {
  const jitter = (seed % 5) / 10; // 0.0 … 0.4
  const round1 = (v: number) => Math.round(v * 10) / 10;
  const moduleTempC = 38 + (seed % 6);
  const tested = new Map(facts.stringTests.map((s) => [s.id, s]));
  const shutDown = new Map(facts.strings.map((s) => [s.id, s]));
  const paired = new Map((facts.pairing?.strings ?? []).map((s) => [s.id, s]));
  const ids = [...new Set([...tested.keys(), ...shutDown.keys()])];
  return {
    vocTemperature: { tempC: moduleTempC, source: "module" },
    strings: ids.map((id) => {
      const t = tested.get(id);
      const s = shutDown.get(id);
      return {
        id,
        polarity: t ? "correct" : null,
        vocV: t?.vocApplies ? round1(stringVocWindow(t, { tempC: moduleTempC, source: "module" }).expectedV - jitter) : null,
        // Dry, new wiring tests far above the minimum.
        insulationMohm: t ? 150 + 10 * (seed % 9) + INSULATION_ROWS[1].minMohm : null,
        devicesFound: paired.get(id)?.installed ?? null,
        measuredV: s ? round1(shutdownWindow(s.devicesInSeries, s.perDeviceV).expectedV + jitter - 0.2) : null,
      };
    }),
    inverters: facts.inverters.map((u, k) => ({ id: u.id, serial: demoSerial(seed, k), cardSerial: demoSerial(seed, k), activated: true })),
    gridProfileSet: facts.acceptedGridProfiles[0] ?? null,
    devicesFound: facts.pairing?.installed ?? null,
    acVoltageV: round1(facts.nominalServiceV * 1.004 + jitter),
    modulesReporting: facts.moduleMonitoring ? facts.modulesInstalled : null,
    firstPowerW: Math.round(facts.acRatingW * (0.58 + jitter / 10)),
    firstPowerTime: `11:${String(10 + ((seed * 7) % 45)).padStart(2, "0")}`,
    rapidShutdown: { boundary: "outside", measuredV: 11 + (seed % 7), seconds: 8 + (seed % 9) },
    storage: facts.storage
      ? {
          stateOfChargePct: 64 + (seed % 30),
          gridOpened: facts.storage.hasBackupPanel ? true : null,
          panelCarried: facts.storage.hasBackupPanel ? true : null,
          transferSeconds: facts.storage.hasBackupPanel ? 0 : null,
          pcsSettingA: facts.storage.pcsSettingA,
          exportLimitKw: facts.storage.exportLimitKw,
        }
      : EMPTY_STORAGE_READINGS,
  };
}
