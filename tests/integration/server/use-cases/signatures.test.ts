// Signature requests end to end below the browser: links made and mailed, opened, signed by drawing,
// declined, withdrawn and expired, with the same throttle as inspector links, and scoped to the company.
import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent, OutboxMessage, Packet, SignatureLinkAccess, SignatureRequest, SignatureSigner, type Project } from "@/models";
import { AppError } from "@/lib/errors";
import { renderAgentAuthorizationPdf } from "@/lib/documents/agent-authorization/render";
import { findSignatureBlocks } from "@/lib/documents/signing/blocks";
import { getDesk } from "@/lib/server/data/desk";
import { TOKEN_GUESS_THROTTLE } from "@/lib/server/data/token-guesses";
import { hasCustomerSignature } from "@/lib/server/data/customer-signatures";
import { getFieldSummary } from "@/lib/server/data/commissioning";
import { getLinkSigner, listSignatureRequests, remindSigner, revokeSigner } from "@/lib/server/data/signature-requests";
import { getObjectBytes, putObject } from "@/lib/server/services/storage";
import { hashToken } from "@/lib/server/tokens";
import { declineByLink, openSigningLink, requestSignatures, signByLink, signingPagePng } from "@/lib/server/use-cases/signatures";
import { pageTexts } from "../../../unit/documents/read-pdf";
import { closeDb } from "../../support/db";
import { makeOrganization, makeProject, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? `${e.code}: ${e.message}` : String(e)),
  );
const DAY = 24 * 60 * 60_000;
const client = (address: string) => ({ address, userAgent: "fixture-phone/2.0" });
// A 2 × 1 px opaque PNG; the server checks the PNG signature and a plausible length, so it is padded with a text chunk.
const PNG =
  "data:image/png;base64," +
  Buffer.concat([
    Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAIAAAABCAYAAAD0In+KAAAAEUlEQVR4nGNgYGD4z8DAwMAAAA4AAf8Ew6lbAAAAAElFTkSuQmCC", "base64"),
  ]).toString("base64");

/** The tokens of the links mailed for a project, newest first, read from the queued mail as a signer would. */
async function mailedTokens(to: string) {
  const rows = await OutboxMessage.findAll({ where: { toAddress: to }, order: [["createdAt", "DESC"]] });
  return rows.flatMap((r) => [...r.textBody.matchAll(/\/sign\/([A-Za-z0-9_-]+)/g)].map((m) => m[1]!));
}

/** A ready interconnection revision whose stored PDF carries a customer signature block. */
async function interconnectionRevision(project: Project, revision: number) {
  const bytes = await renderAgentAuthorizationPdf({
    generatedAt: new Date().toISOString(),
    organization: { name: "Fixture Co.", licenseNumber: null, phone: null, timeZone: "America/Denver" },
    project: {
      number: 9,
      customerName: project.customerName,
      address: "1 Fixture Way",
      jurisdictionName: null,
      utilityName: null,
      utilityAccountNumber: null,
    },
    secondOwnerName: null,
  });
  const key = `packets/fixture-${project.id}-${revision}.pdf`;
  await putObject({ key, body: bytes, contentType: "application/pdf" });
  return Packet.create({
    organizationId: project.organizationId,
    projectId: project.id,
    kind: "interconnection",
    revision,
    status: "ready",
    input: {},
    overrideReason: null,
    requestedById: null,
    objectKey: key,
    sha256: sha256(bytes),
    readyAt: new Date(),
  });
}

beforeAll(async () => {
  org = await makeOrganization("Signing");
  rival = await makeOrganization("Rival signing");
});

afterAll(async () => {
  await closeDb();
});

