import { renderEmail } from "./layout";

/** To the people on a project when someone else moves it to another stage. */
export function stageChangedEmail({ changedBy, projectNumber, customerName, siteAddress, fromLabel, toLabel, nextAction, note, url }: { changedBy: string; projectNumber: number; customerName: string; siteAddress: string; fromLabel: string; toLabel: string; nextAction: string; note: string; url: string }) {
  const subject = `Project ${projectNumber} is now “${toLabel}”: ${customerName}`;
  const body = renderEmail({
    paragraphs: [
      `${changedBy} moved the PV project at ${siteAddress} from “${fromLabel}” to “${toLabel}”.`,
      ...(note ? [`Note: ${note}`] : []),
      `Next: ${nextAction}.`,
    ],
    action: { label: "Open the project", url },
  });
  return { subject, ...body };
}
