// Signing a generated document: the signature lands in its block, the original stays as it was, and
// the appended record carries each signer's evidence and the fingerprints (SHA-256, FIPS 180-4, checked
// here with Node's own implementation).
import { createHash } from "node:crypto";
import { PDFDocument, StandardFonts } from "pdf-lib";
import { describe, expect, test } from "vitest";
import { renderCommissioningPdf } from "@/lib/documents/commissioning/render";
import { renderPacketPdf } from "@/lib/documents/packets/render";
import { fieldBoxes, findSignatureBlocks } from "@/lib/documents/signing/blocks";
import { ELECTRONIC_SIGNATURE_CONSENT } from "@/lib/documents/signing/consent";
import { signingRecordFacts } from "@/lib/documents/signing/facts";
import type { SignerEvidence, SigningInput } from "@/lib/documents/signing/input";
import { signPdf } from "@/lib/documents/signing/sign";
import { typedSignatureSize } from "@/templates/pdf/signing/typed-signature";
import { commissioningFixture } from "@/tests/support/commissioning-fixture";
import { packetFixture } from "@/tests/support/packet-fixture";
import { pageTexts } from "./read-pdf";

// A 2 × 1 px opaque PNG, as a signature pad would hand over (smaller, same format).
const PNG = Uint8Array.from(
  Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAIAAAABCAYAAAD0In+KAAAAEUlEQVR4nGNgYGD4z8DAwMAAAA4AAf8Ew6lbAAAAAElFTkSuQmCC", "base64"),
);

async function original(): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  const font = await doc.embedFont(StandardFonts.Helvetica);
  const page = doc.addPage([612, 792]);
  page.drawText("Interconnection application - signature sheet", { x: 72, y: 720, size: 12, font });
  return doc.save();
}

const signer = (over: Partial<SignerEvidence>): SignerEvidence => ({
  role: "Customer",
  name: "Imogen Farrow-Lake",
  email: "imogen@example.test",
  signedAt: "2026-12-05T17:04:00.000Z",
  consentedAt: "2026-12-05T17:03:10.000Z",
  consent: ELECTRONIC_SIGNATURE_CONSENT,
  address: "198.51.100.23",
  userAgent: "Mozilla/5.0 (fixture phone)",
  mark: { kind: "typed", name: "Imogen Farrow-Lake" },
  box: { pageIndex: 0, x: 72, y: 400, width: 240, height: 40 },
  ...over,
});

const input = (signers: SignerEvidence[]): SigningInput => ({
  documentTitle: "Interconnection application, Rev 2",
  organizationName: "Fixture Solar Co.",
  timeZone: "America/Denver",
  signers,
});

describe("signing a document", () => {
  test("puts each signature in its block, appends the record page, and leaves the original bytes unchanged", async () => {
    const before = await original();
    const copy = before.slice();
    const signed = await signPdf(
      before,
      input([signer({}), signer({ role: "Installer", name: "Rafe Quill", email: "rafe@fixture.test", mark: { kind: "drawn", png: PNG } })]),
    );
    expect(Buffer.compare(Buffer.from(before), Buffer.from(copy))).toBe(0);
    expect(signed.sha256Original).toBe(createHash("sha256").update(before).digest("hex"));
    expect(signed.sha256Final).toBe(createHash("sha256").update(signed.bytes).digest("hex"));
    expect(signed.sha256Signed).not.toBe(signed.sha256Original);
    expect(signed.pageCount).toBe(2);

    const [page, record] = await pageTexts(signed.bytes);
    expect(page).toContain("Interconnection application - signature sheet");
    expect(page).toContain("Imogen Farrow-Lake"); // the typed signature, in the documents' font
    for (const text of [
      "Signing record",
      "Customer: Imogen Farrow-Lake",
      "imogen@example.test",
      "Installer: Rafe Quill",
      "Drawn on screen",
      "Typed name",
      "198.51.100.23",
      "Mozilla/5.0 (fixture phone)",
      signed.sha256Original,
      signed.sha256Signed,
      "December 5, 2026, 10:04", // 17:04 UTC is 10:04 in Denver (MST, UTC−7)
    ])
      expect(record).toContain(text);
    // The drawn signature is a picture on the signed page.
    const doc = await PDFDocument.load(signed.bytes);
    expect(JSON.stringify(doc.getPage(0).node.Resources()?.toString())).toMatch(/XObject/);
  });

  test("refuses a block outside the page instead of placing a signature somewhere else", async () => {
    const before = await original();
    await expect(signPdf(before, input([signer({ box: { pageIndex: 0, x: 500, y: 400, width: 240, height: 40 } })]))).rejects.toThrow(
      RangeError,
    );
    await expect(signPdf(before, input([signer({ box: { pageIndex: 3, x: 72, y: 400, width: 240, height: 40 } })]))).rejects.toThrow(
      "lies outside the document",
    );
  });

  test("the record reads each signer's evidence in the organization's zone, with the agreement they read", () => {
    const facts = signingRecordFacts(input([signer({ email: "", address: "" })]), {
      sha256Original: "a".repeat(64),
      sha256Signed: "b".repeat(64),
    });
    const rows = Object.fromEntries(facts.signers[0]!.rows.map((r) => [r.label, r.value]));
    expect(rows).toMatchObject({
      "E-mail": "Not given",
      "Network address": "Not recorded",
      Signature: "Typed name",
      "Agreement read": ELECTRONIC_SIGNATURE_CONSENT,
    });
    expect(rows["Agreed to sign electronically"]).toContain("10:03");
    expect(facts.intro).toContain("America/Denver");
  });
});

