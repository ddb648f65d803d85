import type { EquipmentKind } from "@/lib/domain/stored-values";
import type { EquipmentDto } from "@/lib/schemas/equipment";

// The few figures a coordinator compares at a glance, per kind; the full sheet is on the edit page.
export const FIGURE_COLUMNS: Record<EquipmentKind, string[]> = {
  module: ["Pmax", "Voc", "Isc"],
  inverter: ["Type", "AC rated", "Max DC input", "DC window"],
  device: ["Type", "Max input", "Rated input"],
  battery: ["Usable", "Nameplate", "Max discharge"],
};

const n = (value: number | undefined, unit: string) => (value === undefined ? "—" : `${value.toLocaleString("en-US")} ${unit}`);

export function keyFigures(item: EquipmentDto): string[] {
  switch (item.kind) {
    case "module":
      return [n(item.specs.powerW, "W"), n(item.specs.vocV, "V"), n(item.specs.iscA, "A")];
    case "inverter": {
      const s = item.specs;
      // Optimizer-string inverters hold a fixed string voltage instead of tracking a window.
      const window =
        s.regulatedStringV !== undefined
          ? `fixed ${n(s.regulatedStringV, "V")}, ≤ ${n(s.maxStringPowerW, "W")}/string`
          : s.mpptMinV !== undefined && s.mpptMaxV !== undefined
            ? `MPPT ${s.mpptMinV}–${n(s.mpptMaxV, "V")}`
            : "—";
      const type = s.storageRole === "multimode" ? "multimode" : s.storageRole === "battery" ? "battery inverter" : s.inverterKind;
      return [type, n(s.acPowerW, "W AC"), n(s.maxDcInputV, "V"), window];
    }
    case "device":
      return [
        item.specs.deviceKind === "optimizer" ? "optimizer" : "shutdown device",
        n(item.specs.maxInputV, "V"),
        n(item.specs.ratedInputPowerW, "W"),
      ];
    case "battery":
      return [n(item.specs.usableKwh, "kWh"), n(item.specs.nameplateKwh, "kWh"), n(item.specs.maxDischargeKw, "kW")];
  }
}

export function formatFileSize(bytes: number): string {
  return bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} KB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}
