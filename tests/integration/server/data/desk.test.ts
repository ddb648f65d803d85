// The coordinator's desk and the morning digest read from the database (issue 15, "Today" and "A daily digest"):
// each section's rows for a fixed day, who sees which projects, and one digest per person per day however
// many workers run it.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CorrectionRound, DeskDigest, Filing, FilingItem, Inspection, OutboxMessage, User } from "@/models";
import { AppError } from "@/lib/errors";
import { getDesk } from "@/lib/server/data/desk";
import { listDigestRecipients, sendDeskDigest, setDailyDigest } from "@/lib/server/data/desk-digests";
import { sendDueDeskDigests } from "@/lib/server/jobs/send-desk-digests";
import { refreshProjectFacts } from "@/lib/server/data/project-facts";
import { listProjects } from "@/lib/server/data/projects";
import { ProjectListQuery } from "@/lib/schemas/project";
import { db } from "@/lib/server/db";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

// 2026-12-07 is a Monday (Gregorian calendar); the fixtures' zone is America/New_York (UTC−5 in December, IANA tz database).
const TODAY = "2026-12-07";
const noonOf = (day: string) => new Date(`${day}T17:00:00Z`); // noon in New York

let org: OrgFixture;
let rival: OrgFixture;
const ids: Record<string, string> = {};

async function filing(projectId: string, kind: "permit" | "interconnection", over: Partial<Parameters<typeof Filing.create>[0]> = {}) {
  const authority =
    kind === "permit"
      ? { authorityKind: "jurisdiction" as const, authorityId: org.jurisdiction.id, authorityName: org.jurisdiction.name }
      : { authorityKind: "utility" as const, authorityId: org.utility.id, authorityName: org.utility.name };
  return Filing.create({
    organizationId: org.organization.id,
    projectId,
    kind,
    ...authority,
    statusSince: noonOf(TODAY),
    createdById: null,
    ...over,
  });
}

beforeAll(async () => {
  org = await makeOrganization("Desk");
  rival = await makeOrganization("Rival desk");
  // The fixture's AHJ reviews in 10 days, its utility in 15 (model defaults, set here so the test says so).
  await org.jurisdiction.update({ reviewDays: 10 });
  await org.utility.update({ reviewDays: 15 });
  const otherCoordinator = await User.create({
    organizationId: org.organization.id,
    email: `other-${org.tag}@fixture.example`,
    name: "Otto Other",
    role: "coordinator",
    passwordHash: org.users.coordinator.passwordHash,
    lastSignInAt: null,
  });
  ids.otherCoordinator = otherCoordinator.id;

  const a = await makeProject(org, { customerName: "Avery Follow", installerId: org.users.installer.id });
  ids.a = a.id;
  // Follow-up four days overdue on a permit with the AHJ since 2026-11-20: 17 days, 7 past the usual 10.
  ids.aPermit = (await filing(a.id, "permit", { status: "submitted", statusSince: noonOf("2026-11-20"), nextFollowUpOn: "2026-12-03" })).id;
  // Interconnection with corrections: round 1 with two items, one answered.
  const aUtility = await filing(a.id, "interconnection", { status: "corrections_requested", statusSince: noonOf("2026-12-01") });
  ids.aUtility = aUtility.id;
  const round = await CorrectionRound.create({
    organizationId: org.organization.id,
    filingId: aUtility.id,
    number: 1,
    receivedOn: "2026-12-01",
  });
  for (const [position, resolved] of [
    [1, true],
    [2, false],
  ] as const)
    await FilingItem.create({ organizationId: org.organization.id, roundId: round.id, position, text: `Comment ${position}`, resolved });

  const b = await makeProject(org, { customerName: "Blake Booked" });
  ids.b = b.id;
  // An issued permit lapsing in ten days, with a final inspection booked the day after tomorrow.
  const bPermit = await filing(b.id, "permit", {
    status: "approved",
    referenceNumber: "BP-1",
    decidedOn: "2026-06-20",
    expiresOn: "2026-12-17",
  });
  ids.bPermit = bPermit.id;
  ids.bInspection = (
    await Inspection.create({
      organizationId: org.organization.id,
      filingId: bPermit.id,
      kind: "final",
      scheduledFor: "2026-12-09",
      timeWindow: "8–12",
    })
  ).id;
  // Beyond the week: not listed.
  await Inspection.create({ organizationId: org.organization.id, filingId: bPermit.id, kind: "rough", scheduledFor: "2026-12-14" });

  // Another coordinator's project: on the admin's desk only.
  const c = await makeProject(org, { customerName: "Casey Colleague", coordinatorId: otherCoordinator.id });
  ids.cPermit = (await filing(c.id, "permit", { nextFollowUpOn: TODAY, status: "submitted" })).id;

  // A project on hold owes nothing today.
  const held = await makeProject(org, { customerName: "Harper Held", holdState: "on_hold", holdSince: new Date() });
  await filing(held.id, "permit", { nextFollowUpOn: "2026-11-01", status: "submitted" });
});

