import { renderEmail } from "./layout";

export function inspectorLinkEmail({
  organizationName,
  senderName,
  siteAddress,
  revisions,
  note,
  url,
  expiresOn,
}: {
  organizationName: string;
  senderName: string;
  siteAddress: string;
  revisions: string[];
  note: string;
  url: string;
  expiresOn: string;
}) {
  const subject = `Solar PV packet for ${siteAddress}`;
  const body = renderEmail({
    paragraphs: [
      `${senderName} of ${organizationName} shared the paperwork of the grid-tied PV system at ${siteAddress} with you: ${revisions.join(", ")}.`,
      ...(note ? [`Their note: ${note}`] : []),
      `The link below opens a read-only page with the project summary, the single-line diagram and the PDFs. No account is needed. It works until ${expiresOn}.`,
    ],
    action: { label: "Open the packet", url },
  });
  return { subject, ...body };
}
