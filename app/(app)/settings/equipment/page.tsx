import type { Metadata } from "next";
import { can } from "@/lib/domain/permissions";
import { EQUIPMENT_KINDS } from "@/lib/domain/stored-values";
import { requirePermission } from "@/lib/server/auth";
import { listEquipment } from "@/lib/server/data/equipment";
import { EquipmentGroup } from "./_components/equipment-group";

export const metadata: Metadata = { title: "Equipment catalog" };

export default async function EquipmentCatalogPage() {
  const viewer = await requirePermission("catalog:view");
  const items = await listEquipment({ viewer, includeArchived: true });
  const canEdit = can(viewer, "catalog:edit");
  return (
    <div className="space-y-6">
      <div>
        <h1>Equipment catalog</h1>
        <p className="text-sm text-ink-soft">
          Figures as printed on each data sheet (modules at STC). Designs pick from here; archived items stay readable in saved designs but
          are not offered for new ones.
        </p>
      </div>
      {EQUIPMENT_KINDS.map((kind) => (
        <EquipmentGroup key={kind} kind={kind} items={items.filter((i) => i.kind === kind)} canEdit={canEdit} />
      ))}
    </div>
  );
}
