import "server-only";
import { QueryTypes } from "sequelize";
import { Jurisdiction, Utility } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import {
  INSPECTION_LOOKAHEAD_DAYS,
  PERMIT_LAPSE_NOTICE_DAYS,
  deskFor,
  type Desk,
  type DeskFiling,
  type DeskSignature,
} from "@/lib/domain/desk";
import { SIGNED_DOCUMENT_LABELS, SIGNER_ROLE_LABELS } from "@/lib/domain/signature-requests";
import type { SignedDocumentKind, SignerRole } from "@/lib/domain/stored-values";
import { WITH_THE_AUTHORITY } from "@/lib/domain/filings";
import { addCalendarDays, localIsoDate } from "@/lib/domain/time-zones";
import { AppError } from "@/lib/errors";
import { db } from "../db";
import { getOrganization } from "./organizations";

type DeskFilingRow = Omit<DeskFiling, "usualReviewDays"> & { authorityId: string | null };

// A permit that lapses within the notice period: on the desk unless a final inspection passed.
const LAPSE_CANDIDATE = "(f.kind = 'permit' AND f.status = 'approved' AND f.expires_on <= :lapseHorizon)";

/**
 * The filings on the viewer's desk on `today` as the desk rules read them, with days in the organization's zone.
 * One statement reads only the filings that could be on the desk today (a follow-up due, with the authority,
 * a permit near its expiry, a visit booked within the look-ahead), each with its latest round and its
 * inspections folded in as JSON, so a company's thousands of decided filings are never loaded and no row
 * is built twice. A coordinator's desk covers the projects they coordinate; an admin's, the company's;
 * projects set aside (on hold, cancelled) wait on nobody, so they owe nothing today.
 */
export async function listDeskFilings({
  viewer,
  timeZone,
  today,
}: {
  viewer: Viewer;
  timeZone: string;
  today: string;
}): Promise<DeskFiling[]> {
  const [rows, reviewDays] = await Promise.all([
    db().query<DeskFilingRow>(
      // Visits booked from today through the look-ahead: one small read the filter and the rows share.
      // A filing's latest round matters only while corrections are requested, its visits only when one
      // is booked or its permit nears expiry, so only those rows pay for reading them.
      `WITH booked AS (SELECT DISTINCT filing_id FROM inspections
                        WHERE organization_id = :org AND result IS NULL AND scheduled_for BETWEEN :today AND :lastVisit)
       SELECT f.id AS "filingId", p.id AS "projectId", p.number AS "projectNumber", p.customer_name AS "customerName",
              f.kind, f.authority_name AS "authorityName", f.authority_id AS "authorityId", f.status,
              to_char(f.status_since AT TIME ZONE :zone, 'YYYY-MM-DD') AS "statusSinceDay",
              f.expires_on::text AS "expiresOn", f.next_follow_up_on::text AS "nextFollowUpOn",
              CASE WHEN f.status = 'corrections_requested' THEN
                (SELECT json_build_object('number', r.number, 'receivedOn', r.received_on::text, 'answered', r.answered_at IS NOT NULL,
                          'openItems', (SELECT count(*)::int FROM filing_items i WHERE i.round_id = r.id AND NOT i.resolved))
                   FROM correction_rounds r WHERE r.filing_id = f.id ORDER BY r.number DESC LIMIT 1)
              END AS "latestRound",
              CASE WHEN f.id IN (SELECT filing_id FROM booked) OR ${LAPSE_CANDIDATE} THEN
                COALESCE((SELECT json_agg(json_build_object('id', v.id, 'kind', v.kind, 'scheduledFor', v.scheduled_for::text,
                          'timeWindow', v.time_window, 'result', v.result))
                   FROM inspections v WHERE v.filing_id = f.id), '[]'::json)
              ELSE '[]'::json END AS inspections
         FROM filings f JOIN projects p ON p.id = f.project_id
        WHERE f.organization_id = :org AND p.organization_id = :org
          AND p.hold_state IS NULL AND (:everyone OR p.coordinator_id = :viewerId)
          AND f.status <> 'withdrawn'
          AND (f.next_follow_up_on <= :today
               OR f.status IN (:withTheAuthority)
               OR ${LAPSE_CANDIDATE}
               OR f.id = ANY(ARRAY(SELECT filing_id FROM booked)))`,
      {
        type: QueryTypes.SELECT,
        replacements: {
          zone: timeZone,
          org: viewer.organizationId,
          everyone: viewer.role === "admin",
          viewerId: viewer.id,
          today,
          withTheAuthority: ["corrections_requested", ...WITH_THE_AUTHORITY],
          lapseHorizon: addCalendarDays(today, PERMIT_LAPSE_NOTICE_DAYS),
          lastVisit: addCalendarDays(today, INSPECTION_LOOKAHEAD_DAYS - 1),
        },
      },
    ),
    usualReviewDays(viewer.organizationId),
  ]);
  return rows.map(({ authorityId, ...f }) => ({ ...f, usualReviewDays: authorityId ? (reviewDays.get(authorityId) ?? null) : null }));
}

