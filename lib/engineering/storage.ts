import { clauseInEdition } from "./clauses";
import { inverterById, totalInverterOutputA } from "./design-lookup";
import { DesignInputError, requirePositive, requireWholePositive } from "./errors";
import type { BatteryBank, Design, NecEdition, Storage, StorageCircuit } from "./types";

// Lookups over a design's storage: which converter carries the batteries, the current the point of
// connection counts, and the storage entries checked once before any storage check reads them.

export type StoredDesign = Design & { storage: Storage };

export function hasStorage(design: Design): design is StoredDesign {
  return design.storage !== undefined;
}

/** The converter between the batteries and the AC wiring: the hybrid inverter (DC-coupled) or the battery inverter (AC-coupled). */
export interface StorageConverter {
  name: string;
  continuousA: number; // grid-connected continuous output
  acPowerW: number;
  acVoltageV: number;
  field: string; // where it is entered
}

export function storageConverter(design: StoredDesign): StorageConverter {
  const s = design.storage;
  if (s.coupling === "ac") {
    const b = s.batteryInverter;
    if (!b) throw new DesignInputError("storage.batteryInverter", "An AC-coupled battery needs its battery inverter entered.");
    return {
      name: `${b.maker} ${b.model}`,
      continuousA: b.acOutputCurrentA,
      acPowerW: b.acPowerW,
      acVoltageV: b.acVoltageV,
      field: "storage.batteryInverter",
    };
  }
  if (s.multimodeInverterId === undefined) {
    throw new DesignInputError("storage.multimodeInverterId", "A DC-coupled battery needs the hybrid inverter it charges through.");
  }
  const inv = inverterById(design, s.multimodeInverterId);
  return {
    name: `${inv.maker} ${inv.model}`,
    continuousA: inv.quantity * inv.acOutputCurrentA,
    acPowerW: inv.quantity * inv.acPowerW,
    acVoltageV: inv.acVoltageV,
    field: `inverters.${inv.id}`,
  };
}

/**
 * The storage's own output current on the busbar: an AC-coupled battery inverter is a second source
 * beside the PV inverters; DC-coupled storage discharges through the hybrid inverter, already counted.
 */
export function storageInverterOutputA(design: Design): number {
  const s = design.storage;
  return s?.coupling === "ac" && s.batteryInverter ? s.batteryInverter.acOutputCurrentA : 0;
}

/** A listed power control system's current setting, where the edition recognizes one (705.13, 2020 on); else null. */
export function powerControlSettingA(design: Design, edition: NecEdition): number | null {
  const pcs = design.storage?.pcs;
  if (!pcs?.listed || pcs.currentSettingA === undefined || clauseInEdition("powerControl", edition) === null) return null;
  return pcs.currentSettingA;
}

export interface CountedSourceCurrent {
  currentA: number;
  by: "inverter-outputs" | "power-control-system";
  inverterOutputsA: number; // every source's continuous output added, PV and storage
}

/**
 * The source current 705.12 counts at the main panel: every inverter's continuous output, the battery
 * inverter's included, or a listed power control system's setting where the edition allows it and it is lower
 * (705.13). Without storage this is the PV inverters' output, as before storage existed.
 */
export function countedSourceCurrent(design: Design, edition: NecEdition): CountedSourceCurrent {
  const inverterOutputsA = totalInverterOutputA(design) + storageInverterOutputA(design);
  const pcsA = powerControlSettingA(design, edition);
  return pcsA !== null && pcsA < inverterOutputsA
    ? { currentA: pcsA, by: "power-control-system", inverterOutputsA }
    : { currentA: inverterOutputsA, by: "inverter-outputs", inverterOutputsA };
}

/** The banks a battery circuit joins: the ones it names, else all. */
export function circuitBanks(storage: Storage, circuit: StorageCircuit): BatteryBank[] {
  if (!circuit.bankIds) return storage.banks;
  return circuit.bankIds.map((id) => {
    const bank = storage.banks.find((b) => b.id === id);
    if (!bank) throw new DesignInputError(`storage.circuits.${circuit.id}.bankIds`, `No battery bank "${id}" is in the design.`);
    return bank;
  });
}

export function totalUnits(storage: Storage): number {
  return storage.banks.reduce((n, b) => n + b.quantity, 0);
}

/** Refuses storage entries no check can read: a DesignInputError names the field. */
export function validateStorage(design: StoredDesign): void {
  const s = design.storage;
  if (s.banks.length === 0) throw new DesignInputError("storage.banks", "Storage needs at least one battery bank.");
  for (const b of s.banks) {
    const at = `storage.banks.${b.id}`;
    requireWholePositive(b.quantity, `${at}.quantity`, "The number of battery units");
    const u = b.unit;
    requirePositive(u.usableKwh, `${at}.unit.usableKwh`, "The usable energy");
    requirePositive(u.nameplateKwh, `${at}.unit.nameplateKwh`, "The nameplate energy");
    if (u.usableKwh > u.nameplateKwh) {
      throw new DesignInputError(`${at}.unit.usableKwh`, "The usable energy cannot exceed the nameplate energy.");
    }
    requirePositive(u.maxContinuousChargeA, `${at}.unit.maxContinuousChargeA`, "The maximum continuous charge current");
    requirePositive(u.maxContinuousDischargeA, `${at}.unit.maxContinuousDischargeA`, "The maximum continuous discharge current");
    requirePositive(u.maxChargeKw, `${at}.unit.maxChargeKw`, "The maximum charge power");
    requirePositive(u.maxDischargeKw, `${at}.unit.maxDischargeKw`, "The maximum discharge power");
    requirePositive(u.nominalVoltageV, `${at}.unit.nominalVoltageV`, "The nominal voltage");
  }
  const converter = storageConverter(design);
  requirePositive(converter.continuousA, converter.field, "The storage inverter's continuous output current");
  if (s.batteryInverter) requirePositive(s.batteryInverter.breakerA, "storage.batteryInverter.breakerA", "The battery inverter's breaker");
  if (s.pcs?.currentSettingA !== undefined)
    requirePositive(s.pcs.currentSettingA, "storage.pcs.currentSettingA", "The power control setting");
  if (s.backupOutput) requirePositive(s.backupOutput.continuousA, "storage.backupOutput.continuousA", "The backup output current");
  const p = s.backupPanel;
  if (p) {
    requirePositive(p.busbarA, "storage.backupPanel.busbarA", "The backup panel's busbar rating");
    requirePositive(p.inverterBreakerA, "storage.backupPanel.inverterBreakerA", "The inverter's breaker in the backup panel");
    if (p.mainBreakerA !== null) requirePositive(p.mainBreakerA, "storage.backupPanel.mainBreakerA", "The backup panel's main breaker");
  }
}
