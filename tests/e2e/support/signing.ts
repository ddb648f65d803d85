import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect, type Locator, type Page } from "@playwright/test";
import { PDFArray, PDFDict, PDFDocument, PDFHexString, PDFName, PDFNumber, PDFString } from "pdf-lib";
import { PDFParse } from "pdf-parse";
import sharp from "sharp";

// Checking a signed PDF as a reader would: where its signature blocks are, and whether ink landed in them.

/** Where a signature block is in a generated PDF: its page and box in points (from the form field the template puts there). */
export async function signatureBlock(bytes: Uint8Array, field: "signature.customer" | "signature.installer") {
  const doc = await PDFDocument.load(bytes);
  for (const [pageIndex, page] of doc.getPages().entries()) {
    const annots = page.node.lookupMaybe(PDFName.of("Annots"), PDFArray);
    for (let i = 0; i < (annots?.size() ?? 0); i++) {
      const widget = annots!.lookup(i, PDFDict);
      const t = widget.lookup(PDFName.of("T"));
      if (!(t instanceof PDFString || t instanceof PDFHexString) || t.decodeText() !== field) continue;
      const rect = widget.lookup(PDFName.of("Rect"), PDFArray);
      const [x1, y1, x2, y2] = [0, 1, 2, 3].map((k) => rect.lookup(k, PDFNumber).asNumber());
      return {
        pageIndex,
        pageHeight: page.getHeight(),
        x: Math.min(x1!, x2!),
        y: Math.min(y1!, y2!),
        width: Math.abs(x2! - x1!),
        height: Math.abs(y2! - y1!),
      };
    }
  }
  throw new Error(`no ${field} block`);
}

/** Dark pixels inside a box of one page, rendered at 72 dpi (one pixel per point) with poppler's pdftoppm. */
export async function inkIn(pdf: Uint8Array, box: Awaited<ReturnType<typeof signatureBlock>>) {
  const dir = mkdtempSync(path.join(tmpdir(), "ohmstead-ink-"));
  writeFileSync(path.join(dir, "in.pdf"), pdf);
  const page = String(box.pageIndex + 1);
  const run = spawnSync("pdftoppm", ["-png", "-r", "72", "-f", page, "-l", page, "-singlefile", "in.pdf", "page"], { cwd: dir });
  expect(run.status, String(run.stderr)).toBe(0);
  const { data, info } = await sharp(readFileSync(path.join(dir, "page.png")))
    .extract({
      left: Math.round(box.x),
      top: Math.round(box.pageHeight - box.y - box.height),
      width: Math.round(box.width),
      height: Math.round(box.height),
    })
    .greyscale()
    .raw()
    .toBuffer({ resolveWithObject: true });
  let dark = 0;
  for (let i = 0; i < info.width * info.height; i++) if (data[i]! < 128) dark++;
  return dark;
}

/** Draws a looping stroke across a signature canvas with the mouse. */
export async function drawSignature(page: Page, within: Page | Locator = page) {
  const canvas = within.getByTestId("signature-canvas");
  // The mouse moves in viewport coordinates: the whole pad must be on screen first.
  await canvas.scrollIntoViewIfNeeded();
  const box = (await canvas.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.1, box.y + box.height * 0.6);
  await page.mouse.down();
  for (let i = 1; i <= 24; i++)
    await page.mouse.move(box.x + box.width * (0.1 + 0.03 * i), box.y + box.height * (0.5 + 0.25 * Math.sin(i / 2)), { steps: 2 });
  await page.mouse.up();
}

/** The whole text of a PDF, whitespace collapsed. */
export async function pdfText(bytes: Uint8Array): Promise<string> {
  const parser = new PDFParse({ data: bytes.slice() });
  try {
    return (await parser.getText()).text.replace(/\s+/g, " ");
  } finally {
    await parser.destroy();
  }
}
