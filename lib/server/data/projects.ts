import "server-only";
import { cache } from "react";
import { literal, Op, type OrderItem, type Transaction, type WhereOptions } from "sequelize";
import { CommissioningRecord, Design, Jurisdiction, Project, ProjectFile, StageChange, User, Utility } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { NEXT_ACTION, nextActionFor, STAGE_LABELS, STAGES, stageIndex, type Stage } from "@/lib/domain/stages";
import { skippedFactsText, stageFromFacts, stagesSkippedBy } from "@/lib/domain/filings";
import { beyondUsual } from "@/lib/domain/desk";
import { AppError } from "@/lib/errors";
import type { ProjectListQuery, ProjectValues } from "@/lib/schemas/project";
import { stageChangedEmail, type StageStep } from "@/templates/email/stage-changed";
import { db } from "../db";
import { env } from "../env";
import { holdOrMergeMail } from "./outbox";
import { isUuid } from "./ids";
import { diffFields, recordAudit } from "./audit";
import { ensureDefaultFilings } from "./filings";
import { countSignedCertificates } from "./customer-signatures";
import { readProjectFacts, refreshProjectFacts } from "./project-facts";
import type { ProjectDto, StageChangeDto } from "@/lib/dto/projects";

const DAY_MS = 86_400_000;

const INCLUDE = [
  { model: Jurisdiction, as: "jurisdiction", attributes: ["id", "name", "necEdition", "reviewDays"] },
  { model: Utility, as: "utility", attributes: ["id", "name", "reviewDays"] },
  { model: User, as: "coordinator", attributes: ["id", "name"] },
  { model: User, as: "installer", attributes: ["id", "name"] },
  // Only the review's outcome: it decides the next action a draft shows.
  { model: Design, as: "design", attributes: ["reviewStatus"] },
];

/** A project as the list reads it: the model's fields and its included rows, as an instance or as a plain row. */
type ListedProject = Omit<Project, "jurisdiction" | "utility" | "coordinator" | "installer" | "design"> &
  Pick<Partial<Project>, "jurisdiction" | "utility" | "coordinator" | "installer" | "design">;

/**
 * The page's rows as plain objects: building a model instance for each row and each included row cost
 * more than the query itself. A nested row a project lacks arrives with null fields; it becomes absent.
 */
async function readListedProjects(ids: string[]): Promise<ListedProject[]> {
  const rows = (await Project.findAll({ where: { id: ids }, include: INCLUDE, raw: true, nest: true })) as unknown as ListedProject[];
  const present = <T extends { id?: string | null }>(row: T | null | undefined) => (row?.id ? row : undefined);
  return rows.map((r) => ({
    ...r,
    // The model's getter, which plain rows skip: pg returns BIGINT as a string.
    declaredValuationCents: r.declaredValuationCents === null ? null : Number(r.declaredValuationCents),
    jurisdiction: present(r.jurisdiction),
    utility: present(r.utility),
    coordinator: present(r.coordinator),
    installer: present(r.installer),
    // The review's outcome alone is read, so a missing design is a null outcome.
    design: r.design?.reviewStatus ? r.design : undefined,
  }));
}

