// The value sets and JSON shapes the database's columns hold, named once. Models take their
// column types from here and from nowhere else in lib; DTOs, schemas and screens name the same
// sets. Types and constant lists only: no rules, no imports that run.

export type { Role } from "./roles";
export type { Stage } from "./stages";
export type { NecEdition } from "@/lib/engineering/types";
export type { FeeAuthorityKind } from "@/lib/fees/types";
export type { AuthorityKind } from "./authorities";

export const EQUIPMENT_KINDS = ["module", "inverter", "device", "battery"] as const;
export type EquipmentKind = (typeof EQUIPMENT_KINDS)[number];

export const PACKET_KINDS = ["permit", "interconnection"] as const;
export type PacketKind = (typeof PACKET_KINDS)[number];

export type PacketStatus = "queued" | "running" | "ready" | "failed";
/** One step of a generation as the worker recorded it when starting it. */
export type PacketStepRecord = { at: string; progress: number; text: string };

/** The outcome of a design's last review, kept with the design. */
export type ReviewStatus = "incomplete" | "pass" | "warn" | "fail";

export type CommissioningStatus = "open" | "complete";

export const PROJECT_FILE_KINDS = ["signed-completion", "site-photo", "comment-letter"] as const;
export type ProjectFileKind = (typeof PROJECT_FILE_KINDS)[number];

export const PAYMENT_STATUSES = ["pending", "paid", "expired", "partially_refunded", "refunded"] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];

export type RefundStatus = "pending" | "succeeded" | "failed";

export type OutboxStatus = "queued" | "sent" | "failed";
/** A stored file sent along with the message; the worker reads it from storage when it sends. */
export type OutboxAttachment = { fileName: string; objectKey: string; contentType: string };

export type ShareLinkAccessKind = "view" | "download";

/** An audit event's before/after pairs, by field. */
export type AuditChanges = Record<string, { before: unknown; after: unknown }>;

export type { FilingKind, FilingStatus, SubmissionChannel, InspectionKind, InspectionResult, WaitingParty } from "./filings";
/** A project set aside: on hold (it comes back) or cancelled (with a reason). */
export type HoldState = "on_hold" | "cancelled";
/** Whether a stage change came from the office's hand or from the facts of the filings. */
export type StageChangeCause = "hand" | "facts";

/** What a signature request asks to be signed: a packet revision's application, the agent letter, or the certificate. */
export const SIGNED_DOCUMENT_KINDS = ["interconnection-application", "agent-authorization", "completion-certificate"] as const;
export type SignedDocumentKind = (typeof SIGNED_DOCUMENT_KINDS)[number];

/** Whose signature a signer gives, and so which block of the document they sign. */
export const SIGNER_ROLES = ["customer", "second-owner", "installer"] as const;
export type SignerRole = (typeof SIGNER_ROLES)[number];

/** A signer's stored state; "expired" is not stored, it follows from the expiry of a link not yet answered. */
export const SIGNER_STATUSES = ["sent", "opened", "signed", "declined", "revoked"] as const;
export type SignerStatus = (typeof SIGNER_STATUSES)[number];

/** How the signer was reached: their own link, or in person on a signed-in phone. */
export type SignerChannel = "link" | "in-person";

export type SignatureMarkKind = "drawn" | "typed";

export type SigningAccessKind = "view" | "page" | "download" | "sign" | "decline";
