import { Document, Page, Text, renderToBuffer } from "@react-pdf/renderer";
import { describe, expect, test } from "vitest";
import { TEXT_FONT, preparePdfFonts } from "@/templates/pdf/shared/fonts";
import { pageTexts } from "./read-pdf";

// Every PDF a process draws shares the font objects: what one PDF's font subset makes must not take
// the text out of the next one. A colon is drawn from the period's outline, so embedding a subset with
// a colon but no period used to leave the period glyph without its character for every later PDF.
async function textOf(line: string, fontWeight: number): Promise<string> {
  await preparePdfFonts();
  const bytes = await renderToBuffer(
    <Document>
      <Page size="LETTER">
        <Text style={{ fontFamily: TEXT_FONT, fontWeight }}>{line}</Text>
      </Page>
    </Document>,
  );
  return (await pageTexts(new Uint8Array(bytes)))[0]!.trim();
}

describe("text in PDFs drawn one after another", () => {
  test.each([400, 600, 700])("keeps each character after an earlier PDF used it only inside another glyph (Inter %i)", async (weight) => {
    expect(await textOf(`Wiring notes: see sheet ${weight}`, weight)).toBe(`Wiring notes: see sheet ${weight}`);
    expect(await textOf(`L1. Rev ${weight}. Ready.`, weight)).toBe(`L1. Rev ${weight}. Ready.`);
  });
});
