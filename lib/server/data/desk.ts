import "server-only";
import { Op, QueryTypes, type WhereOptions } from "sequelize";
import { CorrectionRound, Filing, FilingItem, Inspection, Jurisdiction, Project, Utility } from "@/models";
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

/** A coordinator's desk covers the projects they coordinate; an admin's, the whole company's. */
function projectsOnDesk(viewer: Viewer): WhereOptions<Project> {
  const own = viewer.role === "admin" ? {} : { coordinatorId: viewer.id };
  // Projects set aside (on hold, cancelled) wait on nobody, so they owe nothing today.
  return { organizationId: viewer.organizationId, holdState: null, ...own };
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
 * The filings that could be on the desk on `today`: a follow-up due, with the authority (corrections, review
 * time), a permit near its expiry, or a visit booked within the look-ahead. Read in SQL, so a company's
 * thousands of decided filings are never loaded; the desk rules then decide on exactly these.
 */
function mayBeOnDesk(today: string): WhereOptions<Filing> {
  const sequelize = db();
  const [lastVisit, lapseHorizon] = [
    addCalendarDays(today, INSPECTION_LOOKAHEAD_DAYS - 1),
    addCalendarDays(today, PERMIT_LAPSE_NOTICE_DAYS),
  ];
  return {
    status: { [Op.ne]: "withdrawn" },
    [Op.or]: [
      { nextFollowUpOn: { [Op.lte]: today } },
      { status: { [Op.in]: ["corrections_requested", ...WITH_THE_AUTHORITY] } },
      { kind: "permit", status: "approved", expiresOn: { [Op.lte]: lapseHorizon } },
      {
        id: {
          [Op.in]: sequelize.literal(
            `(select filing_id from inspections where result is null and scheduled_for between ${sequelize.escape(today)} and ${sequelize.escape(lastVisit)})`,
          ),
        },
      },
    ],
  };
}

/** The filings on the viewer's desk on `today` as the desk rules read them, with days in the organization's zone. */
export async function listDeskFilings({
  viewer,
  timeZone,
  today,
}: {
  viewer: Viewer;
  timeZone: string;
  today: string;
}): Promise<DeskFiling[]> {
  db();
  const [projects, reviewDays] = await Promise.all([
    Project.findAll({
      where: projectsOnDesk(viewer),
      attributes: ["id", "number", "customerName"],
      include: [
        {
          model: Filing,
          as: "filings",
          required: true,
          where: mayBeOnDesk(today),
          include: [
            { model: CorrectionRound, as: "rounds", include: [{ model: FilingItem, as: "items", attributes: ["id", "resolved"] }] },
            { model: Inspection, as: "inspections", attributes: ["id", "kind", "scheduledFor", "timeWindow", "result"] },
          ],
        },
      ],
    }),
    usualReviewDays(viewer.organizationId),
  ]);
  return projects.flatMap((p) =>
    (p.filings ?? []).map((f) => {
      const round = [...(f.rounds ?? [])].sort((a, b) => b.number - a.number)[0];
      return {
        filingId: f.id,
        projectId: p.id,
        projectNumber: p.number,
        customerName: p.customerName,
        kind: f.kind,
        authorityName: f.authorityName,
        status: f.status,
        statusSinceDay: localIsoDate(f.statusSince.toISOString(), timeZone),
        expiresOn: f.expiresOn,
        nextFollowUpOn: f.nextFollowUpOn,
        usualReviewDays: f.authorityId ? (reviewDays.get(f.authorityId) ?? null) : null,
        latestRound: round
          ? {
              number: round.number,
              receivedOn: round.receivedOn,
              answered: round.answeredAt !== null,
              openItems: (round.items ?? []).filter((i) => !i.resolved).length,
            }
          : null,
        inspections: (f.inspections ?? []).map((i) => ({
          id: i.id,
          kind: i.kind,
          scheduledFor: i.scheduledFor,
          timeWindow: i.timeWindow,
          result: i.result,
        })),
      } satisfies DeskFiling;
    }),
  );
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
