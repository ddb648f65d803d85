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
const fontFile = (pkg: string, file: string) => `data:font/ttf;base64,${Buffer.from(woffToSfnt(readFileSync(fontPath(pkg, file)))).toString("base64")}`;

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

/** Registers the packet fonts once per process; later calls do nothing. */
export function registerPdfFonts(): void {
  if (registered) return;
  Font.register({
    family: TEXT_FONT,
    fonts: ([400, 600, 700] as const).map((weight) => ({ src: fontFile("@fontsource/inter", `inter-latin-${weight}-normal.woff`), fontWeight: weight })),
  });
  Font.register({
    family: MEASURE_FONT,
    fonts: ([400, 500] as const).map((weight) => ({ src: fontFile("@fontsource/ibm-plex-mono", `ibm-plex-mono-latin-${weight}-normal.woff`), fontWeight: weight })),
  });
  Font.register({
    family: GREEK_FALLBACK,
    fonts: ([400, 700] as const).map((weight) => ({ src: fontFile("@fontsource/inter", `inter-greek-${weight}-normal.woff`), fontWeight: weight })),
  });
  // Hyphenation would split model numbers and values such as "LK-405M-54H" across lines.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
