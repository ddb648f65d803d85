import { PDFDocument } from "pdf-lib";

export type AppendedPdf = { title: string; bytes: Uint8Array };
export type SkippedPdf = { title: string; reason: string };

/** Pages in a PDF. */
export async function countPages(bytes: Uint8Array): Promise<number> {
  const doc = await PDFDocument.load(bytes, { ignoreEncryption: true, updateMetadata: false });
  return doc.getPageCount();
}

/**
 * Appends the pages of each extra PDF (equipment data sheets) after the base document, in
 * order. A file pdf-lib cannot read, or one that is encrypted, is left out and reported in
 * `skipped` rather than failing the whole packet: the cover already lists what was meant to
 * follow, so a reviewer sees what is missing.
 */
export async function appendPdfs(base: Uint8Array, extra: AppendedPdf[]): Promise<{ bytes: Uint8Array; pageCount: number; skipped: SkippedPdf[] }> {
  const merged = await PDFDocument.load(base, { updateMetadata: false });
  const skipped: SkippedPdf[] = [];
  for (const item of extra) {
    try {
      // Encrypted sheets would copy as blank or garbled pages: treat them as unreadable.
      const source = await PDFDocument.load(item.bytes, { updateMetadata: false });
      const pages = await merged.copyPages(source, source.getPageIndices());
      for (const page of pages) merged.addPage(page);
    } catch (error) {
      skipped.push({ title: item.title, reason: error instanceof Error ? error.message : String(error) });
    }
  }
  const bytes = extra.length === skipped.length ? base : await merged.save();
  return { bytes, pageCount: merged.getPageCount(), skipped };
}
