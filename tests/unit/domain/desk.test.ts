// The coordinator's desk (product rules, issue 15 "Today"): which filings each section lists and in what order.
// Calendar arithmetic is checked against the Gregorian calendar (2028 is a leap year; 2026-12-31 + 1 day is 2027-01-01).
import { describe, expect, it } from "vitest";
import {
  beyondUsual,
  daysBetween,
  daysPastUsual,
  deskDayText,
  deskFor,
  deskIsEmpty,
  deskSectionOf,
  digestDayAt,
  type DeskFiling,
  type DeskSignature,
} from "@/lib/domain/desk";
import { deskDigestEmail } from "@/templates/email/desk-digest";

const TODAY = "2026-12-07";
let seq = 0;
const filing = (over: Partial<DeskFiling> = {}): DeskFiling => {
  seq++;
  return {
    filingId: `f${seq}`,
    projectId: `p${seq}`,
    projectNumber: seq,
    customerName: `Customer ${seq}`,
    kind: "permit",
    authorityName: "Town of Larkspur Bend",
    status: "submitted",
    statusSinceDay: TODAY,
    expiresOn: null,
    nextFollowUpOn: null,
    usualReviewDays: 10,
    latestRound: null,
    inspections: [],
    ...over,
  };
};
const keys = (rows: { filingId: string | null }[]) => rows.map((r) => r.filingId);

describe("calendar days", () => {
  it.each([
    ["2026-12-07", "2026-12-07", 0],
    ["2026-12-01", "2026-12-07", 6],
    ["2026-12-31", "2027-01-01", 1],
    ["2028-02-28", "2028-03-01", 2], // leap year
    ["2026-03-07", "2026-03-09", 2], // across the spring clock change: whole days, no hours
    ["2026-12-10", "2026-12-07", -3],
  ])("%s to %s is %i days", (from, to, days) => expect(daysBetween(from, to)).toBe(days));
});

describe("follow-ups due", () => {
  it("lists follow-ups due today and overdue, longest overdue first, and none to come", () => {
    const due = filing({ nextFollowUpOn: TODAY });
    const late = filing({ nextFollowUpOn: "2026-12-01" });
    const later = filing({ nextFollowUpOn: "2026-11-20" });
    const future = filing({ nextFollowUpOn: "2026-12-08" });
    const withdrawn = filing({ nextFollowUpOn: "2026-11-01", status: "withdrawn" });
    const desk = deskFor([due, late, future, later, withdrawn], TODAY);
    expect(keys(desk.followUps)).toEqual([later.filingId, late.filingId, due.filingId]);
    expect(desk.followUps[0]).toMatchObject({ since: "2026-11-20", days: 17, toWhom: "Town of Larkspur Bend" });
    expect(desk.followUps[2]!.what).toContain("due today");
    expect(deskDayText(desk.followUps[0]!)).toBe("17 days overdue");
    expect(deskDayText(desk.followUps[2]!)).toBe("today");
  });
});

describe("correction rounds waiting on the office", () => {
  it("lists unanswered rounds oldest first with their open items", () => {
    const newer = filing({
      status: "corrections_requested",
      latestRound: { number: 1, receivedOn: "2026-12-03", answered: false, openItems: 1 },
    });
    const older = filing({
      kind: "interconnection",
      authorityName: "Kettle Valley Power",
      status: "corrections_requested",
      latestRound: { number: 2, receivedOn: "2026-11-25", answered: false, openItems: 3 },
    });
    const answered = filing({ status: "resubmitted", latestRound: { number: 1, receivedOn: "2026-11-01", answered: true, openItems: 0 } });
    const desk = deskFor([newer, answered, older], TODAY);
    expect(keys(desk.corrections)).toEqual([older.filingId, newer.filingId]);
    expect(desk.corrections[0]!.what).toBe("Answer round 2 of the interconnection: 3 items open");
    expect(desk.corrections[1]!.what).toBe("Answer round 1 of the permit: 1 item open");
    expect(desk.corrections[0]).toMatchObject({ toWhom: "Kettle Valley Power", since: "2026-11-25", days: 12 });
  });
});

