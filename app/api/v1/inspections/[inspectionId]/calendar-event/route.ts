import { inspectionsCalendar } from "@/lib/calendar/inspection-events";
import { getInspectionEvent } from "@/lib/server/data/calendar-feeds";
import { attachmentHeaders, withAuth } from "@/lib/server/http";

// GET /api/v1/inspections/:inspectionId/calendar-event – one booked inspection as an .ics file to add to a calendar
export const GET = withAuth<{ inspectionId: string }>(
  async (_request, { viewer, params }) => {
    const event = await getInspectionEvent({ viewer, inspectionId: params.inspectionId });
    const body = Buffer.from(inspectionsCalendar([event], `Project ${event.projectNumber}`), "utf8");
    return new Response(body, {
      headers: attachmentHeaders({
        fileName: `inspection-project-${event.projectNumber}-${event.day}.ics`,
        contentType: "text/calendar; charset=utf-8",
        length: body.length,
      }),
    });
  },
  { permission: "project:view" },
);