function toProjectDto(p: ListedProject, now = Date.now()): ProjectDto {
  const waitingDays = p.waitingSince ? Math.max(0, Math.floor((now - p.waitingSince.getTime()) / DAY_MS)) : null;
  // Held by an authority: compared with that authority's usual review time (its profile).
  const usualDays =
    p.waitingOn === "ahj" ? (p.jurisdiction?.reviewDays ?? null) : p.waitingOn === "utility" ? (p.utility?.reviewDays ?? null) : null;
  return {
    id: p.id,
    number: p.number,
    customerName: p.customerName,
    customerEmail: p.customerEmail,
    customerPhone: p.customerPhone,
    street: p.street,
    city: p.city,
    state: p.state,
    postalCode: p.postalCode,
    address: `${p.street}, ${p.city}, ${p.state} ${p.postalCode}`,
    jurisdiction: p.jurisdiction ? { id: p.jurisdiction.id, name: p.jurisdiction.name, necEdition: p.jurisdiction.necEdition } : null,
    utility: p.utility ? { id: p.utility.id, name: p.utility.name } : null,
    utilityAccountNumber: p.utilityAccountNumber,
    meterNumber: p.meterNumber,
    mainBreakerA: p.mainBreakerA,
    busbarA: p.busbarA,
    serviceVoltageV: p.serviceVoltageV,
    servicePhases: p.servicePhases,
    stage: p.stage as Stage,
    stageLabel: STAGE_LABELS[p.stage as Stage],
    nextAction: nextActionFor(p.stage as Stage, p.design?.reviewStatus ?? null, p.holdState ?? null),
    stageChangedAt: p.stageChangedAt.toISOString(),
    daysInStage: Math.max(0, Math.floor((now - p.stageChangedAt.getTime()) / DAY_MS)),
    coordinator: p.coordinator ? { id: p.coordinator.id, name: p.coordinator.name } : null,
    installer: p.installer ? { id: p.installer.id, name: p.installer.name } : null,
    declaredValuationCents: p.declaredValuationCents ?? null,
    holdState: p.holdState ?? null,
    holdReason: p.holdReason ?? "",
    waitingOn: p.waitingOn ?? null,
    waitingSince: p.waitingSince?.toISOString() ?? null,
    waitingDays,
    pastUsualDays: waitingDays === null ? null : beyondUsual(waitingDays, usualDays),
    permitStatus: p.permitStatus ?? null,
    interconnectionStatus: p.interconnectionStatus ?? null,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** The rows a viewer may see: their organization's, and for installers only those assigned to them. */
function visibleTo(viewer: Viewer): WhereOptions<Project> {
  return viewer.role === "installer"
    ? { organizationId: viewer.organizationId, installerId: viewer.id }
    : { organizationId: viewer.organizationId };
}

/**
 * Stage sorts in pipeline order, days in stage by the date the stage began. The literal names the
 * model's alias, which every model fixes with `modelName` so a minified build cannot rename it.
 */
export function orderFor({ sort, direction }: Pick<ProjectListQuery, "sort" | "direction">): OrderItem {
  const dir = direction === "asc" ? "ASC" : "DESC";
  if (sort === "stage")
    return [literal(`array_position(array[${STAGES.map((s) => `'${s}'`).join(",")}]::varchar[], "Project"."stage")`), dir];
  if (sort === "daysInStage") return ["stageChangedAt", dir === "ASC" ? "DESC" : "ASC"];
  // Longest wait first when descending, like days in stage; projects nobody holds come last either way.
  if (sort === "waitingSince") return ["waitingSince", dir === "ASC" ? "DESC NULLS LAST" : "ASC NULLS LAST"];
  return [sort, dir];
}

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

/** The list's filters and search as one condition on the projects table alone. */
export function listWhere(viewer: Viewer, query: ProjectListQuery): WhereOptions<Project> {
  const where: WhereOptions<Project>[] = [visibleTo(viewer)];
  if (query.stage) where.push({ stage: query.stage });
  if (query.waitingOn) where.push({ waitingOn: query.waitingOn === "nobody" ? null : query.waitingOn });
  if (query.permitStatus) where.push({ permitStatus: query.permitStatus });
  if (query.hold) where.push({ holdState: query.hold === "active" ? null : query.hold });
  if (query.interconnectionStatus) where.push({ interconnectionStatus: query.interconnectionStatus });
  if (query.q) {
    // Each branch has its trigram index (migration 20261215000200), so a search reads no more than it finds.
    const like = `%${escapeLike(query.q)}%`;
    const anyOf: WhereOptions<Project>[] = [
      { customerName: { [Op.iLike]: like } },
      { street: { [Op.iLike]: like } },
      { city: { [Op.iLike]: like } },
      { utilityAccountNumber: { [Op.iLike]: like } },
    ];
    if (/^\d{1,9}$/.test(query.q)) anyOf.push({ number: Number(query.q) });
    where.push({ [Op.or]: anyOf });
  }
  return { [Op.and]: where };
}

/**
 * One page of the viewer's projects with search (customer, address, account number, project number) and stage filter.
 * The page's ids and the count come from the projects table alone, which its indexes serve; only the page's rows are
 * then read with their people, authorities and review. Joining every project of the company before sorting and
 * counting them was where a list request spent its time.
 */
export async function listProjects({ viewer, query }: { viewer: Viewer; query: ProjectListQuery }) {
  db();
  const where = listWhere(viewer, query);
  const [count, page] = await Promise.all([
    Project.count({ where }),
    Project.findAll({
      where,
      attributes: ["id"],
      order: [orderFor(query), ["number", "DESC"]],
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
      raw: true,
    }),
  ]);
  const ids = page.map((p) => p.id);
  const rows = ids.length ? await readListedProjects(ids) : [];
  const byId = new Map(rows.map((r) => [r.id, r]));
  const now = Date.now();
  return {
    // In the page's order; a project removed between the two reads is simply left out.
    items: ids.flatMap((id) => {
      const row = byId.get(id);
      return row ? [toProjectDto(row, now)] : [];
    }),
    total: count,
    page: query.page,
    pageSize: query.pageSize,
    pageCount: Math.max(1, Math.ceil(count / query.pageSize)),
  };
}

/** Every project the list would show with these filters, in its order (a spreadsheet export), up to `limit`. */
export async function listAllProjects({ viewer, query, limit }: { viewer: Viewer; query: ProjectListQuery; limit: number }) {
  db();
  const rows = await Project.findAll({
    where: listWhere(viewer, query),
    include: INCLUDE,
    order: [orderFor(query), ["number", "DESC"]],
    limit,
  });
  const now = Date.now();
  return rows.map((r) => toProjectDto(r, now));
}

async function findVisibleProject(viewer: Viewer, projectId: string, transaction?: Transaction) {
  // A malformed id is just another project the viewer cannot see.
  if (!isUuid(projectId)) throw new AppError("NOT_FOUND", "No such project.");
  const project = await Project.findOne({ where: { [Op.and]: [visibleTo(viewer), { id: projectId }] }, include: INCLUDE, transaction });
  if (!project || !can(viewer, "project:view", project)) throw new AppError("NOT_FOUND", "No such project.");
  return project;
}

// Read once per page render: the page, its header and the data functions it calls all ask for it. The
// viewer is the request's one object (getViewer is cached too); server actions, route handlers and the
// worker run outside a render and read afresh each time.
const loadVisibleProject = cache(readFreshProject);

/** After a write: never the copy read earlier in the same request. */
async function readFreshProject(viewer: Viewer, projectId: string): Promise<ProjectDto> {
  db();
  return toProjectDto(await findVisibleProject(viewer, projectId));
}

/** One project the viewer may see; NOT_FOUND for missing and foreign ones alike. */
export function getProjectById({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<ProjectDto> {
  return loadVisibleProject(viewer, projectId);
}

/** Refuses references to another organization's rows or to people in the wrong role. */
async function assertReferences(viewer: Viewer, values: ProjectValues) {
  const org = viewer.organizationId;
  const fieldErrors: Record<string, string[]> = {};
  const check = async (field: keyof ProjectValues, find: (id: string) => Promise<unknown>, message: string) => {
    const id = values[field];
    if (typeof id === "string" && !(await find(id))) fieldErrors[field] = [message];
  };
  await Promise.all([
    check("jurisdictionId", (id) => Jurisdiction.findOne({ where: { id, organizationId: org } }), "Choose one of your jurisdictions"),
    check("utilityId", (id) => Utility.findOne({ where: { id, organizationId: org } }), "Choose one of your utilities"),
    check(
      "coordinatorId",
      (id) => User.findOne({ where: { id, organizationId: org, role: { [Op.in]: ["admin", "coordinator"] }, isActive: true } }),
      "Choose an active coordinator",
    ),
    check(
      "installerId",
      (id) => User.findOne({ where: { id, organizationId: org, role: "installer", isActive: true } }),
      "Choose an active installer",
    ),
  ]);
  if (Object.keys(fieldErrors).length) throw new AppError("INVALID_INPUT", "Some choices are not valid.", fieldErrors);
}

export async function createProject({ viewer, values }: { viewer: Viewer; values: ProjectValues }): Promise<ProjectDto> {
  const sequelize = db();
  if (!can(viewer, "project:create")) throw new AppError("FORBIDDEN", "You cannot create projects.");
  await assertReferences(viewer, values);
  const { id } = await sequelize.transaction((transaction) => insertProject({ viewer, values, transaction }));
  return readFreshProject(viewer, id);
}

/**
 * A new draft project with its first timeline entry, audit row and default filings, inside the caller's
 * transaction. The caller has checked the permission and that every reference is the organization's.
 */
export async function insertProject({
  viewer,
  values,
  transaction,
  note = "Project created",
}: {
  viewer: Viewer;
  values: ProjectValues;
  transaction: Transaction;
  note?: string;
}): Promise<{ id: string; number: number }> {
  const project = await Project.create(
    { ...values, organizationId: viewer.organizationId, stage: "draft", stageChangedAt: new Date() },
    { transaction },
  );
  await StageChange.create(
    { organizationId: viewer.organizationId, projectId: project.id, fromStage: null, toStage: "draft", changedById: viewer.id, note },
    { transaction },
  );
  await recordAudit(
    { viewer, action: "project.created", entityType: "project", entityId: project.id, changes: diffFields({}, values) },
    { transaction },
  );
  await ensureDefaultFilings(project, { transaction, actorId: viewer.id });
  return { id: project.id, number: project.number };
}

export async function updateProject({
  viewer,
  projectId,
  values,
}: {
  viewer: Viewer;
  projectId: string;
  values: ProjectValues;
}): Promise<ProjectDto> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    // Who may edit is decided before what they sent is judged, so a stranger learns nothing from the answer.
    const project = await findVisibleProject(viewer, projectId, transaction);
    if (!can(viewer, "project:edit", project)) throw new AppError("FORBIDDEN", "You cannot edit this project.");
    await assertReferences(viewer, values);
    const before = project.get({ plain: true }) as Record<string, unknown>;
    await project.update(values, { transaction });
    await recordAudit(
      { viewer, action: "project.updated", entityType: "project", entityId: project.id, changes: diffFields(before, values) },
      { transaction },
    );
    await ensureDefaultFilings(project, { transaction, actorId: viewer.id });
  });
  return readFreshProject(viewer, projectId);
}

/** What the field record still lacks before a project counts as commissioned, or null when nothing does. */
async function fieldWorkMissing(projectId: string, transaction: Transaction): Promise<string | null> {
  const record = await CommissioningRecord.findOne({ where: { projectId }, attributes: ["status"], transaction });
  if (record?.status !== "complete") return "The commissioning record is not complete.";
  const [uploaded, signedHere] = await Promise.all([
    ProjectFile.count({ where: { projectId, kind: "signed-completion" }, transaction }),
    countSignedCertificates(projectId, transaction),
  ]);
  return uploaded + signedHere ? null : "No signed certificate of completion has been uploaded or signed.";
}

/** How long a stage-change e-mail waits for further moves of the same project to join it. */
export const STAGE_MAIL_HOLD_SECONDS = 45;

/** Moves a project to another stage; the stage change and its audit event commit together or not at all. */
export async function changeProjectStage({
  viewer,
  projectId,
  toStage,
  note,
}: {
  viewer: Viewer;
  projectId: string;
  toStage: Stage;
  note: string;
}): Promise<ProjectDto> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const project = await findVisibleProject(viewer, projectId, transaction);
    if (!can(viewer, "project:change-stage", project)) throw new AppError("FORBIDDEN", "You cannot change this project's stage.");
    // One change at a time per project: the stage read here is the one moved from, and the people's
    // held e-mail (below) is merged into rather than doubled.
    await Project.findByPk(projectId, { attributes: ["id"], lock: transaction.LOCK.UPDATE, transaction });
    await project.reload({ transaction });
    const fromStage = project.stage;
    if (fromStage === toStage) throw new AppError("CONFLICT", `The project is already in “${STAGE_LABELS[toStage]}”.`);
    if (toStage === "commissioned" && !note.trim()) {
      const missing = await fieldWorkMissing(projectId, transaction);
      if (missing)
        throw new AppError("CONFLICT", `${missing} Move it anyway only with a note saying why.`, {
          note: [`Say why: ${missing.toLowerCase()}`],
        });
    }
    // The stage follows the facts: a hand move may not go back past what the filings record, and one
    // that goes past a fact nobody recorded says why (the note is kept with the move and in the audit).
    const { facts } = await readProjectFacts(projectId, transaction);
    const factsStage = stageFromFacts(facts).stage;
    if (stageIndex(toStage) < stageIndex(factsStage)) {
      throw new AppError(
        "CONFLICT",
        `The filings put this project at “${STAGE_LABELS[factsStage]}”: change the filing on the Filings page to move it back.`,
      );
    }
    const skipped = stagesSkippedBy(toStage, facts, fromStage as Stage);
    if (skipped.length && !note.trim()) {
      const what = skippedFactsText(skipped);
      throw new AppError("CONFLICT", `Nothing records ${what} yet. Record it on the Filings page, or move on with a note saying why.`, {
        note: [`Say why: nothing records ${what}`],
      });
    }
    const at = new Date();
    // A stage set by hand stands until the facts of the filings pass it (lib/domain/filings).
    await project.update({ stage: toStage, stageChangedAt: at, handStage: toStage }, { transaction });
    await StageChange.create(
      { organizationId: viewer.organizationId, projectId, fromStage, toStage, changedById: viewer.id, note },
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "project.stage-changed",
        entityType: "project",
        entityId: projectId,
        changes: {
          stage: { before: fromStage, after: toStage },
          ...(note ? { note: { before: null, after: note } } : {}),
          ...(skipped.length ? { skippedFacts: { before: null, after: skipped } } : {}),
        },
      },
      { transaction },
    );
    // What the facts already hold past the new stage (a completed field record, say) moves it on at once.
    await refreshProjectFacts(projectId, { transaction, actorId: viewer.id, now: at });
    // The coordinator and installer hear of it, unless they made the change themselves.
    const people = [project.coordinatorId, project.installerId].filter((id): id is string => Boolean(id) && id !== viewer.id);
    const recipients = people.length
      ? await User.findAll({ where: { id: people, organizationId: viewer.organizationId, isActive: true }, transaction })
      : [];
    // Held briefly: further moves of this project in the next moments join the same message.
    const stepsSince = async (since: Date): Promise<StageStep[]> => {
      const rows = await StageChange.findAll({
        where: { projectId, createdAt: { [Op.gte]: since } },
        include: [{ model: User, as: "changedBy", attributes: ["name"] }],
        order: [["createdAt", "ASC"]],
        transaction,
      });
      return rows.map((r) => ({
        fromLabel: STAGE_LABELS[r.fromStage as Stage] ?? r.fromStage ?? "—",
        toLabel: STAGE_LABELS[r.toStage as Stage],
        changedBy: r.changedBy?.name ?? "Someone",
        note: r.note ?? "",
      }));
    };
    for (const person of recipients) {
      await holdOrMergeMail(
        {
          coalesceKey: `stage-change:${projectId}`,
          holdSeconds: STAGE_MAIL_HOLD_SECONDS,
          organizationId: viewer.organizationId,
          to: person.email,
          startedAt: at,
        },
        async (since) =>
          stageChangedEmail({
            projectNumber: project.number,
            customerName: project.customerName,
            siteAddress: `${project.street}, ${project.city}, ${project.state} ${project.postalCode}`,
            steps: await stepsSince(since),
            nextAction: NEXT_ACTION[toStage],
            url: `${env().APP_URL}/projects/${projectId}`,
          }),
        { transaction },
      );
    }
  });
  return readFreshProject(viewer, projectId);
}

