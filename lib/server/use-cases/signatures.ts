import "server-only";
import { createHash, randomUUID } from "node:crypto";
import type { Transaction } from "sequelize";
import { PDFDocument } from "pdf-lib";
import type { Viewer } from "@/lib/domain/permissions";
import { isSameName, SIGNED_DOCUMENT_LABELS, SIGNER_BLOCK, SIGNER_ROLE_LABELS } from "@/lib/domain/signature-requests";
import type { SignerRole } from "@/lib/domain/stored-values";
import { renderAgentAuthorizationPdf } from "@/lib/documents/agent-authorization/render";
import { renderCommissioningPdf } from "@/lib/documents/commissioning/render";
import { findSignatureBlocks } from "@/lib/documents/signing/blocks";
import { ELECTRONIC_SIGNATURE_CONSENT } from "@/lib/documents/signing/consent";
import type { SignatureMark, SignerEvidence } from "@/lib/documents/signing/input";
import { signPdf } from "@/lib/documents/signing/sign";
import type { SignatureRequestDto, SigningView } from "@/lib/dto/signature-requests";
import { AppError } from "@/lib/errors";
import type { RequestSignaturesInput, SignatureMarkInput, SignCertificateInPersonInput } from "@/lib/schemas/signature-request";
import { SIGNATURE_FIELDS } from "@/templates/pdf/shared/signature-line";
import { can } from "@/lib/domain/permissions";
import { db } from "../db";
import { getOrganization } from "../data/organizations";
import { getProjectById } from "../data/projects";
import { buildAgentAuthorizationInput } from "../data/agent-authorization";
import { buildCommissioningDocumentInput } from "../data/commissioning";
import {
  createInPersonRequest,
  createSignatureRequest,
  getLinkSigner,
  getSignablePacket,
  lockSignatureRequest,
  logSigningAccess,
  recordDecline,
  recordSignature,
  type LinkSigner,
  type LockedRequest,
  type NewSigner,
} from "../data/signature-requests";
import type { ClientInfo } from "../data/share-links";
import { pdfPagePng } from "../services/pdf-pages";
import { deleteObject, getObjectBytes, putObject } from "../services/storage";

// Signing spans the data (requests, signers, audit, outbox) and the outside (stored PDFs, rendering,
// pdf-lib): each signing re-signs the original with everyone who has signed so far, so the one signed
// copy always carries every signature and one record page, and the original never changes.

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");
type ParsedRequest = Omit<RequestSignaturesInput, "expiresInDays"> & { expiresInDays: number };

async function storePdf(projectId: string, name: string, bytes: Uint8Array) {
  const key = `projects/${projectId}/signatures/${randomUUID()}-${name}.pdf`;
  await putObject({ key, body: bytes, contentType: "application/pdf" });
  return { key, sha256: sha256(bytes) };
}

/** Refuses signers whose role has no signature block in the document: a signature must land on its line. */
async function assertBlocksFor(bytes: Uint8Array, roles: SignerRole[]) {
  const blocks = await findSignatureBlocks(bytes);
  const missing = roles.filter((r) => !blocks[SIGNER_BLOCK[r]]);
  if (missing.length)
    throw new AppError(
      "INVALID_INPUT",
      `This document has no signature block for: ${missing.map((r) => SIGNER_ROLE_LABELS[r].toLowerCase()).join(", ")}.`,
      {
        signers: ["Choose signers this document has a block for"],
      },
    );
}

/** Generates (or finds) the document to sign and stores it as the request's original. */
async function originalFor(viewer: Viewer, projectId: string, input: ParsedRequest) {
  const secondOwner = input.signers.find((s) => s.role === "second-owner")?.name ?? null;
  if (input.document === "interconnection-application") {
    const packet = await getSignablePacket({ viewer, projectId, packetId: input.packetId! });
    const bytes = await getObjectBytes(packet.key);
    return {
      packetId: packet.id,
      title: `Interconnection application, interconnection packet Rev ${packet.revision}`,
      key: packet.key,
      sha256: packet.sha256,
      bytes,
      stored: false,
    };
  }
  const bytes =
    input.document === "agent-authorization"
      ? await renderAgentAuthorizationPdf(await buildAgentAuthorizationInput({ viewer, projectId, secondOwnerName: secondOwner }))
      : await renderCommissioningPdf(await buildCommissioningDocumentInput({ viewer, projectId, kind: "certificate" }));
  const stored = await storePdf(projectId, input.document, bytes);
  return { packetId: null, title: SIGNED_DOCUMENT_LABELS[input.document], ...stored, bytes, stored: true };
}

