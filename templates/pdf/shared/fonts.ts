import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { createRequire } from "node:module";
import { Font } from "@react-pdf/renderer";
import { woffToSfnt } from "./woff-to-sfnt";

// The PDF fonts ship with the app as npm packages. @react-pdf cannot read woff2, so the
// static .woff files are registered. They are looked up in the project's node_modules (the
// working directory of the app, the worker and the tests), else through Node's resolution;
// the lookup is built at run time because the app's bundler cannot follow a computed require.
const nodeRequire = createRequire(import.meta.url);
function fontPath(pkg: string, file: string): string {
  const local = path.join(process.cwd(), "node_modules", pkg, "files", file);
  return existsSync(local) ? local : nodeRequire.resolve([pkg, "files", file].join("/"));
}
// Registered as data URLs of the unwrapped TrueType bytes: see woff-to-sfnt.ts for why.
const fontFile = (pkg: string, file: string) =>
  `data:font/ttf;base64,${Buffer.from(woffToSfnt(readFileSync(fontPath(pkg, file)))).toString("base64")}`;

/** Text face. */
export const TEXT_FONT = "Inter";
/** Face for measured values and numbers in tables. */
export const MEASURE_FONT = "Plex Mono";
// The latin subsets lack Greek (αVoc in formulas); this family fills those glyphs in.
const GREEK_FALLBACK = "Inter Greek";

/** Font stacks for styles: react-pdf takes, glyph by glyph, the first family that has it. */
export const TEXT_STACK = [TEXT_FONT, GREEK_FALLBACK];
export const MEASURE_STACK = [MEASURE_FONT, GREEK_FALLBACK];

let registered = false;
let prepared: Promise<void> | undefined;

/** Registers the packet fonts once per process; later calls do nothing. */
export function registerPdfFonts(): void {
  if (registered) return;
  Font.register({
    family: TEXT_FONT,
    fonts: ([400, 600, 700] as const).map((weight) => ({
      src: fontFile("@fontsource/inter", `inter-latin-${weight}-normal.woff`),
      fontWeight: weight,
    })),
  });
  Font.register({
    family: MEASURE_FONT,
    fonts: ([400, 500] as const).map((weight) => ({
      src: fontFile("@fontsource/ibm-plex-mono", `ibm-plex-mono-latin-${weight}-normal.woff`),
      fontWeight: weight,
    })),
  });
  Font.register({
    family: GREEK_FALLBACK,
    fonts: ([400, 700] as const).map((weight) => ({
      src: fontFile("@fontsource/inter", `inter-greek-${weight}-normal.woff`),
      fontWeight: weight,
    })),
  });
  // Hyphenation would split model numbers and values such as "LK-405M-54H" across lines.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}

const REGISTERED_FACES: { fontFamily: string; fontWeight: number }[] = [
  ...[400, 600, 700].map((fontWeight) => ({ fontFamily: TEXT_FONT, fontWeight })),
  ...[400, 500].map((fontWeight) => ({ fontFamily: MEASURE_FONT, fontWeight })),
  ...[400, 700].map((fontWeight) => ({ fontFamily: GREEK_FALLBACK, fontWeight })),
];

// The parts of fontkit's font object this relies on: its character set and its glyph lookup.
type FontkitFace = { characterSet: number[]; glyphForCodePoint(codePoint: number): unknown };

/**
 * Registers the fonts and gives every character of each face its glyph before any PDF is drawn, once
 * per process. The font objects are shared by every PDF a process renders, and fontkit keeps the first
 * glyph object it makes for each glyph id: when embedding one PDF's subset makes a glyph only as a
 * part of another (the period inside a colon), that glyph is kept without its character, and a later
 * PDF that prints the character gets no text for it (copying, searching and screen readers lose it).
 * Made here from the character map first, each glyph keeps its character.
 */
export function preparePdfFonts(): Promise<void> {
  registerPdfFonts();
  prepared ??= (async () => {
    for (const face of REGISTERED_FACES) {
      const source = Font.getFont(face);
      if (!source) continue;
      await source.load();
      const font = source.data as unknown as FontkitFace | null;
      for (const codePoint of font?.characterSet ?? []) font!.glyphForCodePoint(codePoint);
    }
  })().catch((error) => {
    prepared = undefined;
    throw error;
  });
  return prepared;
}
