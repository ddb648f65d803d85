"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { createJurisdiction, updateJurisdiction } from "@/lib/server/data/reference-data";
import { JurisdictionInput, UpdateJurisdictionInput } from "@/lib/schemas/reference-data";

export const createJurisdictionAction = defineAction({ schema: JurisdictionInput, permission: "reference:edit" }, async (values, { viewer }) => {
  const jurisdiction = await createJurisdiction({ viewer, values });
  revalidatePath("/settings/jurisdictions");
  return { id: jurisdiction.id };
});

export const updateJurisdictionAction = defineAction({ schema: UpdateJurisdictionInput, permission: "reference:edit" }, async ({ jurisdictionId, ...values }, { viewer }) => {
  const jurisdiction = await updateJurisdiction({ viewer, jurisdictionId, values });
  revalidatePath("/settings/jurisdictions");
  return { id: jurisdiction.id };
});
