import "server-only";
import { Op, type Transaction } from "sequelize";
import {
  CorrectionRound,
  Design,
  Filing,
  FilingItem,
  Inspection,
  Jurisdiction,
  Packet,
  Payment,
  Project,
  ProjectFile,
  Utility,
} from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import {
  FILING_STATUS_LABELS,
  INSPECTION_KINDS_BY_FILING,
  INSPECTION_KIND_LABELS,
  WITH_THE_AUTHORITY,
  filingChangeProblem,
  isFiled,
  needsReinspection,
  type FilingKind,
  type FilingStatus,
} from "@/lib/domain/filings";
import { addCalendarDays, localIsoDate } from "@/lib/domain/time-zones";
import { AppError } from "@/lib/errors";
import type {
  ChangeFilingStatusInput,
  FilingDetailsInput,
  InspectionResultInput,
  RecordPtoInput,
  RecordRoundInput,
  ScheduleInspectionInput,
  AddFilingInput,
  AnswerItemInput,
  AttachLetterInput,
} from "@/lib/schemas/filings";
import type { AnsweredComment } from "@/lib/documents/packets/changes";
import type { CorrectionRoundDto, FilingDto, FilingItemDto, InspectionDto, ProjectFilingsDto } from "@/lib/dto/filings";
import { db } from "../db";
import { recordAudit } from "./audit";
import { hasCustomerSignature } from "./customer-signatures";
import { isUuid } from "./ids";
import { getOrganization } from "./organizations";
import { refreshProjectFacts } from "./project-facts";

/**
 * The comments of the filing of this packet's kind that are answered but not yet sent back: a new
 * revision answers them, and its change list names them.
 */
export async function answeredSinceLastSending(
  projectId: string,
  kind: "permit" | "interconnection",
  transaction?: Transaction,
): Promise<AnsweredComment[]> {
  const filings = await Filing.findAll({ where: { projectId, kind }, attributes: ["id"], transaction });
  if (filings.length === 0) return [];
  const rounds = await CorrectionRound.findAll({
    where: { filingId: filings.map((f) => f.id), resubmittedPacketId: null },
    include: [{ model: FilingItem, as: "items", where: { resolved: true } }],
    transaction,
  });
  return rounds.flatMap((r) =>
    (r.items ?? []).map((i) => ({ round: r.number, position: i.position, text: i.text, reference: i.reference, response: i.response })),
  );
}

const NOT_FOUND = () => new AppError("NOT_FOUND", "No such filing.");

async function todayFor(viewer: Viewer, now = new Date()) {
  const { timeZone } = await getOrganization({ viewer });
  return localIsoDate(now.toISOString(), timeZone);
}

function itemDto(i: FilingItem): FilingItemDto {
  return { id: i.id, text: i.text, reference: i.reference, response: i.response, designRevision: i.designRevision, resolved: i.resolved };
}

const byPosition = (a: FilingItem, b: FilingItem) => a.position - b.position;

