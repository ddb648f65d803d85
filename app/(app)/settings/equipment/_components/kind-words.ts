import type { EquipmentKind } from "@/lib/domain/stored-values";

/** How the catalog pages name each kind in headings and links. */
export const KIND_WORDS: Record<EquipmentKind, { plural: string; add: string }> = {
  module: { plural: "PV modules", add: "Add a PV module" },
  inverter: { plural: "Inverters", add: "Add an inverter" },
  device: { plural: "Module-level devices", add: "Add a module-level device" },
  battery: { plural: "Batteries", add: "Add a battery" },
};
