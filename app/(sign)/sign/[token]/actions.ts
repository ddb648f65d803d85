"use server";

import { headers } from "next/headers";
import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { clientOf } from "@/lib/server/share-http";
import { declineByLink, signByLink } from "@/lib/server/use-cases/signatures";
import { DeclineSigningInput, SignDocumentInput } from "@/lib/schemas/signature-request";

// The signer's answers. No session: the link's token is the credential, checked (and throttled) by the use case.
const token = z.string().min(1).max(200);

export const signDocumentAction = defineAction(
  { schema: SignDocumentInput.extend({ token, consentedAt: z.iso.datetime().optional() }), permission: null },
  async ({ token, name, mark, consentedAt }) => {
    // When they ticked the agreement, if the page says so and it is not in the future; else now.
    const agreed = consentedAt && new Date(consentedAt) <= new Date() ? new Date(consentedAt) : undefined;
    await signByLink(token, { name, mark, consentedAt: agreed }, clientOf(await headers()));
    return { signed: true };
  },
);

export const declineSigningAction = defineAction(
  { schema: DeclineSigningInput.extend({ token }), permission: null },
  async ({ token, reason }) => {
    await declineByLink(token, reason, clientOf(await headers()));
    return { declined: true };
  },
);
