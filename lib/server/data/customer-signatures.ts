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
