import type { SignerState } from "@/lib/domain/signature-requests";
import type { SignatureMarkKind, SignedDocumentKind, SignerChannel, SignerRole } from "@/lib/domain/stored-values";

export type SignatureSignerDto = {
  id: string;
  role: SignerRole;
  roleLabel: string;
  channel: SignerChannel;
  name: string;
  email: string;
  state: SignerState;
  stateLabel: string;
  expiresAt: string | null;
  declineReason: string;
  markKind: SignatureMarkKind | null;
  openedAt: string | null;
  answeredAt: string | null;
  remindedAt: string | null;
};

export type SignatureRequestDto = {
  id: string;
  documentKind: SignedDocumentKind;
  title: string;
  packetId: string | null;
  createdBy: string | null;
  createdAt: string;
  /** When the last signature was added; null while nobody has signed. */
  signedAt: string | null;
  signers: SignatureSignerDto[];
};

/** What the public signing page shows. */
export type SigningView = {
  organizationName: string;
  timeZone: string;
  documentTitle: string;
  siteAddress: string;
  signerName: string;
  roleLabel: string;
  state: "open" | "signed" | "declined";
  expiresAt: string | null;
  pageCount: number;
  signedAt: string | null;
  declineReason: string;
};