/** A coordinator asks for signatures on one document; each signer gets their own link by e-mail. */
export async function requestSignatures({
  viewer,
  projectId,
  input,
}: {
  viewer: Viewer;
  projectId: string;
  input: ParsedRequest;
}): Promise<SignatureRequestDto> {
  const original = await originalFor(viewer, projectId, input);
  try {
    await assertBlocksFor(
      original.bytes,
      input.signers.map((s) => s.role),
    );
    return await createSignatureRequest({
      viewer,
      projectId,
      document: {
        kind: input.document,
        packetId: original.packetId,
        title: original.title,
        originalKey: original.key,
        originalSha256: original.sha256,
      },
      signers: input.signers as NewSigner[],
      expiresInDays: input.expiresInDays,
    });
  } catch (error) {
    if (original.stored) await deleteObject(original.key).catch(() => undefined);
    throw error;
  }
}

/** The PNG bytes of a drawn signature, or a refusal when the data is not a PNG. */
function pngOf(dataUrl: string): Uint8Array {
  const bytes = Uint8Array.from(Buffer.from(dataUrl.slice(dataUrl.indexOf(",") + 1), "base64"));
  const magic = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (bytes.length < 64 || magic.some((b, i) => bytes[i] !== b))
    throw new AppError("INVALID_INPUT", "Draw your signature again.", { mark: ["Draw your signature"] });
  return bytes;
}

type NewSignature = {
  signerId: string;
  role: SignerRole;
  name: string;
  email: string;
  mark: SignatureMarkInput;
  client: ClientInfo;
  consentedAt: Date;
};

/** Signs the original with everyone who signed before and the new signers, stores the copy and records each signature. */
async function signLocked(
  locked: LockedRequest,
  organization: { name: string; timeZone: string },
  added: NewSignature[],
  transaction: Transaction,
) {
  const original = await getObjectBytes(locked.originalKey);
  if (sha256(original) !== locked.originalSha256) throw new Error(`The stored original of signature request ${locked.id} has changed`);
  const blocks = await findSignatureBlocks(original);
  const now = new Date();
  const earlier = await Promise.all(
    locked.signed.map(async (s) => ({
      role: s.role,
      name: s.name,
      email: s.email,
      signedAt: s.signedAt,
      consentedAt: s.consentedAt,
      consent: s.consent,
      address: s.address,
      userAgent: s.userAgent,
      mark: (s.markKind === "drawn"
        ? { kind: "drawn", png: await getObjectBytes(s.markKey!) }
        : { kind: "typed", name: s.typedName! }) as SignatureMark,
    })),
  );
  const stored: { signature: NewSignature; markKey: string | null; mark: SignatureMark }[] = [];
  for (const signature of added) {
    if (signature.mark.kind === "drawn") {
      const png = pngOf(signature.mark.png);
      const markKey = `projects/${locked.projectId}/signatures/${locked.id}/${signature.signerId}.png`;
      await putObject({ key: markKey, body: png, contentType: "image/png" });
      stored.push({ signature, markKey, mark: { kind: "drawn", png } });
    } else stored.push({ signature, markKey: null, mark: { kind: "typed", name: signature.mark.name } });
  }
  const everyone = [
    ...earlier,
    ...stored.map(({ signature: s, mark }) => ({
      role: s.role,
      name: s.name,
      email: s.email,
      signedAt: now.toISOString(),
      consentedAt: s.consentedAt.toISOString(),
      consent: ELECTRONIC_SIGNATURE_CONSENT,
      address: s.client.address,
      userAgent: s.client.userAgent,
      mark,
    })),
  ];
  const signers: SignerEvidence[] = everyone.map((s) => {
    const block = SIGNER_BLOCK[s.role];
    const box = blocks[block];
    if (!box) throw new AppError("CONFLICT", `This document has no signature block for the ${SIGNER_ROLE_LABELS[s.role].toLowerCase()}.`);
    return { ...s, role: SIGNER_ROLE_LABELS[s.role], box, field: SIGNATURE_FIELDS[block] };
  });
  const signed = await signPdf(original, {
    documentTitle: locked.title,
    organizationName: organization.name,
    timeZone: organization.timeZone,
    signers,
  });
  const copy = await storePdf(locked.projectId, `${locked.documentKind}-signed`, signed.bytes);
  for (const { signature, markKey } of stored) {
    await recordSignature(
      {
        signerId: signature.signerId,
        evidence: {
          signedAt: now,
          consentText: ELECTRONIC_SIGNATURE_CONSENT,
          consentedAt: signature.consentedAt,
          markKind: signature.mark.kind,
          markKey,
          typedName: signature.mark.kind === "typed" ? signature.mark.name : null,
          client: signature.client,
        },
        signedCopy: { key: copy.key, sha256: signed.sha256Final },
      },
      transaction,
    );
  }
  return signed;
}

