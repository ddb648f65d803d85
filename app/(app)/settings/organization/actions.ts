"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { updateOrganization } from "@/lib/server/data/organizations";
import { OrganizationInput } from "@/lib/schemas/organization";

export const updateOrganizationAction = defineAction(
  { schema: OrganizationInput, permission: "organization:edit" },
  async (values, { viewer }) => {
    const organization = await updateOrganization({ viewer, values });
    revalidatePath("/settings/organization");
    return { name: organization.name };
  },
);
