// Temporary walk for screenshots; not committed.
import { execFileSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { generatePacket } from "./support/packets";
import { drawSignature } from "./support/signing";
import { DEMO, listProjectsAs, mailboxFor, signIn } from "./support/session";

const out = "/tmp/walk";
async function shoot(page: Page, name: string) {
  for (const width of [1366, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await page.waitForTimeout(400);
    await page.screenshot({ path: `${out}/${name}-${width}.png`, fullPage: true });
    console.log(name, width, "scrollWidth", await page.evaluate(() => document.documentElement.scrollWidth));
  }
  await page.setViewportSize({ width: 1366, height: 900 });
}
function pdfPages(bytes: Buffer, name: string) {
  writeFileSync(`${out}/${name}.pdf`, bytes);
  execFileSync("pdftoppm", ["-png", "-r", "50", `${out}/${name}.pdf`, `${out}/${name}`]);
}
async function mailedLink(browser: Browser, to: string) {
  const inbox = await mailboxFor(browser);
  const message = inbox.getByTestId("caught-message").filter({ hasText: to }).first();
  await expect(async () => {
    await inbox.reload();
    await expect(message).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  await shoot(inbox, "mailbox");
  const href = await message.getByRole("link", { name: /\/sign\// }).first().getAttribute("href");
  await inbox.context().close();
  return new URL(href!).pathname;
}

test("walk: storage project and a signature", async ({ page, browser }) => {
  test.setTimeout(600_000);
  await signIn(page, DEMO.coordinator);
  const projects = await listProjectsAs(page);
  const storage = projects.find((p) => p.customerName === "Noor Haddadin")!;
  await page.goto(`/projects/${storage.id}/design`);
  await page.getByRole("button", { name: /Storage/ }).first().click();
  await page.waitForTimeout(1500);
  await shoot(page, "storage-step");
  await page.getByRole("button", { name: /Review/ }).first().click();
  await page.waitForTimeout(1500);
  await shoot(page, "storage-review");
  await page.goto(`/projects/${storage.id}/documents`);
  for (const kind of ["permit", "interconnection"] as const) {
    const card = page.getByTestId(`packet-${kind}`);
    const reason = card.getByLabel(/Reason for generating anyway/);
    if (await reason.isVisible().catch(() => false)) await reason.fill("Walk.");
    const revs = await card.getByTestId("packet-revision").count();
    await generatePacket(page, kind, revs + 1);
    await page.reload();
    const href = await page.getByTestId(`packet-${kind}`).getByRole("link", { name: /PDF|Download/ }).first().getAttribute("href");
    pdfPages(Buffer.from(await (await page.request.get(href!)).body()), `storage-${kind}`);
  }
  await shoot(page, "storage-documents");

  // A signature on the storage project's interconnection application.
  const panel = page.getByTestId("signature-panel");
  await panel.getByLabel("Document").selectOption({ index: 1 });
  const email = `walk.${Date.now().toString(36)}@mail.example`;
  await panel.getByLabel("E-mail").first().fill(email);
  await panel.getByRole("button", { name: "Ask for signatures" }).click();
  await expect(panel.getByRole("status")).toContainText("queued");
  await shoot(page, "documents-with-request");
  const link = await mailedLink(browser, email);
  const guest = await (await browser.newContext({ viewport: { width: 390, height: 844 } })).newPage();
  await guest.goto(link);
  await guest.waitForTimeout(2000);
  await shoot(guest, "signing-page");
  await guest.getByLabel("Your full name").fill(storage.customerName);
  await guest.getByLabel("I agree to sign electronically").check();
  await guest.setViewportSize({ width: 390, height: 844 });
  await drawSignature(guest);
  await guest.getByRole("button", { name: "Sign the document" }).click();
  await expect(guest.getByRole("heading", { name: "Already signed" })).toBeVisible({ timeout: 30_000 });
  await shoot(guest, "signed-page");
  pdfPages(Buffer.from(await (await guest.request.get(`${link}/document`)).body()), "signed");

  // The installer's field page for the storage project on a phone.
  const crew = await (await browser.newContext({ viewport: { width: 390, height: 844 } })).newPage();
  await signIn(crew, DEMO.installer);
  await crew.goto(`/projects/${storage.id}/field`);
  await crew.waitForTimeout(1500);
  await crew.evaluate(() => document.querySelectorAll("details").forEach((d) => (d.open = true)));
  await shoot(crew, "storage-field");
});