describe("inspections in the next seven days", () => {
  it("lists open inspections from today through the sixth day after, soonest first", () => {
    const at = (id: string, scheduledFor: string, result: "passed" | null = null) => ({
      id,
      kind: "final" as const,
      scheduledFor,
      timeWindow: "8–12",
      result,
    });
    const f = filing({
      status: "approved",
      inspections: [at("i-late", "2026-12-13"), at("i-today", TODAY), at("i-past", "2026-12-06"), at("i-beyond", "2026-12-14")],
    });
    const g = filing({ status: "approved", inspections: [at("i-done", "2026-12-09", "passed"), at("i-mid", "2026-12-09")] });
    const desk = deskFor([f, g], TODAY);
    expect(desk.inspections.map((r) => r.key)).toEqual(["inspections:i-today", "inspections:i-mid", "inspections:i-late"]);
    expect(desk.inspections[0]!.what).toBe("Final inspection, 8–12");
    expect(deskDayText(desk.inspections[1]!)).toBe("in 2 days");
  });
});

describe("permits about to lapse", () => {
  it.each([
    ["expires within the month", { expiresOn: "2026-12-20" }, true],
    ["expires on the last day of the notice", { expiresOn: "2027-01-06" }, true],
    ["expires after the notice", { expiresOn: "2027-01-07" }, false],
    ["already lapsed", { expiresOn: "2026-12-01" }, true],
    [
      "final inspection passed",
      {
        expiresOn: "2026-12-20",
        inspections: [{ id: "x", kind: "final" as const, scheduledFor: "2026-12-01", timeWindow: "", result: "passed" as const }],
      },
      false,
    ],
    ["no expiry recorded", { expiresOn: null }, false],
    ["an interconnection approval", { kind: "interconnection" as const, expiresOn: "2026-12-20" }, false],
  ])("%s", (_name, over, listed) => {
    const f = filing({ status: "approved", ...over });
    expect(deskFor([f], TODAY).lapsing.length).toBe(listed ? 1 : 0);
  });

  it("says a lapsed permit lapsed", () => {
    const desk = deskFor([filing({ status: "approved", expiresOn: "2026-12-01" })], TODAY);
    expect(desk.lapsing[0]!.what).toMatch(/^Permit lapsed/);
  });
});

describe("past the authority's usual time", () => {
  it.each([
    [11, 10, 1],
    [10, 10, null],
    [0, 10, null],
    [40, 15, 25],
    [40, null, null],
  ])("%i days waited against a usual %s: %s past", (waited, usual, over) => expect(beyondUsual(waited, usual)).toBe(over));

  it.each([
    ["submitted 12 days ago, usual 10", { status: "submitted" as const, statusSinceDay: "2026-11-25", usualReviewDays: 10 }, 2],
    ["in review exactly the usual time", { status: "in_review" as const, statusSinceDay: "2026-11-27", usualReviewDays: 10 }, null],
    ["resubmitted 20 days ago, usual 15", { status: "resubmitted" as const, statusSinceDay: "2026-11-17", usualReviewDays: 15 }, 5],
    ["approved long ago", { status: "approved" as const, statusSinceDay: "2026-01-01", usualReviewDays: 10 }, null],
    ["corrections with the office", { status: "corrections_requested" as const, statusSinceDay: "2026-01-01", usualReviewDays: 10 }, null],
    ["authority without a profile", { status: "submitted" as const, statusSinceDay: "2026-01-01", usualReviewDays: null }, null],
  ])("%s", (_name, over, expected) => {
    expect(daysPastUsual(filing(over), TODAY)).toBe(expected);
  });

  it("lists the furthest past first and names both figures", () => {
    const a = filing({ statusSinceDay: "2026-11-25", usualReviewDays: 10 });
    const b = filing({ kind: "interconnection", statusSinceDay: "2026-11-01", usualReviewDays: 15 });
    const desk = deskFor([a, b], TODAY);
    expect(keys(desk.pastUsual)).toEqual([b.filingId, a.filingId]);
    expect(desk.pastUsual[0]!.what).toBe("Interconnection with the authority 36 days, 21 days past its usual 15");
  });
});

it("an empty desk has nothing in any section", () => {
  expect(deskIsEmpty(deskFor([filing()], TODAY))).toBe(true);
  expect(deskIsEmpty(deskFor([filing({ nextFollowUpOn: TODAY })], TODAY))).toBe(false);
});

