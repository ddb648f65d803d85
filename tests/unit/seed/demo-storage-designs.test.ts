import { describe, expect, it } from "vitest";
import { runDesignReview } from "@/lib/design/run-review";
import { CUSTOMERS, JURISDICTIONS } from "@/lib/seed/demo-scenario";
import { DESIGN_MODELS, type CatalogIds } from "@/lib/seed/demo-designs";
import {
  DEMO_STORAGE_CUSTOMERS,
  STORAGE_MODELS,
  STORAGE_SCENARIOS,
  demoStorageDesign,
  type StorageIds,
  type StorageScenario,
} from "@/lib/seed/demo-storage-designs";
import { DEMO_CATALOG_DTOS, demoIdsOf } from "../../support/demo-catalog-dtos";

const catalog = DEMO_CATALOG_DTOS;
const idsOf = demoIdsOf;
const ids = idsOf(DESIGN_MODELS) as CatalogIds;
const storageIds = idsOf(STORAGE_MODELS) as StorageIds;

// The services and AHJs the seed gives these customers' projects (seed-demo.ts): AC coupling needs the 225 A
// bus for a second source, and the non-export system's power control setting counts only from NEC 2020 (705.13).
const CASES: { scenario: StorageScenario; service: { busbarA: number; mainBreakerA: number }; ahj: string }[] = [
  { scenario: "dc-backup", service: { busbarA: 200, mainBreakerA: 200 }, ahj: "brackenford" },
  { scenario: "dc-backup-full-garage", service: { busbarA: 200, mainBreakerA: 200 }, ahj: "quillan" },
  { scenario: "ac-added", service: { busbarA: 225, mainBreakerA: 200 }, ahj: "brackenford" },
  { scenario: "non-export", service: { busbarA: 200, mainBreakerA: 200 }, ahj: "quillan" },
];

const review = (scenario: StorageScenario, service: { busbarA: number; mainBreakerA: number }, ahj: string, variant = 0) => {
  const j = JURISDICTIONS.find((x) => x.key === ahj)!;
  const out = runDesignReview(demoStorageDesign(ids, storageIds, service, scenario, variant), catalog, j);
  if (out.status !== "reviewed") throw new Error(JSON.stringify(out.problems));
  return out;
};

describe("demo storage designs", () => {
  it("cover every scenario the demo promises, each for a customer of the demo", () => {
    expect(new Set(Object.values(DEMO_STORAGE_CUSTOMERS))).toEqual(new Set(STORAGE_SCENARIOS));
    for (const name of Object.keys(DEMO_STORAGE_CUSTOMERS)) expect(CUSTOMERS).toContain(name);
  });

  it.each(CASES.flatMap((c) => [0, 1].map((variant) => ({ ...c, variant }))))(
    "$scenario reviews without a failure (variant $variant)",
    ({ scenario, service, ahj, variant }) => {
      const out = review(scenario, service, ahj, variant);
      const open = out.review.checks.filter((c) => c.status !== "pass").map((c) => `${c.status} ${c.id}`);
      // The non-export system's finding is the scenario's point: its 60 A breaker itself would not fit the 120 % rule.
      expect(open).toEqual(scenario === "non-export" ? ["warn point-of-connection"] : []);
      expect(out.review.storage).toBeDefined();
    },
  );

  it("the full garage holds 77.5 kWh, just inside the 80 kWh the published limit allows there (IRC 2021 R328.5, from memory)", () => {
    const out = review("dc-backup-full-garage", { busbarA: 200, mainBreakerA: 200 }, "quillan");
    const garage = out.review.checks.find((c) => c.id === "ess-location:garage")!;
    expect([garage.value, garage.limit, garage.status]).toEqual([77.5, 80, "pass"]);
  });

  it("the non-export system counts its power control setting at the panel where the edition has 705.13 (NEC 2020), not under NEC 2017", () => {
    const out = review("non-export", { busbarA: 200, mainBreakerA: 200 }, "quillan").review;
    expect(out.checks.find((c) => c.id === "point-of-connection")!.clause).toContain("705.13");
    expect(out.storage).toMatchObject({ pointOfConnectionA: 32, countedBy: "power-control-system", exportLimitKw: 0 });
    expect(review("non-export", { busbarA: 200, mainBreakerA: 200 }, "wendle").review.storage).toMatchObject({
      pointOfConnectionA: 47.5,
      countedBy: "inverter-outputs",
    });
  });
});
