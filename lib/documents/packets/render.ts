import { createElement } from "react";
import { PDFDocument } from "pdf-lib";
import { interconnectionSheetPages } from "@/templates/pdf/packets/interconnection-packet";
import { PacketDocument } from "@/templates/pdf/packets/packet-document";
import { permitSheetPages, type DrawnSheet } from "@/templates/pdf/packets/permit-packet";
import { renderPdf } from "../render";
import { printableDeep } from "../text";
import { packetFacts, type PrintedPacket } from "./printed";
import type { PacketInput } from "./input";
import { planInterconnectionSheets, planPermitSheets } from "./sheet-plan";

/** The packet's input made printable, with its printed facts. */
function printedPacket(input: PacketInput): PrintedPacket {
  const printable = printableDeep(input);
  return { ...printable, facts: packetFacts(printable) };
}

const sheetsOf = (packet: PrintedPacket): DrawnSheet[] =>
  packet.kind === "permit"
    ? permitSheetPages(packet, planPermitSheets(packet))
    : interconnectionSheetPages(packet, planInterconnectionSheets());

/** The titles of a packet's generated sheets, in order: what the worker will draw. */
export function packetSheetTitles(input: PacketInput): string[] {
  const printable = printableDeep(input);
  return (printable.kind === "permit" ? planPermitSheets(printable) : planInterconnectionSheets()).map((s) => s.title);
}

/**
 * Renders a packet's generated sheets to PDF bytes (data sheets are appended separately, see
 * merge-datasheets.ts). Each sheet is drawn on its own and the pages are put together after, so a
 * caller can report each sheet as it starts (`onSheet`, with its index). Pure apart from reading the
 * shipped font files once.
 */
export async function renderPacketPdf(
  input: PacketInput,
  { onSheet }: { onSheet?: (index: number) => Promise<void> | void } = {},
): Promise<Uint8Array> {
  const packet = printedPacket(input);
  const { documentInfo: info } = packet.facts;
  const merged = await PDFDocument.create({ updateMetadata: false });
  for (const [index, { page }] of sheetsOf(packet).entries()) {
    await onSheet?.(index);
    const drawn = await PDFDocument.load(await renderPdf(createElement(PacketDocument, { info }, page)), { updateMetadata: false });
    for (const copied of await merged.copyPages(drawn, drawn.getPageIndices())) merged.addPage(copied);
  }
  merged.setTitle(info.title);
  merged.setAuthor(info.author);
  merged.setCreator(info.creator);
  merged.setProducer(info.producer);
  const issued = new Date(packet.generatedAt);
  if (!Number.isNaN(issued.getTime())) {
    merged.setCreationDate(issued);
    merged.setModificationDate(issued);
  }
  return merged.save();
}
