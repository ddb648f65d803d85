// Product rules of a filing's status (no published source: the trade's usual sequence of a permit or
// interconnection application, submitted, reviewed, corrected, resubmitted, decided).
import { describe, expect, it } from "vitest";
import { FILING_STATUSES, NEXT_STATUSES, filingChangeProblem, isFiled, type FilingChange } from "@/lib/domain/filings";

const change = (over: Partial<FilingChange>): FilingChange => ({
  kind: "permit",
  from: "submitted",
  to: "in_review",
  referenceNumber: null,
  packetRevision: 1,
  latestRoundAnswered: true,
  revisionAtLatestRound: null,
  ...over,
});

describe("filing status changes", () => {
  it("refuses to mark a filing approved without the authority's reference number", () => {
    for (const referenceNumber of [null, "", "   "]) {
      expect(filingChangeProblem(change({ from: "in_review", to: "approved", referenceNumber }))).toMatchObject({
        field: "referenceNumber",
      });
    }
    expect(filingChangeProblem(change({ from: "in_review", to: "approved", referenceNumber: "BP-2026-0142" }))).toBeNull();
  });

  it("needs the packet revision to submit a permit or an interconnection application, not another approval", () => {
    expect(filingChangeProblem(change({ from: "preparing", to: "submitted", packetRevision: null }))).toMatchObject({
      field: "packetRevision",
    });
    expect(
      filingChangeProblem(change({ kind: "interconnection", from: "preparing", to: "submitted", packetRevision: null })),
    ).toMatchObject({ field: "packetRevision" });
    expect(filingChangeProblem(change({ kind: "other", from: "preparing", to: "submitted", packetRevision: null }))).toBeNull();
  });

  it("sends a revision unasked while the authority has the filing, with the revision it sends", () => {
    for (const from of ["submitted", "in_review"] as const) {
      expect(filingChangeProblem(change({ from, to: "resubmitted", packetRevision: 2 }))).toBeNull();
      expect(filingChangeProblem(change({ from, to: "resubmitted", packetRevision: null }))).toMatchObject({ field: "packetRevision" });
    }
    expect(filingChangeProblem(change({ from: "approved", to: "resubmitted", packetRevision: 2 }))).toMatchObject({ field: "status" });
  });

  it("resubmits only once every item of the round is answered, never with an older revision", () => {
    const base = { from: "corrections_requested", to: "resubmitted", revisionAtLatestRound: 1 } as const;
    expect(filingChangeProblem(change({ ...base, latestRoundAnswered: false, packetRevision: 2 }))).toMatchObject({ field: "rounds" });
    expect(filingChangeProblem(change({ ...base, packetRevision: null }))).toMatchObject({ field: "packetRevision" });
    expect(filingChangeProblem(change({ ...base, revisionAtLatestRound: 2, packetRevision: 1 }))).toMatchObject({
      field: "packetRevision",
    });
    expect(filingChangeProblem(change({ ...base, packetRevision: 2 }))).toBeNull();
    expect(filingChangeProblem(change({ ...base, packetRevision: 1 }))).toBeNull(); // a letter alone may answer a round
  });

  it.each(FILING_STATUSES.flatMap((from) => FILING_STATUSES.map((to) => [from, to] as const)))(
    "%s → %s is allowed exactly when the table lists it",
    (from, to) => {
      const problem = filingChangeProblem(change({ from, to, referenceNumber: "R-1", packetRevision: 3, revisionAtLatestRound: 1 }));
      expect(problem === null).toBe(NEXT_STATUSES[from].includes(to) && from !== to);
    },
  );

  it("counts a filing as filed from submission on, unless it was rejected or withdrawn", () => {
    expect(FILING_STATUSES.filter(isFiled)).toEqual(["submitted", "in_review", "corrections_requested", "resubmitted", "approved"]);
  });

  it("lets every status lead somewhere, so no filing is stuck", () => {
    for (const status of FILING_STATUSES) expect(NEXT_STATUSES[status].length).toBeGreaterThan(0);
  });
});