/** The usual review days of each authority profile of the organization, by id. */
async function usualReviewDays(organizationId: string): Promise<Map<string, number>> {
  const [ahjs, utilities] = await Promise.all([
    Jurisdiction.findAll({ where: { organizationId }, attributes: ["id", "reviewDays"] }),
    Utility.findAll({ where: { organizationId }, attributes: ["id", "reviewDays"] }),
  ]);
  return new Map([...ahjs, ...utilities].map((a) => [a.id, a.reviewDays]));
}

/**
 * What the viewer has to chase on their organization's calendar day (or on `today`, for a test or the
 * digest of a given morning). Admins and coordinators only.
 */
export async function getDesk({
  viewer,
  today,
  now = new Date(),
}: {
  viewer: Viewer;
  today?: string;
  now?: Date;
}): Promise<{ today: string; desk: Desk }> {
  if (!can(viewer, "desk:view")) throw new AppError("FORBIDDEN", "The desk lists the office's work.");
  const { timeZone } = await getOrganization({ viewer });
  const day = today ?? localIsoDate(now.toISOString(), timeZone);
  return { today: day, desk: await deskOf({ viewer, timeZone, today: day }) };
}

/** The desk rules applied to the viewer's filings and unsigned links of one day (the page and the digest agree). */
export async function deskOf({ viewer, timeZone, today }: { viewer: Viewer; timeZone: string; today: string }): Promise<Desk> {
  const [filings, signatures] = await Promise.all([listDeskFilings({ viewer, timeZone, today }), listUnsignedLinks({ viewer, timeZone })]);
  return deskFor(filings, today, signatures);
}

/** How many unsigned links the desk lists at most: the oldest, which need chasing first. */
export const DESK_SIGNATURE_LIMIT = 50;

/**
 * Signing links of the viewer's projects that still wait for their signer (sent or opened, not expired),
 * oldest first: one indexed query with a limit.
 */
export async function listUnsignedLinks({ viewer, timeZone }: { viewer: Viewer; timeZone: string }): Promise<DeskSignature[]> {
  const sequelize = db();
  const own = viewer.role === "admin" ? "" : "and p.coordinator_id = :viewerId";
  const rows = await sequelize.query<{
    signer_id: string;
    project_id: string;
    number: number;
    customer_name: string;
    document_kind: SignedDocumentKind;
    name: string;
    role: SignerRole;
    sent_at: Date;
    expires_at: Date;
    status: string;
  }>(
    `select s.id as signer_id, p.id as project_id, p.number, p.customer_name, r.document_kind, s.name, s.role,
            coalesce(s.reminded_at, s.created_at) as sent_at, s.expires_at, s.status
       from signature_signers s
       join signature_requests r on r.id = s.signature_request_id
       join projects p on p.id = r.project_id
      where s.organization_id = :organizationId and s.status in ('sent','opened') and s.expires_at > now()
        and p.hold_state is null ${own}
      order by sent_at asc
      limit ${DESK_SIGNATURE_LIMIT}`,
    { type: QueryTypes.SELECT, replacements: { organizationId: viewer.organizationId, viewerId: viewer.id } },
  );
  return rows.map((r) => ({
    signerId: r.signer_id,
    projectId: r.project_id,
    projectNumber: r.number,
    customerName: r.customer_name,
    documentTitle: SIGNED_DOCUMENT_LABELS[r.document_kind],
    signerName: r.name,
    roleLabel: SIGNER_ROLE_LABELS[r.role],
    sentDay: localIsoDate(new Date(r.sent_at).toISOString(), timeZone),
    expiresDay: localIsoDate(new Date(r.expires_at).toISOString(), timeZone),
    opened: r.status === "opened",
  }));
}
