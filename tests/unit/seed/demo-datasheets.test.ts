import { PDFParse } from "pdf-parse";
import { describe, expect, it } from "vitest";
import { DEMO_CATALOG } from "@/lib/seed/demo-catalog";
import { demoDatasheetPdf } from "@/lib/seed/demo-datasheets";
import { EquipmentInput } from "@/lib/schemas/equipment";

describe("demo data sheets", () => {
  it.each(DEMO_CATALOG.map((item) => [`${item.maker} ${item.model}`, item] as const))(
    "%s: one page saying it is invented, with its figures",
    async (_name, item) => {
      const parsed = EquipmentInput.parse(item);
      const bytes = await demoDatasheetPdf(parsed);
      const parser = new PDFParse({ data: bytes });
      const { text, total } = await parser.getText();
      await parser.destroy();
      expect(total).toBe(1);
      expect(text).toContain("Not a real product");
      expect(text).toContain(parsed.model);
      const first = Object.values(parsed.specs).find((v) => typeof v === "number");
      expect(text).toContain(String(first));
    },
  );
});
