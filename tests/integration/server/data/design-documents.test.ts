import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { reviewDocument } from "@/lib/design/document-review";
import { AppError } from "@/lib/errors";
import { DEMO_CATALOG } from "@/lib/seed/demo-catalog";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { EquipmentInput } from "@/lib/schemas/equipment";
import { createApiToken, getViewerByApiToken } from "@/lib/server/data/api-tokens";
import { getProjectDesignDocument, reviewProjectDocument } from "@/lib/server/data/design-documents";
import { reviewProjectDesign, saveDesignDraft } from "@/lib/server/data/designs";
import { createEquipment } from "@/lib/server/data/equipment";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let acme: OrgFixture;
let rival: OrgFixture;
let designedId: string;
let blankId: string;

const failure = async (promise: Promise<unknown>) =>
  promise.then(
    () => null,
    (e: unknown) => (e instanceof AppError ? e : Promise.reject(e)),
  );

beforeAll(async () => {
  acme = await makeOrganization("Acme");
  rival = await makeOrganization("Rival");
  const catalog = await Promise.all(
    DEMO_CATALOG.map((item) => createEquipment({ viewer: acme.viewers.admin, values: EquipmentInput.parse(item) })),
  );
  const ids = Object.fromEntries(
    Object.entries(DESIGN_MODELS).map(([k, model]) => [k, catalog.find((c) => c.model === model)!.id]),
  ) as CatalogIds;
  designedId = (await makeProject(acme, { customerName: "Design Export" })).id;
  blankId = (await makeProject(acme, { customerName: "No Design Yet" })).id;
  await saveDesignDraft({
    viewer: acme.viewers.coordinator,
    projectId: designedId,
    draft: demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, 0),
  });
});

afterAll(async () => {
  await closeDb();
});

describe("getProjectDesignDocument and reviewProjectDocument", () => {
  it("export the saved design, whose review posted back is the project's review", async () => {
    const document = await getProjectDesignDocument({ viewer: acme.viewers.coordinator, projectId: designedId });
    expect(document).toMatchObject({
      codeEdition: "2020",
      site: { recordLowC: -20, highAmbientC: 33 },
      strings: [{ id: "S1" }, { id: "S2" }],
    });
    const review = await reviewProjectDocument({ viewer: acme.viewers.coordinator, projectId: designedId });
    const posted = reviewDocument(JSON.parse(JSON.stringify(document)));
    expect(posted).toEqual({ ok: true, review });
    expect(review.status).toBe("pass");
  });

  it("agree with the editor's own review", async () => {
    const editor = await reviewProjectDesign({ viewer: acme.viewers.coordinator, projectId: designedId });
    const review = await reviewProjectDocument({ viewer: acme.viewers.coordinator, projectId: designedId });
    if (editor.status !== "reviewed") throw new Error("the demo design should be complete");
    expect(review.checks.map((c) => [c.id, c.status, c.value])).toEqual(editor.review.checks.map((c) => [c.id, c.status, c.value]));
  });

  it("answer an API token of the same organization", async () => {
    const { token } = await createApiToken({ viewer: acme.viewers.admin, input: { name: "Exporter" } });
    const viewer = (await getViewerByApiToken(token))!;
    expect((await reviewProjectDocument({ viewer, projectId: designedId })).status).toBe("pass");
  });

  it("treat another organization's project as missing", async () => {
    expect((await failure(getProjectDesignDocument({ viewer: rival.viewers.admin, projectId: designedId })))?.code).toBe("NOT_FOUND");
    expect((await failure(reviewProjectDocument({ viewer: rival.viewers.admin, projectId: designedId })))?.code).toBe("NOT_FOUND");
  });

  it("name what is missing when the design is incomplete", async () => {
    const error = await failure(getProjectDesignDocument({ viewer: acme.viewers.coordinator, projectId: blankId }));
    expect(error?.code).toBe("INVALID_INPUT");
    expect(error?.message).toMatch(/incomplete/);
    expect(Object.keys(error?.fieldErrors ?? {})).toContain("equipment.moduleId");
  });
});
