import "server-only";
import { createHash, randomUUID } from "node:crypto";
import { AuditEvent, Packet } from "@/models";
import { appendPdfs } from "@/lib/packets/merge-datasheets";
import { PACKET_TITLES, type PacketInput } from "@/lib/packets/packet-input";
import { renderPacketPdf } from "@/lib/packets/render-packet";
import { db } from "../db";
import { deleteObject, getObjectBytes, putObject } from "./storage";

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/**
 * Renders, stores and verifies one queued packet. The row turns "ready" only
 * after the stored object reads back with the same checksum; on any failure
 * the object is removed and the row says what went wrong, so no half-made
 * revision is ever offered for download.
 */
export async function generatePacket(packetId: string): Promise<void> {
  db();
  const packet = await Packet.findByPk(packetId);
  if (!packet || packet.status === "ready") return;
  const step = (progress: number, text: string) => packet.update({ status: "running", progress, step: text });
  let storedKey: string | null = null;
  try {
    await packet.update({ attempts: packet.attempts + 1, error: null });
    await step(10, "Drawing the sheets");
    const input = packet.input as unknown as PacketInput;
    const sheets = await renderPacketPdf(input);

    await step(55, "Adding the data sheets");
    const extras = [];
    for (const sheet of input.datasheets) if (sheet.objectKey) extras.push({ title: sheet.title, bytes: await getObjectBytes(sheet.objectKey) });
    const merged = await appendPdfs(sheets, extras, { footer: `Attachment to project ${input.project.number}, ${PACKET_TITLES[packet.kind].toLowerCase()} Rev ${packet.revision}` });

    await step(75, "Storing the PDF");
    const checksum = sha256(merged.bytes);
    const key = `orgs/${packet.organizationId}/projects/${packet.projectId}/packets/${packet.kind}-rev${packet.revision}-${randomUUID()}.pdf`;
    await putObject({ key, body: merged.bytes, contentType: "application/pdf" });
    storedKey = key;

    await step(90, "Checking the stored copy");
    if (sha256(await getObjectBytes(key)) !== checksum) throw new Error("The stored copy does not match the generated PDF.");

    const left = merged.skipped.length ? ` (${merged.skipped.map((x) => x.title).join(", ")}: data sheet unreadable, left out)` : "";
    await packet.update({ status: "ready", progress: 100, step: `Ready${left}`.slice(0, 80), objectKey: key, sha256: checksum, sizeBytes: merged.bytes.length, pageCount: merged.pageCount, readyAt: new Date() });
    await AuditEvent.create({
      organizationId: packet.organizationId, actorId: packet.requestedById, action: "packet.generated", entityType: "project", entityId: packet.projectId,
      changes: { [`${packet.kind} packet`]: { before: null, after: `Rev ${packet.revision}, ${merged.pageCount} pages, SHA-256 ${checksum.slice(0, 12)}…` } },
    });
  } catch (error) {
    console.error(`packet ${packetId} failed`, error);
    if (storedKey) await deleteObject(storedKey).catch(() => undefined);
    const message = error instanceof Error ? error.message : String(error);
    await packet.update({ status: "failed", progress: 0, step: "Failed", error: message.slice(0, 500) });
  }
}