afterAll(async () => {
  await closeDb();
});

const summary = (rows: { filingId: string | null; since: string; days: number }[]) => rows.map((r) => [r.filingId, r.since, r.days]);

describe("the desk", () => {
  it("lists a coordinator's own projects, section by section, for the organization's day", async () => {
    const { today, desk } = await getDesk({ viewer: org.viewers.coordinator, today: TODAY });
    expect(today).toBe(TODAY);
    expect(summary(desk.followUps)).toEqual([[ids.aPermit, "2026-12-03", 4]]);
    expect(summary(desk.corrections)).toEqual([[ids.aUtility, "2026-12-01", 6]]);
    expect(desk.corrections[0]!.what).toBe("Answer round 1 of the interconnection: 1 item open");
    expect(desk.corrections[0]!.toWhom).toBe(org.utility.name);
    expect(summary(desk.inspections)).toEqual([[ids.bPermit, "2026-12-09", -2]]);
    expect(desk.inspections[0]!.key).toBe(`inspections:${ids.bInspection}`);
    expect(summary(desk.lapsing)).toEqual([[ids.bPermit, "2026-12-17", -10]]);
    expect(summary(desk.pastUsual)).toEqual([[ids.aPermit, "2026-11-20", 17]]);
    expect(desk.pastUsual[0]!.what).toBe("Permit with the authority 17 days, 7 days past its usual 10");
  });

  it("lists the whole company's projects for an admin, still without those on hold", async () => {
    const { desk } = await getDesk({ viewer: org.viewers.admin, today: TODAY });
    expect(desk.followUps.map((r) => r.customerName)).toEqual(["Avery Follow", "Casey Colleague"]);
  });

  it("shows nothing of another company and refuses installers", async () => {
    const { desk } = await getDesk({ viewer: rival.viewers.admin, today: TODAY });
    expect(Object.values(desk).flat()).toEqual([]);
    await expect(getDesk({ viewer: org.viewers.installer, today: TODAY })).rejects.toMatchObject({ code: "FORBIDDEN" });
    await expect(getDesk({ viewer: org.viewers.installer })).rejects.toBeInstanceOf(AppError);
  });

  it("reads today in the organization's zone by default", async () => {
    // 03:00 UTC on 2026-12-08 is still the evening of 2026-12-07 in New York.
    const { today } = await getDesk({ viewer: org.viewers.coordinator, now: new Date("2026-12-08T03:00:00Z") });
    expect(today).toBe(TODAY);
  });
});

describe("the projects list", () => {
  it("marks a project an authority holds past its usual review time, and only that one", async () => {
    const DAY = 86_400_000;
    const made = async (name: string, kind: "permit" | "interconnection", daysAgo: number) => {
      // Another coordinator's, so the digest's expected rows below stay the first coordinator's.
      const project = await makeProject(org, { customerName: name, coordinatorId: ids.otherCoordinator });
      await filing(project.id, kind, { status: "submitted", statusSince: new Date(Date.now() - daysAgo * DAY - 3_600_000) });
      await db().transaction((transaction) => refreshProjectFacts(project.id, { transaction }));
      return project.id;
    };
    // AHJ usual 10 days, utility usual 15 (set above).
    const late = await made("Lena Late", "permit", 13);
    const onTime = await made("Otis OnTime", "permit", 9);
    const utilityLate = await made("Uma Utility", "interconnection", 20);
    const { items } = await listProjects({ viewer: org.viewers.admin, query: ProjectListQuery.parse({ pageSize: "100" }) });
    const mark = (id: string) => items.find((p) => p.id === id)!;
    expect([mark(late).waitingOn, mark(late).waitingDays, mark(late).pastUsualDays]).toEqual(["ahj", 13, 3]);
    expect(mark(onTime).pastUsualDays).toBeNull();
    expect([mark(utilityLate).waitingOn, mark(utilityLate).pastUsualDays]).toEqual(["utility", 5]);
  });
});

