// Reads generated PDFs back the way a reviewer's tools would: text per page and page sizes.
import { PDFDocument } from "pdf-lib";
import { PDFParse } from "pdf-parse";

/** The text of each page, with runs of whitespace collapsed so wrapped lines compare as one. */
export async function pageTexts(bytes: Uint8Array): Promise<string[]> {
  // pdf.js may take over the buffer it is given; parse a copy so the caller's bytes stay usable.
  const parser = new PDFParse({ data: bytes.slice() });
  try {
    const result = await parser.getText();
    return result.pages.map((p) => p.text.replace(/\s+/g, " "));
  } finally {
    await parser.destroy();
  }
}

/** Width × height of each page in points, as drawn (rotation applied). */
export async function pageSizes(bytes: Uint8Array): Promise<{ width: number; height: number }[]> {
  const doc = await PDFDocument.load(bytes);
  return doc.getPages().map((p) => {
    const { width, height } = p.getSize();
    return p.getRotation().angle % 180 === 0 ? { width, height } : { width: height, height: width };
  });
}

/** How often a whole word occurs in a text. */
export function countWord(text: string, word: string): number {
  return text.match(new RegExp(`\\b${word}\\b`, "g"))?.length ?? 0;
}
