import type { SignedDocumentKind, SignerRole, SignerStatus } from "./stored-values";

// Pure rules of signature requests: what state a signer's link is in, which block each role signs,
// and whether the name a signer confirms is the name they were asked under.

/** What the coordinator sees of a signer: the stored state, or "expired" for a link left unanswered past its expiry. */
export type SignerState = SignerStatus | "expired";

export function signerState(s: { status: SignerStatus; expiresAt: Date | string | null }, now: Date = new Date()): SignerState {
  if ((s.status === "sent" || s.status === "opened") && s.expiresAt && new Date(s.expiresAt).getTime() <= now.getTime()) return "expired";
  return s.status;
}

/** Whether the link still waits for an answer (the desk lists these). */
export const isAwaitingSignature = (state: SignerState) => state === "sent" || state === "opened";

export const SIGNER_STATE_LABELS: Record<SignerState, string> = {
  sent: "Sent",
  opened: "Opened",
  signed: "Signed",
  declined: "Declined",
  expired: "Expired",
  revoked: "Withdrawn",
};

export const SIGNER_ROLE_LABELS: Record<SignerRole, string> = {
  customer: "Customer",
  "second-owner": "Second owner",
  installer: "Installer",
};

/** The signature block (SIGNATURE_FIELDS key) each role signs in. */
export const SIGNER_BLOCK: Record<SignerRole, "customer" | "secondOwner" | "installer"> = {
  customer: "customer",
  "second-owner": "secondOwner",
  installer: "installer",
};

export const SIGNED_DOCUMENT_LABELS: Record<SignedDocumentKind, string> = {
  "interconnection-application": "Interconnection application",
  "agent-authorization": "Agent authorization letter",
  "completion-certificate": "Certificate of completion",
};

const folded = (name: string) => name.normalize("NFKC").toLocaleLowerCase("en-US").replace(/\s+/g, " ").trim();

/** A confirmed name matches when it differs only in letter case and spacing. */
export const isSameName = (asked: string, confirmed: string) => folded(confirmed) !== "" && folded(asked) === folded(confirmed);

/** Days a signing link stays open unless the coordinator chooses otherwise. */
export const SIGNING_LINK_DAYS = { default: 14, min: 1, max: 60 } as const;
