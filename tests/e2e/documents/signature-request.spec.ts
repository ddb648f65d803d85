import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { PDFArray, PDFDict, PDFDocument, PDFName, PDFNumber, PDFString, PDFHexString } from "pdf-lib";
import { PDFParse } from "pdf-parse";
import sharp from "sharp";
import { generatePacket } from "../support/packets";
import { DEMO, listProjectsAs, mailboxFor, signIn } from "../support/session";

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/** The link mailed to `to`, read from the local mailbox as the signer would. */
async function mailedLink(browser: Browser, to: string): Promise<string> {
  const inbox = await mailboxFor(browser);
  const message = inbox.getByTestId("caught-message").filter({ hasText: to }).first();
  await expect(async () => {
    await inbox.reload();
    await expect(message).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  const href = await message
    .getByRole("link", { name: /\/sign\// })
    .first()
    .getAttribute("href");
  await inbox.context().close();
  return new URL(href!).pathname;
}

/** Where the customer's signature block is in a generated PDF: its page and box in points (from the form field the template puts there). */
async function customerBlock(bytes: Uint8Array) {
  const doc = await PDFDocument.load(bytes);
  for (const [pageIndex, page] of doc.getPages().entries()) {
    const annots = page.node.lookupMaybe(PDFName.of("Annots"), PDFArray);
    for (let i = 0; i < (annots?.size() ?? 0); i++) {
      const widget = annots!.lookup(i, PDFDict);
      const t = widget.lookup(PDFName.of("T"));
      if (!(t instanceof PDFString || t instanceof PDFHexString) || t.decodeText() !== "signature.customer") continue;
      const rect = widget.lookup(PDFName.of("Rect"), PDFArray);
      const [x1, y1, x2, y2] = [0, 1, 2, 3].map((k) => rect.lookup(k, PDFNumber).asNumber());
      return {
        pageIndex,
        pageHeight: page.getHeight(),
        x: Math.min(x1!, x2!),
        y: Math.min(y1!, y2!),
        width: Math.abs(x2! - x1!),
        height: Math.abs(y2! - y1!),
      };
    }
  }
  throw new Error("no customer signature block");
}

/** Dark pixels inside a box of one page, rendered at 72 dpi (one pixel per point) with poppler's pdftoppm. */
async function inkIn(pdf: Uint8Array, box: Awaited<ReturnType<typeof customerBlock>>) {
  const dir = mkdtempSync(path.join(tmpdir(), "ohmstead-ink-"));
  writeFileSync(path.join(dir, "in.pdf"), pdf);
  const page = String(box.pageIndex + 1);
  const run = spawnSync("pdftoppm", ["-png", "-r", "72", "-f", page, "-l", page, "-singlefile", "in.pdf", "page"], { cwd: dir });
  expect(run.status, String(run.stderr)).toBe(0);
  const { data, info } = await sharp(readFileSync(path.join(dir, "page.png")))
    .extract({
      left: Math.round(box.x),
      top: Math.round(box.pageHeight - box.y - box.height),
      width: Math.round(box.width),
      height: Math.round(box.height),
    })
    .greyscale()
    .raw()
    .toBuffer({ resolveWithObject: true });
  let dark = 0;
  for (let i = 0; i < info.width * info.height; i++) if (data[i]! < 128) dark++;
  return dark;
}

/** Draws a looping stroke across the canvas with the mouse. */
async function drawSignature(page: Page) {
  const canvas = page.getByTestId("signature-canvas");
  const box = (await canvas.boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.1, box.y + box.height * 0.6);
  await page.mouse.down();
  for (let i = 1; i <= 24; i++)
    await page.mouse.move(box.x + box.width * (0.1 + 0.03 * i), box.y + box.height * (0.5 + 0.25 * Math.sin(i / 2)), { steps: 2 });
  await page.mouse.up();
}

test("coordinator asks the customer to sign Rev 1's interconnection application; the customer signs by link without an account", async ({
  page,
  browser,
}) => {
  test.setTimeout(240_000);
  const stamp = Date.now().toString(36);
  const ownerEmail = `owner.${stamp}@mail.example`;
  await signIn(page, DEMO.coordinator);
  const [project] = (await listProjectsAs(page)).filter(
    (p) => p.stage !== "draft" && !["Rafael Quintero-Bask", "Imogen Halvorsen"].includes(p.customerName),
  );
  await page.goto(`/projects/${project.id}/documents`);
  const interconnection = page.getByTestId("packet-interconnection");
  if ((await interconnection.getByTestId("packet-revision").filter({ hasText: "Rev 1" }).count()) === 0) {
    const reason = interconnection.getByLabel(/Reason for generating anyway/);
    if (await reason.isVisible()) await reason.fill("Application sent for the customer's signature.");
    await generatePacket(page, "interconnection", 1);
    await page.reload();
  }

  // The coordinator: the customer from the project's contact is filled in; the e-mail is this run's own.
  const panel = page.getByTestId("signature-panel");
  await panel.getByLabel("Document").selectOption({ label: "Interconnection application (Interconnection packet Rev 1)" });
  await expect(panel.getByLabel("Name").first()).toHaveValue(project.customerName);
  await panel.getByLabel("E-mail").first().fill(ownerEmail);
  await panel.getByRole("button", { name: "Ask for signatures" }).click();
  await expect(panel.getByRole("status")).toContainText(`queued by e-mail to ${ownerEmail}`);
  const request = panel.getByTestId("signature-request").filter({ hasText: ownerEmail });
  await expect(request.getByTestId("signer-state")).toHaveText("Sent");

  // The customer: the mailbox has the link; a browser with no session opens it and reads the pages.
  const link = await mailedLink(browser, ownerEmail);
  const guest = await (await browser.newContext({ viewport: { width: 390, height: 844 } })).newPage();
  const opened = await guest.goto(link);
  expect(opened!.status()).toBe(200);
  await expect(guest.locator('meta[name="robots"]')).toHaveAttribute("content", /noindex/);
  await expect(guest.getByRole("heading", { name: /Interconnection application/ })).toBeVisible();
  const pages = guest.getByTestId("document-page");
  expect(await pages.count()).toBeGreaterThan(1);
  await pages.first().scrollIntoViewIfNeeded();
  await expect.poll(() => pages.first().evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBeGreaterThan(300);
  await expect(guest.getByText("I agree to sign this document electronically.")).toBeVisible();

  await guest.getByLabel("Your full name").fill(project.customerName);
  await guest.getByLabel("I agree to sign electronically").check();
  await drawSignature(guest);
  await guest.getByRole("button", { name: "Sign the document" }).click();
  await expect(guest.getByRole("heading", { name: "Already signed" })).toBeVisible({ timeout: 30_000 });

  // The signed copy: the name, the signing record with both fingerprints, and ink in the customer's block.
  const signed = new Uint8Array(await (await guest.request.get(`${link}/document`)).body());
  expect(Buffer.from(signed.subarray(0, 5)).toString()).toBe("%PDF-");
  await page.reload();
  const requestId = (await request.getByRole("link", { name: "As generated (PDF)" }).getAttribute("href"))!.split("/")[4];
  const original = new Uint8Array(await (await page.request.get(`/api/v1/signature-requests/${requestId}/original`)).body());
  const parser = new PDFParse({ data: signed.slice() });
  const text = (await parser.getText()).text.replace(/\s+/g, " ");
  await parser.destroy();
  expect(text).toContain("Signing record");
  expect(text).toContain(`Customer: ${project.customerName}`);
  expect(text).toContain(sha256(original));
  const fingerprints = [...new Set(text.match(/\b[0-9a-f]{64}\b/g))];
  expect(fingerprints).toHaveLength(2);
  const block = await customerBlock(original);
  expect(await inkIn(original, block)).toBe(0);
  expect(await inkIn(signed, block)).toBeGreaterThan(20);

  // The request shows signed; a second visit says it is signed already.
  await expect(request.getByTestId("signer-state")).toHaveText("Signed");
  await expect(request.getByTestId("signed-copy")).toBeVisible();
  await guest.goto(link);
  await expect(guest.getByRole("heading", { name: "Already signed" })).toBeVisible();
  await expect(guest.getByRole("link", { name: "Download the signed copy (PDF)" })).toBeVisible();

  // An unknown token answers 404; a withdrawn link 410.
  expect((await guest.goto("/sign/not-a-real-signing-token-0000"))!.status()).toBe(404);
  const secondEmail = `second.${stamp}@mail.example`;
  await panel.getByLabel("Document").selectOption({ label: "Agent authorization letter" });
  await panel.getByLabel("E-mail").first().fill(secondEmail);
  await panel.getByRole("button", { name: "Ask for signatures" }).click();
  const second = panel.getByTestId("signature-request").filter({ hasText: secondEmail });
  await second.getByRole("button", { name: "Withdraw" }).click();
  await expect(second.getByTestId("signer-state")).toHaveText("Withdrawn");
  const withdrawn = await guest.goto(await mailedLink(browser, secondEmail));
  expect(withdrawn!.status()).toBe(410);
  await expect(guest.locator("body")).toContainText("withdrawn by the sender");
});
