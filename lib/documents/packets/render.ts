import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { PDFDocument } from "pdf-lib";
import { preparePdfFonts } from "@/templates/pdf/shared/fonts";
import { interconnectionSheetPages } from "@/templates/pdf/packets/interconnection-packet";
import { PacketDocument, packetDocumentInfo } from "@/templates/pdf/packets/packet-document";
import { permitSheetPages, type DrawnSheet } from "@/templates/pdf/packets/permit-packet";
import type { PacketInput } from "./input";
import { printableDeep } from "./facts";

const sheetsOf = (printable: PacketInput): DrawnSheet[] => (printable.kind === "permit" ? permitSheetPages(printable) : interconnectionSheetPages(printable));

/** The titles of a packet's generated sheets, in order: what the worker will draw. */
export function packetSheetTitles(input: PacketInput): string[] {
  return sheetsOf(printableDeep(input)).map((s) => s.sheet.title);
}

/**
 * Renders a packet's generated sheets to PDF bytes (data sheets are appended separately, see
 * merge-datasheets.ts). Each sheet is drawn on its own and the pages are put together after, so a
 * caller can report each sheet as it starts (`onSheet`, with its index). Pure apart from reading the
 * shipped font files once.
 */
export async function renderPacketPdf(input: PacketInput, { onSheet }: { onSheet?: (index: number) => Promise<void> | void } = {}): Promise<Uint8Array> {
  await preparePdfFonts();
  const printable = printableDeep(input);
  const sheets = sheetsOf(printable);
  const packet = await PDFDocument.create({ updateMetadata: false });
  for (const [index, { page }] of sheets.entries()) {
    await onSheet?.(index);
    // renderToBuffer is typed for a <Document> element; PacketDocument renders one.
    const buffer = await renderToBuffer(createElement(PacketDocument, { input: printable, children: page }) as Parameters<typeof renderToBuffer>[0]);
    const drawn = await PDFDocument.load(new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength), { updateMetadata: false });
    for (const copied of await packet.copyPages(drawn, drawn.getPageIndices())) packet.addPage(copied);
  }
  const info = packetDocumentInfo(printable);
  packet.setTitle(info.title);
  packet.setAuthor(info.author);
  packet.setCreator(info.creator);
  packet.setProducer(info.producer);
  const issued = new Date(printable.generatedAt);
  if (!Number.isNaN(issued.getTime())) {
    packet.setCreationDate(issued);
    packet.setModificationDate(issued);
  }
  return packet.save();
}
