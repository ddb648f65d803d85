import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Equipment } from "@/models";
import { seedDemoCatalog } from "@/lib/seed/demo-catalog";
import { DESIGN_MODELS, type CatalogIds } from "@/lib/seed/demo-designs";
import { STORAGE_MODELS, demoStorageDesign, type StorageIds } from "@/lib/seed/demo-storage-designs";
import { JurisdictionInput } from "@/lib/schemas/reference-data";
import { getAuthorityById, saveAuthority } from "@/lib/server/data/authorities";
import { reviewProjectDesign, saveDesignDraft } from "@/lib/server/data/designs";
import { getReviewedDesign } from "@/lib/server/data/reviewed-design";
import { db } from "@/lib/server/db";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

// A saved design with batteries is reviewed against the residential ESS limits its AHJ adopted, as the AHJ's
// settings store them (IRC 2021 R328.5 by default: 80 kWh in a garage, from memory).
let org: OrgFixture;
let ids: CatalogIds;
let storageIds: StorageIds;

beforeAll(async () => {
  org = await makeOrganization("Storage designs");
  await db().transaction((transaction) => seedDemoCatalog(org.organization.id, transaction));
  const items = await Equipment.findAll({ where: { organizationId: org.organization.id } });
  const idsOf = (models: Record<string, string>) =>
    Object.fromEntries(Object.entries(models).map(([k, model]) => [k, items.find((i) => i.model === model)!.id]));
  ids = idsOf(DESIGN_MODELS) as CatalogIds;
  storageIds = idsOf(STORAGE_MODELS) as StorageIds;
});

afterAll(async () => {
  await closeDb();
});

const ahjValues = (ess: Record<string, string>) =>
  JurisdictionInput.parse({
    name: org.jurisdiction.name,
    state: "CO",
    necEdition: "2020",
    recordLowTempC: "-20",
    highDesignTempC: "33",
    ...ess,
  });

describe("a design with batteries under its AHJ's adopted ESS limits", () => {
  it("is held to the AHJ's garage limit where it adopted one, and to the published one when it is cleared", async () => {
    const project = await makeProject(org, { busbarA: 200, mainBreakerA: 200 });
    const draft = demoStorageDesign(ids, storageIds, { busbarA: 200, mainBreakerA: 200 }, "dc-backup-full-garage", 0);
    const saved = await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft });
    expect(saved.outcome.status === "reviewed" && saved.outcome.review.summary.status).toBe("pass");

    const admin = org.viewers.admin;
    const adopted = { essCode: "Fixture County amended code", essGarageKwh: "60" };
    await saveAuthority({ viewer: admin, kind: "jurisdiction", authorityId: org.jurisdiction.id, values: ahjValues(adopted) });
    expect(await getAuthorityById({ viewer: admin, kind: "jurisdiction", authorityId: org.jurisdiction.id })).toMatchObject({
      essCode: "Fixture County amended code",
      essGarageKwh: 60,
      essPerUnitKwh: null,
    });
    const strict = await reviewProjectDesign({ viewer: admin, projectId: project.id });
    if (strict.status !== "reviewed") throw new Error("not reviewed");
    const garage = strict.review.checks.find((c) => c.id === "ess-location:garage")!;
    expect([garage.status, garage.value, garage.limit, garage.clause]).toEqual(["fail", 77.5, 60, "Fixture County amended code R328.5"]);
    // The packets, fees and field record read the same review.
    const snapshot = await getReviewedDesign({ viewer: admin, projectId: project.id });
    expect(snapshot.status === "reviewed" && snapshot.reviewed.site.essSiting?.aggregateKwh.garage).toBe(60);

    await saveAuthority({ viewer: admin, kind: "jurisdiction", authorityId: org.jurisdiction.id, values: ahjValues({ essGarageKwh: "" }) });
    const published = await reviewProjectDesign({ viewer: admin, projectId: project.id });
    if (published.status !== "reviewed") throw new Error("not reviewed");
    expect(published.site.essSiting).toBeUndefined();
    expect(published.review.checks.find((c) => c.id === "ess-location:garage")).toMatchObject({ status: "pass", limit: 80 });
  });
});

describe("the packets' equipment of a design with batteries", () => {
  it.each([
    ["dc-backup", ["battery"]],
    ["ac-added", ["battery", "inverter"]],
  ] as const)("a %s design hands its batteries (and battery inverter) to the packets, for their data sheets", async (scenario, kinds) => {
    const project = await makeProject(org, { busbarA: 225, mainBreakerA: 200 });
    const draft = demoStorageDesign(ids, storageIds, { busbarA: 225, mainBreakerA: 200 }, scenario, 0);
    await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft });
    const snapshot = await getReviewedDesign({ viewer: org.viewers.coordinator, projectId: project.id });
    if (snapshot.status !== "reviewed") throw new Error("not reviewed");
    expect(snapshot.reviewed.equipment.storage.map((e) => e.kind)).toEqual(kinds);
    const banks = draft.storage && draft.storage.coupling !== "none" ? draft.storage.banks : [];
    expect(snapshot.reviewed.equipment.storage[0]!.id).toBe(banks[0]!.equipmentId);
  });

  it("hands none for a PV-only design", async () => {
    const project = await makeProject(org, { busbarA: 200, mainBreakerA: 200 });
    const draft = demoStorageDesign(ids, storageIds, { busbarA: 200, mainBreakerA: 200 }, "dc-backup", 0);
    await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft: { ...draft, storage: { coupling: "none" } } });
    const snapshot = await getReviewedDesign({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(snapshot.status === "reviewed" && snapshot.reviewed.equipment.storage).toEqual([]);
  });
});
