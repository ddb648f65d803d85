import "server-only";
import { PDFParse } from "pdf-parse";

/**
 * One page of a PDF as a PNG, drawn by pdf.js on a server-side canvas, so a phone can read a document
 * without a PDF viewer. `pageNumber` counts from 1; out of range gives null.
 */
export async function pdfPagePng(bytes: Uint8Array, pageNumber: number, { widthPx = 1000 } = {}): Promise<Uint8Array | null> {
  // pdf.js may take over the buffer it is given: hand it a copy.
  const parser = new PDFParse({ data: bytes.slice() });
  try {
    const info = await parser.getInfo();
    if (!Number.isInteger(pageNumber) || pageNumber < 1 || pageNumber > info.total) return null;
    const shot = await parser.getScreenshot({ partial: [pageNumber], desiredWidth: widthPx, imageDataUrl: false });
    const page = shot.pages[0];
    return page ? new Uint8Array(page.data) : null;
  } finally {
    await parser.destroy();
  }
}
