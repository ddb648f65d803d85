import {
  FILING_KIND_LABELS,
  FILING_STATUS_LABELS,
  SUBMISSION_CHANNEL_LABELS,
  type FilingKind,
  type FilingStatus,
  type SubmissionChannel,
} from "@/lib/domain/filings";
import type { FilingExportRow, LedgerExportRow } from "@/lib/dto/reports";
import { centsToDollarsText } from "@/lib/fees/money";
import type { CsvColumn } from "./write-csv";

/** The filings export: one row per filing submitted in the range, its days as ISO dates. */
export const FILING_CSV_COLUMNS: CsvColumn<FilingExportRow>[] = [
  { header: "Project no.", kind: "number", value: (f) => f.projectNumber },
  { header: "Customer", value: (f) => f.customerName },
  { header: "Address", value: (f) => f.address },
  { header: "Filing", value: (f) => FILING_KIND_LABELS[f.kind as FilingKind] ?? f.kind },
  { header: "Authority", value: (f) => f.authorityName },
  { header: "Status", value: (f) => FILING_STATUS_LABELS[f.status as FilingStatus] ?? f.status },
  { header: "Reference number", value: (f) => f.referenceNumber },
  { header: "Sent by", value: (f) => (f.channel ? (SUBMISSION_CHANNEL_LABELS[f.channel as SubmissionChannel] ?? f.channel) : null) },
  { header: "Sent to", value: (f) => f.sentTo || null },
  { header: "Packet revision", kind: "number", value: (f) => f.packetRevision },
  { header: "Submitted", kind: "date", value: (f) => f.submittedOn },
  { header: "Decided", kind: "date", value: (f) => f.decidedOn },
  { header: "Expires", kind: "date", value: (f) => f.expiresOn },
  { header: "Next follow-up", kind: "date", value: (f) => f.nextFollowUpOn },
  { header: "PTO", kind: "date", value: (f) => f.ptoOn },
  { header: "Correction rounds", kind: "number", value: (f) => f.rounds },
  { header: "Inspections", kind: "number", value: (f) => f.inspections },
  { header: "Inspections passed", kind: "number", value: (f) => f.inspectionsPassed },
];

/** The bookkeeping export: payments and refunds, amounts as decimals with their currency, refunds negative. */
export const LEDGER_CSV_COLUMNS: CsvColumn<LedgerExportRow>[] = [
  { header: "Date", kind: "date", value: (r) => r.day },
  { header: "Entry", value: (r) => (r.entry === "payment" ? "Payment" : "Refund") },
  { header: "Project no.", kind: "number", value: (r) => r.projectNumber },
  { header: "Customer", value: (r) => r.customerName },
  { header: "Receipt number", value: (r) => r.receiptNumber },
  { header: "Processor reference", value: (r) => r.processorReference },
  { header: "Description", value: (r) => r.description || null },
  { header: "Amount", kind: "number", value: (r) => centsToDollarsText(r.amountCents) },
  { header: "Currency", value: (r) => r.currency },
  { header: "Status", value: (r) => r.status.replaceAll("_", " ") },
];