function toFilingDto(f: Filing, revisionOf: Map<string, number>, letterName: Map<string, string>): FilingDto {
  const rounds: CorrectionRoundDto[] = [...(f.rounds ?? [])]
    .sort((a, b) => a.number - b.number)
    .map((r) => ({
      id: r.id,
      number: r.number,
      receivedAt: r.receivedOn,
      answeredAt: r.answeredAt?.toISOString() ?? null,
      letterFileId: r.letterFileId,
      letterFileName: r.letterFileId ? (letterName.get(r.letterFileId) ?? null) : null,
      revisionAtReceipt: r.revisionAtReceipt,
      resubmittedRevision: r.resubmittedPacketId ? (revisionOf.get(r.resubmittedPacketId) ?? null) : null,
      items: [...(r.items ?? [])].sort(byPosition).map(itemDto),
    }));
  const inspections: InspectionDto[] = [...(f.inspections ?? [])]
    .sort((a, b) => (a.scheduledFor ?? "").localeCompare(b.scheduledFor ?? "") || a.createdAt.getTime() - b.createdAt.getTime())
    .map((i) => ({
      id: i.id,
      kind: i.kind,
      scheduledFor: i.scheduledFor,
      timeWindow: i.timeWindow,
      inspectorName: i.inspectorName,
      result: i.result,
      resultOn: i.resultOn,
      reinspectionOf: i.reinspectionOfId,
      notes: i.notes,
      items: [...(i.items ?? [])].sort(byPosition).map(itemDto),
    }));
  return {
    id: f.id,
    kind: f.kind,
    title: f.title,
    authority: {
      kind: f.authorityKind === "jurisdiction" ? "ahj" : f.authorityKind === "utility" ? "utility" : "other",
      id: f.authorityId,
      name: f.authorityName,
    },
    status: f.status,
    statusSince: f.statusSince.toISOString(),
    referenceNumber: f.referenceNumber,
    channel: f.channel,
    sentTo: f.sentTo,
    submittedAt: f.submittedOn,
    decidedAt: f.decidedOn,
    expiresAt: f.expiresOn,
    packetRevision: f.packetId ? (revisionOf.get(f.packetId) ?? null) : null,
    packetId: f.packetId,
    paymentId: f.paymentId,
    nextFollowUpOn: f.nextFollowUpOn,
    ptoOn: f.ptoOn,
    revisionNeededSince: f.revisionNeededSince?.toISOString() ?? null,
    customerSince: f.customerSince?.toISOString() ?? null,
    notes: f.notes,
    rounds,
    inspections,
  };
}

const FILING_INCLUDE = [
  { model: CorrectionRound, as: "rounds", include: [{ model: FilingItem, as: "items" }] },
  { model: Inspection, as: "inspections", include: [{ model: FilingItem, as: "items" }] },
];

const KIND_ORDER: Record<FilingKind, number> = { permit: 0, interconnection: 1, other: 2 };

async function visibleProject(viewer: Viewer, projectId: string, transaction?: Transaction) {
  if (!isUuid(projectId)) throw new AppError("NOT_FOUND", "No such project.");
  const project = await Project.findOne({ where: { id: projectId, organizationId: viewer.organizationId }, transaction });
  if (!project || !can(viewer, "project:view", project)) throw new AppError("NOT_FOUND", "No such project.");
  return project;
}

