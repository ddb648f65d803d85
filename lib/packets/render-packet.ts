import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { registerPdfFonts } from "@/templates/pdf/fonts";
import { InterconnectionPacket } from "@/templates/pdf/interconnection-packet";
import { PermitPacket } from "@/templates/pdf/permit-packet";
import type { PacketInput } from "./packet-input";
import { printableDeep } from "./pdf-facts";

/**
 * Renders a packet's generated sheets to PDF bytes (data sheets are appended separately,
 * see merge-datasheets.ts). Pure apart from reading the shipped font files once.
 */
export async function renderPacketPdf(input: PacketInput): Promise<Uint8Array> {
  registerPdfFonts();
  const printable = printableDeep(input);
  const document = printable.kind === "permit" ? createElement(PermitPacket, { input: printable }) : createElement(InterconnectionPacket, { input: printable });
  // renderToBuffer is typed for a <Document> element; both packet components render one.
  const buffer = await renderToBuffer(document as Parameters<typeof renderToBuffer>[0]);
  return new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength);
}
