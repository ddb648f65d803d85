import { expect, test } from "@playwright/test";
import { DEMO, signIn } from "../support/session";

test("admin invites a user who sets a password from the e-mailed link and signs in", async ({ page, browser }) => {
  const email = `wynn.${Date.now()}@quillmoor.example`;
  await signIn(page, DEMO.admin);
  await page.goto("/settings/users");
  await page.getByLabel("Name").fill("Wynn Hargreave");
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Role", { exact: true }).selectOption("installer");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText(`Invitation queued for ${email}.`)).toBeVisible();
  await expect(page.getByTestId(`user-${email}`)).toContainText("Invited, no password yet");

  // The same address twice is refused next to the field.
  await page.getByLabel("Name").fill("Wynn Again");
  await page.getByLabel("E-mail address").fill(email);
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText("Someone in your organization already has this e-mail address.")).toBeVisible();

  // The worker sends the outbox every second or two: look again until the message is there.
  await page.goto("/mailbox");
  const message = page.getByTestId("caught-message").filter({ hasText: email }).first();
  await expect(async () => {
    await page.reload();
    await expect(message).toBeVisible({ timeout: 2_000 });
  }).toPass({ timeout: 30_000 });
  await expect(message).toContainText("You are invited to Quillmoor Solar Electric on Ohmstead");
  const mailed = await message.getByRole("link", { name: /\/invitation\// }).getAttribute("href");

  // The new user, in a browser of their own, follows the link.
  const context = await browser.newContext();
  const invitee = await context.newPage();
  await invitee.goto(mailed!);
  await expect(invitee.getByRole("heading", { name: "Welcome, Wynn Hargreave" })).toBeVisible();
  const invitationUrl = invitee.url();

  await invitee.getByLabel("New password").fill("spindle-ridge-42");
  await invitee.getByLabel("Repeat the password").fill("spindle-ridge-41");
  await invitee.getByRole("button", { name: "Set password and sign in" }).click();
  await expect(invitee.getByText("The two passwords differ")).toBeVisible();

  await invitee.getByLabel("Repeat the password").fill("spindle-ridge-42");
  await invitee.getByRole("button", { name: "Set password and sign in" }).click();
  await expect(invitee).toHaveURL(/\/dashboard$/);
  await expect(invitee.getByTestId("viewer")).toContainText("Wynn Hargreave");

  // The link works once.
  await invitee.goto(invitationUrl);
  await expect(invitee.getByRole("heading", { name: "Link not valid" })).toBeVisible();

  // And the password works for a fresh sign-in.
  const fresh = await (await browser.newContext()).newPage();
  await signIn(fresh, email, "spindle-ridge-42");
  await expect(fresh.getByTestId("viewer")).toContainText("Installer");

  await page.goto("/settings/users");
  await expect(page.getByTestId(`user-${email}`)).toContainText("Active");
});

test("admin deactivates a user, who can then no longer sign in", async ({ page, browser }) => {
  await signIn(page, DEMO.admin);
  await page.goto("/settings/users");
  const row = page.getByTestId(`user-${DEMO.otherInstaller}`);
  await row.getByRole("button", { name: "Deactivate" }).click();
  await expect(row).toContainText("Deactivated");

  const other = await (await browser.newContext()).newPage();
  await other.goto("/sign-in");
  await other.getByLabel("E-mail address").fill(DEMO.otherInstaller);
  await other.getByLabel("Password").fill("ohmstead-demo");
  await other.getByRole("button", { name: "Sign in" }).click();
  await expect(other.getByTestId("form-message")).toContainText("This account has been deactivated");

  await row.getByRole("button", { name: "Reactivate" }).click();
  await expect(row).toContainText("Active");
});
