import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Op } from "sequelize";
import { AuditEvent, CommissioningRecord, OutboxMessage, Project, StageChange } from "@/models";
import { AppError } from "@/lib/errors";
import { ProjectInput, ProjectListQuery } from "@/lib/schemas/project";
import {
  STAGE_MAIL_HOLD_SECONDS,
  changeProjectStage,
  createProject,
  getProjectById,
  listProjects,
  listStageChanges,
  updateProject,
} from "@/lib/server/data/projects";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, projectFormValues, type OrgFixture } from "../../support/fixtures";

let acme: OrgFixture;
let rival: OrgFixture;

const query = (q: Partial<Record<string, unknown>> = {}) => ProjectListQuery.parse(q);
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

beforeAll(async () => {
  acme = await makeOrganization("Acme");
  rival = await makeOrganization("Rival");
  await makeProject(acme, {
    customerName: "Hollis Brandt",
    utilityAccountNumber: "ZX-77001",
    stage: "permit_filed",
    installerId: acme.users.installer.id,
  });
  await makeProject(acme, { customerName: "Mira Stoneleigh", street: "9 Quarry Bend", stage: "draft" });
  await makeProject(acme, { customerName: "Perrin 50%_Off", stage: "closed", installerId: acme.users.otherInstaller.id });
  await makeProject(rival, { customerName: "Hollis Rival-Brandt" });
});

afterAll(async () => {
  await closeDb();
});

describe("listProjects", () => {
  it("shows only the viewer's organization", async () => {
    const page = await listProjects({ viewer: acme.viewers.coordinator, query: query({ pageSize: 100 }) });
    expect(page.total).toBe(3);
    expect(page.items.every((p) => p.customerName !== "Hollis Rival-Brandt")).toBe(true);
  });

  it("shows installers only the projects assigned to them", async () => {
    const page = await listProjects({ viewer: acme.viewers.installer, query: query() });
    expect(page.items.map((p) => p.customerName)).toEqual(["Hollis Brandt"]);
  });

  it.each([
    ["customer name", "stoneleigh", ["Mira Stoneleigh"]],
    ["street", "quarry", ["Mira Stoneleigh"]],
    ["utility account number", "zx-770", ["Hollis Brandt"]],
    ["literal % and _", "50%_", ["Perrin 50%_Off"]],
    ["nothing", "no such customer", []],
  ])("searches by %s", async (_what, q, names) => {
    const page = await listProjects({ viewer: acme.viewers.coordinator, query: query({ q }) });
    expect(page.items.map((p) => p.customerName)).toEqual(names);
  });

  it("filters by stage and sorts stages in pipeline order", async () => {
    const filtered = await listProjects({ viewer: acme.viewers.coordinator, query: query({ stage: "closed" }) });
    expect(filtered.items.map((p) => p.stage)).toEqual(["closed"]);
    const sorted = await listProjects({ viewer: acme.viewers.coordinator, query: query({ sort: "stage", direction: "asc" }) });
    expect(sorted.items.map((p) => p.stage)).toEqual(["draft", "permit_filed", "closed"]);
  });

  it("pages", async () => {
    const first = await listProjects({ viewer: acme.viewers.coordinator, query: query({ pageSize: 2, page: 1 }) });
    const second = await listProjects({ viewer: acme.viewers.coordinator, query: query({ pageSize: 2, page: 2 }) });
    expect(first.items).toHaveLength(2);
    expect(second.items).toHaveLength(1);
    expect(first.pageCount).toBe(2);
    expect(new Set([...first.items, ...second.items].map((p) => p.id)).size).toBe(3);
  });
});

describe("getProjectById", () => {
  it("answers NOT_FOUND for another organization's project, an unassigned one, and a malformed id", async () => {
    const foreign = await makeProject(rival);
    const unassigned = await makeProject(acme);
    expect(await code(getProjectById({ viewer: acme.viewers.admin, projectId: foreign.id }))).toBe("NOT_FOUND");
    expect(await code(getProjectById({ viewer: acme.viewers.installer, projectId: unassigned.id }))).toBe("NOT_FOUND");
    expect(await code(getProjectById({ viewer: acme.viewers.admin, projectId: "not-a-uuid" }))).toBe("NOT_FOUND");
    expect((await getProjectById({ viewer: acme.viewers.coordinator, projectId: unassigned.id })).id).toBe(unassigned.id);
  });
});

