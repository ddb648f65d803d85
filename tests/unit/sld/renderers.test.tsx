import { Document, Page, renderToBuffer } from "@react-pdf/renderer";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, test } from "vitest";
import { SingleLineSvg } from "@/components/sld/single-line-svg";
import { paintScene } from "@/lib/documents/single-line";
import { layoutSingleLine } from "@/lib/sld";
import { registerPdfFonts } from "@/templates/pdf/shared/fonts";
import { PdfSingleLine } from "@/templates/pdf/shared/single-line";
import { microFixture, optimizerFixture, stringFixture } from "./sld-designs";

describe("single-line renderers", () => {
  test("SVG: responsive, labelled for screen readers, with the diagram's words", () => {
    const scene = layoutSingleLine(stringFixture());
    const html = renderToStaticMarkup(<SingleLineSvg scene={scene} />);
    expect(html).toContain(`viewBox="0 0 ${scene.width} ${scene.height}"`);
    expect(html).toContain('width="100%"');
    expect(html).toContain('role="img"');
    expect(html).toContain(`aria-label="${scene.description}"`);
    expect(html).toContain("40 A PV breaker");
  });

  test("PDF: three designs render to a PDF with the packet fonts", { timeout: 30_000 }, async () => {
    registerPdfFonts();
    const scenes = [stringFixture(), optimizerFixture(), microFixture()].map((d) => layoutSingleLine(d, { necEdition: 2023 }));
    const pdf = await renderToBuffer(
      <Document>
        {scenes.map((scene, i) => (
          <Page key={i} size="TABLOID" orientation="landscape">
            <PdfSingleLine drawing={paintScene(scene, 1100, 700)} />
          </Page>
        ))}
      </Document>,
    );
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
  });
});
