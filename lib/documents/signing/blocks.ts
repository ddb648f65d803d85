import { PDFArray, PDFDict, PDFDocument, PDFName, PDFNumber, PDFRef, PDFString, PDFHexString } from "pdf-lib";
import { SIGNATURE_FIELDS } from "@/templates/pdf/shared/signature-line";
import type { SignatureBox } from "./input";

export type SignatureRole = keyof typeof SIGNATURE_FIELDS;

const nameOf = (widget: PDFDict) => {
  const t = widget.lookup(PDFName.of("T"));
  return t instanceof PDFString || t instanceof PDFHexString ? t.decodeText() : null;
};

/** Where the named form fields of a loaded document are (the first widget of each name), in PDF points. */
export function fieldBoxes(doc: PDFDocument, names: readonly string[]): Map<string, SignatureBox> {
  const found = new Map<string, SignatureBox>();
  doc.getPages().forEach((page, pageIndex) => {
    const annots = page.node.lookupMaybe(PDFName.of("Annots"), PDFArray);
    for (let i = 0; i < (annots?.size() ?? 0); i++) {
      const widget = annots!.lookup(i, PDFDict);
      const name = nameOf(widget) ?? "";
      const rect = widget.lookupMaybe(PDFName.of("Rect"), PDFArray);
      if (!names.includes(name) || !rect || found.has(name)) continue;
      const [x1, y1, x2, y2] = [0, 1, 2, 3].map((k) => rect.lookup(k, PDFNumber).asNumber()) as [number, number, number, number];
      found.set(name, { pageIndex, x: Math.min(x1, x2), y: Math.min(y1, y2), width: Math.abs(x2 - x1), height: Math.abs(y2 - y1) });
    }
  });
  return found;
}

/**
 * Where each signature line of a generated document is, by the field the template put over it. Read from
 * the pages' own annotations, so it also works once a packet's sheets were merged with data sheets.
 */
export async function findSignatureBlocks(bytes: Uint8Array): Promise<Partial<Record<SignatureRole, SignatureBox>>> {
  const boxes = fieldBoxes(await PDFDocument.load(bytes.slice()), Object.values(SIGNATURE_FIELDS));
  const found: Partial<Record<SignatureRole, SignatureBox>> = {};
  for (const [role, field] of Object.entries(SIGNATURE_FIELDS)) {
    const box = boxes.get(field);
    if (box) found[role as SignatureRole] = box;
  }
  return found;
}

/** Takes the named signature fields off the pages (and the form), once a signature stands in their place. */
export function removeSignatureFields(doc: PDFDocument, fields: readonly string[]) {
  for (const page of doc.getPages()) {
    const annots = page.node.lookupMaybe(PDFName.of("Annots"), PDFArray);
    if (!annots) continue;
    for (let i = annots.size() - 1; i >= 0; i--) {
      const entry = annots.get(i);
      const widget = entry instanceof PDFRef ? doc.context.lookup(entry, PDFDict) : annots.lookup(i, PDFDict);
      if (fields.includes(nameOf(widget) ?? "")) annots.remove(i);
    }
  }
  const acro = doc.catalog.lookupMaybe(PDFName.of("AcroForm"), PDFDict);
  const list = acro?.lookupMaybe(PDFName.of("Fields"), PDFArray);
  for (let i = (list?.size() ?? 0) - 1; i >= 0; i--) if (fields.includes(nameOf(list!.lookup(i, PDFDict)) ?? "")) list!.remove(i);
}
