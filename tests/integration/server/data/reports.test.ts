// The Reports page's figures against a fixture worked out by hand. Medians and the 90th percentile follow
// the linear-interpolation definition of PostgreSQL's percentile_cont (PostgreSQL 16 manual, §9.21
// "Aggregate Functions", Table 9.62): the value at position p × (n − 1) of the sorted values, counted from 0.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CorrectionRound, Filing, Inspection, Jurisdiction, Project, StageChange, Utility } from "@/models";
import { AppError } from "@/lib/errors";
import { getReportsOverview, listCycleTimes } from "@/lib/server/data/reports";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
let quietAhj: Jurisdiction;
let secondAhj: Jurisdiction;
let secondUtility: Utility;
const RANGE = { from: "2026-01-01", to: "2026-06-30" };

type FilingFact = {
  kind: "permit" | "interconnection";
  authority: Jurisdiction | Utility;
  submittedOn: string;
  decidedOn?: string;
  status: "approved" | "rejected" | "in_review";
  rounds?: number;
  /** First visits' results; "failed+passed" adds a passed re-inspection after the failed one. */
  inspections?: ("passed" | "failed" | "failed+passed" | "cancelled" | null)[];
};

async function addFiling(owner: OrgFixture, fact: FilingFact) {
  const project = await makeProject(owner);
  const filing = await Filing.create({
    organizationId: owner.organization.id,
    projectId: project.id,
    kind: fact.kind,
    authorityKind: fact.kind === "permit" ? "jurisdiction" : "utility",
    authorityId: fact.authority.id,
    authorityName: fact.authority.name,
    status: fact.status,
    statusSince: new Date(),
    referenceNumber: fact.status === "approved" ? "REF-1" : null,
    submittedOn: fact.submittedOn,
    decidedOn: fact.decidedOn ?? null,
    createdById: null,
  });
  for (let n = 1; n <= (fact.rounds ?? 0); n++)
    await CorrectionRound.create({ organizationId: owner.organization.id, filingId: filing.id, number: n, receivedOn: fact.submittedOn });
  for (const result of fact.inspections ?? []) {
    const base = {
      organizationId: owner.organization.id,
      filingId: filing.id,
      kind: fact.kind === "permit" ? "final" : "witness_test",
    } as const;
    const first = await Inspection.create({
      ...base,
      scheduledFor: fact.submittedOn,
      result: result === "failed+passed" ? "failed" : result,
    });
    if (result === "failed+passed")
      await Inspection.create({ ...base, scheduledFor: fact.submittedOn, result: "passed", reinspectionOfId: first.id });
  }
  return project;
}

