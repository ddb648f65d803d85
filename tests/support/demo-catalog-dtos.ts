import { DEMO_CATALOG } from "@/lib/seed/demo-catalog";
import { EquipmentInput, type EquipmentDto } from "@/lib/schemas/equipment";

/** The demo catalog as DTOs with stable fake ids, and the ids of the models a demo design names. */
export const DEMO_CATALOG_DTOS: EquipmentDto[] = DEMO_CATALOG.map(
  (item, i) =>
    ({
      ...EquipmentInput.parse(item),
      id: `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`,
      isArchived: false,
      datasheet: null,
    }) as EquipmentDto,
);

export const demoIdsOf = <K extends string>(models: Record<K, string>) =>
  Object.fromEntries(Object.entries(models).map(([k, model]) => [k, DEMO_CATALOG_DTOS.find((c) => c.model === model)!.id])) as Record<
    K,
    string
  >;
