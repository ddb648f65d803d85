import { createHash } from "node:crypto";
import { expect, test, type Browser } from "@playwright/test";
import { generatePacket } from "../support/packets";
import { drawSignature, inkIn, pdfText, signatureBlock } from "../support/signing";
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
  const text = await pdfText(signed);
  expect(text).toContain("Signing record");
  expect(text).toContain(`Customer: ${project.customerName}`);
  expect(text).toContain(sha256(original));
  const fingerprints = [...new Set(text.match(/\b[0-9a-f]{64}\b/g))];
  expect(fingerprints).toHaveLength(2);
  const block = await signatureBlock(original, "signature.customer");
  // The block sits on its printed rule: what counts is the ink added over the unsigned page.
  expect(await inkIn(signed, block)).toBeGreaterThan((await inkIn(original, block)) + 20);

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
