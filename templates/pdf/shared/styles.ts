import { StyleSheet, type Styles } from "@react-pdf/renderer";
import type { CheckStatus } from "@/lib/engineering";
import { MEASURE_STACK, TEXT_STACK } from "./fonts";

// Ohmstead's palette on white paper (packets are printed): ink for text, copper for the
// accent; green, amber and red only for check results.
/** One style object, as components take it. */
export type PdfStyle = Styles[string];

export const COLORS = {
  ink: "#1f1c17",
  inkSoft: "#4a443a",
  inkFaint: "#7b7264",
  rule: "#c9bfa9",
  ruleLight: "#e6dfcf",
  paperTint: "#f7f3ea",
  copper: "#b5652b",
  copperDark: "#8f4c1c",
  copperLight: "#f1dcc8",
  pass: "#2f7d4a",
  warn: "#b7791f",
  fail: "#b3261e",
} as const;

export const STATUS_COLORS: Record<CheckStatus, string> = { pass: COLORS.pass, warn: COLORS.warn, fail: COLORS.fail };
export const STATUS_WORDS: Record<CheckStatus, string> = { pass: "Pass", warn: "Review", fail: "Fail" };

/** Plan sheets: 11 × 17 in, landscape (1224 × 792 pt). Forms: US letter, portrait. */
export const PLAN_PAGE = { size: "TABLOID" as const, orientation: "landscape" as const, widthPt: 1224, heightPt: 792, marginPt: 24 };
export const FORM_PAGE = { size: "LETTER" as const, orientation: "portrait" as const, widthPt: 612, heightPt: 792, marginPt: 36 };

export const base = StyleSheet.create({
  // Inter's contextual alternates double the text layout time and change nothing on a
  // technical sheet (they would even turn a typed "->" into an arrow), so they are off.
  page: { fontFamily: TEXT_STACK, color: COLORS.ink, backgroundColor: "#ffffff", fontFeatureSettings: { calt: false } },
  measure: { fontFamily: MEASURE_STACK },
  strong: { fontWeight: 600 },
  soft: { color: COLORS.inkSoft },
  faint: { color: COLORS.inkFaint },
  caps: { fontSize: 6.5, letterSpacing: 0.6, color: COLORS.inkFaint, fontWeight: 600, textTransform: "uppercase" },
  sectionTitle: {
    fontSize: 10,
    fontWeight: 700,
    marginBottom: 5,
    paddingBottom: 2,
    borderBottomWidth: 1.2,
    borderBottomColor: COLORS.copper,
  },
  // react-pdf scales a unitless lineHeight by the font size set on the same element (18 when
  // none is), so every style with a lineHeight carries its own fontSize.
  paragraph: { fontSize: 8.5, marginBottom: 4, lineHeight: 1.35 },
});
