import { z } from "zod";
import { FILING_STATUSES, INSPECTION_KINDS, INSPECTION_RESULTS, SUBMISSION_CHANNELS } from "@/lib/domain/filings";
import { blankToUndefined, optionalText, requiredText, safeString, whenValid } from "./fields";

const uuid = (what: string) => safeString().uuid(`Choose ${what}`);
/** A calendar day as the form's date input gives it. */
const day = (label: string) =>
  safeString()
    .trim()
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Enter the ${label} as a date`)
    .refine((v) => !Number.isNaN(Date.parse(`${v}T00:00:00Z`)), `Enter the ${label} as a real date`);
const optionalDay = (label: string) => z.preprocess(blankToUndefined, day(label).optional());
const optionalUuid = (what: string) => z.preprocess(blankToUndefined, uuid(what).optional());

export const ChangeFilingStatusInput = z.object({
  filingId: uuid("a filing"),
  status: z.enum(FILING_STATUSES, { error: "Choose a status" }),
  on: optionalDay("date"),
  referenceNumber: z.preprocess(blankToUndefined, safeString().trim().max(80, "At most 80 characters").optional()),
  packetId: optionalUuid("a packet revision"),
  channel: z.preprocess(blankToUndefined, z.enum(SUBMISSION_CHANNELS, { error: "Choose how it was sent" }).optional()),
  sentTo: optionalText(200),
  note: optionalText(1000),
  /** Why an interconnection application goes without the customer's completed signature (audited). */
  unsignedReason: safeString().trim().max(1000, "At most 1000 characters").optional(),
});
export type ChangeFilingStatusInput = z.infer<typeof ChangeFilingStatusInput>;

export const FilingDetailsInput = z.object({
  filingId: uuid("a filing"),
  referenceNumber: z.preprocess(blankToUndefined, safeString().trim().max(80, "At most 80 characters").optional()),
  nextFollowUpOn: optionalDay("follow-up date"),
  paymentId: optionalUuid("a payment"),
  waitingOnCustomer: z.boolean().default(false),
  notes: optionalText(2000),
});
export type FilingDetailsInput = z.infer<typeof FilingDetailsInput>;

const ItemInput = z.object({ text: requiredText("comment", 2000), reference: optionalText(120) });

export const RecordRoundInput = z.object({
  filingId: uuid("a filing"),
  receivedOn: day("date received"),
  letterFileId: optionalUuid("the comment letter"),
  items: z.array(ItemInput).min(1, "Enter at least one comment").max(100, "At most 100 comments in a round"),
});
export type RecordRoundInput = z.infer<typeof RecordRoundInput>;

export const AttachLetterInput = z.object({ roundId: uuid("a correction round"), letterFileId: uuid("the comment letter") });
export type AttachLetterInput = z.infer<typeof AttachLetterInput>;

export const AnswerItemInput = z.object({
  itemId: uuid("a comment"),
  response: requiredText("response", 2000),
  designRevision: z.preprocess(
    blankToUndefined,
    z.coerce.number({ error: "The design revision must be a number" }).int().min(1).max(10_000).optional(),
  ),
});
export type AnswerItemInput = z.infer<typeof AnswerItemInput>;

export const ScheduleInspectionInput = z.object({
  filingId: uuid("a filing"),
  kind: z.enum(INSPECTION_KINDS, { error: "Choose the kind of inspection" }),
  scheduledFor: day("inspection date"),
  timeWindow: optionalText(40),
  inspectorName: optionalText(120),
  reinspectionOfId: optionalUuid("the inspection this repeats"),
});
export type ScheduleInspectionInput = z.infer<typeof ScheduleInspectionInput>;

export const InspectionResultInput = z.object({
  inspectionId: uuid("an inspection"),
  result: z.enum(INSPECTION_RESULTS, { error: "Choose the result" }),
  resultOn: day("date of the result"),
  inspectorName: optionalText(120),
  notes: optionalText(2000),
  items: z.array(ItemInput).max(100, "At most 100 corrections").default([]),
});
export type InspectionResultInput = z.infer<typeof InspectionResultInput>;

export const RecordPtoInput = z.object({ filingId: uuid("a filing"), ptoOn: day("PTO date") });
export type RecordPtoInput = z.infer<typeof RecordPtoInput>;

/** Who approves an added filing: one of the organization's AHJ or utility profiles, or another body named here. */
export const ADDED_FILING_AUTHORITY = /^(other|jurisdiction:[0-9a-f-]{36}|utility:[0-9a-f-]{36})$/;

export const AddFilingInput = z
  .object({
    projectId: uuid("a project"),
    title: requiredText("approval", 160),
    authority: safeString().regex(ADDED_FILING_AUTHORITY, "Choose who approves it"),
    authorityName: optionalText(160),
  })
  .refine((v) => v.authority !== "other" || v.authorityName.length > 0, {
    path: ["authorityName"],
    message: "Name the body that approves it",
    when: whenValid("authority", "authorityName"),
  });
export type AddFilingInput = z.infer<typeof AddFilingInput>;
