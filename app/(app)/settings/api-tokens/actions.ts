"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { createApiToken, revokeApiToken } from "@/lib/server/data/api-tokens";
import { CreateApiTokenInput, RevokeApiTokenInput } from "@/lib/schemas/api-token";

export const createApiTokenAction = defineAction(
  { schema: CreateApiTokenInput, permission: "api-tokens:manage" },
  async (input, { viewer }) => {
    const created = await createApiToken({ viewer, input });
    revalidatePath("/settings/api-tokens");
    return created;
  },
);

export const revokeApiTokenAction = defineAction(
  { schema: RevokeApiTokenInput, permission: "api-tokens:manage" },
  async ({ apiTokenId }, { viewer }) => {
    const revoked = await revokeApiToken({ viewer, apiTokenId });
    revalidatePath("/settings/api-tokens");
    return revoked;
  },
);
