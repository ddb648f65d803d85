import { expect, test } from "@playwright/test";
import { DEMO, signIn } from "../support/session";

test("visitor without a session is sent to sign-in and back to the page asked for", async ({ page }) => {
  await page.goto("/settings/jurisdictions");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fsettings%2Fjurisdictions/);
  await page.getByLabel("E-mail address").fill(DEMO.coordinator);
  await page.getByLabel("Password").fill("ohmstead-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/settings\/jurisdictions$/);
  await expect(page.getByRole("cell", { name: "2017" })).toBeVisible();
});

test("repeated wrong passwords lock the account for a while with a clear message", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill("priya@quillmoor.example");
  for (let attempt = 1; attempt <= 5; attempt++) {
    await page.getByLabel("Password").fill(`wrong-${attempt}`);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByTestId("form-message")).toContainText("do not match an account");
  }
  await page.getByLabel("Password").fill("ohmstead-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("form-message")).toContainText("Too many failed sign-ins for this account");
});

test("user signs out", async ({ page }) => {
  await signIn(page, DEMO.coordinator);
  await page.getByRole("link", { name: "Sign out" }).click();
  await page.getByRole("button", { name: "Sign out now" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto("/dashboard");
  await expect(page).toHaveURL(/\/sign-in/);
});