/** A project's filings with their rounds and inspections, and who the project waits on. */
export async function listProjectFilings({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<ProjectFilingsDto> {
  db();
  const project = await visibleProject(viewer, projectId);
  const filings = await Filing.findAll({ where: { projectId, organizationId: viewer.organizationId }, include: FILING_INCLUDE });
  const packetIds = filings
    .flatMap((f) => [f.packetId, ...(f.rounds ?? []).map((r) => r.resubmittedPacketId)])
    .filter((id): id is string => Boolean(id));
  const packets = packetIds.length ? await Packet.findAll({ where: { id: packetIds }, attributes: ["id", "revision"] }) : [];
  const revisionOf = new Map(packets.map((p) => [p.id, p.revision]));
  const letterIds = filings.flatMap((f) => (f.rounds ?? []).map((r) => r.letterFileId)).filter((id): id is string => Boolean(id));
  const letters = letterIds.length ? await ProjectFile.findAll({ where: { id: letterIds }, attributes: ["id", "fileName"] }) : [];
  const letterName = new Map(letters.map((l) => [l.id, l.fileName]));
  return {
    waitingOn: project.waitingOn,
    waitingSince: project.waitingSince?.toISOString() ?? null,
    filings: filings
      .sort((a, b) => KIND_ORDER[a.kind] - KIND_ORDER[b.kind] || a.createdAt.getTime() - b.createdAt.getTime())
      .map((f) => toFilingDto(f, revisionOf, letterName)),
  };
}

/**
 * The permit and the interconnection filings every project has, for the AHJ and the utility it names.
 * Called where a project is created or its authorities change.
 */
export async function ensureDefaultFilings(
  project: Project,
  { transaction, actorId }: { transaction: Transaction; actorId: string | null },
) {
  const existing = await Filing.findAll({ where: { projectId: project.id, kind: ["permit", "interconnection"] }, transaction });
  const now = new Date();
  // A filing nobody sent yet follows the project to its new AHJ or utility; one that went in keeps its history.
  const retarget = async (
    kind: FilingKind,
    authorityId: string | null,
    find: (id: string) => Promise<{ id: string; name: string } | null>,
  ) => {
    const filing = existing.find((f) => f.kind === kind);
    if (!filing || !authorityId || filing.authorityId === authorityId || filing.status !== "preparing" || filing.submittedOn) return;
    const authority = await find(authorityId);
    if (authority) await filing.update({ authorityId: authority.id, authorityName: authority.name }, { transaction });
  };
  const where = (id: string) => ({ where: { id, organizationId: project.organizationId }, attributes: ["id", "name"], transaction });
  await retarget("permit", project.jurisdictionId, (id) => Jurisdiction.findOne(where(id)));
  await retarget("interconnection", project.utilityId, (id) => Utility.findOne(where(id)));
  const has = (kind: FilingKind) => existing.some((f) => f.kind === kind);
  if (project.jurisdictionId && !has("permit")) {
    const ahj = await Jurisdiction.findOne({ where: { id: project.jurisdictionId, organizationId: project.organizationId }, transaction });
    if (ahj)
      await Filing.create(
        {
          organizationId: project.organizationId,
          projectId: project.id,
          kind: "permit",
          authorityKind: "jurisdiction",
          authorityId: ahj.id,
          authorityName: ahj.name,
          statusSince: now,
          createdById: actorId,
        },
        { transaction },
      );
  }
  if (project.utilityId && !has("interconnection")) {
    const utility = await Utility.findOne({ where: { id: project.utilityId, organizationId: project.organizationId }, transaction });
    if (utility)
      await Filing.create(
        {
          organizationId: project.organizationId,
          projectId: project.id,
          kind: "interconnection",
          authorityKind: "utility",
          authorityId: utility.id,
          authorityName: utility.name,
          statusSince: now,
          createdById: actorId,
        },
        { transaction },
      );
  }
}

/**
 * Another approval the project needs beside the permit and the interconnection (an HOA, a separate electrical
 * permit, a utility pre-approval): from one of the organization's authority profiles, or a body named here.
 */
export async function addFiling({ viewer, input, now = new Date() }: { viewer: Viewer; input: AddFilingInput; now?: Date }) {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const project = await visibleProject(viewer, input.projectId, transaction);
    if (!can(viewer, "filings:edit", project)) throw new AppError("FORBIDDEN", "You cannot change this project's filings.");
    const [kind, id] = input.authority.split(":") as ["jurisdiction" | "utility" | "other", string | undefined];
    const where = { id, organizationId: viewer.organizationId };
    const profile =
      kind === "jurisdiction"
        ? await Jurisdiction.findOne({ where, attributes: ["id", "name"], transaction })
        : kind === "utility"
          ? await Utility.findOne({ where, attributes: ["id", "name"], transaction })
          : null;
    if (kind !== "other" && !profile)
      throw new AppError("INVALID_INPUT", "Choose one of your organization's AHJs or utilities.", {
        authority: ["Choose one of your organization's AHJs or utilities"],
      });
    const filing = await Filing.create(
      {
        organizationId: viewer.organizationId,
        projectId: project.id,
        kind: "other",
        title: input.title,
        authorityKind: kind,
        authorityId: profile?.id ?? null,
        authorityName: profile?.name ?? input.authorityName,
        statusSince: now,
        createdById: viewer.id,
      },
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "filing.added",
        entityType: "filing",
        entityId: filing.id,
        changes: { filing: { before: null, after: `${input.title} · ${filing.authorityName}` } },
      },
      { transaction },
    );
    await refreshProjectFacts(project.id, { transaction, actorId: viewer.id, now });
    return { filingId: filing.id };
  });
}