async function pageCount(key: string) {
  return (await PDFDocument.load(await getObjectBytes(key), { updateMetadata: false })).getPageCount();
}

/** Opens a signing link for its page and logs the view. Throws LIMIT_EXCEEDED, NOT_FOUND or GONE. */
export async function openSigningLink(token: string, client: ClientInfo): Promise<SigningView> {
  const signer = await getLinkSigner(token, client);
  await logSigningAccess(signer, "view", client);
  return {
    organizationName: signer.organizationName,
    timeZone: signer.timeZone,
    documentTitle: signer.documentTitle,
    siteAddress: signer.siteAddress,
    signerName: signer.name,
    roleLabel: SIGNER_ROLE_LABELS[signer.role],
    state: signer.status,
    expiresAt: signer.expiresAt,
    pageCount: await pageCount(signer.currentKey),
    signedAt: signer.signedAt,
    declineReason: signer.declineReason,
  };
}

/** One page of the document behind a signing link, as a PNG; logged. */
export async function signingPagePng(token: string, pageNumber: number, client: ClientInfo): Promise<Uint8Array> {
  const signer = await getLinkSigner(token, client);
  const png = await pdfPagePng(await getObjectBytes(signer.currentKey), pageNumber);
  if (!png) throw new AppError("NOT_FOUND", "The document has no such page.");
  await logSigningAccess(signer, "page", client);
  return png;
}

/** The document behind a signing link as a PDF (the signed copy once signed); logged. */
export async function signingDocument(token: string, client: ClientInfo): Promise<{ bytes: Uint8Array; fileName: string }> {
  const signer = await getLinkSigner(token, client);
  await logSigningAccess(signer, "download", client);
  const signed = signer.status === "signed" && signer.signedKey;
  return {
    bytes: await getObjectBytes(signed ? signer.signedKey! : signer.currentKey),
    fileName: `${signer.documentKind}${signed ? "-signed" : ""}.pdf`,
  };
}

function assertOpen(signer: LinkSigner) {
  if (signer.status !== "open")
    throw new AppError(
      "CONFLICT",
      signer.status === "signed" ? "You have already signed this document." : "You declined to sign this document.",
    );
}

