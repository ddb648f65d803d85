import { expect, test, type Page } from "@playwright/test";
import { generatePacket } from "../support/packets";
import { payByCard } from "../support/api";
import { DEMO, listProjectsAs, pageFor, signIn } from "../support/session";
import { pageTexts } from "../../unit/documents/read-pdf";

// The path a new user took in every role — create, design, review, packets, share, the field record on
// a phone, fees paid and refunded — and the things they met on the way: no "[object Object]", no source
// marks, every date the organization's calendar day (Denver), "240 V" on sheet 2, the review inside its
// panel, the icon served.

const ZONE = "America/Denver"; // the demo company's zone (Settings → Organization)
const NEVER = ["[object Object]", "(from memory)", "common practice", "undefined", "NaN"];
const todayThere = () =>
  new Intl.DateTimeFormat("en-CA", { timeZone: ZONE, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date());
const mediumDateThere = () => new Intl.DateTimeFormat("en-US", { timeZone: ZONE, dateStyle: "medium" }).format(new Date());

async function expectCleanPage(page: Page, where: string) {
  const text = await page.locator("body").innerText();
  for (const word of NEVER) expect(text, `${where} shows "${word}"`).not.toContain(word);
}

async function pdfTexts(page: Page, href: string): Promise<string[]> {
  const res = await page.request.get(href);
  expect(res.status(), href).toBe(200);
  return pageTexts(new Uint8Array(await res.body()));
}

test("a new coordinator, inspector and installer go from a new project to fees paid and refunded without meeting a wrong date or a broken text", async ({
  page,
  browser,
}) => {
  test.setTimeout(300_000);
  await page.setViewportSize({ width: 1366, height: 900 });
  await signIn(page, DEMO.coordinator);
  await expectCleanPage(page, "dashboard");

  // The icon is served and the pages point at it.
  expect((await page.request.get("/icon.svg")).headers()["content-type"]).toContain("image/svg+xml");
  expect((await page.request.get("/apple-icon.png")).status()).toBe(200);
  await expect(page.locator('link[rel="icon"]')).toHaveCount(1);

  // A demo project in the same town whose design passes: the new project gets its service and, below, its design.
  const [source] = (await listProjectsAs(page, { stage: "permit_filed" })).filter((p) =>
    (p as { jurisdiction?: { name: string } }).jurisdiction?.name.startsWith("City of Brackenford"),
  ) as unknown as { id: string; mainBreakerA: number; busbarA: number }[];

  // Create: the coordinator making it looks after it unless they choose otherwise.
  await page.goto("/projects/new");
  await expect(page.getByLabel("Permit coordinator")).toHaveValue(/[0-9a-f-]{36}/);
  const customer = `Walk ${Date.now().toString(36)}`;
  await page.getByLabel("Customer name").fill(customer);
  await page.getByLabel("Street address").fill("9 Quarry Bend");
  await page.getByLabel("City or town").fill("Brackenford");
  await page.getByLabel("State").fill("CO");
  await page.getByLabel("ZIP code").fill("80913");
  await page.getByLabel("Authority having jurisdiction (AHJ)").selectOption({ label: "City of Brackenford Building Division (NEC 2023)" });
  await page.getByLabel("Utility", { exact: true }).selectOption({ label: "Brackenford Municipal Light & Power" });
  await page.getByLabel("Main breaker (A)").fill(String(source!.mainBreakerA));
  await page.getByLabel("Busbar rating (A)").fill(String(source!.busbarA));
  await page.getByLabel("Installer (crew lead)").selectOption({ label: "Luis Arkwright" });
  await page.getByRole("button", { name: "Create project" }).click();
  await expect(page.getByRole("heading", { name: customer })).toBeVisible();
  await expect(page.getByText("Dana Okafor").first()).toBeVisible();
  const [project] = await listProjectsAs(page, { q: customer });

  // Design: the demo design, saved through the API the editor uses.
  const { draft } = await (await page.request.get(`/api/v1/projects/${source!.id}/design`)).json();
  expect((await page.request.put(`/api/v1/projects/${project!.id}/design`, { data: draft })).status()).toBe(200);

  // Review: every check, the diagram and the labels stay inside the review panel at 1366 px.
  await page.goto(`/projects/${project!.id}/design`);
  await page.getByRole("button", { name: /6\. Review/ }).click();
  const panel = page.locator("form.panel");
  await expect(page.getByTestId("warning-label").first()).toBeVisible();
  // Nothing pushes the panel wider than itself (wide tables scroll inside their own box)…
  const overflow = await panel.evaluate((el) => el.scrollWidth - el.clientWidth);
  expect(overflow, "content wider than the review panel").toBeLessThanOrEqual(1);
  // …and every check row and label card ends inside it.
  const box = (await panel.boundingBox())!;
  for (const selector of ["[data-testid='check']", "[data-testid='warning-label']"]) {
    for (const inner of await panel.locator(selector).all()) {
      const b = await inner.boundingBox();
      if (b && b.width > 0) expect(b.x + b.width, `${selector} ends inside the panel`).toBeLessThanOrEqual(box.x + box.width + 1);
    }
  }
  await expectCleanPage(page, "review step");

  // The project page says what to do next from the real state, and the stage form offers the next stage.
  await page.goto(`/projects/${project!.id}`);
  await expect(page.getByText(/Next: .*mark the design checked/)).toBeVisible();
  await page.getByLabel("Move to stage").selectOption("design_checked");
  await page.getByRole("button", { name: "Change stage" }).click();
  await expect(page.getByRole("region", { name: "Current stage" })).toContainText("Design checked");
  await expect(page.getByLabel("Move to stage").locator("option:checked")).toHaveText("Permit filed");
  await expect(page.getByText("Next: Assemble and file the permit packet")).toBeVisible();
  await expectCleanPage(page, "project page");

  // Packets: the share panel offers the new revision as soon as it is ready, without a reload.
  await page.goto(`/projects/${project!.id}/documents`);
  const shareable = page.getByTestId("share-panel").getByLabel("Permit packet Rev 1");
  await expect(shareable).toHaveCount(0);
  const card = await generatePacket(page, "permit", 1);
  await expect(shareable).toBeVisible({ timeout: 15_000 });
  const permitHref = (await card
    .getByTestId("packet-revision")
    .filter({ hasText: "Rev 1" })
    .getByRole("link", { name: "Download PDF" })
    .getAttribute("href"))!;
  const permit = await pdfTexts(page, permitHref);
  expect(permit[1], "sheet 2").toContain(`240 V, single phase, ${source!.busbarA} A busbar, ${source!.mainBreakerA} A main`);
  for (const [i, text] of permit.entries()) {
    if (i < 8) expect(text, `sheet ${i + 1}`).toContain(`Issued ${todayThere()}`);
    for (const word of NEVER) expect(text, `permit page ${i + 1}`).not.toContain(word);
  }

  // Share: the list and the inspector's page give the organization's calendar days.
  await shareable.check();
  await page.getByTestId("share-panel").getByRole("button", { name: "Create link" }).click();
  const url = await page.getByTestId("share-panel").getByLabel("New link").inputValue();
  await expect(page.getByTestId("share-link").first()).toContainText(`on ${mediumDateThere()}`);
  await expectCleanPage(page, "documents page");
  const inspector = await (await browser.newContext()).newPage();
  await inspector.goto(new URL(url).pathname);
  await expect(inspector.getByText(/The link works until [A-Z][a-z]{2} \d{1,2}, \d{4}\./)).toBeVisible();
  await expect(inspector.getByText(`generated ${mediumDateThere()}`).first()).toBeVisible();
  await expectCleanPage(inspector, "inspector page");

  // The field record on the installer's phone, and its pre-filled documents.
  const phone = await (await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true })).newPage();
  await signIn(phone, DEMO.installer);
  await phone.goto(`/projects/${project!.id}/field`);
  await expect(phone.getByRole("heading", { level: 1 })).toBeVisible();
  await expectCleanPage(phone, "field record");
  const width = await phone.evaluate(() => document.documentElement.scrollWidth);
  expect(width, "no sideways scrolling on a phone").toBeLessThanOrEqual(390);
  for (const document of ["certificate", "report"]) {
    const texts = await pdfTexts(phone, `/api/v1/projects/${project!.id}/commissioning/${document}`);
    for (const text of texts) {
      expect(text, document).toContain(`Printed ${todayThere()}`);
      for (const word of NEVER) expect(text, document).not.toContain(word);
    }
  }

  // Fees: paid by card; the history reads as words and dates, never "[object Object]".
  await page.goto(`/projects/${project!.id}/fees`);
  await page.getByRole("button", { name: /^Pay \$[\d,.]+ by card$/ }).click();
  await payByCard(page, "4242 4242 4242 4242");
  await expect(page).toHaveURL(/\/fees\?checkout=done$/);
  const payment = page.getByTestId("payment").first();
  await expect(async () => {
    await page.reload();
    await expect(payment.getByTestId("payment-status")).toHaveText(/^Paid$/, { timeout: 2_000 });
  }).toPass({ timeout: 45_000 });
  await expect(payment).toContainText(`paid ${mediumDateThere()}`);
  await expectCleanPage(page, "fees page");

  // An admin refunds one whole fee after confirming it: that line is no longer shown as paid.
  const admin = await pageFor(browser, DEMO.admin);
  await admin.goto(`/projects/${project!.id}/fees`);
  const paid = admin.getByTestId("payment").filter({ hasText: "visa •••• 4242" });
  await paid.getByRole("button", { name: "Refund…" }).click();
  const choice = paid.getByRole("list", { name: "Fees to refund" }).getByRole("listitem").first();
  // "City of Brackenford Building Division: Electrical permit, PV $185.00" → the fee's own name.
  const feeName = /: (.+?) \$/.exec((await choice.innerText()).replace(/\s+/g, " "))![1]!;
  await choice.getByRole("checkbox").check();
  await paid.getByLabel("Reason").fill("Fee waived");
  await paid.getByRole("button", { name: "Review the refund" }).click();
  const dialog = admin.getByRole("dialog", { name: /^Refund \$[\d,.]+\?$/ });
  await expect(dialog.getByTestId("refund-confirmation")).toContainText("visa •••• 4242");
  await dialog.getByRole("button", { name: /^Refund \$/ }).click();
  await expect(paid.getByTestId("refunds")).toContainText(`Refunded`);
  await expect(admin.getByTestId("fee-line").filter({ hasText: feeName }).first().getByTestId("fee-line-state")).toHaveText(
    "Refunded, unpaid again",
  );
  await expectCleanPage(admin, "fees page after a refund");

  // API tokens: a revoked token says when, as a date.
  await admin.goto("/settings/api-tokens");
  await admin.getByLabel("Token name").fill(`Walk ${Date.now()}`);
  await admin.getByRole("button", { name: "Create token" }).click();
  admin.once("dialog", (dialog) => dialog.accept());
  await admin.getByTestId("api-token-row").first().getByRole("button", { name: "Revoke" }).click();
  await expect(admin.getByTestId("api-token-row").first()).toContainText(`Revoked ${mediumDateThere()}`);
  await expectCleanPage(admin, "API tokens");
});
