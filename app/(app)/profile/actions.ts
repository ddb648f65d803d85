"use server";

import { revalidatePath } from "next/cache";
import { defineAction } from "@/lib/server/action";
import { createCalendarFeed, revokeCalendarFeed } from "@/lib/server/data/calendar-feeds";
import { setDailyDigest } from "@/lib/server/data/desk-digests";
import { CalendarFeedInput, DailyDigestInput } from "@/lib/schemas/profile";

export const setDailyDigestAction = defineAction(
  { schema: DailyDigestInput, permission: "profile:edit" },
  async ({ enabled }, { viewer }) => {
    const saved = await setDailyDigest({ viewer, enabled });
    revalidatePath("/profile");
    return saved;
  },
);

export const createCalendarFeedAction = defineAction(
  { schema: CalendarFeedInput, permission: "profile:edit" },
  async (_input, { viewer }) => {
    const created = await createCalendarFeed({ viewer });
    revalidatePath("/profile");
    return created;
  },
);

export const revokeCalendarFeedAction = defineAction(
  { schema: CalendarFeedInput, permission: "profile:edit" },
  async (_input, { viewer }) => {
    await revokeCalendarFeed({ viewer });
    revalidatePath("/profile");
    return { revoked: true };
  },
);
