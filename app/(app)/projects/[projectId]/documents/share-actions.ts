"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { createShareLink, revokeShareLink } from "@/lib/server/data/share-links";
import { CreateShareLinkInput } from "@/lib/schemas/share-link";

export const createShareLinkAction = defineAction(
  { schema: CreateShareLinkInput.extend({ projectId: z.string().uuid() }), permission: "project:edit" },
  async ({ projectId, ...input }, { viewer }) => {
    const created = await createShareLink({ viewer, projectId, input });
    revalidatePath(`/projects/${projectId}/documents`);
    return created;
  },
);

export const revokeShareLinkAction = defineAction(
  { schema: z.object({ shareLinkId: z.string().uuid() }), permission: "project:edit" },
  async ({ shareLinkId }, { viewer }) => revokeShareLink({ viewer, shareLinkId }),
);