describe("the morning digest", () => {
  const recipientOf = async (userId: string) =>
    (await listDigestRecipients({ organizationIds: [org.organization.id] })).find((r) => r.viewer.id === userId)!;

  it("sends the desk's items for a fixed day once, however many workers run it at the same time", async () => {
    const recipient = await recipientOf(org.users.coordinator.id);
    const outcomes = await Promise.all([1, 2, 3].map(() => sendDeskDigest({ recipient, today: TODAY })));
    expect(outcomes.sort()).toEqual(["already", "already", "sent"]);
    const digest = await DeskDigest.findOne({ where: { userId: org.users.coordinator.id, localDay: TODAY } });
    expect(digest?.itemCount).toBe(5);
    const mail = await OutboxMessage.findByPk(digest!.outboxMessageId!);
    expect(mail?.toAddress).toBe(org.users.coordinator.email);
    expect(mail?.subject).toBe("Today's desk, Dec 7, 2026: 5 items");
    const lines = mail!.textBody.split("\n").filter((l) => l.startsWith("- "));
    expect(lines).toEqual([
      `- Project ${await numberOf(ids.a)} · Avery Follow: Follow up on the permit · ${org.jurisdiction.name} · Dec 3, 2026 (4 days overdue)`,
      `- Project ${await numberOf(ids.a)} · Avery Follow: Answer round 1 of the interconnection: 1 item open · ${org.utility.name} · Dec 1, 2026 (6 days ago)`,
      `- Project ${await numberOf(ids.b)} · Blake Booked: Final inspection, 8–12 · ${org.jurisdiction.name} · Dec 9, 2026 (in 2 days)`,
      `- Project ${await numberOf(ids.b)} · Blake Booked: Permit lapses: pass an inspection or ask for an extension · ${org.jurisdiction.name} · Dec 17, 2026 (in 10 days)`,
      `- Project ${await numberOf(ids.a)} · Avery Follow: Permit with the authority 17 days, 7 days past its usual 10 · ${org.jurisdiction.name} · Nov 20, 2026 (17 days ago)`,
    ]);
    expect(mail!.textBody).toContain(`/projects/${ids.a}/filings#filing-${ids.aPermit}`);
    expect(mail!.htmlBody).toContain(`href="http`);
    // A later run the same morning finds the day claimed.
    expect(await sendDeskDigest({ recipient, today: TODAY })).toBe("already");
  });

  it("sends nothing for an empty desk, and claims the day all the same", async () => {
    const recipient = await recipientOf(ids.otherCoordinator!);
    const before = await OutboxMessage.count({ where: { toAddress: recipient.viewer.email } });
    expect(await sendDeskDigest({ recipient, today: "2026-11-02" })).toBe("empty");
    expect(await OutboxMessage.count({ where: { toAddress: recipient.viewer.email } })).toBe(before);
    expect(await DeskDigest.count({ where: { userId: recipient.viewer.id, localDay: "2026-11-02" } })).toBe(1);
  });

  it("runs on working mornings in the organization's zone and skips people who turned it off", async () => {
    const organizationIds = [org.organization.id];
    // Saturday 2026-12-12, 08:00 in New York: no digest.
    expect(await sendDueDeskDigests({ now: new Date("2026-12-12T13:00:00Z"), organizationIds })).toEqual({ sent: 0, empty: 0, already: 0 });
    // Tuesday 2026-12-08, 06:30 in New York: too early.
    expect(await sendDueDeskDigests({ now: new Date("2026-12-08T11:30:00Z"), organizationIds })).toEqual({ sent: 0, empty: 0, already: 0 });
    await setDailyDigest({ viewer: org.viewers.coordinator, enabled: false });
    const report = await sendDueDeskDigests({ now: new Date("2026-12-08T13:00:00Z"), organizationIds });
    expect(report.sent + report.empty + report.already).toBe(1); // the other coordinator only
    expect(await DeskDigest.count({ where: { userId: org.users.coordinator.id, localDay: "2026-12-08" } })).toBe(0);
    await setDailyDigest({ viewer: org.viewers.coordinator, enabled: true });
    const again = await sendDueDeskDigests({ now: new Date("2026-12-08T14:00:00Z"), organizationIds });
    expect(again).toMatchObject({ sent: 1, already: 1 });
  });
});

async function numberOf(projectId: string) {
  const { Project } = await import("@/models");
  return (await Project.findByPk(projectId))!.number;
}
