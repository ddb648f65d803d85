import { createHash } from "node:crypto";
import { createElement } from "react";
import { PDFDocument, type PDFPage } from "pdf-lib";
import { SigningRecord } from "@/templates/pdf/signing/signing-record";
import { FilledLine, TypedSignature } from "@/templates/pdf/signing/typed-signature";
import { signedDateField, signedNameField } from "@/templates/pdf/shared/signature-line";
import { renderPdf } from "../render";
import { dateTimeFormat } from "@/lib/domain/time-zones";
import { printable, printableDeep } from "../text";
import { fieldBoxes, removeSignatureFields } from "./blocks";
import { signingRecordFacts } from "./facts";
import type { SignatureBox, SignedDocument, SigningInput } from "./input";

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/** The largest size of `w × h` that fits the box, centred across and set on the box's line. */
function fit(box: SignatureBox, w: number, h: number) {
  const scale = Math.min(box.width / w, box.height / h);
  return { x: box.x + (box.width - w * scale) / 2, y: box.y, width: w * scale, height: h * scale };
}

async function drawSignature(doc: PDFDocument, page: PDFPage, signer: SigningInput["signers"][number]) {
  const { box, mark } = signer;
  if (mark.kind === "drawn") {
    const image = await doc.embedPng(mark.png);
    page.drawImage(image, fit(box, image.width, image.height));
    return;
  }
  const typed = await renderPdf(createElement(TypedSignature, { name: printable(mark.name), width: box.width, height: box.height }));
  const [embedded] = await doc.embedPdf(typed);
  page.drawPage(embedded!, { x: box.x, y: box.y, width: box.width, height: box.height });
}

/** The calendar day of an instant in the organization's zone, as a US form's date line takes it: 12/05/2026. */
function signedDay(iso: string, timeZone: string) {
  return dateTimeFormat("en-US", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date(iso));
}

async function fillLine(doc: PDFDocument, page: PDFPage, box: SignatureBox, text: string) {
  const drawn = await renderPdf(createElement(FilledLine, { text: printable(text), width: box.width, height: box.height }));
  const [embedded] = await doc.embedPdf(drawn);
  page.drawPage(embedded!, { x: box.x, y: box.y, width: box.width, height: box.height });
}

/**
 * Places each signer's signature in its block of a copy of the original and appends the signing record
 * page. The original bytes are never changed: the signed document is a new file. Throws a RangeError
 * when a block lies outside the document, so a wrong layout never produces a misplaced signature.
 */
export async function signPdf(original: Uint8Array, input: SigningInput): Promise<SignedDocument> {
  const sha256Original = sha256(original);
  const doc = await PDFDocument.load(original.slice());
  const pages = doc.getPages();
  for (const signer of input.signers) {
    const page = pages[signer.box.pageIndex];
    const size = page?.getSize();
    if (
      !page ||
      !size ||
      signer.box.x < 0 ||
      signer.box.y < 0 ||
      signer.box.x + signer.box.width > size.width ||
      signer.box.y + signer.box.height > size.height
    )
      throw new RangeError(`The signature block of ${signer.role} lies outside the document.`);
    await drawSignature(doc, page, signer);
  }
  // The lines beside each signature the document left to fill: the day signed, and a blank printed name.
  const companions = input.signers.flatMap((s) =>
    s.field
      ? [
          { field: signedDateField(s.field), text: signedDay(s.signedAt, input.timeZone) },
          { field: signedNameField(s.field), text: s.name },
        ]
      : [],
  );
  const boxes = fieldBoxes(
    doc,
    companions.map((c) => c.field),
  );
  for (const { field, text } of companions) {
    const box = boxes.get(field);
    if (box) await fillLine(doc, pages[box.pageIndex]!, box, text);
  }
  removeSignatureFields(doc, [...input.signers.flatMap((s) => (s.field ? [s.field] : [])), ...boxes.keys()]);
  const signedPages = await doc.save({ useObjectStreams: false });
  const sha256Signed = sha256(signedPages);
  // Names, addresses and browsers are typed by people: characters the fonts cannot draw are spelled out.
  const facts = printableDeep(signingRecordFacts(input, { sha256Original, sha256Signed }));
  const record = await renderPdf(createElement(SigningRecord, { facts }));
  const withRecord = await PDFDocument.load(signedPages);
  const recordDoc = await PDFDocument.load(record);
  for (const page of await withRecord.copyPages(recordDoc, recordDoc.getPageIndices())) withRecord.addPage(page);
  const bytes = await withRecord.save({ useObjectStreams: false });
  return { bytes, sha256Original, sha256Signed, sha256Final: sha256(bytes), pageCount: withRecord.getPageCount() };
}
