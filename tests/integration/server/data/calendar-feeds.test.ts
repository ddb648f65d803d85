// Inspections in the calendar (issue 15): the private feed is valid iCalendar (RFC 5545, parsed with ical.js,
// Mozilla's parser), lists the inspections of the owner's projects only, stops answering once revoked,
// and is throttled per address like inspector links.
import ICAL from "ical.js";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Filing, Inspection, User } from "@/models";
import { inspectionsCalendar } from "@/lib/calendar/inspection-events";
import { TOKEN_GUESS_THROTTLE } from "@/lib/server/data/token-guesses";
import {
  createCalendarFeed,
  getInspectionEvent,
  getProfileSettings,
  openCalendarFeed,
  revokeCalendarFeed,
} from "@/lib/server/data/calendar-feeds";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
const ids: Record<string, string> = {};
const tokenOf = (url: string) => url.split("/calendar/")[1]!;
let address = 0;
const freshAddress = () => `198.51.100.${++address}`; // TEST-NET-2 (RFC 5737)

// The feed reaches three months back from the organization's today: book days relative to now.
const dayFromNow = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

async function bookedProject(customerName: string, installerId: string | null, day: string) {
  const project = await makeProject(org, { customerName, installerId });
  const filing = await Filing.create({
    organizationId: org.organization.id,
    projectId: project.id,
    kind: "permit",
    authorityKind: "jurisdiction",
    authorityId: org.jurisdiction.id,
    authorityName: org.jurisdiction.name,
    status: "approved",
    referenceNumber: "BP-9",
    statusSince: new Date(),
    createdById: null,
  });
  const inspection = await Inspection.create({
    organizationId: org.organization.id,
    filingId: filing.id,
    kind: "final",
    scheduledFor: day,
    timeWindow: "8–12",
    inspectorName: "R. Pell",
  });
  return { project, filing, inspection };
}

beforeAll(async () => {
  org = await makeOrganization("Calendar");
  rival = await makeOrganization("Rival calendar");
  const mine = await bookedProject("Indra Installed", org.users.installer.id, dayFromNow(5));
  const theirs = await bookedProject("Olek Other", org.users.otherInstaller.id, dayFromNow(6));
  ids.mine = mine.inspection.id;
  ids.theirs = theirs.inspection.id;
  ids.mineFiling = mine.filing.id;
  ids.mineProject = mine.project.id;
});

afterAll(async () => {
  await closeDb();
});

function parse(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  return { calendar, events: calendar.getAllSubcomponents("vevent") };
}

describe("the private calendar feed", () => {
  it("is valid iCalendar with the required properties, and lists an installer's own projects only", async () => {
    const { url } = await createCalendarFeed({ viewer: org.viewers.installer });
    expect(tokenOf(url)).toMatch(/^[A-Za-z0-9_-]{43}$/); // 256 bits, base64url
    const stored = await User.findByPk(org.users.installer.id);
    expect(stored?.calendarTokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored?.calendarTokenHash).not.toContain(tokenOf(url));

    const feed = await openCalendarFeed(tokenOf(url), freshAddress());
    const { calendar, events } = parse(inspectionsCalendar(feed.events, feed.calName));
    // RFC 5545 §3.6: VCALENDAR needs VERSION and PRODID; §3.6.1: VEVENT needs UID and DTSTAMP, and DTSTART here (no METHOD-less exception).
    expect(calendar.name).toBe("vcalendar");
    expect(calendar.getFirstPropertyValue("version")).toBe("2.0");
    expect(calendar.getFirstPropertyValue("prodid")).toBe("-//Ohmstead//Inspections//EN");
    expect(events).toHaveLength(1);
    const event = events[0]!;
    expect(event.getFirstPropertyValue("uid")).toBe(`inspection-${ids.mine}@ohmstead`);
    expect(event.getFirstPropertyValue("dtstamp")).toBeTruthy();
    const start = event.getFirstPropertyValue("dtstart") as ICAL.Time;
    expect(start.isDate).toBe(true);
    expect(start.toString()).toBe(feed.events[0]!.day);
    const end = event.getFirstPropertyValue("dtend") as ICAL.Time;
    expect(end.subtractDate(start).toSeconds()).toBe(86_400);
    expect(String(event.getFirstPropertyValue("summary"))).toContain("Final inspection 8–12");
    expect(String(event.getFirstPropertyValue("location"))).toContain("1 Fixture Way");
    expect(String(event.getFirstPropertyValue("url"))).toContain(`/projects/${ids.mineProject}/filings#filing-${ids.mineFiling}`);
  });

  it("lists the whole company for an admin", async () => {
    const { url } = await createCalendarFeed({ viewer: org.viewers.admin });
    const feed = await openCalendarFeed(tokenOf(url), freshAddress());
    expect(feed.events.map((e) => e.inspectionId).sort()).toEqual([ids.mine, ids.theirs].sort());
  });

  it("stops answering when revoked or replaced, and the profile says whether there is one", async () => {
    const first = await createCalendarFeed({ viewer: org.viewers.coordinator });
    expect((await getProfileSettings({ viewer: org.viewers.coordinator })).createdAt).not.toBeNull();
    const second = await createCalendarFeed({ viewer: org.viewers.coordinator });
    await expect(openCalendarFeed(tokenOf(first.url), freshAddress())).rejects.toMatchObject({ code: "NOT_FOUND" });
    await openCalendarFeed(tokenOf(second.url), freshAddress());
    await revokeCalendarFeed({ viewer: org.viewers.coordinator });
    await expect(openCalendarFeed(tokenOf(second.url), freshAddress())).rejects.toMatchObject({ code: "NOT_FOUND" });
    expect((await getProfileSettings({ viewer: org.viewers.coordinator })).createdAt).toBeNull();
  });

  it("refuses an address that guessed too often, even with a good token", async () => {
    const { url } = await createCalendarFeed({ viewer: org.viewers.otherInstaller });
    const guesser = freshAddress();
    for (let i = 0; i < TOKEN_GUESS_THROTTLE.maxMisses; i++)
      await expect(openCalendarFeed(`guess-${i}-aaaaaaaaaaaaaaaa`, guesser)).rejects.toMatchObject({ code: "NOT_FOUND" });
    await expect(openCalendarFeed(tokenOf(url), guesser)).rejects.toMatchObject({ code: "LIMIT_EXCEEDED" });
    await expect(openCalendarFeed(tokenOf(url), freshAddress())).resolves.toBeTruthy();
  });
});

describe("one inspection as an .ics event", () => {
  it("is given to people who may see the project, and to nobody else", async () => {
    const event = await getInspectionEvent({ viewer: org.viewers.installer, inspectionId: ids.mine! });
    expect(parse(inspectionsCalendar([event], "x")).events).toHaveLength(1);
    await expect(getInspectionEvent({ viewer: org.viewers.otherInstaller, inspectionId: ids.mine! })).rejects.toMatchObject({
      code: "NOT_FOUND",
    });
    await expect(getInspectionEvent({ viewer: rival.viewers.admin, inspectionId: ids.mine! })).rejects.toMatchObject({ code: "NOT_FOUND" });
    await expect(getInspectionEvent({ viewer: org.viewers.coordinator, inspectionId: "not-a-uuid" })).rejects.toMatchObject({
      code: "NOT_FOUND",
    });
  });
});
