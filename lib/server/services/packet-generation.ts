import "server-only";
import { createHash, randomUUID } from "node:crypto";
import { AuditEvent, Packet } from "@/models";
import { planGenerationSteps, type GenerationStep } from "@/lib/documents/packets/generation-steps";
import { appendPdfs } from "@/lib/documents/packets/merge-datasheets";
import { PACKET_TITLES, type PacketInput } from "@/lib/documents/packets/input";
import { packetSheetTitles, renderPacketPdf } from "@/lib/documents/packets/render";
import { db } from "../db";
import { deleteObject, getObjectBytes, putObject } from "./storage";

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/**
 * Renders, stores and verifies one queued packet. The row turns "ready" only
 * after the stored object reads back with the same checksum; on any failure
 * the object is removed and the row says what went wrong, so no half-made
 * revision is ever offered for download. Each step is written to the row as
 * it starts (text, progress and the attempt's step log), so the Documents
 * page shows what the worker is doing.
 */
export async function generatePacket(packetId: string): Promise<void> {
  db();
  const packet = await Packet.findByPk(packetId);
  if (!packet || packet.status === "ready") return;
  let storedKey: string | null = null;
  try {
    const input = packet.input as unknown as PacketInput;
    const datasheets = input.datasheets.filter((sheet) => sheet.objectKey);
    const plan = planGenerationSteps({ sheetTitles: packetSheetTitles(input), datasheetTitles: datasheets.map((sheet) => sheet.title) });
    const sheetSteps = plan.filter((s) => s.kind === "sheet");
    const datasheetSteps = plan.filter((s) => s.kind === "datasheet");
    const stepOf = (kind: GenerationStep["kind"]) => plan.find((s) => s.kind === kind)!;
    // A new attempt starts a new log; the bar of this attempt only moves forward.
    await packet.update({ attempts: packet.attempts + 1, error: null, steps: [] });
    const begin = async (step: GenerationStep) => {
      const progress = Math.max(packet.progress, step.progress);
      await packet.update({ status: "running", progress, step: step.text, steps: [...packet.steps, { at: new Date().toISOString(), progress, text: step.text }] });
    };

    const sheets = await renderPacketPdf(input, { onSheet: (index) => begin(sheetSteps[index]!) });

    const extras = [];
    for (const [index, sheet] of datasheets.entries()) {
      await begin(datasheetSteps[index]!);
      extras.push({ title: sheet.title, bytes: await getObjectBytes(sheet.objectKey!) });
    }
    await begin(stepOf("assemble"));
    const merged = await appendPdfs(sheets, extras, { footer: `Attachment to project ${input.project.number}, ${PACKET_TITLES[packet.kind].toLowerCase()} Rev ${packet.revision}` });

    await begin(stepOf("store"));
    const checksum = sha256(merged.bytes);
    const key = `orgs/${packet.organizationId}/projects/${packet.projectId}/packets/${packet.kind}-rev${packet.revision}-${randomUUID()}.pdf`;
    await putObject({ key, body: merged.bytes, contentType: "application/pdf" });
    storedKey = key;

    await begin(stepOf("verify"));
    if (sha256(await getObjectBytes(key)) !== checksum) throw new Error("The stored copy does not match the generated PDF.");

    const left = merged.skipped.length ? ` (${merged.skipped.map((x) => x.title).join(", ")}: data sheet unreadable, left out)` : "";
    const done = `Ready${left}`.slice(0, 80);
    await packet.update({
      status: "ready", progress: 100, step: done, steps: [...packet.steps, { at: new Date().toISOString(), progress: 100, text: done }],
      objectKey: key, sha256: checksum, sizeBytes: merged.bytes.length, pageCount: merged.pageCount, readyAt: new Date(),
    });
    await AuditEvent.create({
      organizationId: packet.organizationId, actorId: packet.requestedById, action: "packet.generated", entityType: "project", entityId: packet.projectId,
      changes: { [`${packet.kind} packet`]: { before: null, after: `Rev ${packet.revision}, ${merged.pageCount} pages, SHA-256 ${checksum.slice(0, 12)}…` } },
    });
  } catch (error) {
    console.error(`packet ${packetId} failed`, error);
    if (storedKey) await deleteObject(storedKey).catch(() => undefined);
    const message = error instanceof Error ? error.message : String(error);
    // The step log keeps where it stopped; the bar is gone with the failed state.
    await packet.update({ status: "failed", progress: 0, step: "Failed", error: message.slice(0, 500) });
  }
}
