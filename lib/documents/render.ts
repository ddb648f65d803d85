import { renderToBuffer } from "@react-pdf/renderer";
import type { ReactElement } from "react";
import { preparePdfFonts } from "@/templates/pdf/shared/fonts";

/**
 * Draws one @react-pdf <Document> element to PDF bytes. Every document renders through here, so the
 * fonts are always prepared first (see preparePdfFonts: several PDFs in one process keep their text).
 * Pure apart from reading the shipped font files once.
 */
export async function renderPdf(document: ReactElement): Promise<Uint8Array> {
  await preparePdfFonts();
  // renderToBuffer is typed for a <Document> element; every document layout renders one.
  const buffer = await renderToBuffer(document as Parameters<typeof renderToBuffer>[0]);
  return new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength);
}
