import { renderEmail } from "./layout";

/** To the project's coordinator when the installer sends back the signed completion form. */
export function completionReceivedEmail({
  installerName,
  projectNumber,
  siteAddress,
  fileName,
  commissioning,
  url,
}: {
  installerName: string;
  projectNumber: number;
  siteAddress: string;
  fileName: string;
  commissioning: string;
  url: string;
}) {
  const subject = `Signed completion form received: project ${projectNumber}, ${siteAddress}`;
  const body = renderEmail({
    paragraphs: [
      `${installerName} uploaded the signed certificate of completion for the PV system at ${siteAddress} (${fileName}).`,
      `Commissioning record: ${commissioning}`,
      "Review the form and the readings, then move the project to its next stage.",
    ],
    action: { label: "Open the field record", url },
  });
  return { subject, ...body };
}