describe("signature requests", () => {
  it("mails each signer a link whose token is stored only as a hash, and audits the request", async () => {
    const project = await makeProject(org);
    const request = await requestSignatures({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: {
        document: "agent-authorization",
        expiresInDays: 14,
        signers: [
          { role: "customer", name: project.customerName, email: "owner.one@mail.example" },
          { role: "second-owner", name: "Second Fixture", email: "owner.two@mail.example" },
        ],
      },
    });
    expect(request.signers.map((s) => [s.role, s.state])).toEqual([
      ["customer", "sent"],
      ["second-owner", "sent"],
    ]);
    const [token] = await mailedTokens("owner.one@mail.example");
    expect(token!.length).toBeGreaterThanOrEqual(22); // ≥ 128 bits in base64url
    const row = await SignatureSigner.findOne({ where: { signatureRequestId: request.id, role: "customer" } });
    expect(row!.tokenHash).toBe(hashToken(token!));
    expect(JSON.stringify(row!.toJSON())).not.toContain(token);
    // The letter was generated with a block for each owner and stored as the request's original.
    const stored = await SignatureRequest.findByPk(request.id);
    const original = await getObjectBytes(stored!.originalKey);
    expect(sha256(original)).toBe(stored!.originalSha256);
    expect(Object.keys(await findSignatureBlocks(original)).sort()).toEqual(["customer", "secondOwner"]);
    expect(await AuditEvent.count({ where: { entityId: project.id, action: "signatures.requested" } })).toBe(1);
  });

  it("lets the customer read the pages and sign by drawing; the signed copy is new and carries the record", async () => {
    const project = await makeProject(org);
    const rev1 = await interconnectionRevision(project, 1);
    const email = `signer.${project.id.slice(0, 8)}@mail.example`;
    const request = await requestSignatures({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: {
        document: "interconnection-application",
        packetId: rev1.id,
        expiresInDays: 14,
        signers: [{ role: "customer", name: project.customerName, email }],
      },
    });
    expect(await hasCustomerSignature({ organizationId: org.organization.id, packetId: rev1.id })).toBe(false);
    const [token] = await mailedTokens(email);
    const view = await openSigningLink(token!, client("198.51.100.7"));
    expect(view).toMatchObject({ state: "open", signerName: project.customerName, roleLabel: "Customer", pageCount: 1 });
    const png = await signingPagePng(token!, 1, client("198.51.100.7"));
    expect(Buffer.from(png.subarray(1, 4)).toString("latin1")).toBe("PNG");
    expect(await code(signingPagePng(token!, 2, client("198.51.100.7")))).toMatch(/^NOT_FOUND/);

    // The name must be the one the signer was asked under (case and spacing aside).
    expect(await code(signByLink(token!, { name: "Somebody Else", mark: { kind: "drawn", png: PNG } }, client("198.51.100.7")))).toMatch(
      /^INVALID_INPUT/,
    );
    expect(
      await code(signByLink(token!, { name: "x", mark: { kind: "drawn", png: "data:image/png;base64,AAAA" } }, client("198.51.100.7"))),
    ).toMatch(/^INVALID_INPUT/);
    await signByLink(
      token!,
      { name: `  ${project.customerName.toUpperCase()} `, mark: { kind: "drawn", png: PNG } },
      client("198.51.100.7"),
    );

    const stored = await SignatureRequest.findByPk(request.id);
    const original = await getObjectBytes(stored!.originalKey);
    expect(sha256(original)).toBe(rev1.sha256); // the original is unchanged
    expect(stored!.signedKey).not.toBe(stored!.originalKey);
    const signed = await getObjectBytes(stored!.signedKey!);
    expect(sha256(signed)).toBe(stored!.signedSha256);
    const text = (await pageTexts(signed)).join(" ");
    expect(text).toContain(project.customerName);
    expect(text).toContain(rev1.sha256!);
    expect(text).toContain("198.51.100.7");
    expect(await hasCustomerSignature({ organizationId: org.organization.id, packetId: rev1.id })).toBe(true);

    // The signer gets the signed copy attached; the coordinator is told.
    const [copyMail] = await OutboxMessage.findAll({ where: { toAddress: email }, order: [["createdAt", "DESC"]], limit: 1 });
    expect(copyMail!.attachments).toEqual([expect.objectContaining({ objectKey: stored!.signedKey })]);
    const notice = await OutboxMessage.findOne({ where: { toAddress: org.users.coordinator.email }, order: [["createdAt", "DESC"]] });
    expect(notice!.subject).toContain("signed the interconnection application");

    // A second visit shows it signed; signing again is refused; the log has each use.
    expect((await openSigningLink(token!, client("198.51.100.7"))).state).toBe("signed");
    expect(
      await code(
        signByLink(token!, { name: project.customerName, mark: { kind: "typed", name: project.customerName } }, client("198.51.100.7")),
      ),
    ).toMatch(/^CONFLICT/);
    const kinds = (await SignatureLinkAccess.findAll({ where: { signerId: request.signers[0]!.id } })).map((a) => a.kind).sort();
    expect(kinds).toEqual(["page", "sign", "view", "view"]);
    const [listed] = await listSignatureRequests({ viewer: org.viewers.coordinator, projectId: project.id });
    expect(listed!.signers[0]).toMatchObject({ state: "signed", markKind: "drawn" });
  });

  it("refuses a signer the document has no block for", async () => {
    const project = await makeProject(org);
    const rev = await interconnectionRevision(project, 1);
    const refused = requestSignatures({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: {
        document: "interconnection-application",
        packetId: rev.id,
        expiresInDays: 14,
        signers: [{ role: "second-owner", name: "No Block", email: "no.block@mail.example" }],
      },
    });
    expect(await code(refused)).toMatch(/^INVALID_INPUT: This document has no signature block for: second owner/);
  });

  it("answers a withdrawn link and an expired one with GONE and words, an unknown one with NOT_FOUND, and records a refusal", async () => {
    const project = await makeProject(org);
    const input = (email: string) => ({
      document: "agent-authorization" as const,
      expiresInDays: 14,
      signers: [{ role: "customer" as const, name: project.customerName, email }],
    });
    const a = await requestSignatures({ viewer: org.viewers.coordinator, projectId: project.id, input: input("a.gone@mail.example") });
    const [tokenA] = await mailedTokens("a.gone@mail.example");
    await revokeSigner({ viewer: org.viewers.coordinator, signerId: a.signers[0]!.id });
    expect(await code(getLinkSigner(tokenA!, client("203.0.113.5")))).toMatch(/^GONE: This signing link was withdrawn/);

    const b = await requestSignatures({ viewer: org.viewers.coordinator, projectId: project.id, input: input("b.late@mail.example") });
    const [tokenB] = await mailedTokens("b.late@mail.example");
    await SignatureSigner.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { id: b.signers[0]!.id } });
    expect(await code(getLinkSigner(tokenB!, client("203.0.113.5")))).toMatch(/^GONE: This signing link expired on /);
    expect(
      (await listSignatureRequests({ viewer: org.viewers.coordinator, projectId: project.id })).find((r) => r.id === b.id)!.signers[0]!
        .state,
    ).toBe("expired");
    // A reminder makes a new link (the old token stops working) with a new expiry.
    await SignatureSigner.update({ expiresAt: new Date(Date.now() + 60_000) }, { where: { id: b.signers[0]!.id } });
    await remindSigner({ viewer: org.viewers.coordinator, signerId: b.signers[0]!.id, expiresInDays: 7 });
    const [tokenB2] = await mailedTokens("b.late@mail.example");
    expect(tokenB2).not.toBe(tokenB);
    expect(await code(getLinkSigner(tokenB!, client("203.0.113.5")))).toMatch(/^NOT_FOUND/);
    await declineByLink(tokenB2!, "The roof owner is my landlord; ask them.", client("203.0.113.5"));
    const declined = await SignatureSigner.findByPk(b.signers[0]!.id);
    expect(declined).toMatchObject({ status: "declined", declineReason: "The roof owner is my landlord; ask them." });
    expect((await openSigningLink(tokenB2!, client("203.0.113.5"))).state).toBe("declined");
    expect(await code(revokeSigner({ viewer: org.viewers.coordinator, signerId: b.signers[0]!.id }))).toMatch(/^CONFLICT/);

    expect(await code(getLinkSigner("an-unknown-token-of-fair-length", client("203.0.113.5")))).toMatch(/^NOT_FOUND/);
  });

  it("keeps requests inside the company: another company sees nothing and cannot remind or withdraw", async () => {
    const project = await makeProject(org);
    const request = await requestSignatures({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: {
        document: "agent-authorization",
        expiresInDays: 14,
        signers: [{ role: "customer", name: project.customerName, email: "scoped@mail.example" }],
      },
    });
    const signerId = request.signers[0]!.id;
    expect(await code(listSignatureRequests({ viewer: rival.viewers.coordinator, projectId: project.id }))).toMatch(/^NOT_FOUND/);
    expect(await code(remindSigner({ viewer: rival.viewers.coordinator, signerId, expiresInDays: 7 }))).toMatch(/^NOT_FOUND/);
    expect(await code(revokeSigner({ viewer: rival.viewers.admin, signerId }))).toMatch(/^NOT_FOUND/);
    expect(await code(revokeSigner({ viewer: org.viewers.installer, signerId }))).toMatch(/^(NOT_FOUND|FORBIDDEN)/);
  });

  it("lists unanswered links on the coordinator's desk until they are answered, withdrawn or expired", async () => {
    const project = await makeProject(org);
    const request = await requestSignatures({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: {
        document: "agent-authorization",
        expiresInDays: 14,
        signers: [{ role: "customer", name: project.customerName, email: "desk@mail.example" }],
      },
    });
    const onDesk = async () =>
      (await getDesk({ viewer: org.viewers.coordinator })).desk.signatures.filter((r) => r.projectId === project.id).map((r) => r.what);
    expect(await onDesk()).toEqual([`Agent authorization letter: not signed by ${project.customerName} yet`]);
    await SignatureSigner.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: request.signers[0]!.id } });
    expect(await onDesk()).toEqual([]);
    await SignatureSigner.update({ expiresAt: new Date(Date.now() + DAY) }, { where: { id: request.signers[0]!.id } });
    expect(await onDesk()).toHaveLength(1);
    await revokeSigner({ viewer: org.viewers.coordinator, signerId: request.signers[0]!.id });
    expect(await onDesk()).toEqual([]);
    // Another company's desk never lists it.
    expect((await getDesk({ viewer: rival.viewers.admin })).desk.signatures.filter((r) => r.projectId === project.id)).toEqual([]);
  });

  it("refuses an address that guessed too many tokens, even with a good one (shared count with inspector links)", async () => {
    const project = await makeProject(org);
    await requestSignatures({
      viewer: org.viewers.coordinator,
      projectId: project.id,
      input: {
        document: "agent-authorization",
        expiresInDays: 14,
        signers: [{ role: "customer", name: project.customerName, email: "throttle@mail.example" }],
      },
    });
    const [token] = await mailedTokens("throttle@mail.example");
    const guesser = client("192.0.2.99");
    for (let i = 0; i < TOKEN_GUESS_THROTTLE.maxMisses; i++) await code(getLinkSigner(`guess-${i}-abcdefghijklmnop`, guesser));
    expect(await code(getLinkSigner(token!, guesser))).toMatch(/^LIMIT_EXCEEDED/);
    expect(await code(getLinkSigner(token!, client("192.0.2.100")))).toBe("resolved");
  });
});

