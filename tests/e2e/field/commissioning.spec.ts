import { expect, test, type Page } from "@playwright/test";
import { BarcodeFormat, QRCodeWriter } from "@zxing/library";
import { PDFDocument } from "pdf-lib";
import { acSideAndRapidShutdown, enter, recordStorageIfAny, shutDownStrings, testStringsBeforeEnergizing } from "../support/field-record";
import { DEMO, listProjectsAs, mailboxFor, pageFor } from "../support/session";

// A phone held upright: the field record is laid out for this first.
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true });

// Stages where the crew is on site and the demo record is not yet complete.
const ON_SITE = ["permit_issued", "installed", "inspection_passed", "utility_filed", "utility_approved"];

/** The installer's first project at one of `stages` whose field record shows (or lacks) the devices-found step. */
async function fieldProject(phone: Page, { stages, pairing }: { stages: string[]; pairing: boolean }) {
  const mine = (await listProjectsAs(phone)).filter((p) => stages.includes(p.stage));
  for (const project of mine) {
    await phone.goto(`/projects/${project.id}/field`);
    await expect(phone.getByTestId("commissioning-status")).toBeVisible();
    const hasPairing = (await phone.getByTestId("step-pairing").count()) > 0;
    const hasStrings = (await phone.getByTestId("step-before-energizing").count()) > 0;
    if (hasPairing === pairing && hasStrings) return project;
  }
  throw new Error(`No demo project for the installer at ${stages.join("/")} with${pairing ? "" : "out"} module-level devices that report`);
}

/** A QR code of `text` as an SVG picture, as a phone photo of a serial label would show it. */
function qrSvg(text: string): Buffer {
  const matrix = new QRCodeWriter().encode(text, BarcodeFormat.QR_CODE, 33, 33, new Map());
  const cell = 8;
  const size = matrix.getWidth() * cell;
  const squares: string[] = [];
  for (let y = 0; y < matrix.getHeight(); y++)
    for (let x = 0; x < matrix.getWidth(); x++)
      if (matrix.get(x, y)) squares.push(`<rect x="${x * cell}" y="${y * cell}" width="${cell}" height="${cell}"/>`);
  return Buffer.from(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}" viewBox="0 0 ${size} ${size}"><rect width="100%" height="100%" fill="#fff"/><g fill="#000">${squares.join("")}</g></svg>`,
  );
}

