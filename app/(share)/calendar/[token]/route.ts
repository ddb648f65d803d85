import { inspectionsCalendar } from "@/lib/calendar/inspection-events";
import { openCalendarFeed } from "@/lib/server/data/calendar-feeds";
import { clientAddress } from "@/lib/server/client-address";
import { NO_INDEX, shareErrorResponse } from "@/lib/server/share-http";

// GET /calendar/:token – a person's private feed of their projects' inspections (iCalendar); no session, throttled like inspector links
export async function GET(request: Request, { params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  try {
    const { calName, events } = await openCalendarFeed(token, clientAddress(request.headers));
    const body = inspectionsCalendar(events, calName);
    return new Response(body, {
      headers: {
        "content-type": "text/calendar; charset=utf-8",
        "content-disposition": 'inline; filename="inspections.ics"',
        "x-content-type-options": "nosniff",
        ...NO_INDEX,
      },
    });
  } catch (error) {
    return shareErrorResponse(error);
  }
}
