import { createHash } from "node:crypto";
import { expect, test } from "@playwright/test";
import { DEMO, listProjectsAs, pageFor } from "../support/session";
import { drawSignature, inkIn, pdfText, signatureBlock } from "../support/signing";

// A phone held upright, as on site.
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true });

test("installer and customer sign the certificate of completion on the installer's phone", async ({ browser }) => {
  test.setTimeout(180_000);
  const phone = await pageFor(browser, DEMO.installer);
  let project: { id: string; customerName: string } | undefined;
  for (const p of await listProjectsAs(phone)) {
    await phone.goto(`/projects/${p.id}/field`);
    if ((await phone.getByTestId("certificate-signing").count()) > 0) {
      project = p;
      break;
    }
  }
  expect(project, "a project of the installer's with a field record").toBeTruthy();
  const section = phone.getByTestId("certificate-signing");
  // Printing and uploading a paper copy stays possible beside it.
  await expect(phone.getByRole("link", { name: "Certificate of completion (PDF)" })).toBeVisible();

  // The installer draws; the customer types their name.
  const installer = section.getByTestId("installer-block");
  await installer.getByLabel("Installer: I agree to sign electronically").check();
  await installer.getByTestId("signature-canvas").scrollIntoViewIfNeeded();
  await drawSignature(phone, installer);
  const customer = section.getByTestId("customer-block");
  await expect(customer.getByLabel("Customer: full name")).toHaveValue(project!.customerName);
  await customer.getByLabel("Customer: I agree to sign electronically").check();
  await customer.getByLabel("Type my name").check();
  await customer.getByLabel("Type your full name as your signature").fill(project!.customerName);
  await section.getByRole("button", { name: "Sign the certificate" }).click();
  const signedList = section.getByTestId("signed-certificates");
  await expect(signedList).toContainText(project!.customerName, { timeout: 30_000 });

  // The signed copy: both names in the signing record, the fingerprints, ink in the installer's block.
  const href = (await signedList.getByRole("link", { name: "signed certificate (PDF)" }).last().getAttribute("href"))!;
  const signed = new Uint8Array(await (await phone.request.get(href)).body());
  const original = new Uint8Array(await (await phone.request.get(href.replace(/\/signed$/, "/original"))).body());
  const text = await pdfText(signed);
  expect(text).toContain(`Installer: `);
  expect(text).toContain(`Customer: ${project!.customerName}`);
  expect(text).toContain(createHash("sha256").update(original).digest("hex"));
  expect(text).toContain("Typed name");
  expect(text).toContain("Drawn on screen");
  // The blocks sit on their printed rules: what counts is the ink added over the unsigned certificate.
  for (const field of ["signature.installer", "signature.customer"] as const) {
    const block = await signatureBlock(original, field);
    expect(await inkIn(signed, block), field).toBeGreaterThan((await inkIn(original, block)) + 20);
  }
});
