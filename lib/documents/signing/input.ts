// What signing a generated document needs: where each signature goes, what the signer made, and the
// evidence the signing record page prints. Shared by the signing link, the field record's phone signing
// and their tests.

/** A drawn signature (the pad's PNG) or a name typed as the signature. */
export type SignatureMark = { kind: "drawn"; png: Uint8Array } | { kind: "typed"; name: string };

/** A signature block's box on a page of the original, in PDF points from the page's lower-left corner. */
export type SignatureBox = { pageIndex: number; x: number; y: number; width: number; height: number };

/** One signer's signature and what the record says about it. */
export type SignerEvidence = {
  /** The block they sign as: "Customer", "Second owner", "Installer". */
  role: string;
  name: string;
  email: string;
  /** ISO instant of the signature; printed in the organization's zone. */
  signedAt: string;
  /** ISO instant they agreed to sign electronically, and the sentence they agreed to. */
  consentedAt: string;
  consent: string;
  address: string;
  userAgent: string;
  mark: SignatureMark;
  box: SignatureBox;
  /** The form field the signature replaces, taken off the signed copy (see findSignatureBlocks). */
  field?: string;
};

export type SigningInput = {
  documentTitle: string;
  organizationName: string;
  timeZone: string;
  signers: SignerEvidence[];
};

/** The signed file and the fingerprints the record page prints and the database keeps. */
export type SignedDocument = {
  bytes: Uint8Array;
  /** SHA-256 of the original as generated; the original file stays unchanged. */
  sha256Original: string;
  /** SHA-256 of the signed pages before the record page was added (printed on the record page). */
  sha256Signed: string;
  /** SHA-256 of the whole file handed out, record page included (kept in the database, not printable in itself). */
  sha256Final: string;
  pageCount: number;
};