describe("createProject and updateProject", () => {
  it("creates a draft with its first timeline entry and an audit event", async () => {
    const values = ProjectInput.parse(projectFormValues(acme));
    const project = await createProject({ viewer: acme.viewers.coordinator, values });
    expect(project).toMatchObject({ stage: "draft", state: "CO", busbarA: 225, customerPhone: null, installer: null });
    const timeline = await listStageChanges({ viewer: acme.viewers.coordinator, projectId: project.id });
    expect(timeline.map((t) => t.toStage)).toEqual(["draft"]);
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "project.created" } })).toBe(1);
  });

  it("refuses another organization's jurisdiction and an installer in the coordinator field", async () => {
    const values = ProjectInput.parse(
      projectFormValues(acme, { jurisdictionId: rival.jurisdiction.id, coordinatorId: acme.users.installer.id }),
    );
    const error = await createProject({ viewer: acme.viewers.coordinator, values }).catch((e) => e);
    expect(error).toBeInstanceOf(AppError);
    expect(error.code).toBe("INVALID_INPUT");
    expect(Object.keys(error.fieldErrors).sort()).toEqual(["coordinatorId", "jurisdictionId"]);
  });

  it("records what changed on update", async () => {
    const project = await createProject({ viewer: acme.viewers.coordinator, values: ProjectInput.parse(projectFormValues(acme)) });
    await updateProject({
      viewer: acme.viewers.coordinator,
      projectId: project.id,
      values: ProjectInput.parse(projectFormValues(acme, { mainBreakerA: "175" })),
    });
    const event = await AuditEvent.findOne({ where: { entityId: project.id, action: "project.updated" } });
    expect(event?.changes).toEqual({ mainBreakerA: { before: 200, after: 175 } });
  });

  it("does not let a rival update the project", async () => {
    const project = await makeProject(acme);
    const values = ProjectInput.parse(projectFormValues(rival));
    expect(await code(updateProject({ viewer: rival.viewers.admin, projectId: project.id, values }))).toBe("NOT_FOUND");
  });
});

