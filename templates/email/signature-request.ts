import { renderEmail } from "./layout";

/** To a signer: the link to read and sign one document (also sent again as a reminder). */
export function signatureRequestEmail({
  organizationName,
  senderName,
  signerName,
  documentTitle,
  siteAddress,
  url,
  expiresOn,
  reminder,
}: {
  organizationName: string;
  senderName: string;
  signerName: string;
  documentTitle: string;
  siteAddress: string;
  url: string;
  expiresOn: string;
  reminder: boolean;
}) {
  const subject = `${reminder ? "Reminder: " : ""}please sign the ${documentTitle.toLowerCase()} for ${siteAddress}`;
  const body = renderEmail({
    paragraphs: [
      `Hello ${signerName},`,
      `${senderName} of ${organizationName} asks you to sign the ${documentTitle.toLowerCase()} for the solar PV system at ${siteAddress}.`,
      "The link opens the document on any phone or computer. Read it, then sign by drawing or typing your name, or decline and tell us why. No account is needed.",
      `The link is yours alone and works until ${expiresOn}. If you did not expect this message, do not open the link and let ${organizationName} know.`,
    ],
    action: { label: "Read and sign", url },
  });
  return { subject, ...body };
}

/** To a signer once they signed: the signed copy is attached. */
export function signedCopyEmail({
  organizationName,
  documentTitle,
  siteAddress,
}: {
  organizationName: string;
  documentTitle: string;
  siteAddress: string;
}) {
  const subject = `Your signed copy: ${documentTitle.toLowerCase()} for ${siteAddress}`;
  const body = renderEmail({
    paragraphs: [
      `Thank you for signing the ${documentTitle.toLowerCase()} for ${siteAddress}.`,
      `The signed copy is attached. Its last page is the signing record: who signed, when, and the fingerprints that show the pages were not changed afterwards. ${organizationName} has been told.`,
    ],
  });
  return { subject, ...body };
}

/** To the coordinator: a signer answered (signed or declined with a reason). */
export function signingAnsweredEmail({
  signerName,
  roleLabel,
  documentTitle,
  projectNumber,
  siteAddress,
  declineReason,
  url,
}: {
  signerName: string;
  roleLabel: string;
  documentTitle: string;
  projectNumber: number;
  siteAddress: string;
  declineReason: string | null;
  url: string;
}) {
  const what = declineReason === null ? "signed" : "declined to sign";
  const subject = `${signerName} ${what} the ${documentTitle.toLowerCase()}: project ${projectNumber}`;
  const body = renderEmail({
    paragraphs: [
      `${signerName} (${roleLabel.toLowerCase()}) ${what} the ${documentTitle.toLowerCase()} for ${siteAddress}.`,
      ...(declineReason === null ? ["The signed copy is on the project's Documents page."] : [`Their reason: ${declineReason}`]),
    ],
    action: { label: "Open the project's documents", url },
  });
  return { subject, ...body };
}
