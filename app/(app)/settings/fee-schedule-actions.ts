"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { defineAction } from "@/lib/server/action";
import { saveFeeSchedule } from "@/lib/server/data/fee-schedules";
import { FEE_AUTHORITY_KINDS } from "@/lib/fees/types";
import { FeeScheduleInput } from "@/lib/schemas/fee-schedule";

const SaveFeeScheduleInput = z.object({
  authorityKind: z.enum(FEE_AUTHORITY_KINDS),
  authorityId: z.string().uuid(),
  lines: FeeScheduleInput,
});

/** Replaces an AHJ's or a utility's fee schedule; field errors come back under `lines.<n>.<field>`. */
export const saveFeeScheduleAction = defineAction(
  { schema: SaveFeeScheduleInput, permission: "reference:edit" },
  async ({ authorityKind, authorityId, lines }, { viewer }) => {
    const saved = await saveFeeSchedule({ viewer, authorityKind, authorityId, lines });
    revalidatePath(authorityKind === "jurisdiction" ? `/settings/jurisdictions/${authorityId}` : `/settings/utilities/${authorityId}`);
    return { lineCount: saved.length };
  },
);
