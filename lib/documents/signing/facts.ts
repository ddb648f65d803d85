import { longDateTime } from "../text";
import type { SigningInput } from "./input";

// The lines the signing record page prints, computed here so the template only lays them out and the
// tests can check the same strings.

export type SigningRecordFacts = {
  title: string;
  intro: string;
  fingerprints: { label: string; value: string }[];
  signers: { heading: string; rows: { label: string; value: string }[] }[];
};

const METHOD: Record<"drawn" | "typed", string> = { drawn: "Drawn on screen", typed: "Typed name" };

export function signingRecordFacts(input: SigningInput, hashes: { sha256Original: string; sha256Signed: string }): SigningRecordFacts {
  return {
    title: "Signing record",
    intro: `${input.documentTitle}, signed electronically through ${input.organizationName}'s document portal. Times are in ${input.timeZone}.`,
    fingerprints: [
      { label: "SHA-256 of the document as generated, before signing", value: hashes.sha256Original },
      { label: "SHA-256 of the signed pages, before this record was added", value: hashes.sha256Signed },
    ],
    signers: input.signers.map((s) => ({
      heading: `${s.role}: ${s.name}`,
      rows: [
        { label: "E-mail", value: s.email || "Not given" },
        { label: "Signed", value: longDateTime(s.signedAt, input.timeZone) },
        { label: "Signature", value: METHOD[s.mark.kind] },
        { label: "Agreed to sign electronically", value: longDateTime(s.consentedAt, input.timeZone) },
        { label: "Agreement read", value: s.consent },
        { label: "Network address", value: s.address || "Not recorded" },
        { label: "Browser", value: s.userAgent || "Not recorded" },
      ],
    })),
  };
}