beforeAll(async () => {
  org = await makeOrganization("Reports");
  rival = await makeOrganization("Rival reports");
  const id = org.organization.id;
  const ahjNamed = (name: string) =>
    Jurisdiction.create({ organizationId: id, name, state: "CO", necEdition: 2023, recordLowTempC: -20, highDesignTempC: 33, notes: "" });
  secondAhj = await ahjNamed(`B second AHJ ${org.tag}`);
  quietAhj = await ahjNamed(`C quiet AHJ ${org.tag}`);
  secondUtility = await Utility.create({
    organizationId: id,
    name: `Second utility ${org.tag}`,
    serviceVoltages: ["120/240 V"],
    notes: "",
  });
  const ahj = org.jurisdiction;
  const utility = org.utility;
  // The first AHJ: five filings in the range, decided after 10, 20, 30 and 40 days, one still in review.
  await addFiling(org, {
    kind: "permit",
    authority: ahj,
    submittedOn: "2026-01-05",
    decidedOn: "2026-01-15",
    status: "approved",
    inspections: ["passed"],
  });
  await addFiling(org, {
    kind: "permit",
    authority: ahj,
    submittedOn: "2026-02-01",
    decidedOn: "2026-02-21",
    status: "approved",
    rounds: 1,
    inspections: ["failed+passed"],
  });
  await addFiling(org, {
    kind: "permit",
    authority: ahj,
    submittedOn: "2026-03-01",
    decidedOn: "2026-03-31",
    status: "approved",
    rounds: 2,
    inspections: ["cancelled", null],
  });
  await addFiling(org, { kind: "permit", authority: ahj, submittedOn: "2026-04-01", decidedOn: "2026-05-11", status: "rejected" });
  await addFiling(org, { kind: "permit", authority: ahj, submittedOn: "2026-05-01", status: "in_review", rounds: 1 });
  // Outside the range (submitted the December before): never counted, though decided inside it.
  await addFiling(org, { kind: "permit", authority: ahj, submittedOn: "2025-12-20", decidedOn: "2026-01-02", status: "approved" });
  await addFiling(org, { kind: "permit", authority: ahj, submittedOn: "2026-07-01", decidedOn: "2026-07-02", status: "approved" });
  // The second AHJ: one filing, three days.
  await addFiling(org, { kind: "permit", authority: secondAhj, submittedOn: "2026-02-10", decidedOn: "2026-02-13", status: "approved" });
  // The first utility: 7, 14 and 3 days; one correction round; its one witness test failed first time.
  await addFiling(org, {
    kind: "interconnection",
    authority: utility,
    submittedOn: "2026-01-10",
    decidedOn: "2026-01-17",
    status: "approved",
  });
  await addFiling(org, {
    kind: "interconnection",
    authority: utility,
    submittedOn: "2026-01-20",
    decidedOn: "2026-02-03",
    status: "approved",
    rounds: 1,
  });
  await addFiling(org, {
    kind: "interconnection",
    authority: utility,
    submittedOn: "2026-03-01",
    decidedOn: "2026-03-04",
    status: "approved",
    inspections: ["failed+passed"],
  });
  // Another company's filing to its own AHJ on the same days: never in this company's report.
  await addFiling(rival, {
    kind: "permit",
    authority: rival.jurisdiction,
    submittedOn: "2026-01-05",
    decidedOn: "2026-06-01",
    status: "approved",
  });
});

afterAll(async () => {
  await closeDb();
});

describe("cycle times", () => {
  it("gives each AHJ its filings' days to decision, first-pass share, rounds and first inspections, worked out by hand", async () => {
    const rows = await listCycleTimes({ viewer: org.viewers.coordinator, groupBy: "ahj", range: RANGE });
    expect(rows).toEqual([
      {
        authorityId: secondAhj.id,
        name: secondAhj.name,
        filings: 1,
        decided: 1,
        medianDays: 3,
        p90Days: 3,
        firstPassRate: 1,
        meanRounds: 0,
        inspectionPassRate: null,
      },
      {
        authorityId: quietAhj.id,
        name: quietAhj.name,
        filings: 0,
        decided: 0,
        medianDays: null,
        p90Days: null,
        firstPassRate: null,
        meanRounds: null,
        inspectionPassRate: null,
      },
      {
        authorityId: org.jurisdiction.id,
        name: org.jurisdiction.name,
        filings: 5,
        decided: 4,
        // days 10, 20, 30, 40: median at position 1.5 → 25; p90 at position 2.7 → 30 + 0.7 × 10 = 37
        medianDays: 25,
        p90Days: 37,
        // of 4 decided, only the first was approved without a round (the 40-day one was rejected)
        firstPassRate: 0.25,
        // rounds 0, 1, 2, 0, 1 over 5 filings
        meanRounds: 0.8,
        // first visits judged: passed, failed (its re-inspection and the cancelled and unbooked ones do not count)
        inspectionPassRate: 0.5,
      },
    ]);
  });

  it("gives each utility its figures the same way, and lists one with no filings", async () => {
    const rows = await listCycleTimes({ viewer: org.viewers.admin, groupBy: "utility", range: RANGE });
    const first = rows.find((r) => r.authorityId === org.utility.id);
    // days 3, 7, 14: median 7; p90 at position 1.8 → 7 + 0.8 × 7 = 12.6
    expect(first).toEqual({
      authorityId: org.utility.id,
      name: org.utility.name,
      filings: 3,
      decided: 3,
      medianDays: 7,
      p90Days: 12.6,
      firstPassRate: 0.6667,
      meanRounds: 0.33,
      inspectionPassRate: 0,
    });
    expect(rows.find((r) => r.authorityId === secondUtility.id)).toMatchObject({ filings: 0, medianDays: null });
    expect(rows).toHaveLength(2);
  });

  it("narrows to the range's days, both ends included", async () => {
    const rows = await listCycleTimes({ viewer: org.viewers.coordinator, groupBy: "ahj", range: { from: "2026-01-05", to: "2026-02-01" } });
    expect(rows.find((r) => r.authorityId === org.jurisdiction.id)).toMatchObject({ filings: 2, decided: 2, medianDays: 15 });
  });

  it("refuses installers", async () => {
    const refused = await listCycleTimes({ viewer: org.viewers.installer, groupBy: "ahj", range: RANGE }).catch((e: unknown) => e);
    expect(refused).toBeInstanceOf(AppError);
    expect((refused as AppError).code).toBe("FORBIDDEN");
  });
});

