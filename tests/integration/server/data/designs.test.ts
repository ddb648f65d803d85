import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent, Design, Equipment } from "@/models";
import { AppError } from "@/lib/errors";
import { seedDemoCatalog } from "@/lib/seed/demo-catalog";
import { DESIGN_MODELS, demoDesign, type CatalogIds } from "@/lib/seed/demo-designs";
import { getDesignForProject, getDesignStatus, reviewProjectDesign, saveDesignDraft } from "@/lib/server/data/designs";
import { db } from "@/lib/server/db";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
let ids: CatalogIds;
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

beforeAll(async () => {
  org = await makeOrganization("Designs");
  rival = await makeOrganization("Rival designs");
  await db().transaction((t) => seedDemoCatalog(org.organization.id, t));
  const items = await Equipment.findAll({ where: { organizationId: org.organization.id } });
  ids = Object.fromEntries(Object.entries(DESIGN_MODELS).map(([k, model]) => [k, items.find((i) => i.model === model)!.id])) as CatalogIds;
});

afterAll(async () => {
  await closeDb();
});

describe("designs", () => {
  it("offers a new draft prefilled from the project's service", async () => {
    const project = await makeProject(org, { busbarA: 225, mainBreakerA: 200 });
    const design = await getDesignForProject({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(design.isSaved).toBe(false);
    expect(design.draft.service).toMatchObject({ busbarA: "225", mainBreakerA: "200", voltageV: "240" });
    expect(await getDesignStatus({ viewer: org.viewers.coordinator, projectId: project.id })).toBeNull();
  });

  it("saves an incomplete draft as typed, without losing anything", async () => {
    const project = await makeProject(org);
    const draft = { service: { busbarA: "two hundred" }, runs: [{ lineId: "run-1", label: "Half typed" }] };
    const saved = await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft });
    expect(saved.outcome.status).toBe("incomplete");
    const back = await getDesignForProject({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(back.draft).toEqual(draft);
    expect(back.reviewStatus).toBe("incomplete");
  });

  it("reviews a whole design on save, keeps the outcome and records when it changes", async () => {
    const project = await makeProject(org, { busbarA: 200, mainBreakerA: 200 });
    const draft = demoDesign(ids, { busbarA: 200, mainBreakerA: 200 }, 0);
    const first = await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft });
    expect(first.outcome.status === "reviewed" && first.outcome.review.summary.status).toBe("pass");
    await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft });
    const status = await getDesignStatus({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(status).toMatchObject({ reviewStatus: "pass", revision: 2 });
    expect(status?.counts?.fail).toBe(0);
    // Two saves, one change of outcome: one audit event.
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "design.review-changed" } })).toBe(1);

    const tooLong = structuredClone(draft);
    tooLong.array.strings[0].modulesInSeries = "16";
    const failing = await saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft: tooLong });
    expect(failing.outcome.status === "reviewed" && failing.outcome.review.summary.status).toBe("fail");
    const reviewed = await reviewProjectDesign({ viewer: org.viewers.installer, projectId: project.id }).catch((e) => e);
    expect(reviewed.code).toBe("NOT_FOUND"); // not assigned to this installer
    expect((await reviewProjectDesign({ viewer: org.viewers.admin, projectId: project.id })).status).toBe("reviewed");
  });

  it("keeps other organizations out and refuses what is not a design", async () => {
    const project = await makeProject(org);
    expect(await code(saveDesignDraft({ viewer: rival.viewers.admin, projectId: project.id, draft: {} }))).toBe("NOT_FOUND");
    expect(await code(getDesignForProject({ viewer: rival.viewers.admin, projectId: project.id }))).toBe("NOT_FOUND");
    expect(await code(saveDesignDraft({ viewer: org.viewers.coordinator, projectId: project.id, draft: { runs: "all of them" } }))).toBe(
      "INVALID_INPUT",
    );
    expect(await Design.count({ where: { projectId: project.id } })).toBe(0);
  });
});