describe("the documents' signature blocks", () => {
  test("the interconnection application and the certificate of completion mark where the customer and the installer sign", async () => {
    const packet = await renderPacketPdf(packetFixture({ kind: "interconnection" }));
    const certificate = await renderCommissioningPdf(commissioningFixture({ kind: "certificate", scenario: "complete" }));
    // The certificate is one page; the application's signature sheet is its last.
    for (const [bytes, page] of [
      [packet, (await PDFDocument.load(packet)).getPageCount() - 1],
      [certificate, 0],
    ] as const) {
      const blocks = await findSignatureBlocks(bytes);
      expect(Object.keys(blocks).sort()).toEqual(["customer", "installer"]);
      for (const box of Object.values(blocks)) {
        expect(box.pageIndex).toBe(page);
        expect(box.width).toBeGreaterThan(120); // room for a name across the line
        expect(box.height).toBeGreaterThanOrEqual(20);
      }
    }
  }, 60_000);

  test("a signed certificate carries both signatures in place of its fields, which are gone from the copy", async () => {
    const certificate = await renderCommissioningPdf(commissioningFixture({ kind: "certificate", scenario: "complete" }));
    const blocks = await findSignatureBlocks(certificate);
    const signed = await signPdf(
      certificate,
      input([
        signer({ box: blocks.customer!, field: "signature.customer" }),
        signer({
          role: "Installer",
          name: "Rafe Quill",
          mark: { kind: "typed", name: "Rafe Quill" },
          box: blocks.installer!,
          field: "signature.installer",
        }),
      ]),
    );
    expect(await findSignatureBlocks(signed.bytes)).toEqual({});
    const pages = await pageTexts(signed.bytes);
    expect(pages).toHaveLength(2);
    expect(pages[0]).toContain("Rafe Quill");
    expect(pages[0]).toContain("Imogen Farrow-Lake");
    expect(pages[1]).toContain("Installer: Rafe Quill");
    // Each date line carries the day signed in the organization's zone (17:04 UTC is 10:04 in Denver, Dec 5), and the
    // blank printed-name lines the signer's name beside the signature: the name shows twice, typed and printed.
    expect(pages[0]!.split("12/05/2026").length - 1).toBe(2);
    expect(pages[0]!.split("Rafe Quill").length - 1).toBe(2);
    const companions = await PDFDocument.load(signed.bytes);
    expect(fieldBoxes(companions, ["signature.customer.date", "signature.installer.name"]).size).toBe(0);
  }, 60_000);

  test("the day on the date line is the organization's calendar day, not the server's", async () => {
    const certificate = await renderCommissioningPdf(commissioningFixture({ kind: "certificate", scenario: "complete" }));
    const blocks = await findSignatureBlocks(certificate);
    // 05:30 UTC on Dec 6 is still Dec 5 in Denver (UTC-7).
    const signed = await signPdf(
      certificate,
      input([signer({ box: blocks.customer!, field: "signature.customer", signedAt: "2026-12-06T05:30:00.000Z" })]),
    );
    const [page] = await pageTexts(signed.bytes);
    expect(page).toContain("12/05/2026");
    expect(page).not.toContain("12/06/2026");
  }, 60_000);
});

describe("a typed signature", () => {
  test.each([
    ["a short name in a wide block", "Ana Ruiz", 330, 30],
    ["a long name in a narrow block", "Imogen Farrow-Lake Pemberton-Whitlock", 135, 30],
    ["a low block", "Rafe Quill", 330, 12],
  ])("%s fits on one line", (_what, name, width, height) => {
    const size = typedSignatureSize(name, width, height);
    expect(name.length * 0.75 * size).toBeLessThanOrEqual(width - 4 + 1e-9);
    expect(size).toBeLessThanOrEqual(Math.min(16, height));
  });

  test("a long name on the certificate's narrow line still renders", async () => {
    const certificate = await renderCommissioningPdf(commissioningFixture({ kind: "certificate", scenario: "complete" }));
    const blocks = await findSignatureBlocks(certificate);
    for (const long of ["Imogen Farrow-Lake Pemberton-Whitlock", "WWWWWWMMMMMMWWWWWWMMMMMM"]) {
      const signed = await signPdf(
        certificate,
        input([signer({ name: long, mark: { kind: "typed", name: long }, box: blocks.customer! })]),
      );
      expect((await pageTexts(signed.bytes))[0]).toContain(long);
    }
  }, 60_000);
});
