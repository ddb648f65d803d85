import { expect, test } from "@playwright/test";
import { DEMO, pageFor, signIn } from "../support/session";

test("admin changes the company's phone and time zone; a coordinator cannot open the page", async ({ page, browser }) => {
  await signIn(page, DEMO.admin);
  await page.goto("/settings");
  await page.getByRole("link", { name: "Organization" }).click();
  await expect(page.getByRole("heading", { name: "Organization" })).toBeVisible();
  await expect(page.getByLabel("Time zone")).toHaveValue("America/Denver");

  await page.getByLabel("Company name").fill("");
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByText("Enter the company's name")).toBeVisible();

  await page.getByLabel("Company name").fill("Quillmoor Solar Electric");
  await page.getByLabel("Phone").fill("(555) 014-2299");
  await page.getByLabel("Time zone").selectOption("America/Phoenix");
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByRole("status")).toHaveText("Saved.");
  await page.reload();
  await expect(page.getByLabel("Phone")).toHaveValue("(555) 014-2299");
  await expect(page.getByLabel("Time zone")).toHaveValue("America/Phoenix");

  // Put the demo back as it was for the other tests.
  await page.getByLabel("Phone").fill("(555) 014-2210");
  await page.getByLabel("Time zone").selectOption("America/Denver");
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByRole("status")).toHaveText("Saved.");

  const coordinator = await pageFor(browser, DEMO.coordinator);
  const response = await coordinator.goto("/settings/organization");
  expect(response?.status()).toBe(404);
});
