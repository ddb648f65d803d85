import "server-only";
import { createHash, randomUUID } from "node:crypto";
import { planGenerationSteps, type GenerationStep } from "@/lib/documents/packets/generation-steps";
import { appendPdfs } from "@/lib/documents/packets/merge-datasheets";
import { PACKET_TITLES } from "@/lib/documents/packets/input";
import { packetSheetTitles, renderPacketPdf } from "@/lib/documents/packets/render";
import { startPacketGeneration } from "../data/packets";
import { deleteObject, getObjectBytes, putObject } from "../services/storage";

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/**
 * Renders, stores and verifies one queued packet. The row turns "ready" only
 * after the stored object reads back with the same checksum, together with its
 * audit row; on any failure the object is removed and the row says what went
 * wrong, so no half-made revision is ever offered for download. Each step is
 * written to the row as it starts, so the Documents page shows what the worker
 * is doing.
 */
export async function generatePacket(packetId: string): Promise<void> {
  const generation = await startPacketGeneration(packetId);
  if (!generation) return;
  const { packet, begin } = generation;
  let storedKey: string | null = null;
  try {
    const { input } = packet;
    const datasheets = input.datasheets.filter((sheet) => sheet.objectKey);
    const plan = planGenerationSteps({ sheetTitles: packetSheetTitles(input), datasheetTitles: datasheets.map((sheet) => sheet.title) });
    const sheetSteps = plan.filter((s) => s.kind === "sheet");
    const datasheetSteps = plan.filter((s) => s.kind === "datasheet");
    const stepOf = (kind: GenerationStep["kind"]) => plan.find((s) => s.kind === kind)!;

    const sheets = await renderPacketPdf(input, { onSheet: (index) => begin(sheetSteps[index]!) });

    const extras = [];
    for (const [index, sheet] of datasheets.entries()) {
      await begin(datasheetSteps[index]!);
      extras.push({ title: sheet.title, bytes: await getObjectBytes(sheet.objectKey!) });
    }
    await begin(stepOf("assemble"));
    const merged = await appendPdfs(sheets, extras, {
      footer: `Attachment to project ${input.project.number}, ${PACKET_TITLES[packet.kind].toLowerCase()} Rev ${packet.revision}`,
    });

    await begin(stepOf("store"));
    const checksum = sha256(merged.bytes);
    const key = `orgs/${packet.organizationId}/projects/${packet.projectId}/packets/${packet.kind}-rev${packet.revision}-${randomUUID()}.pdf`;
    await putObject({ key, body: merged.bytes, contentType: "application/pdf" });
    storedKey = key;

    await begin(stepOf("verify"));
    if (sha256(await getObjectBytes(key)) !== checksum) throw new Error("The stored copy does not match the generated PDF.");

    const left = merged.skipped.length ? ` (${merged.skipped.map((x) => x.title).join(", ")}: data sheet unreadable, left out)` : "";
    await generation.markReady({
      objectKey: key,
      sha256: checksum,
      sizeBytes: merged.bytes.length,
      pageCount: merged.pageCount,
      doneText: `Ready${left}`.slice(0, 80),
    });
  } catch (error) {
    console.error(`packet ${packetId} failed`, error);
    if (storedKey) await deleteObject(storedKey).catch(() => undefined);
    await generation.markFailed(error instanceof Error ? error.message : String(error));
  }
}
