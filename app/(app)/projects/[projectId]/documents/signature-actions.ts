"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { SIGNING_LINK_DAYS } from "@/lib/domain/signature-requests";
import { defineAction } from "@/lib/server/action";
import { remindSigner, revokeSigner } from "@/lib/server/data/signature-requests";
import { requestSignatures } from "@/lib/server/use-cases/signatures";
import { RequestSignaturesInput } from "@/lib/schemas/signature-request";

export const requestSignaturesAction = defineAction(
  { schema: z.object({ projectId: z.string().uuid(), request: RequestSignaturesInput }), permission: "signatures:request" },
  async ({ projectId, request }, { viewer }) => {
    const created = await requestSignatures({ viewer, projectId, input: request });
    revalidatePath(`/projects/${projectId}/documents`);
    return created;
  },
);

export const remindSignerAction = defineAction(
  { schema: z.object({ signerId: z.string().uuid() }), permission: "signatures:request" },
  async ({ signerId }, { viewer }) => remindSigner({ viewer, signerId, expiresInDays: SIGNING_LINK_DAYS.default }),
);

export const revokeSignerAction = defineAction(
  { schema: z.object({ signerId: z.string().uuid() }), permission: "signatures:request" },
  async ({ signerId }, { viewer }) => revokeSigner({ viewer, signerId }),
);
