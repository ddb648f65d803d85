import { expect, test } from "@playwright/test";
import { generatePacket } from "../support/packets";
import { DEMO, listProjectsAs, mailboxFor, signIn } from "../support/session";

test("coordinator shares a permit packet with an inspector, who opens and downloads it without an account, until the link is revoked", async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  const inspector = `inspector.${Date.now()}@ahj.example`;
  await signIn(page, DEMO.coordinator);
  const [project] = (await listProjectsAs(page)).filter(
    (p) => p.stage !== "draft" && !["Rafael Quintero-Bask", "Imogen Halvorsen"].includes(p.customerName),
  );
  await page.goto(`/projects/${project.id}/documents`);

  // Reuse Rev 1 if an earlier run made it; otherwise generate it through the worker.
  const permit = page.getByTestId("packet-permit");
  if ((await permit.getByTestId("packet-revision").filter({ hasText: "Rev 1" }).count()) === 0) {
    const reason = permit.getByLabel(/Reason for generating anyway/);
    if (await reason.isVisible()) await reason.fill("Shared with the inspector for an early look.");
    await generatePacket(page, "permit", 1);
    await page.reload();
  }

  const panel = page.getByTestId("share-panel");
  await panel.getByLabel("Permit packet Rev 1").check();
  await panel.getByLabel("Inspector's e-mail (optional)").fill(inspector);
  await panel.getByLabel("Days until the link expires").fill("14");
  await panel.getByLabel("Note for the inspector (optional)").fill("Rough-in inspection on Thursday.");
  await panel.getByRole("button", { name: "Create link" }).click();
  await expect(panel.getByTestId("new-share-link")).toContainText(`e-mailed to ${inspector}`);
  const shownUrl = await panel.getByLabel("New link").inputValue();
  const link = panel.getByTestId("share-link").filter({ hasText: inspector });
  await expect(link.getByTestId("share-link-status")).toHaveText("Active");

  // The inspector: the mailbox holds the message; the link opens in a browser with no session.
  const inbox = await mailboxFor(browser);
  await expect(async () => {
    await inbox.reload();
    await expect(inbox.getByTestId("caught-message").filter({ hasText: inspector }).first()).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  const message = inbox.getByTestId("caught-message").filter({ hasText: inspector }).first();
  await expect(message).toContainText("Rough-in inspection on Thursday.");
  const mailedUrl = await message
    .getByRole("link", { name: /\/share\// })
    .first()
    .getAttribute("href");
  expect(mailedUrl).toBe(shownUrl);
  const context = await browser.newContext();
  const guest = await context.newPage();
  const path = new URL(mailedUrl!).pathname;

  const opened = await guest.goto(path);
  expect(opened!.status()).toBe(200);
  await expect(guest.locator('meta[name="robots"]')).toHaveAttribute("content", /noindex/);
  const summary = guest.getByRole("region", { name: "Project summary" });
  await expect(summary).toContainText(/[\d.]+ kW DC \/ [\d.]+ kW AC/);
  await expect(summary).toContainText(/NEC 20\d\d/);
  await expect(guest.getByRole("heading", { name: "Single-line diagram" })).toBeVisible();
  await expect(guest.locator("svg").last()).toBeVisible();
  await expect(guest.getByTestId("read-only-note")).toContainText("read only");
  await expect(guest.getByRole("button")).toHaveCount(0); // nothing to press but links

  const button = guest
    .getByTestId("shared-revision")
    .filter({ hasText: "Permit packet Rev 1" })
    .getByRole("link", { name: "Download PDF" });
  const [download] = await Promise.all([guest.waitForEvent("download"), button.click()]);
  expect(download.suggestedFilename()).toMatch(/-permit-rev1\.pdf$/);
  const file = await guest.request.get((await button.getAttribute("href"))!);
  expect(file.status()).toBe(200);
  expect(file.headers()["x-robots-tag"]).toContain("noindex");
  expect((await file.body()).subarray(0, 5).toString()).toBe("%PDF-");

  // The coordinator sees the view and the download in the access log.
  await page.reload();
  await link.getByText(/Access log/).click();
  const log = link.getByTestId("share-link-accesses");
  await expect(log).toContainText("Viewed the page");
  await expect(log).toContainText("Downloaded Permit packet Rev 1");

  // Revoked: the link answers 410 with a clear page; a made-up token answers 404.
  await link.getByRole("button", { name: "Revoke" }).click();
  await expect(link.getByTestId("share-link-status")).toHaveText("Revoked");
  const gone = await guest.goto(path);
  expect(gone!.status()).toBe(410);
  await expect(guest.getByRole("heading", { name: "Link no longer available" })).toBeVisible();
  expect((await guest.request.get(`${path}/packets/00000000-0000-4000-8000-000000000000`)).status()).toBe(410);
  const unknown = await guest.goto("/share/this-token-was-never-made-by-anyone-0000000");
  expect(unknown!.status()).toBe(404);
  await expect(guest.getByRole("heading", { name: "Link not found" })).toBeVisible();
});

test("installer sees no sharing panel", async ({ page }) => {
  await signIn(page, DEMO.installer);
  const [mine] = await listProjectsAs(page);
  await page.goto(`/projects/${mine.id}/documents`);
  await expect(page.getByTestId("packet-permit")).toBeVisible();
  await expect(page.getByTestId("share-panel")).toHaveCount(0);
});
