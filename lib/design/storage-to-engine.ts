import type { BatteryUnit, Inverter, Storage, StorageCircuit, StandAloneOutput, TerminalTempC } from "@/lib/engineering";
import type { StorageInput } from "@/lib/schemas/design";
import { listingsOf, type EquipmentDto } from "@/lib/schemas/equipment";
import type { DesignProblem } from "./to-engine";

type BatteryItem = Extract<EquipmentDto, { kind: "battery" }>;
type InverterItem = Extract<EquipmentDto, { kind: "inverter" }>;
type Stored = Exclude<StorageInput, { coupling: "none" }>;

/** A catalog battery as the engine reads one unit. */
export function batteryFromCatalog(item: BatteryItem): BatteryUnit {
  const s = item.specs;
  return {
    maker: item.maker,
    model: item.model,
    usableKwh: s.usableKwh,
    nameplateKwh: s.nameplateKwh,
    maxContinuousChargeA: s.maxContinuousChargeA,
    maxContinuousDischargeA: s.maxContinuousDischargeA,
    maxChargeKw: s.maxChargeKw,
    maxDischargeKw: s.maxDischargeKw,
    nominalVoltageV: s.nominalVoltageV,
    listings: item.listing.trim() ? listingsOf(item.listing) : undefined,
    maxUnitsInParallel: s.maxUnitsInParallel,
  };
}

/** What a multimode or battery inverter supplies with the grid down, from its data sheet; none without a backup rating. */
export function backupOutputOf(item: InverterItem): StandAloneOutput | undefined {
  const s = item.specs;
  if (s.backupContinuousA === undefined) return undefined;
  return {
    continuousA: s.backupContinuousA,
    voltageV: s.backupVoltageV ?? s.acVoltageV,
    powerW: s.backupPowerW,
    transferTimeS: s.transferTimeS,
  };
}

const yesNo = (v: string | undefined) => (v === "yes" ? true : v === "no" ? false : undefined);

function circuitsOf(s: Stored): StorageCircuit[] | undefined {
  if (!s.circuits?.length) return undefined;
  return s.circuits.map((c) => ({
    id: c.lineId,
    label: c.label,
    kind: c.kind,
    conductor: {
      size: c.size,
      material: c.material,
      insulationTempC: Number(c.insulationTempC) as 75 | 90,
      insulation: c.insulation || undefined,
    },
    ocpdA: c.ocpdA,
    terminalTempC: c.terminalTempC ? (Number(c.terminalTempC) as TerminalTempC) : undefined,
  }));
}

/**
 * The editor's storage entries as the engine's Storage: catalog batteries by line, the multimode inverter among
 * the design's inverter lines (DC) or the battery inverter from the catalog (AC), and the backup loads panel.
 * Undefined for "no battery".
 */
export function storageFromInput(
  input: StorageInput | undefined,
  catalog: EquipmentDto[],
  inverters: Inverter[],
  inverterLines: { lineId: string; equipmentId: string }[],
): { storage: Storage | undefined; problems: DesignProblem[] } {
  if (!input || input.coupling === "none") return { storage: undefined, problems: [] };
  const problems: DesignProblem[] = [];
  const byId = new Map(catalog.map((item) => [item.id, item]));
  const banks = input.banks.flatMap((line, i) => {
    const item = byId.get(line.equipmentId);
    if (item?.kind !== "battery") {
      problems.push({ path: `storage.banks.${i}.equipmentId`, message: `Battery line ${line.lineId}: choose a battery from the catalog` });
      return [];
    }
    return [{ id: line.lineId, unit: batteryFromCatalog(item), quantity: line.quantity, location: line.location }];
  });

  let converter: InverterItem | undefined;
  const storage: Storage = {
    coupling: input.coupling,
    banks,
    operatingMode: input.operatingMode,
    exportLimitKw: input.exportLimitKw,
    importLimitKw: input.importLimitKw,
    circuits: circuitsOf(input),
    availableFaultCurrentA: input.availableFaultCurrentA,
  };
  if (input.coupling === "dc") {
    const line = inverterLines.find((l) => l.lineId === input.multimodeInverterLineId);
    const item = line && byId.get(line.equipmentId);
    if (!line || !inverters.some((inv) => inv.id === line.lineId) || item?.kind !== "inverter")
      problems.push({
        path: "storage.multimodeInverterLineId",
        message: "Choose the multimode inverter among the design's inverter lines",
      });
    else {
      converter = item;
      storage.multimodeInverterId = line.lineId;
    }
  } else {
    const item = byId.get(input.batteryInverterId);
    if (item?.kind !== "inverter")
      problems.push({ path: "storage.batteryInverterId", message: "Choose the battery inverter from the catalog" });
    else {
      converter = item;
      storage.batteryInverter = {
        maker: item.maker,
        model: item.model,
        acPowerW: item.specs.acPowerW,
        acOutputCurrentA: item.specs.acOutputCurrentA,
        acVoltageV: item.specs.acVoltageV,
        breakerA: input.batteryInverterBreakerA,
      };
    }
  }
  if (converter) {
    storage.backupOutput = backupOutputOf(converter);
    // The listing is the equipment's; the setting is the design's.
    if (input.pcsCurrentSettingA !== undefined || converter.specs.pcsListed !== undefined)
      storage.pcs = { listed: converter.specs.pcsListed === true, currentSettingA: input.pcsCurrentSettingA };
  }
  if (input.hasBackupPanel && input.backupBusbarA !== undefined && input.backupInverterBreakerA !== undefined) {
    storage.backupPanel = {
      busbarA: input.backupBusbarA,
      mainBreakerA: input.backupMainBreakerA ?? null,
      inverterBreakerA: input.backupInverterBreakerA,
      inverterBreakerAtOppositeEnd: input.backupInverterBreakerAtOppositeEnd ?? false,
      otherBreakersA: input.backupOtherBreakersA?.length ? input.backupOtherBreakersA : undefined,
      voltageV: input.backupPanelVoltageV === "120" ? 120 : 240,
      multiwireBranchCircuits: yesNo(input.backupMultiwire),
      loads: input.backupLoads?.map((l) => ({ name: l.name, currentA: l.currentA, voltageV: Number(l.voltageV) as 120 | 240 })),
    };
  }
  if (input.disconnectKind)
    storage.disconnect = {
      kind: input.disconnectKind,
      withinSight: yesNo(input.disconnectWithinSight),
      lockable: yesNo(input.disconnectLockable),
      location: input.disconnectLocation || undefined,
    };
  return { storage, problems };
}
