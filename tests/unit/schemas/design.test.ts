import { describe, expect, it } from "vitest";
import { newDesignDraft } from "@/lib/design/defaults";
import { DesignDraft, DesignInput } from "@/lib/schemas/design";
import { completeDraft } from "../design/fixtures";

const messages = (draft: unknown) =>
  Object.fromEntries((DesignInput.safeParse(draft).error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

describe("DesignDraft", () => {
  it("keeps half-typed input, blanks and bad numbers alike", () => {
    const draft = {
      ...newDesignDraft({ serviceVoltageV: null, servicePhases: null, busbarA: null, mainBreakerA: null }),
      service: { busbarA: "two hundred" },
    };
    expect(DesignDraft.parse(draft)).toMatchObject({ service: { busbarA: "two hundred" } });
  });

  it("refuses what is not a design at all", () => {
    expect(DesignDraft.safeParse({ runs: "everything" }).success).toBe(false);
    expect(DesignDraft.safeParse({ runs: Array.from({ length: 51 }, () => ({})) }).success).toBe(false);
    expect(DesignDraft.safeParse({ service: { busbarA: "x".repeat(201) } }).success).toBe(false);
  });
});

describe("DesignInput", () => {
  it("parses a whole design into numbers", () => {
    const out = DesignInput.parse(completeDraft());
    expect(out.service).toMatchObject({ busbarA: 200, mainBreakerA: 200, pvBreakerA: 40, otherBreakersA: [] });
    expect(out.array.strings[0]).toMatchObject({ modulesInSeries: 10, parallelCount: 2, mpptIndex: 1 });
  });

  it.each([
    [(d: ReturnType<typeof completeDraft>) => (d.service.busbarA = ""), "service.busbarA", "Enter the busbar rating"],
    [(d: ReturnType<typeof completeDraft>) => (d.service.pvBreakerA = "forty"), "service.pvBreakerA", "PV breaker must be a number"],
    [
      (d: ReturnType<typeof completeDraft>) => (d.array.strings[0].modulesInSeries = "10.5"),
      "array.strings.0.modulesInSeries",
      "Modules in series must be a whole number",
    ],
    [(d: ReturnType<typeof completeDraft>) => (d.runs[0].lengthFt = "-3"), "runs.0.lengthFt", "Length must be between 1 and 2000 ft"],
    [
      (d: ReturnType<typeof completeDraft>) => (d.service.otherBreakersA = "20, twenty"),
      "service.otherBreakersA",
      "List the other breakers in whole amperes separated by commas, e.g. 20, 20, 30",
    ],
    [(d: ReturnType<typeof completeDraft>) => (d.equipment.moduleId = ""), "equipment.moduleId", "Choose a PV module"],
  ])("gives a readable message (%#)", (change, path, message) => {
    const draft = completeDraft();
    change(draft);
    expect(messages(draft)[path]).toBe(message);
  });

  it("leaves the main breaker optional for a main-lug panel", () => {
    const draft = completeDraft();
    draft.service.mainBreakerA = "";
    expect(DesignInput.parse(draft).service.mainBreakerA).toBeUndefined();
  });
});
