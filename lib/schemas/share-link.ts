import { z } from "zod";
import { safeString } from "./fields";

export const SHARE_LINK_DAYS = { default: 30, min: 1, max: 365 } as const;

/** What a coordinator fills in to share packet revisions with an inspector. */
export const CreateShareLinkInput = z.object({
  packetIds: z.array(safeString().uuid("Unknown packet")).min(1, "Choose at least one revision").max(20, "At most 20 revisions per link"),
  recipientEmail: safeString()
    .trim()
    .toLowerCase()
    .max(254, "At most 254 characters")
    .refine((v) => v === "" || safeString().email().safeParse(v).success, "Enter an e-mail address, or leave it empty")
    .default(""),
  expiresInDays: z.coerce
    .number({ error: "Enter a number of days" })
    .int("Whole days only")
    .min(SHARE_LINK_DAYS.min, `At least ${SHARE_LINK_DAYS.min} day`)
    .max(SHARE_LINK_DAYS.max, `At most ${SHARE_LINK_DAYS.max} days`)
    .default(SHARE_LINK_DAYS.default),
  note: safeString().trim().max(1000, "At most 1000 characters").default(""),
});
export type CreateShareLinkInput = z.input<typeof CreateShareLinkInput>;
