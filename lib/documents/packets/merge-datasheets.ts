import { PDFDocument, StandardFonts, rgb } from "pdf-lib";

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
export async function appendPdfs(
  base: Uint8Array,
  extra: AppendedPdf[],
  { footer }: { footer?: string } = {},
): Promise<{ bytes: Uint8Array; pageCount: number; skipped: SkippedPdf[] }> {
  const merged = await PDFDocument.load(base, { updateMetadata: false });
  const font = footer ? await merged.embedFont(StandardFonts.Helvetica) : null;
  const skipped: SkippedPdf[] = [];
  for (const item of extra) {
    try {
      // Encrypted sheets would copy as blank or garbled pages: treat them as unreadable.
      const source = await PDFDocument.load(item.bytes, { updateMetadata: false });
      const pages = await merged.copyPages(source, source.getPageIndices());
      pages.forEach((page, i) => {
        merged.addPage(page);
        // Loose sheets still say which packet and revision they belong to.
        if (font && footer)
          page.drawText(`${footer} · ${item.title} · page ${i + 1} of ${pages.length}`.replace(/[^\x20-\x7e·]/g, "-"), {
            x: 24,
            y: 10,
            size: 7,
            font,
            color: rgb(0.3, 0.28, 0.24),
          });
      });
    } catch (error) {
      skipped.push({ title: item.title, reason: error instanceof Error ? error.message : String(error) });
    }
  }
  const bytes = extra.length === skipped.length ? base : await merged.save();
  return { bytes, pageCount: merged.getPageCount(), skipped };
}
