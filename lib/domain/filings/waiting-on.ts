import type { InspectionResult } from "./inspections";
import { WITH_THE_AUTHORITY, type FilingKind, type FilingStatus } from "./statuses";

export const WAITING_PARTIES = ["office", "ahj", "utility", "customer", "crew"] as const;
export type WaitingParty = (typeof WAITING_PARTIES)[number];

export const WAITING_PARTY_LABELS: Record<WaitingParty, string> = {
  office: "Office",
  ahj: "AHJ",
  utility: "Utility",
  customer: "Customer",
  crew: "Crew",
};

export type AuthorityParty = "ahj" | "utility" | "other";

/** An inspection, witness test or meter set as the waiting-on rules read it. */
export type InspectionFacts = { scheduledFor: string | null; result: InspectionResult | null; recordedAt: string | null };

/** A filing as the waiting-on rules read it. `since` is when it entered its status. */
export type WaitingFiling = {
  kind: FilingKind;
  authority: AuthorityParty;
  status: FilingStatus;
  since: string;
  /** The design changed after this filing's packet went in: the office owes a new revision. */
  revisionNeeded: boolean;
  /** The coordinator marked the filing as waiting on the customer (a signature, a document), since then. */
  customerSince: string | null;
  inspections: InspectionFacts[];
};

export type WaitingFacts = {
  /** The organization's calendar day (YYYY-MM-DD), against which booked inspections are read. */
  today: string;
  createdAt: string;
  hold: "on_hold" | "cancelled" | null;
  ptoAt: string | null;
  installed: boolean;
  installedAt: string | null;
  commissionedAt: string | null;
  filings: WaitingFiling[];
};

export type WaitingOn = { party: WaitingParty; since: string; why: string } | null;

type Claim = { party: WaitingParty; since: string; why: string };

/** Who must act on one filing, if anyone. */
function claimOf(filing: WaitingFiling, facts: WaitingFacts): Claim | null {
  // Another approving body (an HOA, a fire district) stands with the AHJ: the NEC's Article 100 calls any body
  // that approves an installation an authority having jurisdiction (from memory: NFPA 70, Art. 100, "Authority
  // Having Jurisdiction (AHJ)"); the office only follows it up.
  const authority: WaitingParty = filing.authority === "utility" ? "utility" : "ahj";
  if (filing.status === "withdrawn") return null;
  if (filing.customerSince) return { party: "customer", since: filing.customerSince, why: "Waiting for the customer" };
  if (filing.revisionNeeded)
    return { party: "office", since: filing.since, why: "The design changed after submission: a new revision is due" };
  if (filing.status === "preparing") return { party: "office", since: filing.since, why: "Filing being prepared" };
  if (filing.status === "corrections_requested") return { party: "office", since: filing.since, why: "Corrections to answer" };
  if (filing.status === "rejected") return { party: "office", since: filing.since, why: "Rejected: decide how to refile" };
  if (WITH_THE_AUTHORITY.includes(filing.status)) return { party: authority, since: filing.since, why: "In the authority's hands" };

  // Approved: the inspections decide, then the crew.
  const open = filing.inspections.filter((i) => i.result === null && i.scheduledFor);
  const next = open.sort((a, b) => a.scheduledFor!.localeCompare(b.scheduledFor!))[0];
  if (next) {
    if (facts.today <= next.scheduledFor!) return { party: "crew", since: filing.since, why: `Inspection booked for ${next.scheduledFor}` };
    return { party: authority, since: next.scheduledFor!, why: "Inspection result to come" };
  }
  const lastResult = filing.inspections
    .filter((i) => i.result !== null)
    .sort((a, b) => (a.recordedAt ?? "").localeCompare(b.recordedAt ?? ""))
    .at(-1);
  if (lastResult && (lastResult.result === "failed" || lastResult.result === "partial")) {
    return { party: "crew", since: lastResult.recordedAt ?? filing.since, why: "Inspection corrections to fix on site" };
  }
  // The permit gates the work: another approval leaves the crew waiting until the permit is issued too.
  const permitIssued = facts.filings.every((f) => f.kind !== "permit" || f.status === "approved" || f.status === "withdrawn");
  if (!facts.installed && permitIssued) return { party: "crew", since: filing.since, why: "Approved: ready to install" };
  return null;
}

/** The order in which parties hold a project when several could: our own side first, then the outside. */
const PRIORITY: readonly WaitingParty[] = ["office", "crew", "customer", "ahj", "utility"];

/**
 * Who holds the project now and since when, from its filings: the office for anything it owes (a filing
 * to prepare, corrections to answer, a revision to send), the crew for approved work not yet built or an
 * inspection coming up, the customer when marked, else the authority that has the filing. Nobody once PTO
 * is recorded, or while the project is on hold or cancelled.
 */
export function waitingOn(facts: WaitingFacts): WaitingOn {
  if (facts.ptoAt || facts.hold) return null;
  const live = facts.filings.filter((f) => f.status !== "withdrawn");
  if (live.length === 0) return { party: "office", since: facts.createdAt, why: "No filing yet" };
  // A filing still being prepared holds the project only while nothing else is in motion: once the
  // permit is with the AHJ, that is who the project waits on, and the next application is the office's to-do.
  const claimsOf = (filings: WaitingFiling[]) => filings.map((f) => claimOf(f, facts)).filter((c): c is Claim => c !== null);
  const moving = claimsOf(live.filter((f) => f.status !== "preparing"));
  const claims = moving.length ? moving : claimsOf(live.filter((f) => f.status === "preparing"));
  for (const party of PRIORITY) {
    const mine = claims.filter((c) => c.party === party).sort((a, b) => a.since.localeCompare(b.since));
    if (mine.length) return mine[0]!;
  }
  // Every filing is approved and the work is built: the field record, then the utility's PTO.
  if (!facts.commissionedAt) return { party: "crew", since: facts.installedAt ?? facts.createdAt, why: "Field record to complete" };
  return { party: "utility", since: facts.commissionedAt, why: "Permission to operate to come" };
}