describe("the digest's working morning", () => {
  // Offsets from the IANA tz database: Denver is UTC−7 in December (MST), UTC−6 in July (MDT);
  // 2026-12-07 is a Monday, 2026-12-05 a Saturday (Gregorian calendar).
  it.each([
    ["Monday 07:00 in Denver", "2026-12-07T14:00:00Z", "America/Denver", "2026-12-07"],
    ["Monday 06:59 in Denver", "2026-12-07T13:59:00Z", "America/Denver", null],
    ["Monday 11:59 in Denver", "2026-12-07T18:59:00Z", "America/Denver", "2026-12-07"],
    ["Monday noon in Denver", "2026-12-07T19:00:00Z", "America/Denver", null],
    ["Saturday 08:00 in Denver", "2026-12-05T15:00:00Z", "America/Denver", null],
    ["Friday 08:00 in New York, already Friday 13:00 UTC", "2026-12-11T13:00:00Z", "America/New_York", "2026-12-11"],
    ["Tuesday 07:30 in Denver is still Monday evening in Honolulu", "2026-12-08T14:30:00Z", "Pacific/Honolulu", null],
    ["July: 07:00 MDT", "2026-07-06T13:00:00Z", "America/Denver", "2026-07-06"],
  ])("%s", (_name, iso, zone, day) => expect(digestDayAt(iso, zone)).toBe(day));
});

describe("the desk section a link names", () => {
  it.each([
    ["followUps", "followUps"],
    ["pastUsual", "pastUsual"],
    ["everything", null],
    [["followUps", "corrections"], null],
    [undefined, null],
  ])("%j opens %j whole", (value, section) => {
    expect(deskSectionOf(value)).toBe(section);
  });
});

describe("the morning digest's long sections", () => {
  const section = (total: number, shown: number) => ({
    title: "Follow-ups due",
    total,
    rows: Array.from({ length: shown }, (_, i) => ({ text: `Row ${i + 1}`, url: `https://portal.example/r${i + 1}` })),
    moreUrl: "https://portal.example/dashboard?desk=followUps#desk-followUps",
  });

  it("lists the first rows, counts the whole section and links to the rest", () => {
    const mail = deskDigestEmail({ dayText: "Dec 7, 2026", deskUrl: "https://portal.example/dashboard", sections: [section(40, 15)] });
    expect(mail.subject).toBe("Today's desk, Dec 7, 2026: 40 items");
    expect(mail.text).toContain("Follow-ups due (40)");
    expect(mail.text).toContain("- Row 15");
    expect(mail.text).toContain("- and 25 more on your desk: https://portal.example/dashboard?desk=followUps#desk-followUps");
    expect(mail.html).toContain("and 25 more on your desk");
  });

  it("says nothing more when every row is listed", () => {
    const mail = deskDigestEmail({ dayText: "Dec 7, 2026", deskUrl: "https://portal.example/dashboard", sections: [section(3, 3)] });
    expect(mail.text).not.toContain("more on your desk");
    expect(mail.html).not.toContain("more on your desk");
  });
});

describe("signatures not given yet", () => {
  const link = (over: Partial<DeskSignature> = {}): DeskSignature => ({
    signerId: "s1",
    projectId: "p-sign",
    projectNumber: 40,
    customerName: "Ottilie Brand-Vane",
    documentTitle: "Interconnection application",
    signerName: "Ottilie Brand-Vane",
    roleLabel: "Customer",
    sentDay: "2026-12-02",
    expiresDay: "2026-12-16",
    opened: false,
    ...over,
  });

  it("lists waiting links oldest first, each pointing at the project's documents, until their last day", () => {
    const desk = deskFor([], TODAY, [
      link({ signerId: "newer", sentDay: "2026-12-06", opened: true }),
      link({ signerId: "older" }),
      link({ signerId: "last-day", sentDay: "2026-12-01", expiresDay: TODAY }),
      link({ signerId: "expired", sentDay: "2026-11-20", expiresDay: "2026-12-06" }),
    ]);
    expect(desk.signatures.map((r) => r.key)).toEqual(["signatures:last-day", "signatures:older", "signatures:newer"]);
    expect(desk.signatures[0]).toMatchObject({ filingId: null, path: "/projects/p-sign/documents", days: 6 });
    expect(desk.signatures[2]!.what).toBe("Interconnection application: not signed by Ottilie Brand-Vane yet (opened)");
    expect(deskIsEmpty(desk)).toBe(false);
  });

  it("leaves the filing sections as they were", () => {
    const desk = deskFor([filing({ nextFollowUpOn: TODAY })], TODAY, [link()]);
    expect(desk.followUps).toHaveLength(1);
    expect(desk.followUps[0]!.path).toBe(`/projects/${desk.followUps[0]!.projectId}/filings#filing-${desk.followUps[0]!.filingId}`);
  });
});
