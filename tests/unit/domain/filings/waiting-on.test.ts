// Who holds a project (product rules from the filing's status, DESIGN.md §3): submitted or in review → the
// authority; corrections requested → the office; an inspection booked → the crew until its day, then the
// authority; approved and not installed → the crew; PTO → nobody.
import { describe, expect, it } from "vitest";
import { waitingOn, type WaitingFacts, type WaitingFiling } from "@/lib/domain/filings";

const permit = (over: Partial<WaitingFiling> = {}): WaitingFiling => ({
  kind: "permit",
  authority: "ahj",
  status: "submitted",
  since: "2026-03-02",
  revisionNeeded: false,
  customerSince: null,
  inspections: [],
  ...over,
});
const interconnection = (over: Partial<WaitingFiling> = {}): WaitingFiling => ({
  ...permit(),
  kind: "interconnection",
  authority: "utility",
  ...over,
});
const facts = (over: Partial<WaitingFacts>): WaitingFacts => ({
  today: "2026-03-10",
  createdAt: "2026-02-20",
  hold: null,
  ptoAt: null,
  installed: false,
  installedAt: null,
  commissionedAt: null,
  filings: [],
  ...over,
});

describe("who the project waits on", () => {
  it.each([
    ["no filing yet", facts({}), "office", "2026-02-20"],
    ["a filing being prepared", facts({ filings: [permit({ status: "preparing", since: "2026-02-25" })] }), "office", "2026-02-25"],
    ["a submitted permit", facts({ filings: [permit()] }), "ahj", "2026-03-02"],
    [
      "a permit in review while the interconnection is being prepared",
      facts({ filings: [permit({ status: "in_review" }), interconnection({ status: "preparing" })] }),
      "ahj",
      "2026-03-02",
    ],
    [
      "the permit done and inspected, the interconnection not yet filed",
      facts({ installed: true, filings: [permit({ status: "approved" }), interconnection({ status: "preparing", since: "2026-02-25" })] }),
      "office",
      "2026-02-25",
    ],
    [
      "both still being prepared",
      facts({
        filings: [permit({ status: "preparing", since: "2026-02-26" }), interconnection({ status: "preparing", since: "2026-02-25" })],
      }),
      "office",
      "2026-02-25",
    ],
    ["a permit in review", facts({ filings: [permit({ status: "in_review", since: "2026-03-04" })] }), "ahj", "2026-03-04"],
    [
      "corrections requested",
      facts({ filings: [permit({ status: "corrections_requested", since: "2026-03-08" })] }),
      "office",
      "2026-03-08",
    ],
    ["a resubmitted permit", facts({ filings: [permit({ status: "resubmitted", since: "2026-03-09" })] }), "ahj", "2026-03-09"],
    ["an application with the utility", facts({ filings: [interconnection()] }), "utility", "2026-03-02"],
    ["an approved permit, nothing built", facts({ filings: [permit({ status: "approved", since: "2026-03-09" })] }), "crew", "2026-03-09"],
    [
      "a design changed after submission",
      facts({ filings: [permit({ revisionNeeded: true, since: "2026-03-02" })] }),
      "office",
      "2026-03-02",
    ],
    ["the customer marked as holding it", facts({ filings: [permit({ customerSince: "2026-03-05" })] }), "customer", "2026-03-05"],
    [
      "an HOA reviewing once the work is built: the other approving body holds it like an AHJ",
      facts({
        installed: true,
        filings: [
          permit({ status: "approved", since: "2026-03-01" }),
          permit({ kind: "other", authority: "other", status: "in_review", since: "2026-03-06" }),
        ],
      }),
      "ahj",
      "2026-03-06",
    ],
  ] as const)("%s → %s since %s", (_what, input, party, since) => {
    expect(waitingOn(input)).toMatchObject({ party, since });
  });

  it("gives an inspection to the crew until its day, then to the authority", () => {
    const booked = permit({
      status: "approved",
      since: "2026-03-09",
      inspections: [{ scheduledFor: "2026-03-12", result: null, recordedAt: null }],
    });
    expect(waitingOn(facts({ installed: true, filings: [booked] }))).toMatchObject({ party: "crew" });
    expect(waitingOn(facts({ today: "2026-03-12", installed: true, filings: [booked] }))).toMatchObject({ party: "crew" });
    expect(waitingOn(facts({ today: "2026-03-13", installed: true, filings: [booked] }))).toMatchObject({
      party: "ahj",
      since: "2026-03-12",
    });
    const witness = interconnection({ status: "approved", inspections: [{ scheduledFor: "2026-03-01", result: null, recordedAt: null }] });
    expect(waitingOn(facts({ installed: true, filings: [witness] }))).toMatchObject({ party: "utility" });
  });

  it("sends a failed inspection back to the crew", () => {
    const failed = permit({
      status: "approved",
      inspections: [{ scheduledFor: "2026-03-05", result: "failed", recordedAt: "2026-03-05T20:00:00Z" }],
    });
    expect(waitingOn(facts({ installed: true, filings: [failed] }))).toMatchObject({ party: "crew", since: "2026-03-05T20:00:00Z" });
  });

  it("puts the office first when two tracks wait on different parties", () => {
    const input = facts({
      filings: [permit({ status: "corrections_requested", since: "2026-03-08" }), interconnection({ since: "2026-03-01" })],
    });
    expect(waitingOn(input)).toMatchObject({ party: "office" });
    expect(waitingOn(facts({ filings: [permit({ since: "2026-03-04" }), interconnection({ since: "2026-03-01" })] }))).toMatchObject({
      party: "ahj",
    });
  });

  it("does not send the crew to build on a utility approval while the permit is out", () => {
    const input = facts({ filings: [permit({ status: "in_review" }), interconnection({ status: "approved" })] });
    expect(waitingOn(input)).toMatchObject({ party: "ahj" });
  });

  it("waits on the crew for the field record, then on the utility for PTO, then on nobody", () => {
    const approvedBoth = [permit({ status: "approved" }), interconnection({ status: "approved" })];
    expect(waitingOn(facts({ installed: true, installedAt: "2026-03-20", filings: approvedBoth }))).toMatchObject({
      party: "crew",
      since: "2026-03-20",
    });
    expect(waitingOn(facts({ installed: true, commissionedAt: "2026-03-25", filings: approvedBoth }))).toMatchObject({
      party: "utility",
      since: "2026-03-25",
    });
    expect(waitingOn(facts({ installed: true, commissionedAt: "2026-03-25", ptoAt: "2026-04-02", filings: approvedBoth }))).toBeNull();
  });

  it("waits on nobody while the project is on hold or cancelled", () => {
    expect(waitingOn(facts({ hold: "on_hold", filings: [permit()] }))).toBeNull();
    expect(waitingOn(facts({ hold: "cancelled" }))).toBeNull();
  });
});
