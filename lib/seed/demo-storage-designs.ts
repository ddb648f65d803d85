// The demo projects that carry batteries, built as the editor would hold them: two DC-coupled systems
// with a backup loads panel (one with its garage close to the residential aggregate limit), one battery
// AC-coupled beside an existing PV system, and one non-export system held by a power control setting.
import type { DesignFormValues } from "@/lib/schemas/design";
import { demoDesign, type CatalogIds } from "./demo-designs";

export type StorageIds = Record<"hybridInverter" | "largeHybridInverter" | "batteryInverter" | "battery" | "stackBattery", string>;

/** Demo catalog models the storage designs use (see demo-catalog.ts). */
export const STORAGE_MODELS: Record<keyof StorageIds, string> = {
  hybridInverter: "AV-7600H Hybrid",
  largeHybridInverter: "AV-11400H Hybrid",
  batteryInverter: "AB-5000 Battery Inverter",
  battery: "TW-135 Cell Stack",
  stackBattery: "TW-155 Cell Stack",
};

export const STORAGE_SCENARIOS = ["dc-backup", "dc-backup-full-garage", "ac-added", "non-export"] as const;
export type StorageScenario = (typeof STORAGE_SCENARIOS)[number];

/** The demo customers whose projects carry batteries; each one's service suits its scenario (see seed-demo.ts). */
export const DEMO_STORAGE_CUSTOMERS: Readonly<Record<string, StorageScenario>> = {
  "Tobias Wrenhall": "dc-backup",
  "Desmond Achterberg": "dc-backup-full-garage",
  "Clementine Ashdown": "ac-added",
  "Florian Devereaux": "non-export",
};

type Storage = Extract<NonNullable<DesignFormValues["storage"]>, { coupling: "dc" | "ac" }>;
type Service = { busbarA: number; mainBreakerA: number };

const circuit = (lineId: string, label: string, kind: "battery-dc" | "battery-inverter-output", size: string, ocpdA: number) => ({
  lineId,
  label,
  kind,
  material: "Cu" as const,
  size: size as "6",
  insulation: "THWN-2" as const,
  insulationTempC: "90" as const,
  terminalTempC: "75" as const,
  ocpdA: String(ocpdA),
});

// The loads a household usually keeps running through an outage, moved to a 125 A backup panel on main lugs.
const backupPanel = {
  hasBackupPanel: true,
  backupBusbarA: "125",
  backupMainBreakerA: "",
  backupInverterBreakerA: "40",
  backupInverterBreakerAtOppositeEnd: false,
  backupOtherBreakersA: "20, 20, 15, 30",
  backupPanelVoltageV: "240" as const,
  backupMultiwire: "no" as const,
  backupLoads: [
    { lineId: "load-1", name: "Refrigerator", currentA: "6", voltageV: "120" as const },
    { lineId: "load-2", name: "Furnace blower", currentA: "7", voltageV: "120" as const },
    { lineId: "load-3", name: "Well pump", currentA: "9.8", voltageV: "240" as const },
    { lineId: "load-4", name: "Kitchen receptacles", currentA: "12", voltageV: "120" as const },
  ],
};

// Form values leave optional entries out, as the editor's blank inputs do.
const entries = (values: Partial<Storage>) => values as Storage;

function storageOf(scenario: StorageScenario, ids: StorageIds): Storage {
  const bank = (equipmentId: string, quantity: number, location: Storage["banks"][number]["location"]) => ({
    lineId: "bat-1",
    equipmentId,
    quantity: String(quantity),
    location,
  });
  switch (scenario) {
    case "dc-backup":
      return entries({
        coupling: "dc",
        multimodeInverterLineId: "inv-1",
        banks: [bank(ids.battery, 2, "garage")],
        operatingMode: "self-consumption",
        ...backupPanel,
        disconnectKind: "integral",
        disconnectLocation: "On the battery cabinet in the garage",
        circuits: [circuit("bc-1", "Batteries to inverter", "battery-dc", "6", 70)],
      });
    case "dc-backup-full-garage":
      // 5 × 15.5 kWh = 77.5 kWh in one garage: just inside the 80 kWh the published residential limit allows there.
      return entries({
        coupling: "dc",
        multimodeInverterLineId: "inv-1",
        banks: [bank(ids.stackBattery, 5, "garage")],
        operatingMode: "backup-only",
        ...backupPanel,
        disconnectKind: "separate",
        disconnectWithinSight: "yes",
        disconnectLockable: "yes",
        disconnectLocation: "Garage wall beside the batteries",
        circuits: [circuit("bc-1", "Battery stacks to inverter", "battery-dc", "3", 100)],
      });
    case "ac-added":
      return entries({
        coupling: "ac",
        batteryInverterId: ids.batteryInverter,
        batteryInverterBreakerA: "30",
        banks: [bank(ids.battery, 2, "outdoor-wall")],
        operatingMode: "self-consumption",
        hasBackupPanel: false,
        disconnectKind: "separate",
        disconnectWithinSight: "yes",
        disconnectLockable: "yes",
        disconnectLocation: "Outside wall beside the battery inverter",
        circuits: [circuit("bc-1", "Battery inverter to service panel", "battery-inverter-output", "10", 30)],
      });
    case "non-export":
      // The utility allows no export; a listed power control system holds the hybrid inverter to 32 A.
      return entries({
        coupling: "dc",
        multimodeInverterLineId: "inv-1",
        banks: [bank(ids.battery, 1, "utility-space")],
        operatingMode: "non-export",
        exportLimitKw: "0",
        pcsCurrentSettingA: "32",
        hasBackupPanel: false,
        disconnectKind: "integral",
        disconnectLocation: "On the battery cabinet in the basement utility room",
        circuits: [circuit("bc-1", "Battery to inverter", "battery-dc", "6", 70)],
      });
  }
}

/**
 * A demo design with batteries. The DC-coupled ones replace the string inverter of the string design with a
 * multimode inverter of the same size (the larger one for the non-export system); the AC-coupled one keeps the
 * project's PV design as it is and adds the battery inverter beside it.
 */
export function demoStorageDesign(
  ids: CatalogIds,
  storageIds: StorageIds,
  service: Service,
  scenario: StorageScenario,
  variant: number,
): DesignFormValues {
  const storage = storageOf(scenario, storageIds);
  if (scenario === "ac-added") return { ...demoDesign(ids, service, variant), storage };
  const pv = demoDesign(ids, { ...service, mainBreakerA: Math.max(service.mainBreakerA, 200) }, 0);
  const large = scenario === "non-export";
  const runs = large
    ? pv.runs.map((r) => (r.circuit.startsWith("ac:") ? { ...r, size: "6" as const, label: "Hybrid inverter to service panel" } : r))
    : pv.runs;
  return {
    ...pv,
    service: { ...pv.service, pvBreakerA: large ? "60" : "40" },
    equipment: {
      ...pv.equipment,
      inverters: [{ lineId: "inv-1", equipmentId: large ? storageIds.largeHybridInverter : storageIds.hybridInverter, quantity: "1" }],
    },
    runs,
    storage,
  };
}
