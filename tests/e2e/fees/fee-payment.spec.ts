import { expect, test } from "@playwright/test";
import { payByCard } from "../support/api";
import { DEMO, listProjectsAs, mailboxFor, pageFor, signIn } from "../support/session";

test("coordinator pays fees: a fee waiting for the valuation counts at its minimum, a declined card leaves them unpaid, the succeeding card marks them paid and the receipt arrives; an admin refunds one fee and part of the money", async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  await signIn(page, DEMO.coordinator);
  // A Brackenford project: its AHJ's invented schedule has a size bracket and a share of the valuation.
  const candidates = (await listProjectsAs(page)) as (Awaited<ReturnType<typeof listProjectsAs>>[number] & {
    jurisdiction: { name: string } | null;
  })[];
  const project = candidates.find(
    (p) => p.jurisdiction?.name.startsWith("City of Brackenford") && ["design_checked", "permit_filed", "permit_issued"].includes(p.stage),
  );
  expect(project).toBeDefined();
  await page.goto(`/projects/${project!.id}`);
  await page.getByRole("link", { name: "Fees", exact: true }).click();
  await expect(page.getByRole("heading", { name: "Fees" })).toBeVisible();

  // Without a valuation the plan review (0.65 % of it, at least $75.00, invented schedule) counts at its minimum.
  const lines = page.getByTestId("fee-line");
  const review = lines.filter({ hasText: "Plan review" });
  await page.getByLabel("Declared project valuation ($)").fill("");
  await page.getByRole("button", { name: "Save valuation" }).click();
  await expect(review.getByTestId("fee-line-amount")).toHaveText("at least $75.00");
  await expect(review.getByText("Enter the project's declared valuation to work out this fee.")).toBeVisible();
  await expect(review.getByRole("checkbox")).toHaveCount(0);
  await expect(page.getByTestId("unpaid-total")).toHaveText(/^at least \$[\d,]+\.\d\d$/);
  await expect(lines.getByText("$0.00")).toHaveCount(0);

  // Declare the valuation so the percentage line can be worked out: 0.65 % of $24,500.00 = $159.25.
  await page.getByLabel("Declared project valuation ($)").fill("24,500");
  await page.getByRole("button", { name: "Save valuation" }).click();
  await expect(review.getByTestId("fee-line-amount")).toHaveText("$159.25");
  await expect(page.getByTestId("unpaid-total")).toHaveText(/^\$[\d,]+\.\d\d$/);
  await expect(lines.filter({ hasText: "%" }).first()).toBeVisible();
  await expect(lines.first().getByRole("list", { name: /Working for/ })).toBeVisible();
  const count = await lines.count();
  expect(count).toBeGreaterThan(1);

  // A declined card: the page says so, the office sees why, and nothing is paid.
  await page.getByRole("button", { name: /^Pay \$[\d,.]+ by card$/ }).click();
  await payByCard(page, "4000 0000 0000 0002");
  await expect(page.getByRole("alert")).toContainText("declined");
  await page.getByRole("link", { name: "Cancel and go back" }).click();
  await expect(page).toHaveURL(/\/fees\?checkout=cancelled$/);
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId("payment-failure").first()).toContainText("Your card was declined.", { timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  for (const state of await page.getByTestId("fee-line-state").allTextContents()) expect(state).toBe("Unpaid");

  // The succeeding card: back on the fees page, the webhook marks every line paid.
  await page.getByRole("button", { name: /^Pay \$[\d,.]+ by card$/ }).click();
  await payByCard(page, "4242 4242 4242 4242");
  await expect(page).toHaveURL(/\/fees\?checkout=done$/);
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId("fee-line-state").filter({ hasText: "Paid" })).toHaveCount(count, { timeout: 2_000 });
  }).toPass({ timeout: 45_000 });
  const paid = page.getByTestId("payment").filter({ has: page.getByTestId("payment-status").filter({ hasText: /^Paid$/ }) });
  await expect(paid).toContainText("visa •••• 4242");
  // Paid now: the declined attempt no longer asks for another card.
  await expect(page.getByTestId("payment-failure")).toHaveCount(0);
  await expect(page.getByText("pay again with another card")).toHaveCount(0);
  await expect(page.getByTestId("unpaid-total")).toHaveText("$0.00");

  // The receipt reaches the mailbox and the page.
  const mailbox = await mailboxFor(browser);
  const receipt = mailbox
    .getByTestId("caught-message")
    .filter({ hasText: /Receipt R-\d{4}-/ })
    .filter({ hasText: DEMO.coordinator });
  await expect(async () => {
    await mailbox.reload();
    await expect(receipt.first()).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  await expect(receipt.first().getByRole("list", { name: "Attachments" })).toContainText(
    /Attached: R-\d{4}-[\w-]+\.pdf \(application\/pdf/,
  );
  await page.reload();
  const receiptLink = paid.getByRole("link", { name: /^Receipt R-/ });
  const response = await page.request.get((await receiptLink.getAttribute("href"))!);
  expect(response.headers()["content-type"]).toBe("application/pdf");

  // An admin refunds the plan review as a fee: nothing is chosen or filled in beforehand, and a dialog names the amount and the payment.
  const admin = await pageFor(browser, DEMO.admin);
  await admin.goto(`/projects/${project!.id}/fees`);
  const payment = admin.getByTestId("payment").filter({ hasText: "visa •••• 4242" });
  const paidTotal = (await payment.locator(".measure").first().textContent())!;
  await payment.getByRole("button", { name: "Refund…" }).click();
  const fees = payment.getByRole("list", { name: "Fees to refund" });
  for (const box of await fees.getByRole("checkbox").all()) await expect(box).not.toBeChecked();
  await payment.getByRole("button", { name: "Review the refund" }).click();
  await expect(payment.getByText("Choose at least one fee to refund")).toBeVisible();
  await fees.getByRole("checkbox", { name: /Plan review/ }).check();
  await payment.getByLabel("Reason").fill("Plan review fee waived by the AHJ");
  await payment.getByRole("button", { name: "Review the refund" }).click();
  const dialog = admin.getByRole("dialog", { name: "Refund $159.25?" });
  await expect(dialog).toBeVisible();
  await expect(dialog.getByTestId("refund-confirmation")).toContainText(`$159.25 of the ${paidTotal} payment`);
  await expect(dialog.getByTestId("refund-confirmation")).toContainText("visa •••• 4242");
  await expect(dialog).toContainText("Plan review will be unpaid again.");
  // Going back refunds nothing.
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(dialog).toBeHidden();
  await expect(payment.getByTestId("refunds")).toHaveCount(0);
  await payment.getByRole("button", { name: "Review the refund" }).click();
  await dialog.getByRole("button", { name: "Refund $159.25" }).click();
  await expect(payment.getByTestId("refunds")).toContainText("Refunded $159.25 for Plan review");
  await expect(payment.getByTestId("payment-status")).toHaveText("Partly refunded");
  const adminLines = admin.getByTestId("fee-line");
  await expect(adminLines.filter({ hasText: "Plan review" }).getByTestId("fee-line-state")).toHaveText("Refunded, unpaid again");
  await expect(
    adminLines
      .filter({ hasNotText: "Plan review" })
      .getByTestId("fee-line-state")
      .filter({ hasText: /^Paid$/ }),
  ).toHaveCount(count - 1);
  await expect(admin.getByTestId("unpaid-total")).toHaveText("$159.25");

  // Then $10.00 of money, not tied to a fee: the other fees stay paid.
  await payment.getByRole("button", { name: "Refund…" }).click();
  await payment.getByRole("radio", { name: /An amount of money/ }).check();
  await expect(payment.getByLabel("Refund amount ($)")).toHaveValue("");
  await payment.getByLabel("Refund amount ($)").fill("10.00");
  await payment.getByLabel("Reason").fill("Records fee overcharged");
  await payment.getByRole("button", { name: "Review the refund" }).click();
  const second = admin.getByRole("dialog", { name: "Refund $10.00?" });
  await expect(second).toContainText("The fees stay paid.");
  await second.getByRole("button", { name: "Refund $10.00" }).click();
  await expect(payment.getByTestId("refunds")).toContainText("Refunded $10.00 on");
  await expect(
    adminLines
      .filter({ hasNotText: "Plan review" })
      .getByTestId("fee-line-state")
      .filter({ hasText: /^Paid$/ }),
  ).toHaveCount(count - 1);
});

test("coordinator pays with the card that asks for extra authentication, completes it, and the fees are paid", async ({ page }) => {
  test.setTimeout(120_000);
  await signIn(page, DEMO.coordinator);
  // A Quillan Springs project: its invented schedule needs no valuation.
  const candidates = (await listProjectsAs(page)) as (Awaited<ReturnType<typeof listProjectsAs>>[number] & {
    jurisdiction: { name: string } | null;
  })[];
  const project = candidates.find((p) => p.jurisdiction?.name.startsWith("Town of Quillan Springs") && p.stage !== "draft");
  expect(project).toBeDefined();
  await page.goto(`/projects/${project!.id}/fees`);
  const lines = page.getByTestId("fee-line");
  const count = await lines.count();
  expect(count).toBeGreaterThan(0);

  await page.getByRole("button", { name: /^Pay \$[\d,.]+ by card$/ }).click();
  await payByCard(page, "4000 0025 0000 3155");
  await page.getByRole("button", { name: "Complete authentication" }).click();
  await expect(page).toHaveURL(/\/fees\?checkout=done$/);
  await expect(async () => {
    await page.reload();
    await expect(page.getByTestId("fee-line-state").filter({ hasText: "Paid" })).toHaveCount(count, { timeout: 2_000 });
  }).toPass({ timeout: 45_000 });
});
