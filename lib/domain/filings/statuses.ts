// A filing is one authority's yes the project needs: the AHJ's permit, the utility's interconnection
// approval, sometimes another (an HOA, a separate electrical permit). Keys are stored; labels are shown.

export const FILING_KINDS = ["permit", "interconnection", "other"] as const;
export type FilingKind = (typeof FILING_KINDS)[number];

export const FILING_KIND_LABELS: Record<FilingKind, string> = {
  permit: "Permit",
  interconnection: "Interconnection",
  other: "Other approval",
};

export const FILING_STATUSES = [
  "preparing",
  "submitted",
  "in_review",
  "corrections_requested",
  "resubmitted",
  "approved",
  "rejected",
  "withdrawn",
] as const;
export type FilingStatus = (typeof FILING_STATUSES)[number];

export const FILING_STATUS_LABELS: Record<FilingStatus, string> = {
  preparing: "Preparing",
  submitted: "Submitted",
  in_review: "In review",
  corrections_requested: "Corrections requested",
  resubmitted: "Resubmitted",
  approved: "Approved",
  rejected: "Rejected",
  withdrawn: "Withdrawn",
};

/** How a filing went to the authority. */
export const SUBMISSION_CHANNELS = ["portal", "email", "counter", "mail"] as const;
export type SubmissionChannel = (typeof SUBMISSION_CHANNELS)[number];
export const SUBMISSION_CHANNEL_LABELS: Record<SubmissionChannel, string> = {
  portal: "Online portal",
  email: "E-mail",
  counter: "At the counter",
  mail: "Post",
};

/** The statuses in which the authority holds the filing (it went in and no decision came back yet). */
export const WITH_THE_AUTHORITY: readonly FilingStatus[] = ["submitted", "in_review", "resubmitted"];

/** The filing went in at some point and was not given up: it counts as filed. */
export function isFiled(status: FilingStatus): boolean {
  return status !== "preparing" && status !== "rejected" && status !== "withdrawn";
}

/**
 * Where a status may go next. Corrections are entered by recording a round, a resubmission by answering
 * it; a rejected or withdrawn filing starts again from preparing.
 */
export const NEXT_STATUSES: Record<FilingStatus, readonly FilingStatus[]> = {
  preparing: ["submitted", "withdrawn"],
  // A revision can go in unasked while the authority has the filing (the design changed after submission).
  submitted: ["in_review", "corrections_requested", "resubmitted", "approved", "rejected", "withdrawn"],
  in_review: ["corrections_requested", "resubmitted", "approved", "rejected", "withdrawn"],
  corrections_requested: ["resubmitted", "rejected", "withdrawn"],
  resubmitted: ["in_review", "corrections_requested", "approved", "rejected", "withdrawn"],
  approved: ["withdrawn"],
  rejected: ["preparing", "withdrawn"],
  withdrawn: ["preparing"],
};

export function isFilingStatus(value: unknown): value is FilingStatus {
  return (FILING_STATUSES as readonly unknown[]).includes(value);
}
