import { PDFDocument, StandardFonts } from "pdf-lib";
import { describe, expect, test } from "vitest";
import { appendPdfs, countPages } from "@/lib/documents/packets/merge-datasheets";
import { pageTexts } from "../read-pdf";

async function smallPdf(lines: string[]): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  const font = await doc.embedFont(StandardFonts.Helvetica);
  for (const line of lines) doc.addPage([612, 792]).drawText(line, { x: 72, y: 700, size: 14, font });
  return doc.save();
}

describe("appending data sheets", () => {
  test("adds every page of each readable PDF after the base, in order", async () => {
    const base = await smallPdf(["Generated sheet 1", "Generated sheet 2"]);
    const moduleSheet = await smallPdf(["Module data sheet p1", "Module data sheet p2"]);
    const inverterSheet = await smallPdf(["Inverter data sheet"]);
    const merged = await appendPdfs(base, [
      { title: "Module", bytes: moduleSheet },
      { title: "Inverter", bytes: inverterSheet },
    ]);
    expect(merged.pageCount).toBe(5);
    expect(merged.skipped).toEqual([]);
    expect(await countPages(merged.bytes)).toBe(5);
    const texts = await pageTexts(merged.bytes);
    expect(texts.map((t) => t.trim())).toEqual([
      "Generated sheet 1",
      "Generated sheet 2",
      "Module data sheet p1",
      "Module data sheet p2",
      "Inverter data sheet",
    ]);
  });

  test("skips and reports a file it cannot read instead of failing the packet", async () => {
    const base = await smallPdf(["Generated sheet"]);
    const good = await smallPdf(["Good data sheet"]);
    const broken = new TextEncoder().encode("%PDF-1.7\nthis is not really a PDF");
    const merged = await appendPdfs(base, [
      { title: "Broken upload", bytes: broken },
      { title: "Good", bytes: good },
    ]);
    expect(merged.pageCount).toBe(2);
    expect(merged.skipped.map((s) => s.title)).toEqual(["Broken upload"]);
    expect(merged.skipped[0]!.reason).not.toBe("");
    expect(await countPages(merged.bytes)).toBe(2);
  });

  test("marks each appended page with the packet it belongs to", async () => {
    const base = await smallPdf(["Generated sheet"]);
    const sheet = await smallPdf(["Inverter data sheet p1", "Inverter data sheet p2"]);
    const merged = await appendPdfs(base, [{ title: "Quillon QS-7600", bytes: sheet }], {
      footer: "Attachment to project 1042, permit packet Rev 2",
    });
    const texts = await pageTexts(merged.bytes);
    expect(texts[0]).not.toContain("Attachment");
    expect(texts[1]).toContain("Attachment to project 1042, permit packet Rev 2 · Quillon QS-7600 · page 1 of 2");
    expect(texts[2]).toContain("page 2 of 2");
  });

  test("with nothing readable to add, the base comes back unchanged", async () => {
    const base = await smallPdf(["Only sheet"]);
    const merged = await appendPdfs(base, [{ title: "Empty", bytes: new Uint8Array() }]);
    expect(merged.bytes).toBe(base);
    expect(merged.pageCount).toBe(1);
    expect(merged.skipped).toHaveLength(1);
  });
});