/** One filing the viewer may change, locked for the change, with its project. */
async function editableFiling(viewer: Viewer, filingId: string, transaction: Transaction) {
  if (!isUuid(filingId)) throw NOT_FOUND();
  const filing = await Filing.findOne({
    where: { id: filingId, organizationId: viewer.organizationId },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  if (!filing) throw NOT_FOUND();
  const project = await Project.findOne({ where: { id: filing.projectId, organizationId: viewer.organizationId }, transaction });
  if (!project || !can(viewer, "project:view", project)) throw NOT_FOUND();
  if (!can(viewer, "filings:edit", project)) throw new AppError("FORBIDDEN", "You cannot change this project's filings.");
  return { filing, project };
}

/** A ready packet of this project of the kind the filing sends. */
async function submittablePacket(filing: Filing, packetId: string | undefined, transaction: Transaction) {
  if (!packetId) return null;
  const packet = await Packet.findOne({
    where: { id: packetId, projectId: filing.projectId, organizationId: filing.organizationId },
    transaction,
  });
  if (!packet)
    throw new AppError("INVALID_INPUT", "Choose one of this project's packet revisions.", {
      packetId: ["Choose one of this project's packet revisions"],
    });
  if (filing.kind !== "other" && packet.kind !== filing.kind) {
    throw new AppError("INVALID_INPUT", `Choose a ${filing.kind} packet for this filing.`, {
      packetId: [`Choose a ${filing.kind} packet`],
    });
  }
  if (packet.status !== "ready")
    throw new AppError("INVALID_INPUT", "That revision is not ready yet.", { packetId: ["That revision is not ready yet"] });
  return packet;
}

async function reviewDaysOf(filing: Filing, transaction: Transaction): Promise<{ reviewDays: number; permitValidDays: number | null }> {
  if (filing.authorityKind === "jurisdiction" && filing.authorityId) {
    const ahj = await Jurisdiction.findByPk(filing.authorityId, { attributes: ["reviewDays", "permitValidDays"], transaction });
    if (ahj) return { reviewDays: ahj.reviewDays, permitValidDays: ahj.permitValidDays };
  }
  if (filing.authorityKind === "utility" && filing.authorityId) {
    const utility = await Utility.findByPk(filing.authorityId, { attributes: ["reviewDays"], transaction });
    if (utility) return { reviewDays: utility.reviewDays, permitValidDays: null };
  }
  return { reviewDays: 14, permitValidDays: null }; // common practice: two weeks before asking an authority with no profile
}

async function latestRound(filingId: string, transaction: Transaction) {
  return CorrectionRound.findOne({
    where: { filingId },
    include: [{ model: FilingItem, as: "items" }],
    order: [["number", "DESC"]],
    transaction,
  });
}

function invalid(field: string, message: string): AppError {
  return field === "status" ? new AppError("CONFLICT", message) : new AppError("INVALID_INPUT", message, { [field]: [message] });
}

/**
 * Moves a filing to another status with what that status needs: the revision sent on submission and
 * resubmission, the authority's number on approval. Follow-up and expiry dates come from the authority's
 * profile; the audit row and the project's new stage and waiting-on commit with the change.
 */
export async function changeFilingStatus({
  viewer,
  input,
  now = new Date(),
}: {
  viewer: Viewer;
  input: ChangeFilingStatusInput;
  now?: Date;
}): Promise<void> {
  const sequelize = db();
  const today = await todayFor(viewer, now);
  await sequelize.transaction(async (transaction) => {
    const { filing } = await editableFiling(viewer, input.filingId, transaction);
    const to = input.status;
    const packet = await submittablePacket(filing, input.packetId, transaction);
    const current = filing.packetId ? await Packet.findByPk(filing.packetId, { attributes: ["revision"], transaction }) : null;
    const round = await latestRound(filing.id, transaction);
    const roundOpen = round !== null && round.answeredAt === null && filing.status === "corrections_requested";
    const sending = to === "submitted" || to === "resubmitted";
    const referenceNumber = input.referenceNumber ?? filing.referenceNumber;
    const problem = filingChangeProblem({
      kind: filing.kind,
      from: filing.status,
      to,
      referenceNumber,
      packetRevision: sending
        ? (packet?.revision ?? (to === "submitted" ? (current?.revision ?? null) : null))
        : (current?.revision ?? null),
      latestRoundAnswered: !roundOpen || (round.items ?? []).every((i) => i.resolved),
      revisionAtLatestRound: round?.revisionAtReceipt ?? null,
    });
    if (problem) throw invalid(problem.field, problem.message);
    // The utility asks for the account holder's signature on the application: going without it takes a reason.
    const sentPacketId = packet?.id ?? filing.packetId;
    const unsigned =
      to === "submitted" && filing.kind === "interconnection" && sentPacketId
        ? !(await hasCustomerSignature({ organizationId: filing.organizationId, packetId: sentPacketId }, transaction))
        : false;
    if (unsigned && !input.unsignedReason)
      throw invalid(
        "unsignedReason",
        "The customer has not signed this revision's interconnection application here. Ask for the signature on the Documents page, or say why it goes without.",
      );

    const on = input.on ?? today;
    const { reviewDays, permitValidDays } = await reviewDaysOf(filing, transaction);
    const before = { status: filing.status, referenceNumber: filing.referenceNumber, packetId: filing.packetId };
    const changes: Partial<Filing> = { status: to, statusSince: now, referenceNumber: referenceNumber ?? null };
    if (sending) {
      Object.assign(changes, {
        packetId: packet?.id ?? filing.packetId,
        nextFollowUpOn: addCalendarDays(on, reviewDays),
        revisionNeededSince: null,
      });
      if (to === "submitted")
        Object.assign(changes, { submittedOn: on, channel: input.channel ?? filing.channel, sentTo: input.sentTo || filing.sentTo });
      // Only the open round is answered by this sending; an earlier round keeps the revision that answered it.
      if (to === "resubmitted" && round && !round.resubmittedPacketId)
        await round.update({ resubmittedPacketId: packet?.id ?? filing.packetId, answeredAt: round.answeredAt ?? now }, { transaction });
    }
    if (to === "approved")
      Object.assign(changes, {
        decidedOn: on,
        expiresOn: filing.kind === "permit" && permitValidDays ? addCalendarDays(on, permitValidDays) : null,
        nextFollowUpOn: null,
      });
    if (to === "rejected") Object.assign(changes, { decidedOn: on, nextFollowUpOn: null });
    if (to === "withdrawn") Object.assign(changes, { nextFollowUpOn: null });
    if (to === "preparing") Object.assign(changes, { decidedOn: null, expiresOn: null });
    if (input.note) changes.notes = [filing.notes, `${on}: ${input.note}`].filter(Boolean).join("\n");
    await filing.update(changes, { transaction });
    if (sending && packet && !packet.sentTo.includes(filing.authorityName))
      await packet.update({ sentTo: [...packet.sentTo, filing.authorityName] }, { transaction });
    await recordAudit(
      {
        viewer,
        action: "filing.status-changed",
        entityType: "filing",
        entityId: filing.id,
        changes: {
          status: { before: before.status, after: to },
          ...(referenceNumber !== before.referenceNumber
            ? { referenceNumber: { before: before.referenceNumber, after: referenceNumber } }
            : {}),
          ...(filing.packetId !== before.packetId ? { packetId: { before: before.packetId, after: filing.packetId } } : {}),
          ...(input.note ? { note: { before: null, after: input.note } } : {}),
          ...(unsigned ? { filedWithoutCustomerSignature: { before: null, after: input.unsignedReason } } : {}),
        },
      },
      { transaction },
    );
    await refreshProjectFacts(filing.projectId, { transaction, actorId: viewer.id, now });
  });
}

/** The filing's own facts that are not a status: its number, follow-up date, fee payment, the customer's turn, notes. */
export async function updateFilingDetails({
  viewer,
  input,
  now = new Date(),
}: {
  viewer: Viewer;
  input: FilingDetailsInput;
  now?: Date;
}): Promise<void> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const { filing } = await editableFiling(viewer, input.filingId, transaction);
    if (
      input.paymentId &&
      !(await Payment.findOne({
        where: { id: input.paymentId, projectId: filing.projectId, organizationId: viewer.organizationId },
        transaction,
      }))
    ) {
      throw new AppError("INVALID_INPUT", "Choose one of this project's payments.", {
        paymentId: ["Choose one of this project's payments"],
      });
    }
    if (filing.status === "approved" && !input.referenceNumber) {
      throw new AppError("INVALID_INPUT", "An approved filing keeps its reference number.", {
        referenceNumber: ["An approved filing keeps its reference number"],
      });
    }
    const before = {
      referenceNumber: filing.referenceNumber,
      nextFollowUpOn: filing.nextFollowUpOn,
      paymentId: filing.paymentId,
      waitingOnCustomer: filing.customerSince !== null,
      notes: filing.notes,
    };
    await filing.update(
      {
        referenceNumber: input.referenceNumber ?? null,
        nextFollowUpOn: input.nextFollowUpOn ?? null,
        paymentId: input.paymentId ?? null,
        customerSince: input.waitingOnCustomer ? (filing.customerSince ?? now) : null,
        notes: input.notes,
      },
      { transaction },
    );
    const after = {
      referenceNumber: filing.referenceNumber,
      nextFollowUpOn: filing.nextFollowUpOn,
      paymentId: filing.paymentId,
      waitingOnCustomer: input.waitingOnCustomer,
      notes: filing.notes,
    };
    const changes = Object.fromEntries(
      Object.entries(after)
        .filter(([k, v]) => before[k as keyof typeof before] !== v)
        .map(([k, v]) => [k, { before: before[k as keyof typeof before], after: v }]),
    );
    await recordAudit({ viewer, action: "filing.updated", entityType: "filing", entityId: filing.id, changes }, { transaction });
    await refreshProjectFacts(filing.projectId, { transaction, actorId: viewer.id, now });
  });
}

