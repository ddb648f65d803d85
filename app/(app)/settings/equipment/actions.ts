"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { createEquipment, setEquipmentArchived, updateEquipment } from "@/lib/server/data/equipment";
import { EquipmentInput, SetArchivedInput, UpdateEquipmentInput } from "@/lib/schemas/equipment";

export const createEquipmentAction = defineAction({ schema: EquipmentInput, permission: "catalog:edit" }, async (values, { viewer }) => {
  const item = await createEquipment({ viewer, values });
  revalidatePath("/settings/equipment");
  return { id: item.id };
});

export const updateEquipmentAction = defineAction(
  { schema: UpdateEquipmentInput, permission: "catalog:edit" },
  async (input, { viewer }) => {
    const item = await updateEquipment({ viewer, equipmentId: input.equipmentId, values: input });
    revalidatePath("/settings/equipment");
    return { id: item.id };
  },
);

export const setEquipmentArchivedAction = defineAction(
  { schema: SetArchivedInput, permission: "catalog:edit" },
  async ({ equipmentId, isArchived }, { viewer }) => {
    const item = await setEquipmentArchived({ viewer, equipmentId, isArchived });
    revalidatePath("/settings/equipment");
    return { isArchived: item.isArchived };
  },
);