/** The signer signs through their link: name confirmed, consent agreed, signature drawn or typed. */
export async function signByLink(
  token: string,
  input: { name: string; mark: SignatureMarkInput; consentedAt?: Date },
  client: ClientInfo,
): Promise<void> {
  const signer = await getLinkSigner(token, client);
  assertOpen(signer);
  if (!isSameName(signer.name, input.name))
    throw new AppError("INVALID_INPUT", "Type your name as it appears above. If it is wrong, ask the sender to correct it.", {
      name: [`Type your name as ${signer.name}`],
    });
  if (input.mark.kind === "typed" && !isSameName(signer.name, input.mark.name))
    throw new AppError("INVALID_INPUT", "A typed signature is your name as it appears above.", { "mark.name": [`Type ${signer.name}`] });
  await db().transaction(async (transaction) => {
    const locked = await lockSignatureRequest(signer.requestId, transaction);
    // Answered or withdrawn while the page was open: the lock makes this check final.
    if (
      locked.signers.find((s) => s.id === signer.signerId)?.state !== "opened" &&
      locked.signers.find((s) => s.id === signer.signerId)?.state !== "sent"
    )
      throw new AppError("CONFLICT", "This link is no longer waiting for a signature. Reload the page.");
    await signLocked(
      locked,
      { name: signer.organizationName, timeZone: signer.timeZone },
      [
        {
          signerId: signer.signerId,
          role: signer.role,
          name: signer.name,
          email: signer.email,
          mark: input.mark,
          client,
          consentedAt: input.consentedAt ?? new Date(),
        },
      ],
      transaction,
    );
  });
  await logSigningAccess(signer, "sign", client);
}

/** The signer declines through their link, with a reason the coordinator reads. */
export async function declineByLink(token: string, reason: string, client: ClientInfo): Promise<void> {
  const signer = await getLinkSigner(token, client);
  assertOpen(signer);
  await recordDecline({ signerId: signer.signerId, reason, client });
  await logSigningAccess(signer, "decline", client);
}

/**
 * The installer and the customer sign the certificate of completion on the installer's phone: the
 * certificate is generated from the saved field record, stored as the original, and signed by both in one
 * go, with the same signing record as a link signature. The signed copy stays with the project's documents.
 */
export async function signCertificateInPerson({
  viewer,
  projectId,
  input,
  client,
}: {
  viewer: Viewer;
  projectId: string;
  input: Omit<SignCertificateInPersonInput, "customer"> & { customer: SignCertificateInPersonInput["customer"] & { email: string } };
  client: ClientInfo;
}): Promise<{ requestId: string }> {
  const project = await getProjectById({ viewer, projectId });
  if (!can(viewer, "field:record", { organizationId: viewer.organizationId, installerId: project.installer?.id ?? null }))
    throw new AppError("FORBIDDEN", "Only the project's installer and the office record the field work.");
  const [organization, certificate] = await Promise.all([
    getOrganization({ viewer }),
    buildCommissioningDocumentInput({ viewer, projectId, kind: "certificate" }),
  ]);
  const bytes = await renderCommissioningPdf(certificate);
  await assertBlocksFor(bytes, ["installer", "customer"]);
  const original = await storePdf(projectId, "completion-certificate", bytes);
  const now = new Date();
  const consented = (iso?: string) => (iso && new Date(iso) <= now ? new Date(iso) : now);
  try {
    return await db().transaction(async (transaction) => {
      const { requestId, signerIds } = await createInPersonRequest(
        {
          viewer,
          projectId,
          document: {
            kind: "completion-certificate",
            title: SIGNED_DOCUMENT_LABELS["completion-certificate"],
            originalKey: original.key,
            originalSha256: original.sha256,
          },
          signers: [
            { role: "installer", name: input.installer.name, email: viewer.email },
            { role: "customer", name: input.customer.name, email: input.customer.email },
          ],
        },
        transaction,
      );
      const locked = await lockSignatureRequest(requestId, transaction);
      await signLocked(
        locked,
        organization,
        [
          {
            signerId: signerIds[0]!,
            role: "installer",
            name: input.installer.name,
            email: viewer.email,
            mark: input.installer.mark,
            client,
            consentedAt: consented(input.installer.consentedAt),
          },
          {
            signerId: signerIds[1]!,
            role: "customer",
            name: input.customer.name,
            email: input.customer.email,
            mark: input.customer.mark,
            client,
            consentedAt: consented(input.customer.consentedAt),
          },
        ],
        transaction,
      );
      return { requestId };
    });
  } catch (error) {
    await deleteObject(original.key).catch(() => undefined);
    throw error;
  }
}