async function createItems(
  viewer: Viewer,
  parent: { roundId?: string; inspectionId?: string },
  items: { text: string; reference: string }[],
  transaction: Transaction,
) {
  await FilingItem.bulkCreate(
    items.map((item, position) => ({
      organizationId: viewer.organizationId,
      ...parent,
      position,
      text: item.text,
      reference: item.reference,
    })),
    { transaction },
  );
}

/** A comment letter uploaded to the filing's project. */
async function letterOf(filing: Filing, fileId: string, transaction: Transaction) {
  const file = await ProjectFile.findOne({
    where: { id: fileId, projectId: filing.projectId, organizationId: filing.organizationId, kind: "comment-letter" },
    transaction,
  });
  if (!file)
    throw new AppError("INVALID_INPUT", "Choose a comment letter uploaded to this project.", {
      letterFileId: ["Choose a comment letter uploaded to this project"],
    });
  return file;
}

/** The authority's letter for a round recorded before the letter was at hand (or a clearer copy of it). */
export async function attachRoundLetter({ viewer, input }: { viewer: Viewer; input: AttachLetterInput }): Promise<void> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    if (!isUuid(input.roundId)) throw new AppError("NOT_FOUND", "No such correction round.");
    const round = await CorrectionRound.findOne({ where: { id: input.roundId, organizationId: viewer.organizationId }, transaction });
    if (!round) throw new AppError("NOT_FOUND", "No such correction round.");
    const { filing } = await editableFiling(viewer, round.filingId, transaction);
    const file = await letterOf(filing, input.letterFileId, transaction);
    const before = round.letterFileId;
    await round.update({ letterFileId: file.id }, { transaction });
    await recordAudit(
      {
        viewer,
        action: "filing.letter-attached",
        entityType: "filing",
        entityId: filing.id,
        changes: { [`round ${round.number} letter`]: { before, after: file.fileName } },
      },
      { transaction },
    );
  });
}