describe("changeProjectStage", () => {
  it("moves the stage and writes the timeline entry and the audit event together", async () => {
    const project = await makeProject(acme, { stage: "design_checked" });
    const moved = await changeProjectStage({
      viewer: acme.viewers.coordinator,
      projectId: project.id,
      toStage: "permit_filed",
      note: "Filed at the counter",
    });
    expect(moved.stage).toBe("permit_filed");
    expect(moved.daysInStage).toBe(0);
    const change = await StageChange.findOne({ where: { projectId: project.id, toStage: "permit_filed" } });
    expect(change).toMatchObject({ fromStage: "design_checked", note: "Filed at the counter", changedById: acme.users.coordinator.id });
    const audit = await AuditEvent.findOne({ where: { entityId: project.id, action: "project.stage-changed" } });
    expect(audit?.changes.stage).toEqual({ before: "design_checked", after: "permit_filed" });
  });

  it("asks for a note to mark a project commissioned while its field record is open or the signed form is missing", async () => {
    const project = await makeProject(acme, { stage: "utility_approved", installerId: acme.users.installer.id });
    const refused = await changeProjectStage({
      viewer: acme.viewers.coordinator,
      projectId: project.id,
      toStage: "commissioned",
      note: "",
    }).catch((e) => e);
    expect(refused).toMatchObject({ code: "CONFLICT" });
    expect(refused.message).toMatch(/commissioning record is not complete/);
    expect(refused.fieldErrors.note[0]).toMatch(/^Say why/);
    expect((await getProjectById({ viewer: acme.viewers.coordinator, projectId: project.id })).stage).toBe("utility_approved");

    await CommissioningRecord.create({
      organizationId: acme.organization.id,
      projectId: project.id,
      readings: {},
      status: "complete",
      updatedById: null,
    });
    const unsigned = await changeProjectStage({
      viewer: acme.viewers.coordinator,
      projectId: project.id,
      toStage: "commissioned",
      note: "",
    }).catch((e) => e);
    expect(unsigned.message).toMatch(/No signed certificate/);

    const moved = await changeProjectStage({
      viewer: acme.viewers.coordinator,
      projectId: project.id,
      toStage: "commissioned",
      note: "Signed form on paper in the office file",
    });
    expect(moved.stage).toBe("commissioned");
  });

  it("e-mails the installer and the coordinator through the outbox, but not whoever made the change", async () => {
    const project = await makeProject(acme, { stage: "utility_approved", installerId: acme.users.installer.id });
    await changeProjectStage({
      viewer: acme.viewers.admin,
      projectId: project.id,
      toStage: "commissioned",
      note: "Commissioning record complete",
    });
    const number = (await Project.findByPk(project.id))!.number;
    const sent = await OutboxMessage.findAll({ where: { subject: { [Op.like]: `Project ${number} is now “Commissioned”%` } } });
    expect(sent.map((m) => m.toAddress).sort()).toEqual([acme.users.coordinator.email, acme.users.installer.email].sort());
    expect(sent[0].textBody).toContain("Note: Commissioning record complete");
    expect(sent[0].textBody).toContain(`/projects/${project.id}`);

    // A second move moments later joins the installer's held message; the coordinator made it, so theirs stays as it was.
    await changeProjectStage({
      viewer: acme.viewers.coordinator,
      projectId: project.id,
      toStage: "pto_received",
      note: "PTO letter by e-mail",
    });
    const second = await OutboxMessage.findAll({ where: { subject: { [Op.like]: `Project ${number} is now “PTO received”%` } } });
    expect(second.map((m) => m.toAddress)).toEqual([acme.users.installer.email]);
    expect(second[0]!.textBody).toMatch(
      /moved it from “Utility approved” to “Commissioned”[\s\S]*moved it from “Commissioned” to “PTO received”/,
    );
    const forInstaller = await OutboxMessage.count({
      where: { toAddress: acme.users.installer.email, coalesceKey: `stage-change:${project.id}` },
    });
    expect(forInstaller).toBe(1);
  });

  it("gathers a burst of moves of one project into one e-mail per person, held briefly for more", async () => {
    // Defect: ten stage changes in a few seconds sent the installer ten e-mails.
    const project = await makeProject(acme, { stage: "draft", installerId: acme.users.installer.id });
    const path = [
      "design_checked",
      "permit_filed",
      "permit_issued",
      "installed",
      "inspection_passed",
      "installed",
      "inspection_passed",
      "utility_filed",
      "utility_approved",
      "utility_filed",
    ] as const;
    const before = Date.now();
    // Moving past facts nobody recorded needs a word of why.
    for (const toStage of path)
      await changeProjectStage({ viewer: acme.viewers.coordinator, projectId: project.id, toStage, note: "Caught up by hand" });
    const held = await OutboxMessage.findAll({ where: { coalesceKey: `stage-change:${project.id}` } });
    expect(held.map((m) => m.toAddress)).toEqual([acme.users.installer.email]);
    expect(held[0]!.textBody).toContain(`changed stage ${path.length} times`);
    expect(held[0]!.textBody.match(/moved it from/g)).toHaveLength(path.length);
    expect(held[0]!.subject).toContain("is now “Utility filed”");
    // Held for the window, then sent like any other message.
    expect(held[0]!.nextAttemptAt.getTime()).toBeGreaterThanOrEqual(before + (STAGE_MAIL_HOLD_SECONDS - 1) * 1000);
  });

  it("refuses installers and the same stage, and changes nothing", async () => {
    const project = await makeProject(acme, { stage: "installed", installerId: acme.users.installer.id });
    expect(await code(changeProjectStage({ viewer: acme.viewers.installer, projectId: project.id, toStage: "closed", note: "" }))).toBe(
      "FORBIDDEN",
    );
    expect(
      await code(changeProjectStage({ viewer: acme.viewers.coordinator, projectId: project.id, toStage: "installed", note: "" })),
    ).toBe("CONFLICT");
    expect(await StageChange.count({ where: { projectId: project.id } })).toBe(0);
    expect((await getProjectById({ viewer: acme.viewers.coordinator, projectId: project.id })).stage).toBe("installed");
  });
});
