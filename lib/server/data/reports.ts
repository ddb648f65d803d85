import "server-only";
import { QueryTypes } from "sequelize";
import { can, type Viewer } from "@/lib/domain/permissions";
import { STAGES, type Stage } from "@/lib/domain/stages";
import { WAITING_PARTIES } from "@/lib/domain/filings";
import { localIsoDate } from "@/lib/domain/time-zones";
import { AppError } from "@/lib/errors";
import { monthsOf, resolveRange } from "@/lib/reports/range";
import type { ReportGroup } from "@/lib/schemas/reports";
import {
  AGE_BUCKETS,
  type CycleTimeRow,
  type MonthlyApprovalsRow,
  type ReportsOverview,
  type StageAgingRow,
  type StageDurationRow,
  type WaitingCountRow,
} from "@/lib/dto/reports";
import { db } from "../db";
import { getOrganization } from "./organizations";

type Range = { from: string; to: string };

function assertMayReport(viewer: Viewer) {
  if (!can(viewer, "reports:view")) throw new AppError("FORBIDDEN", "Reports are for the office: admins and coordinators.");
}

/** The range with its blank ends filled from today in the organization's zone. */
export async function reportRange({ viewer, range }: { viewer: Viewer; range: Range }): Promise<Range> {
  const { timeZone } = await getOrganization({ viewer });
  return resolveRange(range, localIsoDate(new Date().toISOString(), timeZone));
}

const AUTHORITY = {
  ahj: { table: "jurisdictions", kind: "jurisdiction" },
  utility: { table: "utilities", kind: "utility" },
} as const satisfies Record<ReportGroup, { table: string; kind: string }>;

const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));

/**
 * Days from submitted to decided per authority for the filings submitted in the range (both ends
 * included), with every authority of the organization listed. Medians and the 90th percentile are
 * PostgreSQL's percentile_cont (linear between neighbours); the first-pass rate is the share of decided
 * filings approved without a correction round; the mean rounds counts every filing submitted; the
 * inspection pass rate counts first visits only (not re-inspections) that have a pass, fail or partial result.
 */
export async function listCycleTimes({
  viewer,
  groupBy,
  range,
}: {
  viewer: Viewer;
  groupBy: ReportGroup;
  range: Range;
}): Promise<CycleTimeRow[]> {
  assertMayReport(viewer);
  const { table, kind } = AUTHORITY[groupBy];
  const rows = await db().query<Record<string, unknown>>(
    `WITH f AS (
       SELECT f.id, f.authority_id, f.status, f.submitted_on, f.decided_on,
              (SELECT count(*) FROM correction_rounds r WHERE r.filing_id = f.id) AS rounds
         FROM filings f
        WHERE f.organization_id = :org AND f.authority_kind = :kind AND f.submitted_on BETWEEN :from AND :to
     ), firsts AS (
       SELECT f.authority_id,
              count(*) FILTER (WHERE i.result IN ('passed', 'failed', 'partial')) AS judged,
              count(*) FILTER (WHERE i.result = 'passed') AS passed
         FROM f JOIN inspections i ON i.filing_id = f.id AND i.reinspection_of_id IS NULL
        GROUP BY f.authority_id
     )
     SELECT a.id AS "authorityId", a.name,
            count(f.id)::int AS filings,
            count(f.decided_on)::int AS decided,
            round(percentile_cont(0.5) WITHIN GROUP (ORDER BY f.decided_on - f.submitted_on)::numeric, 1) AS "medianDays",
            round(percentile_cont(0.9) WITHIN GROUP (ORDER BY f.decided_on - f.submitted_on)::numeric, 1) AS "p90Days",
            round(count(*) FILTER (WHERE f.decided_on IS NOT NULL AND f.status = 'approved' AND f.rounds = 0)::numeric
                  / nullif(count(f.decided_on), 0), 4) AS "firstPassRate",
            round(avg(f.rounds), 2) AS "meanRounds",
            round(max(firsts.passed)::numeric / nullif(max(firsts.judged), 0), 4) AS "inspectionPassRate"
       FROM ${table} a
       LEFT JOIN f ON f.authority_id = a.id
       LEFT JOIN firsts ON firsts.authority_id = a.id
      WHERE a.organization_id = :org
      GROUP BY a.id, a.name
      ORDER BY a.name, a.id`,
    { type: QueryTypes.SELECT, replacements: { org: viewer.organizationId, kind, from: range.from, to: range.to } },
  );
  return rows.map((r) => ({
    authorityId: String(r.authorityId),
    name: String(r.name),
    filings: Number(r.filings),
    decided: Number(r.decided),
    medianDays: num(r.medianDays),
    p90Days: num(r.p90Days),
    firstPassRate: num(r.firstPassRate),
    meanRounds: num(r.meanRounds),
    inspectionPassRate: num(r.inspectionPassRate),
  }));
}

/**
 * The median days a project stayed in each stage, from the stage timeline: a stay runs from one change
 * to the project's next, and counts when it ended within the range (in the organization's zone).
 */