/** Round N of the authority's comments: the filing now waits on the office to answer them. */
export async function recordCorrectionRound({
  viewer,
  input,
  now = new Date(),
}: {
  viewer: Viewer;
  input: RecordRoundInput;
  now?: Date;
}): Promise<{ roundId: string; number: number }> {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const { filing } = await editableFiling(viewer, input.filingId, transaction);
    if (!WITH_THE_AUTHORITY.includes(filing.status)) {
      throw new AppError(
        "CONFLICT",
        `Corrections come back on a filing the authority has; this one is ${FILING_STATUS_LABELS[filing.status as FilingStatus].toLowerCase()}.`,
      );
    }
    if (input.letterFileId) await letterOf(filing, input.letterFileId, transaction);
    const number =
      ((await CorrectionRound.max<number, CorrectionRound>("number", { where: { filingId: filing.id }, transaction })) ?? 0) + 1;
    const packet = filing.packetId ? await Packet.findByPk(filing.packetId, { attributes: ["revision"], transaction }) : null;
    const round = await CorrectionRound.create(
      {
        organizationId: viewer.organizationId,
        filingId: filing.id,
        number,
        receivedOn: input.receivedOn,
        letterFileId: input.letterFileId ?? null,
        revisionAtReceipt: packet?.revision ?? null,
      },
      { transaction },
    );
    await createItems(viewer, { roundId: round.id }, input.items, transaction);
    await filing.update({ status: "corrections_requested", statusSince: now }, { transaction });
    await recordAudit(
      {
        viewer,
        action: "filing.corrections-recorded",
        entityType: "filing",
        entityId: filing.id,
        changes: { round: { before: null, after: number }, items: { before: null, after: input.items.length } },
      },
      { transaction },
    );
    await refreshProjectFacts(filing.projectId, { transaction, actorId: viewer.id, now });
    return { roundId: round.id, number };
  });
}

