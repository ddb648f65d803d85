import "server-only";
import type { Transaction } from "sequelize";
import { SignatureRequest, SignatureSigner } from "@/models";

// Kept apart from the signature requests' module: filings ask it, and that module reads projects, which read filings.

/** Whether a packet revision's interconnection application carries a completed customer signature. */
export async function hasCustomerSignature(
  { organizationId, packetId }: { organizationId: string; packetId: string },
  transaction?: Transaction,
) {
  const found = await SignatureSigner.findOne({
    where: { organizationId, role: "customer", status: "signed" },
    include: [{ model: SignatureRequest, as: "request", where: { packetId, documentKind: "interconnection-application" }, attributes: [] }],
    attributes: ["id"],
    transaction,
  });
  return Boolean(found);
}

/**
 * Certificates of completion of a project that every signer has signed through Ohmstead (on the phone or by
 * link): each counts as a signed form received, as an uploaded scan of a signed paper form does.
 */
export async function countSignedCertificates(projectId: string, transaction?: Transaction): Promise<number> {
  const requests = await SignatureRequest.findAll({
    where: { projectId, documentKind: "completion-certificate" },
    include: [{ model: SignatureSigner, as: "signers", attributes: ["status"] }],
    attributes: ["id", "signedKey"],
    transaction,
  });
  return requests.filter((r) => r.signedKey && (r.signers ?? []).length > 0 && r.signers!.every((s) => s.status === "signed")).length;
}
