// The project's stage follows from its facts (product rule, DESIGN.md §3: the stage summarises the filings,
// the field record and PTO). Each row is one situation a coordinator meets.
import { describe, expect, it } from "vitest";
import { resolveStage, stageFromFacts, stagesSkippedBy, type FilingFacts, type StageFacts } from "@/lib/domain/filings";

const filing = (status: FilingFacts["status"], referenceNumber: string | null = null): FilingFacts => ({
  status,
  referenceNumber,
  submittedAt: "2026-03-02",
  decidedAt: status === "approved" ? "2026-03-20" : null,
});
const none: StageFacts = {
  designChecked: false,
  permit: null,
  interconnection: null,
  installedAt: null,
  finalInspectionPassedAt: null,
  commissionedAt: null,
  ptoAt: null,
};
const at = (over: Partial<StageFacts>): StageFacts => ({ ...none, ...over });

describe("the stage from the facts", () => {
  it.each([
    ["a new project", at({}), "draft"],
    ["a design that passes its review", at({ designChecked: true }), "design_checked"],
    ["a permit submitted", at({ designChecked: true, permit: filing("submitted") }), "permit_filed"],
    [
      "a permit with corrections requested is still filed",
      at({ designChecked: true, permit: filing("corrections_requested") }),
      "permit_filed",
    ],
    ["a withdrawn permit is not filed", at({ designChecked: true, permit: filing("withdrawn") }), "design_checked"],
    ["a permit approved without its number is not issued", at({ designChecked: true, permit: filing("approved") }), "permit_filed"],
    ["a permit approved with its number", at({ designChecked: true, permit: filing("approved", "BP-1") }), "permit_issued"],
    [
      "the interconnection filed the same day as the permit waits for the line",
      at({ designChecked: true, permit: filing("submitted"), interconnection: filing("submitted") }),
      "permit_filed",
    ],
    ["work under way", at({ designChecked: true, permit: filing("approved", "BP-1"), installedAt: "2026-04-01" }), "installed"],
    [
      "a final inspection passed",
      at({ designChecked: true, permit: filing("approved", "BP-1"), installedAt: "2026-04-01", finalInspectionPassedAt: "2026-04-10" }),
      "inspection_passed",
    ],
    [
      "then the interconnection already filed counts",
      at({
        designChecked: true,
        permit: filing("approved", "BP-1"),
        finalInspectionPassedAt: "2026-04-10",
        interconnection: filing("in_review"),
      }),
      "utility_filed",
    ],
    [
      "the utility approves",
      at({
        designChecked: true,
        permit: filing("approved", "BP-1"),
        finalInspectionPassedAt: "2026-04-10",
        interconnection: filing("approved", "IA-9"),
      }),
      "utility_approved",
    ],
    [
      "the field record is completed",
      at({
        designChecked: true,
        permit: filing("approved", "BP-1"),
        finalInspectionPassedAt: "2026-04-10",
        interconnection: filing("approved", "IA-9"),
        commissionedAt: "2026-04-20",
      }),
      "commissioned",
    ],
    ["PTO stands in for everything before it", at({ ptoAt: "2026-05-01" }), "pto_received"],
  ] as const)("%s → %s", (_what, facts, stage) => {
    expect(stageFromFacts(facts).stage).toBe(stage);
  });

  it("lets a passed final inspection stand in for the installation and the issued permit", () => {
    const { stage, reached } = stageFromFacts(
      at({ designChecked: true, permit: filing("submitted"), finalInspectionPassedAt: "2026-04-10" }),
    );
    expect(stage).toBe("inspection_passed");
    expect(reached.map((r) => r.stage)).toEqual([
      "draft",
      "design_checked",
      "permit_filed",
      "permit_issued",
      "installed",
      "inspection_passed",
    ]);
    expect(reached.find((r) => r.stage === "inspection_passed")).toMatchObject({ fact: "Final inspection passed", at: "2026-04-10" });
  });

  it("never reaches Closed from facts", () => {
    const all = at({
      designChecked: true,
      permit: filing("approved", "BP-1"),
      installedAt: "d",
      finalInspectionPassedAt: "d",
      interconnection: filing("approved", "IA"),
      commissionedAt: "d",
      ptoAt: "d",
    });
    expect(stageFromFacts(all).stage).toBe("pto_received");
  });

  it("keeps a hand move until the facts pass it, and names the facts a hand move skips", () => {
    const facts = at({ designChecked: true, permit: filing("submitted") });
    expect(resolveStage(facts, "installed")).toBe("installed");
    expect(resolveStage(facts, "draft")).toBe("permit_filed");
    expect(stagesSkippedBy("installed", facts, "permit_filed")).toEqual(["permit_issued"]); // installed is the crew's word, not a record
    expect(stagesSkippedBy("permit_filed", facts, "design_checked")).toEqual([]);
    expect(stagesSkippedBy("design_checked", at({}), "draft")).toEqual([]); // the office checks the design by hand
    expect(stagesSkippedBy("pto_received", at({}), "utility_approved")).toEqual(["commissioned", "pto_received"]);
    expect(stagesSkippedBy("closed", at({ ptoAt: "d" }), "pto_received")).toEqual([]);
  });

  it("lets a stage set by hand stand for those before it, so a later fact moves on from there", () => {
    const handSet = at({ commissionedAt: "2026-04-15" });
    expect(stageFromFacts(handSet).stage).toBe("draft");
    expect(resolveStage(handSet, "utility_approved")).toBe("commissioned");
    expect(stageFromFacts(handSet, "utility_approved").reached.find((r) => r.stage === "permit_issued")).toMatchObject({
      fact: "Set by hand",
    });
  });
});
