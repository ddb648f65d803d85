// A packet input whose design carries batteries: the demo packet fixture's design with the engine's
// storage added and reviewed again, as the design document's storage will reach it. Invented equipment only.
import { reviewDesign, type Storage } from "@/lib/engineering";
import type { PacketKind } from "@/lib/domain/stored-values";
import type { PacketInput } from "@/lib/documents/packets/input";
import { acStorage, dcStorage } from "@/tests/unit/engineering/storage/fixtures";
import { packetFixture } from "./packet-fixture";

export function storagePacketFixture(kind: PacketKind, storage: (inverterId: string) => Storage): PacketInput {
  const base = packetFixture({ kind });
  const design = { ...base.design, storage: storage(base.design.inverters[0]!.id) };
  return { ...base, design, review: reviewDesign(design, base.site) };
}

/** DC-coupled through the string inverter with a backup loads panel, a listed power control system and an export limit. */
export const dcBackupStorage = (inverterId: string): Storage =>
  dcStorage({
    multimodeInverterId: inverterId,
    exportLimitKw: 5,
    pcs: { listed: true, currentSettingA: 24 },
    availableFaultCurrentA: 10000,
  });

/** AC-coupled beside the PV inverter, exporting, no backup panel. */
export const acExportStorage = (): Storage => acStorage();
