import { describe, expect, it } from "vitest";
import { essSitingOf } from "@/lib/authorities/ess-siting";
import { reviewDocument } from "@/lib/design/document-review";
import { draftToDocument } from "@/lib/design/draft-to-document";
import { runDesignReview } from "@/lib/design/run-review";
import { storageFromInput } from "@/lib/design/storage-to-engine";
import { toEngineInput } from "@/lib/design/to-engine";
import { toReviewJson } from "@/lib/design/review-json";
import { reviewDesign } from "@/lib/engineering";
import { DEFAULT_ESS_SITING } from "@/lib/engineering/checks/ess-siting";
import { DesignDraft, DesignInput, StorageInput } from "@/lib/schemas/design";
import { JURISDICTIONS } from "@/lib/seed/demo-scenario";
import { DESIGN_MODELS, type CatalogIds } from "@/lib/seed/demo-designs";
import { STORAGE_MODELS, STORAGE_SCENARIOS, demoStorageDesign, type StorageIds } from "@/lib/seed/demo-storage-designs";
import { DEMO_CATALOG_DTOS as catalog, demoIdsOf } from "../../support/demo-catalog-dtos";

const ids = demoIdsOf(DESIGN_MODELS) as CatalogIds;
const storageIds = demoIdsOf(STORAGE_MODELS) as StorageIds;
const quillan = JURISDICTIONS.find((j) => j.key === "quillan")!; // NEC 2020
const service = (scenario: string) => ({ busbarA: scenario === "ac-added" ? 225 : 200, mainBreakerA: 200 });
const design = (scenario: (typeof STORAGE_SCENARIOS)[number]) => demoStorageDesign(ids, storageIds, service(scenario), scenario, 0);

describe("the editor's storage entries", () => {
  it("drop whatever else a 'no battery' entry holds, so a design switched back to no battery is never refused", () => {
    expect(StorageInput.parse({ coupling: "none", banks: [{ lineId: "bat-1", quantity: "x" }] })).toEqual({ coupling: "none" });
    const pvOnly = { ...design("dc-backup"), storage: { coupling: "none" as const } };
    const out = toEngineInput(DesignInput.parse(pvOnly), catalog, quillan);
    expect(out.ok && "storage" in out.design).toBe(false);
    expect(out.ok).toBe(true);
  });

  it("name each missing entry of a battery by its form path", () => {
    const out = StorageInput.safeParse({ coupling: "dc", multimodeInverterLineId: "", banks: [], hasBackupPanel: true });
    const paths = Object.fromEntries((out.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));
    expect(paths).toMatchObject({
      multimodeInverterLineId: "Choose the multimode inverter the batteries charge through",
      banks: "Add at least one battery",
      operatingMode: "Choose the operating mode",
    });
    // The backup panel's own figures are asked for once the rest of the battery reads.
    const dc = design("dc-backup").storage;
    const panel = StorageInput.safeParse({ ...dc, backupBusbarA: "", backupInverterBreakerA: "" });
    expect(Object.fromEntries((panel.error?.issues ?? []).map((i) => [i.path.join("."), i.message]))).toEqual({
      backupBusbarA: "Enter the backup panel's busbar rating",
      backupInverterBreakerA: "Enter the inverter's breaker in the backup panel",
    });
    expect(StorageInput.safeParse({ coupling: "solar" }).error?.issues[0]?.message).toBe("Choose no battery, DC-coupled or AC-coupled");
  });

  it("are saved half-typed as drafts, whichever coupling they hold", () => {
    const draft = {
      storage: { coupling: "ac", batteryInverterId: "", banks: [{ lineId: "bat-1", quantity: "2" }], backupLoads: [{ name: "Pump" }] },
    };
    expect(DesignDraft.safeParse(draft).success).toBe(true);
    expect(DesignDraft.safeParse({ storage: { banks: [{ lineId: { nested: true } }] } }).success).toBe(false);
  });

  it("map onto the engine's storage: catalog units, the multimode inverter's backup output and power control listing", () => {
    const out = toEngineInput(DesignInput.parse(design("non-export")), catalog, quillan);
    if (!out.ok) throw new Error(JSON.stringify(out.problems));
    expect(out.design.storage).toMatchObject({
      coupling: "dc",
      multimodeInverterId: "inv-1",
      operatingMode: "non-export",
      exportLimitKw: 0,
      pcs: { listed: true, currentSettingA: 32 },
      backupOutput: { continuousA: 47.5, voltageV: 240, transferTimeS: 0.02 },
      banks: [
        { id: "bat-1", quantity: 1, location: "utility-space", unit: { nameplateKwh: 13.5, listings: ["UL 9540", "UL 9540A", "UL 1973"] } },
      ],
      disconnect: { kind: "integral" },
    });
    const ac = toEngineInput(DesignInput.parse(design("ac-added")), catalog, quillan);
    expect(ac.ok && ac.design.storage).toMatchObject({
      coupling: "ac",
      batteryInverter: { model: "AB-5000 Battery Inverter", acOutputCurrentA: 20.8, breakerA: 30 },
      pcs: { listed: false },
    });
  });

  it("point a battery or multimode inverter that is not in the design back at its field", () => {
    const parsed = DesignInput.parse(design("dc-backup"));
    const input = parsed.storage as Extract<typeof parsed.storage, { coupling: "dc" }>;
    const out = storageFromInput(
      { ...input, multimodeInverterLineId: "inv-9", banks: [{ ...input.banks[0]!, equipmentId: ids.stringModule }] },
      catalog,
      [],
      parsed.equipment.inverters,
    );
    expect(out.problems.map((p) => p.path)).toEqual(["storage.banks.0.equipmentId", "storage.multimodeInverterLineId"]);
  });
});

