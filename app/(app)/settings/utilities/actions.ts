"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { createUtility, updateUtility } from "@/lib/server/data/reference-data";
import { UpdateUtilityInput, UtilityInput } from "@/lib/schemas/reference-data";

export const createUtilityAction = defineAction({ schema: UtilityInput, permission: "reference:edit" }, async (values, { viewer }) => {
  const utility = await createUtility({ viewer, values });
  revalidatePath("/settings/utilities");
  return { id: utility.id };
});

export const updateUtilityAction = defineAction({ schema: UpdateUtilityInput, permission: "reference:edit" }, async ({ utilityId, ...values }, { viewer }) => {
  const utility = await updateUtility({ viewer, utilityId, values });
  revalidatePath("/settings/utilities");
  return { id: utility.id };
});
