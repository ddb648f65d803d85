import { renderEmail } from "./layout";

export type StageStep = { fromLabel: string; toLabel: string; changedBy: string; note: string };

/**
 * To the people on a project when someone else moves its stage. Moves made within a short while are
 * gathered into one message: every step, in order, then where the project stands now.
 */
export function stageChangedEmail({
  projectNumber,
  customerName,
  siteAddress,
  steps,
  nextAction,
  url,
}: {
  projectNumber: number;
  customerName: string;
  siteAddress: string;
  steps: StageStep[];
  nextAction: string;
  url: string;
}) {
  const last = steps[steps.length - 1]!;
  const subject = `Project ${projectNumber} is now “${last.toLabel}”: ${customerName}`;
  const moves = steps.map((s) => `${s.changedBy} moved it from “${s.fromLabel}” to “${s.toLabel}”.${s.note ? ` Note: ${s.note}` : ""}`);
  const body = renderEmail({
    paragraphs: [
      steps.length === 1
        ? `The PV project at ${siteAddress} changed stage.`
        : `The PV project at ${siteAddress} changed stage ${steps.length} times in a short while.`,
      ...moves,
      `It is now “${last.toLabel}”. Next: ${nextAction}.`,
    ],
    action: { label: "Open the project", url },
  });
  return { subject, ...body };
}
