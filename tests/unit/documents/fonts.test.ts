import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { describe, expect, test } from "vitest";
import { registerPdfFonts } from "@/templates/pdf/shared/fonts";
import { woffToSfnt } from "@/templates/pdf/shared/woff-to-sfnt";

const require = createRequire(import.meta.url);

describe("PDF fonts", () => {
  test("a WOFF unwraps to a TrueType file with the same tables", () => {
    const woff = readFileSync(require.resolve("@fontsource/ibm-plex-mono/files/ibm-plex-mono-latin-400-normal.woff"));
    const sfnt = woffToSfnt(woff);
    const view = new DataView(sfnt.buffer, sfnt.byteOffset, sfnt.byteLength);
    expect(view.getUint32(0)).toBe(0x00010000); // TrueType outlines
    expect(view.getUint16(4)).toBe(woff.readUInt16BE(12));
    expect(sfnt.length).toBe(woff.readUInt32BE(16)); // totalSfntSize from the WOFF header
  });

  test("rejects a file that is not WOFF 1.0", () => {
    expect(() => woffToSfnt(new Uint8Array(64))).toThrow(/WOFF/);
  });

  test("registering twice is harmless", () => {
    expect(() => {
      registerPdfFonts();
      registerPdfFonts();
    }).not.toThrow();
  });
});
