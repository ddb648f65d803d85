"use server";

import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { clientOf } from "@/lib/server/share-http";
import { signCertificateInPerson } from "@/lib/server/use-cases/signatures";
import { SignCertificateInPersonInput } from "@/lib/schemas/signature-request";

export const signCertificateInPersonAction = defineAction(
  { schema: SignCertificateInPersonInput.extend({ projectId: z.string().uuid() }), permission: "field:record" },
  async ({ projectId, ...input }, { viewer }) => {
    const signed = await signCertificateInPerson({ viewer, projectId, input, client: clientOf(await headers()) });
    revalidatePath(`/projects/${projectId}/field`);
    return signed;
  },
);
