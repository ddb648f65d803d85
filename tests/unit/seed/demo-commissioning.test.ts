import { describe, expect, it } from "vitest";
import { runDesignReview } from "@/lib/design/run-review";
import { checkCommissioning, commissioningComplete } from "@/lib/engineering/commissioning";
import { commissioningFacts, moduleMonitoringOf, toCommissioningRecord } from "@/lib/field/commissioning-facts";
import { DEMO_CATALOG } from "@/lib/seed/demo-catalog";
import { demoEquipment, passingDemoReadings } from "@/lib/seed/demo-commissioning";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { JURISDICTIONS, UTILITIES } from "@/lib/seed/demo-scenario";
import { EquipmentInput, type EquipmentDto } from "@/lib/schemas/equipment";

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
const services = [100, 150, 200].flatMap((mainBreakerA) => [0, 1].map((variant) => ({ mainBreakerA, variant })));

describe("demo commissioning readings (invented)", () => {
  it("module-level monitoring follows the demo catalog: optimizers and microinverters report, shutdown units do not", () => {
    const monitoring = [0, 1].map((variant) =>
      moduleMonitoringOf(demoEquipment(demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, variant), catalog)),
    );
    expect(monitoring).toEqual([false, true]); // variant 0: string inverter with shutdown units; 1: optimizers
    expect(moduleMonitoringOf(demoEquipment(demoDesign(ids, { busbarA: 150, mainBreakerA: 150 }, 0), catalog))).toBe(true); // microinverters
  });

  it.each(services.flatMap((s) => JURISDICTIONS.map((j) => ({ ...s, j }))))(
    "pass every check: $mainBreakerA A service, variant $variant, $j.name",
    ({ mainBreakerA, variant, j }) => {
      const draft = demoDesign(ids, { busbarA: mainBreakerA, mainBreakerA }, variant);
      const outcome = runDesignReview(draft, catalog, {
        recordLowTempC: j.recordLowTempC,
        highDesignTempC: j.highDesignTempC,
        necEdition: j.necEdition,
      });
      const moduleMonitoring = moduleMonitoringOf(demoEquipment(draft, catalog));
      if (outcome.status !== "reviewed") throw new Error("demo design did not review");
      const { ratings } = outcome.review.summary;
      for (const [seed, utility] of Array.from({ length: 28 }, (_, i) => [i, UTILITIES[i % UTILITIES.length]] as const)) {
        const facts = commissioningFacts({
          design: outcome.design,
          edition: j.necEdition,
          acceptedGridProfiles: utility.acceptedGridProfiles,
          moduleCount: ratings.moduleCount,
          acKw: ratings.acKw,
          moduleMonitoring,
        });
        const results = checkCommissioning(toCommissioningRecord(facts, passingDemoReadings(facts, seed)));
        expect(results.filter((r) => r.status !== "pass").map((r) => `${r.id}: ${r.message}`)).toEqual([]);
        expect(commissioningComplete(results).complete).toBe(true);
        // The new readings are all there: strings tested before energizing, the serial against its card, devices found.
        const kinds = new Set(results.map((r) => r.kind));
        if (facts.stringTests.length)
          expect([...kinds]).toEqual(
            expect.arrayContaining(["string-polarity", "string-insulation", "inverter-serial", "inverter-activation"]),
          );
        if (facts.stringTests.some((s) => s.vocApplies)) expect(kinds.has("string-voc")).toBe(true);
        expect(kinds.has("device-pairing")).toBe(moduleMonitoring);
        expect(kinds.has("modules-reporting")).toBe(moduleMonitoring);
      }
    },
  );
});

describe("demo signed form (invented)", () => {
  it("is a one-page PDF saying it is a demo, naming the project", async () => {
    const { demoSignedFormPdf } = await import("@/lib/seed/attach-demo-signed-forms");
    const { PDFParse } = await import("pdf-parse");
    const parser = new PDFParse({
      data: await demoSignedFormPdf({ number: 12, customerName: "Wren Alderley", street: "44 Cinder Lane", city: "Brackenford" }),
    });
    const { text, total } = await parser.getText();
    await parser.destroy();
    expect(total).toBe(1);
    expect(text).toContain("Project 12 · Wren Alderley");
    expect(text).toContain("Not a real document");
  });
});
