import { describe, expect, it } from "vitest";
import { runDesignReview } from "@/lib/design/run-review";
import { newDesignDraft } from "@/lib/design/defaults";
import { CATALOG, CONDITIONS, completeDraft } from "./fixtures";

describe("runDesignReview", () => {
  it("lists what is missing on a new design instead of failing checks", () => {
    const out = runDesignReview(
      newDesignDraft({ serviceVoltageV: 240, servicePhases: 1, busbarA: 200, mainBreakerA: 200 }),
      CATALOG,
      CONDITIONS,
    );
    expect(out.status).toBe("incomplete");
    if (out.status === "incomplete") {
      const paths = out.problems.map((p) => p.path);
      expect(paths).toContain("equipment.moduleId");
      expect(paths).toContain("service.pvBreakerA");
    }
  });

  it("asks for the AHJ when the project has none", () => {
    const out = runDesignReview(completeDraft(), CATALOG, null);
    expect(out.status === "incomplete" && out.problems[0].path).toBe("project.jurisdiction");
  });

  it("reviews a whole design", () => {
    const out = runDesignReview(completeDraft(), CATALOG, CONDITIONS);
    if (out.status !== "reviewed") throw new Error(JSON.stringify(out.problems));
    const { summary, checks } = out.review;
    // 20 × 400 W = 8.0 kW DC; 7.6 kW AC; 8.0 / 7.6 = 1.05
    expect(summary.ratings).toMatchObject({ moduleCount: 20, dcKw: 8, acKw: 7.6 });
    expect(summary.ratings.dcToAcRatio).toBeCloseTo(1.05, 2);
    // Coefficient method (NEC 2020 690.7(A)(1)): 10 × 40.0 × (1 + (−20 − 25)(−0.0028)) = 450.4 V
    expect(summary.maxDcVoltageV).toBeCloseTo(450.4, 1);
    // 705.12 120 % rule with a 200 A bus and 200 A main: 1.2 × 200 − 200 = 40 A (code arithmetic, REFERENCE.md)
    expect(summary.largestPvBreakerA).toBe(40);
    expect(checks.find((c) => c.id.startsWith("string-voltage"))?.status).toBe("pass");
  });

  it("fails the string voltage when too many modules are in series and suggests the count that fits", () => {
    const draft = completeDraft();
    draft.array.strings[0].modulesInSeries = "14"; // 14 × 45.04 V = 630.6 V > 600 V
    draft.array.roofPlanes[0].moduleCount = "28";
    const out = runDesignReview(draft, CATALOG, CONDITIONS);
    if (out.status !== "reviewed") throw new Error("expected a review");
    const check = out.review.checks.find((c) => c.id.startsWith("string-voltage"));
    expect(check?.status).toBe("fail");
    expect(check?.fix).toContain("13");
  });

  // Issue 11, design editor: the live review shows every check it can compute while other steps are
  // incomplete, and names the run or field missing a value.
  it("flags a 25-module string on step 2, before the service and the runs are entered", () => {
    const draft = newDesignDraft({ serviceVoltageV: 240, servicePhases: 1, busbarA: 200, mainBreakerA: 200 });
    draft.equipment.moduleId = CATALOG[0]!.id;
    draft.equipment.inverters[0]!.equipmentId = CATALOG[1]!.id;
    draft.array.strings[0] = { ...draft.array.strings[0]!, modulesInSeries: "25" };
    const out = runDesignReview(draft, CATALOG, CONDITIONS);
    if (out.status !== "incomplete") throw new Error("expected an incomplete design");
    // 25 × 45.04 V = 1126 V > 600 V (NEC 2020 690.7(A), coefficient method)
    expect(out.partial.find((c) => c.id === "string-voltage:S1")).toMatchObject({ status: "fail", value: 1126, limit: 600 });
    expect(out.problems.map((p) => p.path)).toContain("service.pvBreakerA");
  });

  it("names the run and the string a missing value belongs to", () => {
    const draft = completeDraft();
    draft.runs[0].lengthFt = "";
    draft.array.strings[0].modulesInSeries = "";
    const out = runDesignReview(draft, CATALOG, CONDITIONS);
    if (out.status !== "incomplete") throw new Error("expected an incomplete design");
    expect(out.problems).toContainEqual({ path: "runs.0.lengthFt", message: 'Run "Array to junction box": enter the length' });
    expect(out.problems).toContainEqual({ path: "array.strings.0.modulesInSeries", message: "String S1: enter the modules in series" });
  });

  it("has nothing partial to show before the equipment is chosen", () => {
    const out = runDesignReview(
      newDesignDraft({ serviceVoltageV: 240, servicePhases: 1, busbarA: 200, mainBreakerA: 200 }),
      CATALOG,
      CONDITIONS,
    );
    expect(out.status === "incomplete" && out.partial).toEqual([]);
  });
});