/** The office's answer to one comment or correction, with the design revision that answers it when the design changed. */
export async function answerFilingItem({
  viewer,
  input,
  now = new Date(),
}: {
  viewer: Viewer;
  input: AnswerItemInput;
  now?: Date;
}): Promise<void> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    if (!isUuid(input.itemId)) throw new AppError("NOT_FOUND", "No such comment.");
    const item = await FilingItem.findOne({ where: { id: input.itemId, organizationId: viewer.organizationId }, transaction });
    if (!item) throw new AppError("NOT_FOUND", "No such comment.");
    const round = item.roundId ? await CorrectionRound.findByPk(item.roundId, { transaction }) : null;
    const inspection = item.inspectionId ? await Inspection.findByPk(item.inspectionId, { transaction }) : null;
    const filingId = round?.filingId ?? inspection?.filingId;
    if (!filingId) throw new AppError("NOT_FOUND", "No such comment.");
    const { filing } = await editableFiling(viewer, filingId, transaction);
    if (input.designRevision !== undefined) {
      const design = await Design.findOne({ where: { projectId: filing.projectId }, attributes: ["revision"], transaction });
      if (!design || input.designRevision > design.revision) {
        throw new AppError("INVALID_INPUT", `The design is at revision ${design?.revision ?? 0}.`, {
          designRevision: [`The design is at revision ${design?.revision ?? 0}`],
        });
      }
    }
    const before = { response: item.response, designRevision: item.designRevision };
    await item.update({ response: input.response, designRevision: input.designRevision ?? null, resolved: true }, { transaction });
    if (round && !round.answeredAt) {
      const open = await FilingItem.count({ where: { roundId: round.id, resolved: false }, transaction });
      if (open === 0) await round.update({ answeredAt: now }, { transaction });
    }
    await recordAudit(
      {
        viewer,
        action: "filing.item-answered",
        entityType: "filing",
        entityId: filing.id,
        changes: {
          response: { before: before.response, after: input.response },
          designRevision: { before: before.designRevision, after: input.designRevision ?? null },
        },
      },
      { transaction },
    );
    await refreshProjectFacts(filing.projectId, { transaction, actorId: viewer.id, now });
  });
}

/** Books an inspection (or the utility's witness test or meter set) under the filing it belongs to. */
export async function scheduleInspection({
  viewer,
  input,
  now = new Date(),
}: {
  viewer: Viewer;
  input: ScheduleInspectionInput;
  now?: Date;
}): Promise<{ inspectionId: string }> {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const { filing } = await editableFiling(viewer, input.filingId, transaction);
    const kinds: readonly string[] = INSPECTION_KINDS_BY_FILING[filing.kind];
    if (!kinds.includes(input.kind)) {
      throw new AppError("INVALID_INPUT", `A ${INSPECTION_KIND_LABELS[input.kind].toLowerCase()} does not belong to this filing.`, {
        kind: ["Choose a kind this authority carries out"],
      });
    }
    if (filing.kind === "permit" && filing.status !== "approved")
      throw new AppError("CONFLICT", "Inspections are booked once the permit is issued.");
    if (filing.kind === "interconnection" && !isFiled(filing.status))
      throw new AppError("CONFLICT", "Book the utility's visit once the application is in.");
    if (input.reinspectionOfId) {
      const failed = await Inspection.findOne({ where: { id: input.reinspectionOfId, filingId: filing.id }, transaction });
      if (!failed || !needsReinspection(failed.result)) {
        throw new AppError("INVALID_INPUT", "A re-inspection repeats a failed or partly passed inspection of this filing.", {
          reinspectionOfId: ["Choose a failed inspection of this filing"],
        });
      }
    }
    const inspection = await Inspection.create(
      {
        organizationId: viewer.organizationId,
        filingId: filing.id,
        kind: input.kind,
        scheduledFor: input.scheduledFor,
        timeWindow: input.timeWindow,
        inspectorName: input.inspectorName,
        reinspectionOfId: input.reinspectionOfId ?? null,
      },
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "inspection.scheduled",
        entityType: "filing",
        entityId: filing.id,
        changes: { inspection: { before: null, after: `${input.kind} on ${input.scheduledFor}` } },
      },
      { transaction },
    );
    await refreshProjectFacts(filing.projectId, { transaction, actorId: viewer.id, now });
    return { inspectionId: inspection.id };
  });
}

