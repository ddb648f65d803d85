import { describe, expect, it } from "vitest";
import { runDesignReview } from "@/lib/design/run-review";
import { DEMO_CATALOG } from "@/lib/seed/demo-catalog";
import { JURISDICTIONS } from "@/lib/seed/demo-scenario";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { EquipmentInput, type EquipmentDto } from "@/lib/schemas/equipment";

// The demo catalog as DTOs with stable fake ids.
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

describe("demo designs", () => {
  const cases = JURISDICTIONS.flatMap((j) =>
    [
      { busbarA: 100, mainBreakerA: 100 },
      { busbarA: 150, mainBreakerA: 150 },
      { busbarA: 200, mainBreakerA: 200 },
      { busbarA: 225, mainBreakerA: 200 },
    ].flatMap((service) => [0, 1].map((variant) => ({ j, service, variant }))),
  );

  it.each(cases)(
    "pass the review in $j.name (NEC $j.necEdition) on a $service.busbarA A bus, variant $variant",
    ({ j, service, variant }) => {
      const out = runDesignReview(demoDesign(ids, service, variant), catalog, j);
      if (out.status !== "reviewed") throw new Error(JSON.stringify(out.problems));
      const failing = out.review.checks.filter((c) => c.status !== "pass").map((c) => `${c.status} ${c.id}: ${c.message}`);
      expect(failing).toEqual([]);
    },
  );
});
