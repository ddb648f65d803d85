import { describe, expect, it } from "vitest";
import { reviewDesign, type ConductorRun, type Design, type Site } from "@/lib/engineering";
import { DesignDocument } from "@/lib/design/document";
import { reviewDocument } from "@/lib/design/document-review";
import { documentToEngine } from "@/lib/design/document-to-engine";
import { draftToDocument } from "@/lib/design/draft-to-document";
import { engineToDocument } from "@/lib/design/engine-to-document";
import { toReviewJson } from "@/lib/design/review-json";
import { toEngineInput } from "@/lib/design/to-engine";
import { DEMO_CATALOG } from "@/lib/seed/demo-catalog";
import { JURISDICTIONS } from "@/lib/seed/demo-scenario";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { DesignInput } from "@/lib/schemas/design";
import { EquipmentInput, type EquipmentDto } from "@/lib/schemas/equipment";
import { coldSite, fenwickOptimizer, microDesign, northmereOptimizerInverter, stringDesign } from "../engineering/fixtures";

/** Through JSON and the schema, as an exported document travels to POST /api/v1/design-review. */
const overTheWire = (design: Design, site: Site) => {
  const out = engineToDocument(design, site);
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  return JSON.parse(JSON.stringify(out.document)) as unknown;
};
const backToEngine = (body: unknown) => {
  const out = documentToEngine(DesignDocument.parse(body));
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  return out;
};

/** Every default written out, as a document always carries it, so the round trip can be compared field by field. */
function explicit(design: Design, site: Site): Design {
  const runs = design.runs.map((run): ConductorRun => ({
    ...run,
    conductor: { ...run.conductor, stranding: run.conductor.stranding ?? "stranded" },
    ambientTempC: run.ambientTempC ?? site.highDesignTempC,
    // strings keep their own circuits unless joined; inverter outputs leave a combiner as one
    circuit:
      run.circuit.kind === "dc-strings"
        ? { ...run.circuit, combined: run.circuit.combined ?? false }
        : { ...run.circuit, combined: run.circuit.combined ?? true },
  }));
  return { ...design, runs };
}

const optimizerDesign = () =>
  stringDesign({
    inverters: [northmereOptimizerInverter],
    moduleLevelDevice: fenwickOptimizer,
    strings: [
      { id: "S1", inverterId: "inv-opt", modulesInSeries: 10 },
      { id: "S2", inverterId: "inv-opt", modulesInSeries: 10 },
    ],
    runs: [],
    paths: [],
  });

describe("engine → document → engine", () => {
  it.each([
    ["string inverter with shutdown devices", () => stringDesign()],
    ["optimizer strings", optimizerDesign],
    ["micro-inverters", () => microDesign()],
    [
      "V/°C coefficient, main-lug panel, strings in parallel",
      () =>
        stringDesign({
          module: { ...stringDesign().module, vocTempCoeff: { value: -0.112, unit: "V/C" } },
          strings: [
            { id: "A.1", inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 10 },
            { id: "A.2", inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 10 },
          ],
          runs: [{ ...stringDesign().runs[0], circuit: { kind: "dc-strings", stringIds: ["A.1", "A.2"] } }],
          paths: [],
          service: { ...stringDesign().service, mainBreakerA: null, otherBreakersA: [20, 20, 30] },
        }),
    ],
  ])("gives back the same design: %s", (_what, make) => {
    const design = explicit(make(), coldSite);
    const back = backToEngine(overTheWire(design, coldSite));
    expect(back.design).toEqual(design);
    expect(back.site).toEqual(coldSite);
  });

  it("writes defaults out, so the engine reads the same figures and the review is the same", () => {
    const design = stringDesign(); // ambient, terminal rating and conductor count left to the engine's defaults
    const back = backToEngine(overTheWire(design, coldSite));
    expect(back.design.runs[0]).toMatchObject({ ambientTempC: 35, circuit: { combined: false } });
    // the terminal rating and the conductor count stay unentered: the engine takes them from the inverter and the circuits
    expect(back.design.runs[0]!.terminalTempC).toBeUndefined();
    expect(back.design.runs[0]!.currentCarryingConductors).toBeUndefined();
    expect(reviewDesign(back.design, coldSite)).toEqual(reviewDesign(design, coldSite));
  });

  it("names several whole strings sharing a run, and refuses a run carrying part of a parallel set", () => {
    const design = stringDesign({
      strings: [...stringDesign().strings, { id: "S3", inverterId: "inv-1", mpptIndex: 2, modulesInSeries: 10 }],
    });
    design.runs = [{ ...design.runs[0]!, circuit: { kind: "dc-strings", stringIds: ["S1", "S3"] } }];
    const named = engineToDocument(design, coldSite);
    expect(named.ok && named.document.runs[0]).toMatchObject({ circuit: "dc-string", stringIds: ["S1", "S3"], combined: false });

    const parallel = stringDesign({
      strings: [
        { id: "A.1", inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 10 },
        { id: "A.2", inverterId: "inv-1", mpptIndex: 1, modulesInSeries: 10 },
      ],
    });
    parallel.runs = [{ ...parallel.runs[0]!, circuit: { kind: "dc-strings", stringIds: ["A.1"] } }];
    const out = engineToDocument(parallel, coldSite);
    expect(out.ok ? [] : out.problems.map((p) => p.path)).toEqual(["runs.0.circuit"]);
  });
});

// The demo catalog as DTOs with stable fake ids, and the demo designs as the editor saves them.
const catalog = DEMO_CATALOG.map(
  (item, i) =>
    ({
      ...EquipmentInput.parse(item),
      id: `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`,
      isArchived: false,
      datasheet: null,
    }) as EquipmentDto,
);
const ids = Object.fromEntries(
  Object.entries(DESIGN_MODELS).map(([k, model]) => [k, catalog.find((c) => c.model === model)!.id]),
) as CatalogIds;
const demoCases = JURISDICTIONS.flatMap((j) =>
  [100, 150, 200].flatMap((mainBreakerA) => [0, 1].map((variant) => ({ j, mainBreakerA, variant }))),
);

describe("a saved demo design exported and posted back", () => {
  it.each(demoCases)(
    "reviews the same in $j.name (NEC $j.necEdition), $mainBreakerA A main, variant $variant",
    ({ j, mainBreakerA, variant }) => {
      const draft = demoDesign(ids, { busbarA: mainBreakerA, mainBreakerA }, variant);
      const exported = draftToDocument(draft, catalog, j);
      if (!exported.ok) throw new Error(JSON.stringify(exported.problems));
      const posted = reviewDocument(JSON.parse(JSON.stringify(exported.document)));
      if (!posted.ok) throw new Error(JSON.stringify(posted.problems));

      const input = toEngineInput(DesignInput.parse(draft), catalog, j);
      if (!input.ok) throw new Error(JSON.stringify(input.problems));
      const direct = toReviewJson(reviewDesign(input.design, input.site), { roofPlanesGiven: true });
      expect(posted.review).toEqual(direct);
      expect(posted.review.status).toBe("pass");
    },
  );

  it("says what is missing when the saved design is incomplete", () => {
    const draft = demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, 1);
    draft.equipment.moduleId = "";
    const out = draftToDocument(draft, catalog, JURISDICTIONS[0]);
    expect(out.ok ? [] : out.problems.map((p) => p.path)).toEqual(["equipment.moduleId"]);
    expect(draftToDocument(draft, catalog, null)).toMatchObject({ ok: false, problems: [{ path: "project.jurisdiction" }] });
  });
});