/** The project's stage timeline, oldest first. */
export async function listStageChanges({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<StageChangeDto[]> {
  db();
  // The page has read the project already: within its render this is the same read, not another.
  await getProjectById({ viewer, projectId });
  const rows = await StageChange.findAll({
    where: { projectId, organizationId: viewer.organizationId },
    include: [{ model: User, as: "changedBy", attributes: ["name"] }],
    order: [["createdAt", "ASC"]],
  });
  return rows.map((r) => ({
    id: r.id,
    fromStage: r.fromStage,
    toStage: r.toStage,
    toLabel: STAGE_LABELS[r.toStage],
    note: r.note,
    changedBy: r.changedBy?.name ?? null,
    createdAt: r.createdAt.toISOString(),
  }));
}

const HOLD_WORDS = { on_hold: "put on hold", cancelled: "cancelled", active: "taken up again" } as const;

/**
 * Sets a project aside (on hold, or cancelled, with the reason) or takes it up again. A project set aside
 * waits on nobody and is kept out of the active projects; its filings and stage stay as they were.
 */
export async function setProjectHold({
  viewer,
  projectId,
  hold,
  reason,
}: {
  viewer: Viewer;
  projectId: string;
  hold: "on_hold" | "cancelled" | "active";
  reason: string;
}): Promise<ProjectDto> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const project = await findVisibleProject(viewer, projectId, transaction);
    if (!can(viewer, "project:change-stage", project)) throw new AppError("FORBIDDEN", "You cannot set this project aside.");
    await Project.findByPk(projectId, { attributes: ["id"], lock: transaction.LOCK.UPDATE, transaction });
    await project.reload({ transaction });
    const before = project.holdState ?? "active";
    if (before === hold) throw new AppError("CONFLICT", `The project is already ${HOLD_WORDS[hold]}.`);
    if (hold !== "active" && !reason.trim())
      throw new AppError("INVALID_INPUT", "Say why the project is set aside.", { reason: ["Say why the project is set aside"] });
    const now = new Date();
    await project.update(
      {
        holdState: hold === "active" ? null : hold,
        holdReason: hold === "active" ? "" : reason,
        holdSince: hold === "active" ? null : now,
      },
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "project.hold-changed",
        entityType: "project",
        entityId: projectId,
        changes: { hold: { before, after: hold }, ...(reason ? { reason: { before: null, after: reason } } : {}) },
      },
      { transaction },
    );
    await refreshProjectFacts(projectId, { transaction, actorId: viewer.id, now });
  });
  return getProjectById({ viewer, projectId });
}
