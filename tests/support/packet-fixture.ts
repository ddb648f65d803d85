// A whole packet input from the invented demo catalog and a demo design, for
// template, diagram and packet tests. No database needed.
import { runDesignReview } from "@/lib/design/run-review";
import { toEngineInput } from "@/lib/design/to-engine";
import type { PacketKind } from "@/lib/domain/stored-values";
import type { PacketInput } from "@/lib/documents/packets/input";
import { DesignInput } from "@/lib/schemas/design";
import { EquipmentInput, type EquipmentDto } from "@/lib/schemas/equipment";
import { DEMO_CATALOG } from "@/lib/seed/demo-catalog";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";

export const FIXTURE_CATALOG = DEMO_CATALOG.map(
  (item, i) =>
    ({
      ...EquipmentInput.parse(item),
      id: `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`,
      isArchived: false,
      datasheet: null,
    }) as EquipmentDto,
);
const ids = Object.fromEntries(
  Object.entries(DESIGN_MODELS).map(([k, model]) => [k, FIXTURE_CATALOG.find((c) => c.model === model)!.id]),
) as CatalogIds;
const JURISDICTION = {
  name: "City of Brackenford Building Division",
  state: "CO",
  necEdition: 2023 as const,
  recordLowTempC: -24,
  highDesignTempC: 34,
};

/** variant 0: string inverter with shutdown devices; 1: optimizer strings; service 150 A: microinverters. */
export function packetFixture({
  kind = "permit",
  variant = 0,
  busbarA = 200,
  mainBreakerA = 200,
  revision = 1,
}: { kind?: PacketKind; variant?: number; busbarA?: number; mainBreakerA?: number; revision?: number } = {}): PacketInput {
  const draft = demoDesign(ids, { busbarA, mainBreakerA }, variant);
  const designInput = DesignInput.parse(draft);
  const engine = toEngineInput(designInput, FIXTURE_CATALOG, JURISDICTION);
  if (!engine.ok) throw new Error(JSON.stringify(engine.problems));
  const outcome = runDesignReview(draft, FIXTURE_CATALOG, JURISDICTION);
  if (outcome.status !== "reviewed") throw new Error("fixture design does not review");
  const byId = (id: string | null) => FIXTURE_CATALOG.find((c) => c.id === id);
  return {
    kind,
    revision,
    // 7:30 pm on November 20 in Denver, already November 21 in UTC: every sheet must say the 20th.
    generatedAt: "2026-11-21T02:30:00.000Z",
    preparedBy: {
      name: "Dana Okafor",
      organizationName: "Quillmoor Solar Electric",
      licenseNumber: "EC-40718 (demo)",
      phone: "(555) 014-2210",
      timeZone: "America/Denver",
    },
    project: {
      number: 1042,
      customerName: "Imogen Halvorsen",
      customerEmail: "imogen@mail.example",
      customerPhone: "(555) 010-3000",
      street: "120 Larkin Mill Rd",
      city: "Brackenford",
      state: "CO",
      postalCode: "80913",
      utilityAccountNumber: "BL-4410000",
      meterNumber: "M72000000",
    },
    jurisdiction: JURISDICTION,
    utility: {
      name: "Brackenford Municipal Light & Power",
      acceptedGridProfiles: ["IEEE 1547-2018 Category B, the utility's default settings"],
    },
    designInput,
    design: engine.design,
    site: engine.site,
    equipment: {
      module: byId(designInput.equipment.moduleId) as PacketInput["equipment"]["module"],
      inverters: designInput.equipment.inverters.map((l) => ({
        lineId: l.lineId,
        quantity: l.quantity,
        item: byId(l.equipmentId) as PacketInput["equipment"]["inverters"][number]["item"],
      })),
      device: (byId(designInput.equipment.deviceId) ?? null) as PacketInput["equipment"]["device"],
    },
    review: outcome.review,
    override: null,
    changes: revision > 1 ? ["PV breaker: 35 A → 40 A", "Run “Inverter to service panel”: 8 AWG → 6 AWG"] : [],
    datasheets: [],
  };
}
