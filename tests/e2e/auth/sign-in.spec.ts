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

test("repeated wrong passwords slow further tries from that place with a plain message, and the right password then works", async ({
  page,
}) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill("priya@quillmoor.example");
  for (let attempt = 1; attempt <= 5; attempt++) {
    await page.getByLabel("Password").fill(`wrong-${attempt}`);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByTestId("form-message")).toContainText("do not match an account");
  }
  await page.getByLabel("Password").fill("ohmstead-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("form-message")).toContainText(
    /each new try waits a little longer\. Try again in \d+ seconds?\. The account is not locked\./,
  );
  // No lock to wait out: after the short pause the owner's password signs in.
  await page.waitForTimeout(2_500);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/dashboard$/);
});

test("a return path that leaves the site is never followed, before or after signing in", async ({ page }) => {
  // Defect: callbackUrl=/\evil.example/… sent the browser off-site.
  for (const hostile of ["/\\evil.example/steal", "//evil.example/", "/.//evil.example", "https://evil.example/"]) {
    await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(hostile)}`);
    await page.getByLabel("E-mail address").fill(DEMO.coordinator);
    await page.getByLabel("Password").fill("ohmstead-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page).toHaveURL(/^http:\/\/127\.0\.0\.1:\d+\/dashboard$/);
    // Already signed in: the server's own redirect stays on the site too.
    const response = await page.request.get(`/sign-in?callbackUrl=${encodeURIComponent(hostile)}`, { maxRedirects: 0 });
    expect(response.status()).toBe(307);
    expect(new URL(response.headers()["location"]!, page.url()).host).toBe(new URL(page.url()).host);
    await page.context().clearCookies();
  }
});

test("user signs out", async ({ page }) => {
  await signIn(page, DEMO.coordinator);
  await page.getByRole("link", { name: "Sign out" }).click();
  await page.getByRole("button", { name: "Sign out now" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto("/dashboard");
  await expect(page).toHaveURL(/\/sign-in/);
});
