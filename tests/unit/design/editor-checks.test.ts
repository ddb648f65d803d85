import { describe, expect, it } from "vitest";
import { editorValues, newDesignDraft } from "@/lib/design/defaults";
import { checkEditorValues } from "@/lib/design/editor-checks";
import { runDesignReview } from "@/lib/design/run-review";
import { circuitConductorCount } from "@/lib/engineering";
import { DesignInput, type DesignDraft } from "@/lib/schemas/design";
import { CATALOG, CONDITIONS, completeDraft } from "./fixtures";

const blank = () => newDesignDraft({ serviceVoltageV: 240, servicePhases: 1, busbarA: 200, mainBreakerA: 200 });
const tooLong = () => {
  const d = completeDraft();
  d.array.strings[0] = { ...d.array.strings[0]!, modulesInSeries: "14", parallelCount: "1" };
  return d;
};
const withoutStorage = () => {
  const { storage: _dropped, ...d } = completeDraft();
  return d;
};

// The page computes these on the server for the editor's first paint; the editor computes them in the
// browser after every change. Both must be what the review and the schema say of the same values.
describe("checkEditorValues", () => {
  it.each([
    ["a new design (incomplete, partial checks)", blank, null],
    ["a whole design (reviewed)", completeDraft, CONDITIONS],
    ["a string too long for the inverter (a failing string check)", tooLong, CONDITIONS],
    ["a project without an AHJ", completeDraft, null],
  ] as const)("on %s its outcome is runDesignReview's", (_, draft, conditions) => {
    const checks = checkEditorValues(draft(), CATALOG, conditions ?? null);
    expect(checks.outcome).toEqual(runDesignReview(draft(), CATALOG, conditions ?? null));
  });

  it("shows the failing string on the string that fails", () => {
    // 14 × 40.0 V × (1 + (−20 − 25)(−0.0028)) = 630.6 V over the 600 V dwelling limit (NEC 2020 690.7(A)(1), 690.7 dwelling limit).
    const { outcome } = checkEditorValues(tooLong(), CATALOG, CONDITIONS);
    if (outcome.status !== "reviewed") throw new Error(JSON.stringify(outcome.problems));
    expect(outcome.review.checks.find((c) => c.id.startsWith("string-voltage"))?.status).toBe("fail");
  });

  it.each([
    ["a new design", blank],
    ["a whole design", completeDraft],
  ])("on %s its issues are the schema's, by dotted path", (_, draft) => {
    const parsed = DesignInput.safeParse(draft());
    const expected = parsed.success ? [] : parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
    const { issues } = checkEditorValues(draft(), CATALOG, CONDITIONS);
    expect(issues).toEqual(expected);
    if (draft === blank) expect(issues.map((i) => i.path)).toContain("equipment.moduleId");
  });

  it("counts each run's current-carrying conductors as the engine does, once the design reviews", () => {
    const { outcome, countedConductors } = checkEditorValues(completeDraft(), CATALOG, CONDITIONS);
    if (outcome.status !== "reviewed") throw new Error(JSON.stringify(outcome.problems));
    for (const run of outcome.design.runs) expect(countedConductors[run.id]).toBe(circuitConductorCount(outcome.design, run));
    // Two strings in parallel kept apart in one raceway: two circuits of two conductors (NEC 310.15(C)(1) counts each current-carrying conductor).
    expect(countedConductors["run-1"]).toBe(4);
    expect(checkEditorValues(blank(), CATALOG, CONDITIONS).countedConductors).toEqual({});
  });

  it("hands the page plain data the editor receives unchanged", () => {
    for (const draft of [blank(), completeDraft(), tooLong()]) {
      const checks = checkEditorValues(draft, CATALOG, CONDITIONS);
      // structuredClone throws on functions and class instances other than the built-in ones.
      expect(structuredClone(checks)).toEqual(checks);
    }
  });
});

describe("editorValues", () => {
  it("opens a draft saved before storage existed on no battery, and checks it as the editor would", () => {
    const saved = withoutStorage() as DesignDraft;
    const values = editorValues(saved);
    expect(values.storage).toEqual({ coupling: "none" });
    expect(checkEditorValues(values, CATALOG, CONDITIONS).outcome).toEqual(
      runDesignReview({ ...saved, storage: { coupling: "none" } }, CATALOG, CONDITIONS),
    );
  });

  it("keeps a draft's own storage", () => {
    const saved = { ...completeDraft(), storage: { coupling: "dc", multimodeInverterLineId: "inv-1" } } as DesignDraft;
    expect(editorValues(saved).storage).toEqual({ coupling: "dc", multimodeInverterLineId: "inv-1" });
    expect(editorValues(saved)).not.toBe(saved);
  });
});
