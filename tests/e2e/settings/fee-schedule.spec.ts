import { expect, test, type Page } from "@playwright/test";
import { DEMO, signIn } from "../support/session";

const feeLine = (page: Page, number: number) => page.getByRole("group", { name: `Fee line ${number}`, exact: true });

/** The preview's date is filled in by the browser, so a value there means the editor is hydrated. */
async function editorReady(page: Page) {
  await expect(page.getByLabel("Fees as of")).not.toHaveValue("");
}

test("admin sets a jurisdiction's fee schedule, tries it before saving, and finds it again", async ({ page }) => {
  // A jurisdiction of its own, so the seeded schedules other tests read stay as they are.
  const name = `Township of Corran Ridge ${Date.now().toString(36)}`;
  await signIn(page, DEMO.admin);
  await page.goto("/settings/jurisdictions");
  await page.getByLabel("Authority").fill(name);
  await page.getByLabel("State").fill("vt");
  await page.getByLabel("Record low (°C)").fill("-29");
  await page.getByLabel("High design temperature (°C)").fill("30");
  await page.getByRole("button", { name: "Add jurisdiction" }).click();
  await page.getByRole("link", { name: `Edit ${name}` }).click();
  await expect(page.getByRole("heading", { name: "Fee schedule" })).toBeVisible();
  await editorReady(page);

  // A flat fee: the preview shows it at once.
  await page.getByRole("button", { name: "Add fee line" }).click();
  const permit = feeLine(page, 1);
  await permit.getByLabel("Fee name").fill("Building permit");
  await permit.getByLabel("Amount ($)").fill("150");
  await expect(page.getByTestId("fee-preview-total")).toHaveText("$150.00");

  // A rate per kW with a minimum: 7.6 kW DC × $12.00 = $91.20 is raised to the $100.00 minimum.
  await page.getByRole("button", { name: "Add fee line" }).click();
  const review = feeLine(page, 2);
  await review.getByLabel("Fee name").fill("Plan review");
  await review.getByLabel("How it is worked out").selectOption({ label: "Rate per kW" });
  await expect(review.getByLabel("Size it reads")).toHaveValue("dc");
  await review.getByLabel("Rate ($ per kW)").fill("12");
  await review.getByLabel("Minimum ($, optional)").fill("100");
  await expect(page.getByTestId("fee-preview-total")).toHaveText("$250.00");
  await expect(page.getByText("below the $100.00 minimum → $100.00")).toBeVisible();
  await page.getByLabel("DC size (kW)").fill("10");
  await expect(page.getByTestId("fee-preview-total")).toHaveText("$270.00");

  // A maximum below the minimum is refused beside the field, and nothing typed is lost.
  await review.getByLabel("Maximum ($, optional)").fill("50");
  await expect(page.getByTestId("fee-preview-total")).toHaveCount(0);
  await page.getByRole("button", { name: "Save fee schedule" }).click();
  await expect(review.getByText("The minimum ($100.00) cannot be above the maximum ($50.00)")).toBeVisible();
  await expect(review.getByLabel("Maximum ($, optional)")).toHaveAttribute("aria-invalid", "true");
  await expect(permit.getByLabel("Fee name")).toHaveValue("Building permit");
  await expect(permit.getByLabel("Amount ($)")).toHaveValue("150");
  await expect(review.getByLabel("Fee name")).toHaveValue("Plan review");
  await expect(review.getByLabel("Rate ($ per kW)")).toHaveValue("12");
  await expect(review.getByLabel("Minimum ($, optional)")).toHaveValue("100");
  await expect(review.getByLabel("Maximum ($, optional)")).toHaveValue("50");

  await review.getByLabel("Maximum ($, optional)").fill("500");
  await expect(review.getByText("The minimum ($100.00) cannot be above the maximum")).toHaveCount(0);
  await expect(page.getByTestId("fee-preview-total")).toHaveText("$270.00");
  const takesEffect = await permit.getByLabel("Takes effect").inputValue();
  await page.getByRole("button", { name: "Save fee schedule" }).click();
  await expect(page.getByTestId("fee-schedule-save-state")).toHaveText("Saved: 2 fee lines.");

  await page.reload();
  await editorReady(page);
  await expect(feeLine(page, 1).getByLabel("Fee name")).toHaveValue("Building permit");
  await expect(feeLine(page, 1).getByLabel("How it is worked out")).toHaveValue("flat");
  await expect(feeLine(page, 1).getByLabel("Amount ($)")).toHaveValue("150.00");
  await expect(feeLine(page, 1).getByLabel("Takes effect")).toHaveValue(takesEffect);
  await expect(feeLine(page, 2).getByLabel("Fee name")).toHaveValue("Plan review");
  await expect(feeLine(page, 2).getByLabel("How it is worked out")).toHaveValue("per-kw");
  await expect(feeLine(page, 2).getByLabel("Rate ($ per kW)")).toHaveValue("12.00");
  await expect(feeLine(page, 2).getByLabel("Minimum ($, optional)")).toHaveValue("100.00");
  await expect(feeLine(page, 2).getByLabel("Maximum ($, optional)")).toHaveValue("500.00");
  await expect(feeLine(page, 3)).toHaveCount(0);
  await expect(page.getByTestId("fee-preview-total")).toHaveText("$250.00");
});