describe("a demo design with batteries exported and posted back", () => {
  it.each(STORAGE_SCENARIOS)("%s reviews the same, storage and all", (scenario) => {
    const draft = design(scenario);
    const exported = draftToDocument(draft, catalog, quillan);
    if (!exported.ok) throw new Error(JSON.stringify(exported.problems));
    expect(exported.document.storage?.batteries.length).toBe(1);
    const posted = reviewDocument(JSON.parse(JSON.stringify(exported.document)));
    if (!posted.ok) throw new Error(JSON.stringify(posted.problems));
    const input = toEngineInput(DesignInput.parse(draft), catalog, quillan);
    if (!input.ok) throw new Error(JSON.stringify(input.problems));
    expect(posted.review).toEqual(toReviewJson(reviewDesign(input.design, input.site), { roofPlanesGiven: true }));
    expect(posted.review.storage?.coupling).toBe(scenario === "ac-added" ? "ac" : "dc");
  });

  it("refuses storage that names what the document does not hold, by JSON path", () => {
    const exported = draftToDocument(design("dc-backup"), catalog, quillan);
    if (!exported.ok) throw new Error("export failed");
    const doc = JSON.parse(JSON.stringify(exported.document)) as { storage: Record<string, unknown> };
    const ac = reviewDocument({ ...doc, storage: { ...doc.storage, coupling: "ac" } });
    expect(ac.ok ? [] : ac.problems.map((p) => p.path)).toEqual(["storage.batteryInverter", "storage.multimodeInverterId"]);
    // An entry only the engine can judge comes back under the battery's place in the list.
    const batteries = doc.storage.batteries as { quantity: number }[];
    const zero = reviewDocument({ ...doc, storage: { ...doc.storage, batteries: [{ ...batteries[0], quantity: 0 }] } });
    expect(zero.ok ? [] : zero.problems.map((p) => p.path)).toEqual(["storage.batteries[0].quantity"]);
  });
});

describe("the AHJ's adopted ESS siting limits", () => {
  it("default to the published ones when the AHJ entered none", () => {
    const none = { essCode: null, essPerUnitKwh: null, essGarageKwh: null, essOutdoorKwh: null, essUtilitySpaceKwh: null };
    expect(essSitingOf(none)).toBeUndefined();
    expect(essSitingOf({ ...none, essGarageKwh: 60 })).toEqual({
      ...DEFAULT_ESS_SITING,
      aggregateKwh: { ...DEFAULT_ESS_SITING.aggregateKwh, garage: 60 },
    });
  });

  // The rule, not one number: the garage's aggregate is held to whatever limit the AHJ adopted.
  it.each([
    [null, "pass", 80, "IRC 2021 R328.5"],
    [77.5, "pass", 77.5, "IRC 2021 R328.5"],
    [60, "fail", 60, "Quillan amended code R328.5"],
  ] as const)("a 77.5 kWh garage under an adopted limit of %s kWh: %s", (garageKwh, status, limit, cited) => {
    const essSiting = essSitingOf({
      essCode: garageKwh === 60 ? "Quillan amended code" : null,
      essPerUnitKwh: null,
      essGarageKwh: garageKwh,
      essOutdoorKwh: null,
      essUtilitySpaceKwh: null,
    });
    const out = runDesignReview(design("dc-backup-full-garage"), catalog, { ...quillan, ...(essSiting ? { essSiting } : {}) });
    if (out.status !== "reviewed") throw new Error(JSON.stringify(out.problems));
    const garage = out.review.checks.find((c) => c.id === "ess-location:garage")!;
    expect([garage.status, garage.limit, garage.clause]).toEqual([status, limit, cited]);
  });
});