describe("the reports overview", () => {
  it("takes the median stay in each stage from the timeline and counts active projects by who holds them", async () => {
    const company = await makeOrganization("Stages");
    const viewer = company.viewers.coordinator;
    const at = (iso: string) => new Date(iso);
    const timeline = async (moves: [string, string][], project: Project) => {
      let from: string | null = null;
      for (const [toStage, when] of moves) {
        await StageChange.create({
          organizationId: company.organization.id,
          projectId: project.id,
          fromStage: from as never,
          toStage: toStage as never,
          changedById: null,
          note: "",
          createdAt: at(when),
        });
        from = toStage;
      }
    };
    const one = await makeProject(company, { waitingOn: "ahj" });
    const two = await makeProject(company, { waitingOn: "ahj" });
    const three = await makeProject(company, { waitingOn: "office" });
    await makeProject(company, { waitingOn: "crew", holdState: "on_hold" });
    // Draft stays of 2 and 4 days (median 3); one design-checked stay of 5 days; the last stays are still running.
    await timeline(
      [
        ["draft", "2026-01-01T12:00:00Z"],
        ["design_checked", "2026-01-03T12:00:00Z"],
        ["permit_filed", "2026-01-08T12:00:00Z"],
      ],
      one,
    );
    await timeline(
      [
        ["draft", "2026-01-01T12:00:00Z"],
        ["design_checked", "2026-01-05T12:00:00Z"],
      ],
      two,
    );
    await timeline([["draft", "2026-01-01T12:00:00Z"]], three);
    const overview = await getReportsOverview({ viewer, range: RANGE });
    const stage = (s: string) => overview.stageDurations.find((r) => r.stage === s);
    expect(stage("draft")).toEqual({ stage: "draft", stays: 2, medianDays: 3 });
    expect(stage("design_checked")).toEqual({ stage: "design_checked", stays: 1, medianDays: 5 });
    expect(stage("permit_filed")).toEqual({ stage: "permit_filed", stays: 0, medianDays: null });
    expect(Object.fromEntries(overview.waiting.map((w) => [w.waitingOn, w.projects]))).toEqual({
      office: 1,
      ahj: 2,
      utility: 0,
      customer: 0,
      crew: 0,
      nobody: 0,
    });
    expect(overview.monthlyApprovals.map((m) => m.month)).toEqual(["2026-01", "2026-02", "2026-03", "2026-04", "2026-05", "2026-06"]);
    expect(overview.stageAging.reduce((sum, r) => sum + r.counts.reduce((a, b) => a + b, 0), 0)).toBe(3);
  });

  it("counts approvals by the month they were decided, permits and interconnections apart", async () => {
    const overview = await getReportsOverview({ viewer: org.viewers.coordinator, range: RANGE });
    expect(overview.monthlyApprovals).toEqual([
      { month: "2026-01", permits: 2, interconnections: 1 },
      { month: "2026-02", permits: 2, interconnections: 1 },
      { month: "2026-03", permits: 1, interconnections: 1 },
      { month: "2026-04", permits: 0, interconnections: 0 },
      { month: "2026-05", permits: 0, interconnections: 0 },
      { month: "2026-06", permits: 0, interconnections: 0 },
    ]);
  });
});
