import { z } from "zod";

/** Turns the person's own morning digest on or off. */
export const DailyDigestInput = z.object({ enabled: z.boolean() });
export type DailyDigestInput = z.infer<typeof DailyDigestInput>;

/** Makes or revokes the person's own calendar feed: nothing to say but the wish. */
export const CalendarFeedInput = z.object({}).strict();
export type CalendarFeedInput = z.infer<typeof CalendarFeedInput>;