test("installer on a phone records commissioning in the order of the work: strings tested, the serial read from its barcode and checked against the card, the grid profile chosen from the utility's list, completed without module-level monitoring; then uploads the signed form and the coordinator is notified", async ({
  browser,
}) => {
  test.setTimeout(240_000);
  const phone = await pageFor(browser, DEMO.installer);
  const project = await fieldProject(phone, { stages: ["utility_approved"], pairing: false });

  await phone.goto(`/projects/${project.id}`);
  await phone.getByRole("link", { name: "Field record", exact: true }).click();
  await expect(phone.getByRole("heading", { name: "Field record" })).toBeVisible();
  await expect(phone.getByTestId("field-cautions")).toContainText("Inverter capacitors hold a charge after shutdown");
  // The steps follow the work at the inverter.
  await expect(phone.locator("[data-testid^=step-] h3")).toHaveText([
    /Before energizing: string tests/,
    /At the inverter: serial, activation card, activation/,
    /Grid profile/,
    /String voltages with the array shut down/,
    /AC voltage at the point of connection/,
    /First power/,
    /Rapid shutdown test/,
  ]);
  // Nothing spills sideways on a phone.
  expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

  await testStringsBeforeEnergizing(phone);

  // The unit's serial, read from a photo of its barcode; the card in the box is for another unit.
  const unit = phone.getByTestId("step-inverter").locator("fieldset").first();
  await unit
    .getByLabel("Photo of the barcode of Inverter's label")
    .setInputFiles({ name: "label.svg", mimeType: "image/svg+xml", buffer: qrSvg("S/N: QN0730499") });
  await expect(unit.locator("input[id$='.serial']")).toHaveValue("QN0730499");
  await enter(unit.locator("input[id$='.cardSerial']"), "QN0730498");
  const serial = phone.locator("[data-testid^=result-inverter-serial]");
  await expect(serial).toHaveAttribute("data-status", "fail");
  await expect(serial).toContainText("the card belongs to another unit");
  await enter(unit.locator("input[id$='.cardSerial']"), "qn-0730499");
  await expect(serial).toHaveAttribute("data-status", "pass");
  await unit.getByLabel(/Activated with this card's key/).check();
  await expect(phone.locator("[data-testid^=result-inverter-activation]")).toHaveAttribute("data-status", "pass");

  // A profile typed as the inverter words it is compared loosely; then one chosen from the utility's list.
  const choice = phone.getByLabel("Profile set on the inverter");
  const accepted = (await choice.locator("option").allTextContents()).filter((o) => o !== "Choose…" && !o.startsWith("Other"));
  expect(accepted.length).toBeGreaterThan(0);
  await choice.selectOption({ label: "Other: type it as the inverter shows it" });
  await enter(phone.getByLabel("Profile as the inverter shows it"), `${accepted[0]!.toUpperCase().replace("CATEGORY", "Cat.")} default`);
  const profile = phone.getByTestId("result-grid-profile");
  await expect(profile).toHaveAttribute("data-status", "pass");
  await expect(profile).toContainText("names the accepted profile");
  await enter(phone.getByLabel("Profile as the inverter shows it"), "IEEE 1547-2003");
  await expect(profile).toHaveAttribute("data-status", "fail");
  await choice.selectOption({ label: accepted[0]! });
  await expect(profile).toHaveAttribute("data-status", "pass");

  await shutDownStrings(phone, 0.2);
  await expect(phone.locator("[data-testid^=result-string-shutdown][data-status=pass]")).toHaveCount(
    await phone.locator("[data-testid^=result-string-shutdown]").count(),
  );

  // One failing value: flagged with its reason, then corrected.
  await enter(phone.getByLabel("AC voltage (V)"), "262");
  const ac = phone.getByTestId("result-ac-voltage");
  await expect(ac).toHaveAttribute("data-status", "fail");
  await expect(ac).toContainText("262");
  await acSideAndRapidShutdown(phone);
  await expect(ac).toHaveAttribute("data-status", "pass");

  // No module-level monitoring: nothing to count, and the record completes honestly without it.
  await expect(phone.getByTestId("no-module-monitoring")).toBeVisible();
  await expect(phone.locator("#modulesReporting")).toHaveCount(0);
  await expect(phone.getByTestId("completion-counts")).toHaveText("0 failing · 0 to record");
  await phone.getByRole("button", { name: "Mark complete" }).click();
  await expect(phone.getByTestId("save-state")).toHaveText("Saved and marked complete.");
  await expect(phone.getByTestId("commissioning-status")).toContainText("Complete");

  // Resumed later, the readings are there.
  await phone.reload();
  await expect(phone.getByLabel("AC voltage (V)")).toHaveValue("241");
  await expect(phone.getByTestId("step-inverter").locator("input[id$='.serial']").first()).toHaveValue("QN0730499");
  await expect(phone.getByLabel("Profile set on the inverter")).toHaveValue(accepted[0]!);
  await expect(phone.getByTestId("commissioning-status")).toContainText("Complete");

  // The pre-filled certificate downloads as a PDF.
  const [download] = await Promise.all([
    phone.waitForEvent("download"),
    phone.getByRole("link", { name: "Certificate of completion (PDF)" }).click(),
  ]);
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
  const notice = inbox
    .getByTestId("caught-message")
    .filter({ hasText: "Signed completion form received" })
    .filter({ hasText: "signed-certificate.pdf" });
  await expect(async () => {
    await inbox.reload();
    await expect(notice.first()).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  const office = await pageFor(browser, DEMO.coordinator);
  const link = await notice
    .first()
    .getByRole("link", { name: /\/field$/ })
    .first()
    .getAttribute("href");
  expect(new URL(link!).pathname).toBe(`/projects/${project.id}/field`);

  // The office downloads the signed form as an attachment of the type its bytes showed.
  await office.goto(`/projects/${project.id}/field`);
  const fileLink = office.getByTestId("uploaded-files").getByRole("link", { name: "signed-certificate.pdf" });
  const response = await office.request.get((await fileLink.getAttribute("href"))!);
  expect(response.status()).toBe(200);
  expect(response.headers()["content-type"]).toBe("application/pdf");
  expect(response.headers()["content-disposition"]).toMatch(/^attachment;/);
  expect(response.headers()["x-content-type-options"]).toBe("nosniff");

  // The project page shows the field work done, and the completed record moved the project on by itself.
  await office.goto(`/projects/${project.id}`);
  const field = office.getByTestId("field-status");
  await expect(field).toContainText("Commissioning: complete");
  await expect(field).toContainText("Signed completion form: received");
  await expect(office.getByRole("region", { name: "Current stage" })).toContainText("Commissioned");
  await expect(office.getByTestId("stage-timeline")).toContainText("Field record completed");
});

test("installer on a phone with optimizers that report: devices found short of installed wait and hold the record open, a shut-down reading a little under the expected voltage passes, and every module must report", async ({
  browser,
}) => {
  test.setTimeout(180_000);
  const phone = await pageFor(browser, DEMO.installer);
  await fieldProject(phone, { stages: ON_SITE, pairing: true });
  // The demo's project with reporting optimizers may also have batteries: their step then comes last.
  const withStorage = (await phone.getByTestId("step-storage").count()) > 0;
  await expect(phone.locator("[data-testid^=step-] h3")).toHaveText([
    /Before energizing: string tests/,
    /At the inverter/,
    /Grid profile/,
    /Module-level optimizers found/,
    /String voltages with the array shut down/,
    /AC voltage/,
    /First power/,
    /Modules reporting/,
    /Rapid shutdown test/,
    ...(withStorage ? [/Energy storage/] : []),
  ]);
  // Optimizer strings show no Voc before the inverter runs: polarity and insulation only.
  await expect(phone.getByTestId("step-before-energizing").locator("input[id$='.vocV']")).toHaveCount(0);
  await testStringsBeforeEnergizing(phone);

  const unit = phone.getByTestId("step-inverter").locator("fieldset").first();
  await enter(unit.locator("input[id$='.serial']"), "CB6-2041177");
  await enter(unit.locator("input[id$='.cardSerial']"), "CB62041177");
  await unit.getByLabel(/Activated with this card's key/).check();
  const choice = phone.getByLabel("Profile set on the inverter");
  await choice.selectOption({ index: 1 });

  // Devices found: fewer than installed is not a pass; it waits, and completion is refused.
  const found = phone.locator("#devicesFound");
  const installed = Number(await found.getAttribute("data-installed"));
  await enter(found, String(installed - 2));
  const pairing = phone.getByTestId("result-device-pairing");
  await expect(pairing).toHaveAttribute("data-status", "warn");
  await expect(pairing).toHaveAttribute("data-waiting", "true");
  await expect(pairing).toContainText(`${installed - 2} of ${installed} optimizers in the system found`);
  await expect(pairing).toContainText("Not a pass: wait a few minutes");

  // Each string of 10 optimizers at 1 V reads about 10 V; 0.4 V under is normal (a two-sided window), 1.5 V under is not.
  const first = phone.getByTestId("step-shutdown").locator("input[data-expected-v]").first();
  const expectedV = Number(await first.getAttribute("data-expected-v"));
  await enter(first, (expectedV - 1.5).toFixed(1));
  await expect(phone.locator("[data-testid^=result-string-shutdown]").first()).toHaveAttribute("data-status", "fail");
  await shutDownStrings(phone, 0.4);
  await expect(phone.locator("[data-testid^=result-string-shutdown][data-status=pass]")).toHaveCount(
    await phone.locator("[data-testid^=result-string-shutdown]").count(),
  );

  await acSideAndRapidShutdown(phone);
  await recordStorageIfAny(phone);
  const modules = phone.locator("#modulesReporting");
  await enter(modules, (await modules.getAttribute("data-installed"))!);
  await expect(phone.getByTestId("completion-counts")).toHaveText("0 failing · 0 to record · 1 waiting");
  await phone.getByRole("button", { name: "Mark complete" }).click();
  await expect(phone.getByTestId("save-state")).toContainText("not marked complete: 1 waiting");
  await expect(phone.getByTestId("commissioning-status")).toContainText("Open");

  // The rest are found after a rescan: now it completes.
  await enter(found, String(installed));
  await expect(pairing).toHaveAttribute("data-status", "pass");
  await expect(phone.getByTestId("completion-counts")).toHaveText("0 failing · 0 to record");
  await phone.getByRole("button", { name: "Mark complete" }).click();
  await expect(phone.getByTestId("save-state")).toHaveText("Saved and marked complete.");
  expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});