async function listStageDurations(viewer: Viewer, range: Range, timeZone: string): Promise<StageDurationRow[]> {
  const rows = await db().query<{ stage: Stage; stays: number; medianDays: string | null }>(
    `WITH stays AS (
       SELECT s.to_stage AS stage, s.created_at AS began,
              lead(s.created_at) OVER (PARTITION BY s.project_id ORDER BY s.created_at, s.id) AS ended
         FROM stage_changes s
        WHERE s.organization_id = :org
     )
     SELECT stage, count(*)::int AS stays,
            round(percentile_cont(0.5) WITHIN GROUP (ORDER BY extract(epoch FROM ended - began) / 86400)::numeric, 1) AS "medianDays"
       FROM stays
      WHERE ended IS NOT NULL AND (ended AT TIME ZONE :zone)::date BETWEEN :from AND :to
      GROUP BY stage`,
    { type: QueryTypes.SELECT, replacements: { org: viewer.organizationId, zone: timeZone, from: range.from, to: range.to } },
  );
  const byStage = new Map(rows.map((r) => [r.stage, r]));
  return STAGES.map((stage) => ({ stage, stays: byStage.get(stage)?.stays ?? 0, medianDays: num(byStage.get(stage)?.medianDays) }));
}

/** Active projects (neither on hold nor cancelled) by who holds them now; "nobody" once PTO is in. */
async function listWaitingCounts(viewer: Viewer): Promise<WaitingCountRow[]> {
  const rows = await db().query<{ waitingOn: string | null; projects: number }>(
    `SELECT waiting_on AS "waitingOn", count(*)::int AS projects
       FROM projects WHERE organization_id = :org AND hold_state IS NULL GROUP BY waiting_on`,
    { type: QueryTypes.SELECT, replacements: { org: viewer.organizationId } },
  );
  const count = (party: string | null) => rows.find((r) => r.waitingOn === party)?.projects ?? 0;
  return [...WAITING_PARTIES.map((w) => ({ waitingOn: w, projects: count(w) })), { waitingOn: "nobody" as const, projects: count(null) }];
}

/** Approvals per month of the range, permits and interconnection applications apart. */
async function listMonthlyApprovals(viewer: Viewer, range: Range): Promise<MonthlyApprovalsRow[]> {
  const rows = await db().query<{ month: string; kind: string; approvals: number }>(
    `SELECT to_char(decided_on, 'YYYY-MM') AS month, kind, count(*)::int AS approvals
       FROM filings
      WHERE organization_id = :org AND status = 'approved' AND decided_on BETWEEN :from AND :to
      GROUP BY 1, 2`,
    { type: QueryTypes.SELECT, replacements: { org: viewer.organizationId, from: range.from, to: range.to } },
  );
  const count = (month: string, kind: string) => rows.find((r) => r.month === month && r.kind === kind)?.approvals ?? 0;
  return monthsOf(range).map((month) => ({ month, permits: count(month, "permit"), interconnections: count(month, "interconnection") }));
}

/** Active projects by their current stage and how many whole days they have been in it, in the buckets of AGE_BUCKETS. */
async function listStageAging(viewer: Viewer): Promise<StageAgingRow[]> {
  const rows = await db().query<{ stage: Stage; bucket: number; projects: number }>(
    `SELECT stage, width_bucket(floor(extract(epoch FROM now() - stage_changed_at) / 86400)::int, ARRAY[8, 31, 91]) AS bucket,
            count(*)::int AS projects
       FROM projects
      WHERE organization_id = :org AND hold_state IS NULL AND stage NOT IN ('pto_received', 'closed')
      GROUP BY 1, 2`,
    { type: QueryTypes.SELECT, replacements: { org: viewer.organizationId } },
  );
  return STAGES.filter((s) => s !== "pto_received" && s !== "closed").map((stage) => ({
    stage,
    counts: AGE_BUCKETS.map((_, i) => rows.find((r) => r.stage === stage && Number(r.bucket) === i)?.projects ?? 0),
  }));
}

/** Everything the Reports page draws, for one range of days. */
export async function getReportsOverview({ viewer, range }: { viewer: Viewer; range: Range }): Promise<ReportsOverview> {
  assertMayReport(viewer);
  const { timeZone } = await getOrganization({ viewer });
  const resolved = resolveRange(range, localIsoDate(new Date().toISOString(), timeZone));
  const [ahj, utility, stageDurations, waiting, monthlyApprovals, stageAging] = await Promise.all([
    listCycleTimes({ viewer, groupBy: "ahj", range: resolved }),
    listCycleTimes({ viewer, groupBy: "utility", range: resolved }),
    listStageDurations(viewer, resolved, timeZone),
    listWaitingCounts(viewer),
    listMonthlyApprovals(viewer, resolved),
    listStageAging(viewer),
  ]);
  return { ...resolved, ahj, utility, stageDurations, waiting, monthlyApprovals, stageAging };
}
