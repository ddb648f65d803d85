// Renders page 1 of a PDF to PNG with Debian's poppler-utils, for the visual check.
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { PDFDocument } from "pdf-lib";

export const PDFTOPPM = "/usr/bin/pdftoppm";
export const hasPdftoppm = existsSync(PDFTOPPM);
export const NO_PDFTOPPM = `${PDFTOPPM} is missing (Debian package poppler-utils): the visual check is skipped`;

/** Page 1 as PNG bytes at 40 dpi. */
export function firstPagePng(pdf: Uint8Array): Buffer {
  const dir = mkdtempSync(path.join(tmpdir(), "ohmstead-png-"));
  try {
    writeFileSync(path.join(dir, "in.pdf"), pdf);
    const run = spawnSync(PDFTOPPM, ["-png", "-r", "40", "-f", "1", "-l", "1", "-singlefile", "in.pdf", "page"], {
      cwd: dir,
      encoding: "utf8",
    });
    if (run.status !== 0) throw new Error(`pdftoppm failed: ${run.stderr}`);
    return readFileSync(path.join(dir, "page.png"));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** A blank page of the same size, rendered the same way: what "nothing drawn" weighs as PNG. */
export async function blankPagePng(widthPt: number, heightPt: number): Promise<Buffer> {
  const doc = await PDFDocument.create();
  doc.addPage([widthPt, heightPt]);
  return firstPagePng(await doc.save());
}

/** Width and height from the PNG header. */
export function pngSize(png: Buffer): { width: number; height: number } {
  expectPng(png);
  return { width: png.readUInt32BE(16), height: png.readUInt32BE(20) };
}

function expectPng(png: Buffer) {
  if (png.subarray(1, 4).toString("latin1") !== "PNG") throw new Error("not a PNG");
}
