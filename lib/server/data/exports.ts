import "server-only";
import { QueryTypes } from "sequelize";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { FilingExportRow, LedgerExportRow } from "@/lib/dto/reports";
import { db } from "../db";

/** The most rows one spreadsheet export holds; a wider range is refused rather than cut short without a word. */
export const EXPORT_ROW_LIMIT = 10_000;

function assertMayExport(viewer: Viewer) {
  if (!can(viewer, "reports:view")) throw new AppError("FORBIDDEN", "Spreadsheet exports are for the office: admins and coordinators.");
}

function assertWithinLimit(rows: unknown[]) {
  if (rows.length > EXPORT_ROW_LIMIT)
    throw new AppError("TOO_LARGE", `The export holds more than ${EXPORT_ROW_LIMIT} rows; choose a shorter range of days.`);
}

type Range = { from: string; to: string };

/** Filings submitted in the range (both ends included), with their dates, rounds and inspections, oldest first. */
export async function listFilingsForExport({ viewer, range }: { viewer: Viewer; range: Range }): Promise<FilingExportRow[]> {
  assertMayExport(viewer);
  const rows = await db().query<FilingExportRow>(
    `SELECT p.number AS "projectNumber", p.customer_name AS "customerName",
            p.street || ', ' || p.city || ', ' || p.state || ' ' || p.postal_code AS address,
            f.kind, f.authority_name AS "authorityName", f.status, f.reference_number AS "referenceNumber",
            f.channel, f.sent_to AS "sentTo", k.revision AS "packetRevision",
            to_char(f.submitted_on, 'YYYY-MM-DD') AS "submittedOn", to_char(f.decided_on, 'YYYY-MM-DD') AS "decidedOn",
            to_char(f.expires_on, 'YYYY-MM-DD') AS "expiresOn", to_char(f.next_follow_up_on, 'YYYY-MM-DD') AS "nextFollowUpOn",
            to_char(f.pto_on, 'YYYY-MM-DD') AS "ptoOn",
            (SELECT count(*)::int FROM correction_rounds r WHERE r.filing_id = f.id) AS rounds,
            (SELECT count(*)::int FROM inspections i WHERE i.filing_id = f.id) AS inspections,
            (SELECT count(*)::int FROM inspections i WHERE i.filing_id = f.id AND i.result = 'passed') AS "inspectionsPassed"
       FROM filings f
       JOIN projects p ON p.id = f.project_id
       LEFT JOIN packets k ON k.id = f.packet_id
      WHERE f.organization_id = :org AND f.submitted_on BETWEEN :from AND :to
      ORDER BY f.submitted_on, p.number, f.kind
      LIMIT :limit`,
    { type: QueryTypes.SELECT, replacements: { org: viewer.organizationId, from: range.from, to: range.to, limit: EXPORT_ROW_LIMIT + 1 } },
  );
  assertWithinLimit(rows);
  return rows;
}

/**
 * Payments received and refunds given in the range, by the day they happened in the organization's
 * zone: payments by the day they were paid (pending and expired ones never were), refunds by the day they
 * were asked of the processor, with their status. Amounts in cents; refunds count against the books.
 */
export async function listLedgerForExport({
  viewer,
  range,
  timeZone,
}: {
  viewer: Viewer;
  range: Range;
  timeZone: string;
}): Promise<LedgerExportRow[]> {
  assertMayExport(viewer);
  const rows = await db().query<LedgerExportRow>(
    `SELECT * FROM (
       SELECT to_char((pay.paid_at AT TIME ZONE :zone)::date, 'YYYY-MM-DD') AS day, 'payment' AS entry, p.number AS "projectNumber",
              p.customer_name AS "customerName", pay.receipt_number AS "receiptNumber", pay.payment_intent_id AS "processorReference",
              coalesce((SELECT string_agg(l.name, '; ' ORDER BY l.name) FROM payment_lines l WHERE l.payment_id = pay.id), '') AS description,
              pay.amount_cents::bigint AS "amountCents", upper(pay.currency) AS currency, pay.status, pay.paid_at AS at
         FROM payments pay JOIN projects p ON p.id = pay.project_id
        WHERE pay.organization_id = :org AND pay.paid_at IS NOT NULL
          AND (pay.paid_at AT TIME ZONE :zone)::date BETWEEN :from AND :to
       UNION ALL
       SELECT to_char((r.created_at AT TIME ZONE :zone)::date, 'YYYY-MM-DD'), 'refund', p.number, p.customer_name, pay.receipt_number,
              r.processor_refund_id, coalesce(r.reason, ''), -r.amount_cents::bigint, upper(pay.currency), r.status, r.created_at
         FROM refunds r JOIN payments pay ON pay.id = r.payment_id JOIN projects p ON p.id = pay.project_id
        WHERE pay.organization_id = :org AND (r.created_at AT TIME ZONE :zone)::date BETWEEN :from AND :to
     ) ledger
     ORDER BY at, entry
     LIMIT :limit`,
    {
      type: QueryTypes.SELECT,
      replacements: { org: viewer.organizationId, zone: timeZone, from: range.from, to: range.to, limit: EXPORT_ROW_LIMIT + 1 },
    },
  );
  assertWithinLimit(rows);
  // pg returns BIGINT as text; cents below 2^53 are exact as numbers. The sort key stays behind.
  return rows.map(({ at: _at, ...r }: LedgerExportRow & { at?: unknown }) => ({ ...r, amountCents: Number(r.amountCents) }));
}