/** The inspector's verdict with any corrections; a passed final inspection moves the stage by itself. */
export async function recordInspectionResult({
  viewer,
  input,
  now = new Date(),
}: {
  viewer: Viewer;
  input: InspectionResultInput;
  now?: Date;
}): Promise<void> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    if (!isUuid(input.inspectionId)) throw new AppError("NOT_FOUND", "No such inspection.");
    const inspection = await Inspection.findOne({ where: { id: input.inspectionId, organizationId: viewer.organizationId }, transaction });
    if (!inspection) throw new AppError("NOT_FOUND", "No such inspection.");
    const { filing } = await editableFiling(viewer, inspection.filingId, transaction);
    if (inspection.result) throw new AppError("CONFLICT", "This inspection's result is already recorded: book a re-inspection instead.");
    if (needsReinspection(input.result) && input.items.length === 0) {
      throw new AppError("INVALID_INPUT", "List the corrections the inspector asked for.", {
        items: ["List the corrections the inspector asked for"],
      });
    }
    await inspection.update(
      {
        result: input.result,
        resultOn: input.resultOn,
        recordedAt: now,
        notes: input.notes,
        ...(input.inspectorName ? { inspectorName: input.inspectorName } : {}),
      },
      { transaction },
    );
    if (input.items.length) await createItems(viewer, { inspectionId: inspection.id }, input.items, transaction);
    await recordAudit(
      {
        viewer,
        action: "inspection.result-recorded",
        entityType: "filing",
        entityId: filing.id,
        changes: { [inspection.kind]: { before: null, after: input.result } },
      },
      { transaction },
    );
    await refreshProjectFacts(filing.projectId, { transaction, actorId: viewer.id, now });
  });
}

/** The utility's permission to operate, on the approved interconnection filing. */
export async function recordPto({ viewer, input, now = new Date() }: { viewer: Viewer; input: RecordPtoInput; now?: Date }): Promise<void> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const { filing } = await editableFiling(viewer, input.filingId, transaction);
    if (filing.kind !== "interconnection") throw new AppError("CONFLICT", "PTO is recorded on the interconnection filing.");
    if (filing.status !== "approved") throw new AppError("CONFLICT", "Record PTO once the interconnection application is approved.");
    const before = filing.ptoOn;
    await filing.update({ ptoOn: input.ptoOn }, { transaction });
    await recordAudit(
      {
        viewer,
        action: "filing.pto-recorded",
        entityType: "filing",
        entityId: filing.id,
        changes: { ptoOn: { before, after: input.ptoOn } },
      },
      { transaction },
    );
    await refreshProjectFacts(filing.projectId, { transaction, actorId: viewer.id, now });
  });
}

/**
 * A design saved after its packet went in: every filing that sent a packet and is still under review owes
 * the authority a new revision. (A change after approval is a revision to an issued permit, which the
 * office files on its own.) Called inside the design save's transaction.
 */
export async function markRevisionNeeded(projectId: string, { transaction, now = new Date() }: { transaction: Transaction; now?: Date }) {
  const [count] = await Filing.update(
    { revisionNeededSince: now },
    {
      where: {
        projectId,
        packetId: { [Op.ne]: null },
        revisionNeededSince: null,
        status: { [Op.in]: ["submitted", "in_review", "corrections_requested", "resubmitted"] },
      },
      transaction,
    },
  );
  return count;
}
