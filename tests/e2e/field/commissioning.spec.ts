import { expect, test, type Locator } from "@playwright/test";
import { PDFDocument } from "pdf-lib";
import { DEMO, listProjectsAs, mailboxFor, pageFor } from "../support/session";

// A phone held upright: the field record is laid out for this first.
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true });

/** Types a reading and waits for its check to settle on a status. */
async function enter(input: Locator, value: string) {
  await input.fill(value);
  await input.blur();
}

test("installer on a phone records commissioning, corrects a failing reading, uploads the signed form; a renamed executable is refused; the coordinator is notified", async ({ browser }) => {
  test.setTimeout(180_000);
  const phone = await pageFor(browser, DEMO.installer);
  const mine = (await listProjectsAs(phone)).filter((p) => p.stage === "utility_approved");
  expect(mine.length).toBeGreaterThan(0);
  const project = mine[0];

  await phone.goto(`/projects/${project.id}`);
  await phone.getByRole("link", { name: "Field record", exact: true }).click();
  await expect(phone.getByRole("heading", { name: "Field record" })).toBeVisible();
  await expect(phone.getByTestId("field-cautions")).toContainText("Inverter capacitors hold a charge after shutdown");
  // Nothing spills sideways on a phone.
  expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

  const profile = phone.locator("#gridProfileSet");
  await enter(profile, (await profile.getAttribute("data-required"))!);
  await expect(phone.getByTestId("result-grid-profile")).toHaveAttribute("data-status", "pass");

  // One failing value: flagged with its reason, then corrected.
  await enter(phone.locator("#acVoltageV"), "262");
  const ac = phone.getByTestId("result-ac-voltage");
  await expect(ac).toHaveAttribute("data-status", "fail");
  await expect(ac).toContainText("262");
  await enter(phone.locator("#acVoltageV"), "241");
  await expect(ac).toHaveAttribute("data-status", "pass");

  const strings = phone.locator("input[data-expected-v]");
  for (let i = 0; i < (await strings.count()); i++) {
    const expectedV = Number(await strings.nth(i).getAttribute("data-expected-v"));
    await enter(strings.nth(i), String(expectedV + 0.4));
  }
  const modules = phone.locator("#modulesReporting");
  await enter(modules, (await modules.getAttribute("data-installed"))!);
  const power = phone.locator("#firstPowerW");
  await enter(power, String(Math.round(Number(await power.getAttribute("data-rating-w")) * 0.62)));
  await phone.locator("#firstPowerTime").fill("12:40");
  await enter(phone.locator("#rapidShutdown\\.measuredV"), "11");
  await enter(phone.locator("#rapidShutdown\\.seconds"), "8");
  await expect(phone.getByTestId("completion-counts")).toHaveText("0 failing · 0 to record");

  await phone.getByRole("button", { name: "Mark complete" }).click();
  await expect(phone.getByTestId("save-state")).toHaveText("Saved and marked complete.");
  await expect(phone.getByTestId("commissioning-status")).toContainText("Complete");

  // Resumed later, the readings are there.
  await phone.reload();
  await expect(phone.locator("#acVoltageV")).toHaveValue("241");
  await expect(phone.getByTestId("commissioning-status")).toContainText("Complete");

  // The pre-filled certificate downloads as a PDF.
  const [download] = await Promise.all([phone.waitForEvent("download"), phone.getByRole("link", { name: "Certificate of completion (PDF)" }).click()]);
  expect(download.suggestedFilename()).toMatch(/^certificate-of-completion-project-\d+\.pdf$/);

  // A renamed executable is refused by its bytes; nothing is listed.
  const drop = phone.getByTestId("upload-signed-completion");
  const executable = Buffer.concat([Buffer.from([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00, 0x00, 0x00]), Buffer.alloc(512)]);
  await drop.setInputFiles({ name: "signed-certificate.pdf", mimeType: "application/pdf", buffer: executable });
  await expect(phone.getByTestId("upload-notices").getByRole("alert")).toContainText("not PDF, JPEG or PNG");
  await expect(phone.getByText("Nothing uploaded yet.")).toBeVisible();

  // The signed form goes through.
  const signed = await PDFDocument.create();
  signed.addPage([612, 792]).drawText("Signed on site", { x: 72, y: 700 });
  await drop.setInputFiles({ name: "signed-certificate.pdf", mimeType: "application/pdf", buffer: Buffer.from(await signed.save()) });
  await expect(phone.getByTestId("upload-notices")).toContainText("The coordinator has been notified");
  await expect(phone.getByTestId("uploaded-files")).toContainText("signed-certificate.pdf");

  // The coordinator's notice arrives through the outbox.
  const inbox = await mailboxFor(browser);
  const notice = inbox.getByTestId("caught-message").filter({ hasText: "Signed completion form received" }).filter({ hasText: "signed-certificate.pdf" });
  await expect(async () => {
    await inbox.reload();
    await expect(notice.first()).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  const office = await pageFor(browser, DEMO.coordinator);
  const link = await notice.first().getByRole("link", { name: /\/field$/ }).first().getAttribute("href");
  expect(new URL(link!).pathname).toBe(`/projects/${project.id}/field`);

  // The office downloads the signed form as an attachment of the type its bytes showed.
  await office.goto(`/projects/${project.id}/field`);
  const fileLink = office.getByTestId("uploaded-files").getByRole("link", { name: "signed-certificate.pdf" });
  const response = await office.request.get((await fileLink.getAttribute("href"))!);
  expect(response.status()).toBe(200);
  expect(response.headers()["content-type"]).toBe("application/pdf");
  expect(response.headers()["content-disposition"]).toMatch(/^attachment;/);
  expect(response.headers()["x-content-type-options"]).toBe("nosniff");

  // The project page shows the field work done, and the coordinator moves the project on.
  await office.goto(`/projects/${project.id}`);
  const field = office.getByTestId("field-status");
  await expect(field).toContainText("Commissioning: complete");
  await expect(field).toContainText("Signed completion form: received");
  await office.getByLabel("Move to stage").selectOption({ label: "Commissioned" });
  await office.getByRole("button", { name: "Change stage" }).click();
  await expect(office.getByRole("region", { name: "Current stage" })).toContainText("Commissioned");
});