describe("a certificate signed here counts as the signed form", () => {
  async function certificate(project: Project, statuses: ("signed" | "sent")[]) {
    const request = await SignatureRequest.create({
      organizationId: project.organizationId,
      projectId: project.id,
      documentKind: "completion-certificate",
      packetId: null,
      title: "Certificate of completion",
      originalKey: `projects/${project.id}/completion-certificate.pdf`,
      originalSha256: "0".repeat(64),
      signedKey: `projects/${project.id}/completion-certificate-signed.pdf`,
      signedSha256: "1".repeat(64),
      createdById: null,
    });
    const roles = ["installer", "customer"] as const;
    for (const [i, status] of statuses.entries())
      await SignatureSigner.create({
        organizationId: project.organizationId,
        signatureRequestId: request.id,
        role: roles[i]!,
        channel: "in-person",
        name: `Signer ${i + 1}`,
        status,
        signedAt: status === "signed" ? new Date() : null,
      });
  }

  it("counts a certificate every signer signed, and not one a signer has still to sign", async () => {
    const half = await makeProject(org);
    await certificate(half, ["signed", "sent"]);
    expect((await getFieldSummary({ viewer: org.viewers.coordinator, projectId: half.id })).signedForms).toBe(0);

    const whole = await makeProject(org);
    await certificate(whole, ["signed", "signed"]);
    expect((await getFieldSummary({ viewer: org.viewers.coordinator, projectId: whole.id })).signedForms).toBe(1);
  });
});
