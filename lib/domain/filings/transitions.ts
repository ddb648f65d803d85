import { FILING_STATUS_LABELS, NEXT_STATUSES, type FilingKind, type FilingStatus } from "./statuses";

/** What a status change needs to know about the filing as it stands and what the user entered. */
export type FilingChange = {
  kind: FilingKind;
  from: FilingStatus;
  to: FilingStatus;
  referenceNumber: string | null;
  packetRevision: number | null;
  /** Every item of the latest correction round has a response (true when there is no round). */
  latestRoundAnswered: boolean;
  /** The packet revision the authority had when it sent the latest round, if any. */
  revisionAtLatestRound: number | null;
};

/** The field each refusal is about, so a form can show it beside the input. */
export type FilingChangeProblem = { field: "status" | "referenceNumber" | "packetRevision" | "rounds"; message: string };

/**
 * Why a filing may not move to a status, or null when it may. The permit and the interconnection
 * application go in with a packet revision; nothing is approved without the authority's number; a
 * resubmission answers every item of the open round and sends no older revision than the one that drew it.
 */
export function filingChangeProblem(change: FilingChange): FilingChangeProblem | null {
  const { from, to } = change;
  if (from === to) return { field: "status", message: `The filing is already ${FILING_STATUS_LABELS[to].toLowerCase()}.` };
  if (!NEXT_STATUSES[from].includes(to)) {
    return {
      field: "status",
      message: `A filing that is ${FILING_STATUS_LABELS[from].toLowerCase()} cannot become ${FILING_STATUS_LABELS[to].toLowerCase()}.`,
    };
  }
  const needsPacket = change.kind !== "other";
  if (to === "submitted" && needsPacket && change.packetRevision === null) {
    return { field: "packetRevision", message: "Choose the packet revision that was submitted." };
  }
  if (to === "approved" && !change.referenceNumber?.trim()) {
    return {
      field: "referenceNumber",
      message: "Enter the authority's reference number (the permit or application number) before marking the filing approved.",
    };
  }
  if (to === "resubmitted") {
    if (!change.latestRoundAnswered) return { field: "rounds", message: "Answer every item of the correction round before resubmitting." };
    if (needsPacket && change.packetRevision === null)
      return { field: "packetRevision", message: "Choose the packet revision that was resubmitted." };
    if (
      needsPacket &&
      change.revisionAtLatestRound !== null &&
      change.packetRevision !== null &&
      change.packetRevision < change.revisionAtLatestRound
    ) {
      return {
        field: "packetRevision",
        message: `Rev ${change.packetRevision} is older than Rev ${change.revisionAtLatestRound}, the revision the corrections were about.`,
      };
    }
  }
  return null;
}
