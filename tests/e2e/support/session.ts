import { expect, type Browser, type Page } from "@playwright/test";
import { DEMO_SIGN_INS } from "../../../lib/seed/demo-sign-ins.mjs";

export const DEMO = {
  admin: "marta@quillmoor.example",
  coordinator: "dana@quillmoor.example",
  installer: "luis@quillmoor.example",
  otherInstaller: "tomasz@quillmoor.example",
  rivalAdmin: "rhea@harrowgate.example",
} as const;

export async function signIn(page: Page, email: string, password: string = DEMO_SIGN_INS.password) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/dashboard$/);
}

/** A signed-in page in a fresh browser context, so several people can act in one test. */
export async function pageFor(browser: Browser, email: string) {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, email);
  return page;
}

type ProjectRow = { id: string; customerName: string; installer: { id: string } | null; stage: string };

/** The viewer's projects through the JSON API, with the page's own session cookie. */
export async function listProjectsAs(page: Page, params: Record<string, string> = {}): Promise<ProjectRow[]> {
  const res = await page.request.get(`/api/v1/projects?${new URLSearchParams({ pageSize: "100", ...params })}`);
  expect(res.status()).toBe(200);
  return (await res.json()).items;
}

/** The local mailbox as the first company's admin sees it: only mail that company sent. */
export async function mailboxFor(browser: Browser, email: string = DEMO.admin) {
  const page = await pageFor(browser, email);
  await page.goto("/mailbox");
  return page;
}
