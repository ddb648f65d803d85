import type { Metadata } from "next";
import { LocalTime } from "@/components/time/local-time";
import { can } from "@/lib/domain/permissions";
import { DIGEST_HOURS } from "@/lib/domain/desk";
import { ROLE_LABELS } from "@/lib/domain/roles";
import { US_TIME_ZONES } from "@/lib/domain/time-zones";
import { requireUser } from "@/lib/server/auth";
import { getProfileSettings } from "@/lib/server/data/calendar-feeds";
import { getOrganization } from "@/lib/server/data/organizations";
import { createCalendarFeedAction, revokeCalendarFeedAction, setDailyDigestAction } from "./actions";
import { CalendarFeedPanel } from "./_components/calendar-feed-panel";
import { DigestToggle } from "./_components/digest-toggle";

export const metadata: Metadata = { title: "Your profile" };

export default async function ProfilePage() {
  const viewer = await requireUser();
  const [settings, organization] = await Promise.all([getProfileSettings({ viewer }), getOrganization({ viewer })]);
  const zoneLabel = US_TIME_ZONES.find((z) => z.id === organization.timeZone)?.label ?? organization.timeZone;
  const feedScope =
    viewer.role === "installer"
      ? "the projects assigned to you"
      : viewer.role === "coordinator"
        ? "the projects you coordinate"
        : "every project of the company";
  return (
    <div className="max-w-2xl space-y-5">
      <div>
        <h1>Your profile</h1>
        <p className="text-sm text-ink-soft">
          {viewer.name} · {viewer.email} · {ROLE_LABELS[viewer.role]}
        </p>
      </div>

      <section className="panel space-y-2" aria-labelledby="digest-heading">
        <h2 id="digest-heading" className="text-base">
          Morning digest
        </h2>
        {viewer.role === "coordinator" ? (
          <>
            <p className="text-sm text-ink-soft">
              One e-mail each working morning (Monday to Friday, from {DIGEST_HOURS.from}:00 until noon, {zoneLabel} time) with today&apos;s
              desk: follow-ups due, corrections to answer, inspections this week, permits about to lapse and filings past the
              authority&apos;s usual time. A morning with nothing on the desk sends nothing.
            </p>
            <DigestToggle enabled={settings.dailyDigest} save={setDailyDigestAction} />
          </>
        ) : (
          <p className="text-sm text-ink-soft">
            The digest goes to coordinators about the projects they coordinate.
            {can(viewer, "desk:view") ? " The company's desk is at the top of the Projects page." : ""}
          </p>
        )}
      </section>

      <section className="panel space-y-2" aria-labelledby="calendar-heading" data-testid="calendar-feed">
        <h2 id="calendar-heading" className="text-base">
          Inspections in your calendar
        </h2>
        <p className="text-sm text-ink-soft">
          A private address your calendar program can subscribe to, listing the booked inspections and utility visits of {feedScope}. Each
          inspection can also be downloaded on its own from the Filings and Field record pages.
        </p>
        <p className="text-sm" data-testid="calendar-feed-status">
          {settings.createdAt ? (
            <>
              Your address was made on <LocalTime iso={settings.createdAt} style="date" />.
            </>
          ) : (
            "You have no calendar address."
          )}
        </p>
        <CalendarFeedPanel hasFeed={settings.createdAt !== null} create={createCalendarFeedAction} revoke={revokeCalendarFeedAction} />
      </section>
    </div>
  );
}
