import "server-only";
import type { Transaction } from "sequelize";
import { Organization, Packet, Project, SignatureLinkAccess, SignatureRequest, SignatureSigner, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { DEFAULT_TIME_ZONE, localLongDate } from "@/lib/domain/time-zones";
import {
  isAwaitingSignature,
  SIGNED_DOCUMENT_LABELS,
  SIGNER_ROLE_LABELS,
  SIGNER_STATE_LABELS,
  signerState,
} from "@/lib/domain/signature-requests";
import type { SignatureMarkKind, SignedDocumentKind, SignerRole, SigningAccessKind } from "@/lib/domain/stored-values";
import { AppError } from "@/lib/errors";
import type { SignatureRequestDto, SignatureSignerDto } from "@/lib/dto/signature-requests";
import { signatureRequestEmail, signedCopyEmail, signingAnsweredEmail } from "@/templates/email/signature-request";
import { db } from "../db";
import { env } from "../env";
import { hashToken, newToken } from "../tokens";
import { recordAudit } from "./audit";
import { isUuid } from "./ids";
import { enqueueMail } from "./outbox";
import { coordinatorAddress } from "./project-files";
import { getProjectById } from "./projects";
import type { ClientInfo } from "./share-links";
import { recordTokenMiss, refuseTokenGuesser } from "./token-guesses";

const DAY_MS = 24 * 60 * 60_000;
const signingUrl = (token: string) => `${env().APP_URL}/sign/${token}`;
const clip = (client: ClientInfo) => ({ address: client.address.slice(0, 100), userAgent: client.userAgent.slice(0, 500) });
const siteOf = (p: Pick<Project, "street" | "city" | "state" | "postalCode">) => `${p.street}, ${p.city}, ${p.state} ${p.postalCode}`;

function toSignerDto(s: SignatureSigner): SignatureSignerDto {
  const state = signerState(s);
  return {
    id: s.id,
    role: s.role,
    roleLabel: SIGNER_ROLE_LABELS[s.role],
    channel: s.channel,
    name: s.name,
    email: s.email,
    state,
    stateLabel: SIGNER_STATE_LABELS[state],
    expiresAt: s.expiresAt?.toISOString() ?? null,
    declineReason: s.declineReason,
    markKind: s.markKind,
    openedAt: s.openedAt?.toISOString() ?? null,
    answeredAt: (s.signedAt ?? s.declinedAt ?? s.revokedAt)?.toISOString() ?? null,
    remindedAt: s.remindedAt?.toISOString() ?? null,
  };
}

function toRequestDto(r: SignatureRequest): SignatureRequestDto {
  const order: SignerRole[] = ["customer", "second-owner", "installer"];
  return {
    id: r.id,
    documentKind: r.documentKind,
    title: r.title,
    packetId: r.packetId,
    createdBy: r.createdBy?.name ?? null,
    createdAt: r.createdAt.toISOString(),
    signedAt: r.signedAt?.toISOString() ?? null,
    signers: [...(r.signers ?? [])].sort((a, b) => order.indexOf(a.role) - order.indexOf(b.role)).map(toSignerDto),
  };
}

async function assertMayAsk(viewer: Viewer, projectId: string) {
  await getProjectById({ viewer, projectId }); // NOT_FOUND for foreign and unassigned projects
  if (!can(viewer, "signatures:request")) throw new AppError("FORBIDDEN", "Only coordinators and admins ask for signatures.");
}

/** The ready interconnection packet revision a coordinator asks the customer to sign, with its stored PDF. */
export async function getSignablePacket({ viewer, projectId, packetId }: { viewer: Viewer; projectId: string; packetId: string }) {
  await assertMayAsk(viewer, projectId);
  const packet = isUuid(packetId)
    ? await Packet.findOne({
        where: { id: packetId, projectId, organizationId: viewer.organizationId, kind: "interconnection", status: "ready" },
      })
    : null;
  if (!packet?.objectKey || !packet.sha256)
    throw new AppError("NOT_FOUND", "Choose a ready revision of this project's interconnection packet.");
  return { id: packet.id, revision: packet.revision, key: packet.objectKey, sha256: packet.sha256 };
}

export type NewSigner = { role: SignerRole; name: string; email: string };

/**
 * Records a request for signatures on a stored document and sends each signer their own link through
 * the outbox, in one transaction with its audit row. Each token is made here, mailed once and only
 * its hash is kept.
 */
export async function createSignatureRequest({
  viewer,
  projectId,
  document,
  signers,
  expiresInDays,
}: {
  viewer: Viewer;
  projectId: string;
  document: { kind: SignedDocumentKind; packetId: string | null; title: string; originalKey: string; originalSha256: string };
  signers: NewSigner[];
  expiresInDays: number;
}): Promise<SignatureRequestDto> {
  const sequelize = db();
  await assertMayAsk(viewer, projectId);
  const [project, organization] = await Promise.all([
    Project.findOne({ where: { id: projectId, organizationId: viewer.organizationId } }),
    Organization.findByPk(viewer.organizationId),
  ]);
  if (!project || !organization) throw new AppError("NOT_FOUND", "No such project.");
  const expiresAt = new Date(Date.now() + expiresInDays * DAY_MS);
  const id = await sequelize.transaction(async (transaction) => {
    const request = await SignatureRequest.create(
      {
        organizationId: viewer.organizationId,
        projectId,
        documentKind: document.kind,
        packetId: document.packetId,
        title: document.title,
        originalKey: document.originalKey,
        originalSha256: document.originalSha256,
        createdById: viewer.id,
      },
      { transaction },
    );
    for (const signer of signers) {
      const { token, tokenHash } = newToken();
      await SignatureSigner.create(
        {
          organizationId: viewer.organizationId,
          signatureRequestId: request.id,
          role: signer.role,
          name: signer.name,
          email: signer.email,
          tokenHash,
          expiresAt,
        },
        { transaction },
      );
      const mail = signatureRequestEmail({
        organizationName: organization.name,
        senderName: viewer.name,
        signerName: signer.name,
        documentTitle: SIGNED_DOCUMENT_LABELS[document.kind],
        siteAddress: siteOf(project),
        url: signingUrl(token),
        expiresOn: localLongDate(expiresAt.toISOString(), organization.timeZone),
        reminder: false,
      });
      await enqueueMail({ to: signer.email, ...mail, organizationId: viewer.organizationId }, { transaction });
    }
    await recordAudit(
      {
        viewer,
        action: "signatures.requested",
        entityType: "project",
        entityId: projectId,
        changes: {
          signatureRequest: { before: null, after: `${document.title} to ${signers.map((s) => `${s.name} <${s.email}>`).join(", ")}` },
        },
      },
      { transaction },
    );
    return request.id;
  });
  return toRequestDto(await loadRequest(viewer.organizationId, id));
}

async function loadRequest(organizationId: string, id: string, transaction?: Transaction) {
  const request = await SignatureRequest.findOne({
    where: { id, organizationId },
    include: [
      { model: SignatureSigner, as: "signers" },
      { model: User, as: "createdBy", attributes: ["name"] },
    ],
    transaction,
  });
  if (!request) throw new AppError("NOT_FOUND", "No such signature request.");
  return request;
}

/** The project's signature requests, newest first, each with its signers' states. */
export async function listSignatureRequests({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<SignatureRequestDto[]> {
  db();
  await getProjectById({ viewer, projectId });
  const rows = await SignatureRequest.findAll({
    where: { projectId, organizationId: viewer.organizationId },
    include: [
      { model: SignatureSigner, as: "signers" },
      { model: User, as: "createdBy", attributes: ["name"] },
    ],
    order: [["createdAt", "DESC"]],
  });
  return rows.map(toRequestDto);
}

/** A stored file of one of the viewer's requests: its signed copy when there is one, else the original. */
export async function getSignatureRequestFile({
  viewer,
  requestId,
  which,
}: {
  viewer: Viewer;
  requestId: string;
  which: "original" | "signed";
}) {
  db();
  const request = isUuid(requestId)
    ? await SignatureRequest.findOne({ where: { id: requestId, organizationId: viewer.organizationId } })
    : null;
  if (!request) throw new AppError("NOT_FOUND", "No such signature request.");
  await getProjectById({ viewer, projectId: request.projectId });
  const key = which === "signed" ? request.signedKey : request.originalKey;
  if (!key) throw new AppError("NOT_FOUND", "Nobody has signed this document yet.");
  const slug = request.documentKind + (which === "signed" ? "-signed" : "");
  return { key, fileName: `${slug}-${request.id.slice(0, 8)}.pdf` };
}

async function findSignerForOffice(viewer: Viewer, signerId: string) {
  const signer = isUuid(signerId)
    ? await SignatureSigner.findOne({
        where: { id: signerId, organizationId: viewer.organizationId },
        include: [{ model: SignatureRequest, as: "request" }],
      })
    : null;
  if (!signer?.request) throw new AppError("NOT_FOUND", "No such signer.");
  await assertMayAsk(viewer, signer.request.projectId);
  return signer as SignatureSigner & { request: SignatureRequest };
}

/**
 * Sends an unanswered signer a fresh link (the old one stops working, since only one hash is kept) with
 * a new expiry, through the outbox.
 */
export async function remindSigner({ viewer, signerId, expiresInDays }: { viewer: Viewer; signerId: string; expiresInDays: number }) {
  const sequelize = db();
  const signer = await findSignerForOffice(viewer, signerId);
  if (signer.channel !== "link" || (signer.status !== "sent" && signer.status !== "opened"))
    throw new AppError("CONFLICT", "Only a link that still waits for an answer can be sent again.");
  const [project, organization] = await Promise.all([
    Project.findByPk(signer.request.projectId),
    Organization.findByPk(viewer.organizationId),
  ]);
  const { token, tokenHash } = newToken();
  const expiresAt = new Date(Date.now() + expiresInDays * DAY_MS);
  await sequelize.transaction(async (transaction) => {
    await signer.update({ tokenHash, expiresAt, remindedAt: new Date() }, { transaction });
    const mail = signatureRequestEmail({
      organizationName: organization!.name,
      senderName: viewer.name,
      signerName: signer.name,
      documentTitle: SIGNED_DOCUMENT_LABELS[signer.request.documentKind],
      siteAddress: siteOf(project!),
      url: signingUrl(token),
      expiresOn: localLongDate(expiresAt.toISOString(), organization!.timeZone),
      reminder: true,
    });
    await enqueueMail({ to: signer.email, ...mail, organizationId: viewer.organizationId }, { transaction });
    await recordAudit(
      {
        viewer,
        action: "signatures.reminded",
        entityType: "project",
        entityId: signer.request.projectId,
        changes: {
          signer: { before: `${signer.name}: link sent`, after: `${signer.name}: reminded, new link until ${expiresAt.toISOString()}` },
        },
      },
      { transaction },
    );
  });
  return toRequestDto(await loadRequest(viewer.organizationId, signer.request.id));
}

/** Withdraws a signer's link at once; it then answers 410. Withdrawing an answered link is refused. */
export async function revokeSigner({ viewer, signerId }: { viewer: Viewer; signerId: string }) {
  const sequelize = db();
  const signer = await findSignerForOffice(viewer, signerId);
  if (signer.status === "signed" || signer.status === "declined")
    throw new AppError("CONFLICT", "This signer has already answered; their answer stays on record.");
  if (signer.status !== "revoked") {
    await sequelize.transaction(async (transaction) => {
      await signer.update({ status: "revoked", revokedAt: new Date() }, { transaction });
      await recordAudit(
        {
          viewer,
          action: "signatures.revoked",
          entityType: "project",
          entityId: signer.request.projectId,
          changes: { signer: { before: `${signer.name}: ${signer.status}`, after: `${signer.name}: link withdrawn` } },
        },
        { transaction },
      );
    });
  }
  return toRequestDto(await loadRequest(viewer.organizationId, signer.request.id));
}

/** A signer's live link and its request, as the public signing page works with them. */
export type LinkSigner = {
  signerId: string;
  requestId: string;
  organizationId: string;
  projectId: string;
  role: SignerRole;
  name: string;
  email: string;
  status: "open" | "signed" | "declined";
  expiresAt: string | null;
  signedAt: string | null;
  declineReason: string;
  documentKind: SignedDocumentKind;
  documentTitle: string;
  /** The copy the signer reads: the latest signed copy, or the original while nobody has signed. */
  currentKey: string;
  signedKey: string | null;
  organizationName: string;
  timeZone: string;
  siteAddress: string;
};

/**
 * Resolves a signing token. Throttled per client address with the inspector links' count: too many
 * unknown tokens lately → LIMIT_EXCEEDED (even for a good token). Unknown → NOT_FOUND (counted);
 * withdrawn, or expired while unanswered → GONE with the reason. A signed or declined link stays
 * readable so the signer can fetch their copy.
 */
export async function getLinkSigner(token: string, client: ClientInfo): Promise<LinkSigner> {
  db();
  const { address } = clip(client);
  await refuseTokenGuesser(address, "signing links");
  const signer = /^[A-Za-z0-9_-]{16,100}$/.test(token)
    ? await SignatureSigner.findOne({
        where: { tokenHash: hashToken(token), channel: "link" },
        include: [{ model: SignatureRequest, as: "request" }],
      })
    : null;
  if (!signer?.request) {
    await recordTokenMiss(address);
    throw new AppError("NOT_FOUND", "This signing link does not exist. Check that it was copied whole.");
  }
  const [organization, project] = await Promise.all([
    Organization.findByPk(signer.organizationId),
    Project.findByPk(signer.request.projectId, { attributes: ["street", "city", "state", "postalCode"] }),
  ]);
  const zone = organization?.timeZone ?? DEFAULT_TIME_ZONE;
  const state = signerState(signer);
  if (state === "revoked")
    throw new AppError(
      "GONE",
      "This signing link was withdrawn by the sender. Nothing is waiting for your signature here; ask them if you are unsure.",
    );
  if (state === "expired")
    throw new AppError(
      "GONE",
      `This signing link expired on ${localLongDate(signer.expiresAt!.toISOString(), zone)} without a signature. Ask ${organization?.name ?? "the sender"} to send you a new one.`,
    );
  const request = signer.request;
  return {
    signerId: signer.id,
    requestId: request.id,
    organizationId: signer.organizationId,
    projectId: request.projectId,
    role: signer.role,
    name: signer.name,
    email: signer.email,
    status: isAwaitingSignature(state) ? "open" : (state as "signed" | "declined"),
    expiresAt: signer.expiresAt?.toISOString() ?? null,
    signedAt: signer.signedAt?.toISOString() ?? null,
    declineReason: signer.declineReason,
    documentKind: request.documentKind,
    documentTitle: request.title,
    currentKey: request.signedKey ?? request.originalKey,
    signedKey: request.signedKey,
    organizationName: organization?.name ?? "",
    timeZone: zone,
    siteAddress: project ? siteOf(project) : "",
  };
}

/** Logs one use of a signing link; the first view also marks the link opened. */
export async function logSigningAccess(signer: Pick<LinkSigner, "signerId">, kind: SigningAccessKind, client: ClientInfo) {
  db();
  await SignatureLinkAccess.create({ signerId: signer.signerId, kind, ...clip(client) });
  if (kind === "view")
    await SignatureSigner.update({ status: "opened", openedAt: new Date() }, { where: { id: signer.signerId, status: "sent" } });
}

/** A request locked for one signing (row lock), with everyone who signed it so far: signings of one document take turns. */
export type LockedRequest = {
  id: string;
  organizationId: string;
  projectId: string;
  documentKind: SignedDocumentKind;
  title: string;
  originalKey: string;
  originalSha256: string;
  signed: {
    role: SignerRole;
    name: string;
    email: string;
    signedAt: string;
    consentedAt: string;
    consent: string;
    address: string;
    userAgent: string;
    markKind: SignatureMarkKind;
    markKey: string | null;
    typedName: string | null;
  }[];
  signers: { id: string; role: SignerRole; state: ReturnType<typeof signerState> }[];
};

export async function lockSignatureRequest(requestId: string, transaction: Transaction): Promise<LockedRequest> {
  const request = await SignatureRequest.findByPk(requestId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!request) throw new AppError("NOT_FOUND", "No such signature request.");
  const signers = await SignatureSigner.findAll({ where: { signatureRequestId: requestId }, transaction, order: [["signedAt", "ASC"]] });
  return {
    id: request.id,
    organizationId: request.organizationId,
    projectId: request.projectId,
    documentKind: request.documentKind,
    title: request.title,
    originalKey: request.originalKey,
    originalSha256: request.originalSha256,
    signed: signers
      .filter((s) => s.status === "signed")
      .map((s) => ({
        role: s.role,
        name: s.name,
        email: s.email,
        signedAt: s.signedAt!.toISOString(),
        consentedAt: s.consentedAt!.toISOString(),
        consent: s.consentText ?? "",
        address: s.address,
        userAgent: s.userAgent,
        markKind: s.markKind!,
        markKey: s.markKey,
        typedName: s.typedName,
      })),
    signers: signers.map((s) => ({ id: s.id, role: s.role, state: signerState(s) })),
  };
}

export type SignatureEvidence = {
  signedAt: Date;
  consentText: string;
  consentedAt: Date;
  markKind: SignatureMarkKind;
  markKey: string | null;
  typedName: string | null;
  client: ClientInfo;
};

/**
 * Records one signer's signature and the request's new signed copy, audits it, and queues the signed
 * copy to the signer and a notice to the coordinator. Call inside the transaction that locked the request.
 */
export async function recordSignature(
  { signerId, evidence, signedCopy }: { signerId: string; evidence: SignatureEvidence; signedCopy: { key: string; sha256: string } },
  transaction: Transaction,
) {
  const signer = await SignatureSigner.findByPk(signerId, { transaction, include: [{ model: SignatureRequest, as: "request" }] });
  if (!signer?.request) throw new AppError("NOT_FOUND", "No such signer.");
  const { address, userAgent } = clip(evidence.client);
  await signer.update(
    {
      status: "signed",
      signedAt: evidence.signedAt,
      consentText: evidence.consentText,
      consentedAt: evidence.consentedAt,
      markKind: evidence.markKind,
      markKey: evidence.markKey,
      typedName: evidence.typedName,
      address,
      userAgent,
    },
    { transaction },
  );
  await signer.request.update({ signedKey: signedCopy.key, signedSha256: signedCopy.sha256, signedAt: evidence.signedAt }, { transaction });
  const actor = { organizationId: signer.organizationId, id: null };
  await recordAudit(
    {
      viewer: actor,
      action: "signatures.signed",
      entityType: "project",
      entityId: signer.request.projectId,
      changes: {
        signer: {
          before: `${signer.name}: waiting`,
          after: `${signer.name} signed ${signer.request.title} (${signer.channel === "link" ? "by link" : "in person"}, from ${address || "an unknown address"})`,
        },
        signedCopySha256: { before: null, after: signedCopy.sha256 },
      },
    },
    { transaction },
  );
  await queueAnswerMail(signer, null, transaction, signedCopy.key);
}

/** Records a refusal with its reason, audits it and tells the coordinator. */
export async function recordDecline({ signerId, reason, client }: { signerId: string; reason: string; client: ClientInfo }) {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const signer = await SignatureSigner.findByPk(signerId, {
      transaction,
      lock: { level: transaction.LOCK.UPDATE, of: SignatureSigner },
      include: [{ model: SignatureRequest, as: "request", required: true }],
    });
    if (!signer?.request) throw new AppError("NOT_FOUND", "No such signer.");
    if (!isAwaitingSignature(signerState(signer))) throw new AppError("CONFLICT", "This link has already been answered.");
    await signer.update({ status: "declined", declinedAt: new Date(), declineReason: reason, ...clip(client) }, { transaction });
    await recordAudit(
      {
        viewer: { organizationId: signer.organizationId, id: null },
        action: "signatures.declined",
        entityType: "project",
        entityId: signer.request.projectId,
        changes: { signer: { before: `${signer.name}: waiting`, after: `${signer.name} declined: ${reason}` } },
      },
      { transaction },
    );
    await queueAnswerMail(signer, reason, transaction, null);
  });
}

async function queueAnswerMail(
  signer: SignatureSigner & { request?: SignatureRequest },
  declineReason: string | null,
  transaction: Transaction,
  signedKey: string | null,
) {
  const request = signer.request!;
  const project = await Project.findByPk(request.projectId, { transaction });
  const organization = await Organization.findByPk(signer.organizationId, { transaction });
  if (!project || !organization) return;
  const label = SIGNED_DOCUMENT_LABELS[request.documentKind];
  const to = await coordinatorAddress({ organizationId: signer.organizationId }, project.coordinatorId ?? null, transaction);
  if (to) {
    const mail = signingAnsweredEmail({
      signerName: signer.name,
      roleLabel: SIGNER_ROLE_LABELS[signer.role],
      documentTitle: label,
      projectNumber: project.number,
      siteAddress: siteOf(project),
      declineReason,
      url: `${env().APP_URL}/projects/${project.id}/documents`,
    });
    await enqueueMail({ to, ...mail, organizationId: signer.organizationId }, { transaction });
  }
  if (signedKey && signer.email) {
    const mail = signedCopyEmail({ organizationName: organization.name, documentTitle: label, siteAddress: siteOf(project) });
    await enqueueMail(
      {
        to: signer.email,
        ...mail,
        organizationId: signer.organizationId,
        attachments: [{ fileName: `${request.documentKind}-signed.pdf`, objectKey: signedKey, contentType: "application/pdf" }],
      },
      { transaction },
    );
  }
}

/**
 * Records a document signed in person on a signed-in phone (the certificate of completion in the field):
 * the request and its signers, without links. Call inside the transaction that then signs it.
 */
export async function createInPersonRequest(
  {
    viewer,
    projectId,
    document,
    signers,
  }: {
    viewer: Viewer;
    projectId: string;
    document: { kind: SignedDocumentKind; title: string; originalKey: string; originalSha256: string };
    signers: NewSigner[];
  },
  transaction: Transaction,
): Promise<{ requestId: string; signerIds: string[] }> {
  const request = await SignatureRequest.create(
    {
      organizationId: viewer.organizationId,
      projectId,
      documentKind: document.kind,
      packetId: null,
      title: document.title,
      originalKey: document.originalKey,
      originalSha256: document.originalSha256,
      createdById: viewer.id,
    },
    { transaction },
  );
  const rows = await SignatureSigner.bulkCreate(
    signers.map((s) => ({
      organizationId: viewer.organizationId,
      signatureRequestId: request.id,
      role: s.role,
      channel: "in-person" as const,
      name: s.name,
      email: s.email,
      tokenHash: null,
      expiresAt: null,
    })),
    { transaction, returning: true },
  );
  return { requestId: request.id, signerIds: rows.map((r) => r.id) };
}
