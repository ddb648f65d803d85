import ICAL from "ical.js";
import { readFile } from "node:fs/promises";
import { expect, request, test } from "@playwright/test";
import { DEMO, pageFor } from "../support/session";

// The coordinator's desk, the digest choice and inspections in the calendar (issue 15), on the demo as
// seeded the day the run began: it always has an overdue or due follow-up and inspections in the coming days.

test("coordinator starts the day on the desk and opens a filing from it", async ({ browser }) => {
  const page = await pageFor(browser, DEMO.coordinator);
  const desk = page.getByTestId("today-desk");
  await expect(desk.getByRole("heading", { level: 1 })).toContainText("Today");
  const followUps = page.getByTestId("desk-followUps").getByTestId("desk-row");
  await expect(followUps.first()).toContainText("Follow up on the permit");
  await expect(page.getByTestId("desk-inspections").getByTestId("desk-row").first()).toContainText("Final inspection");
  // The list of every project is still below it.
  await expect(page.getByRole("heading", { name: "All projects" })).toBeVisible();

  const link = followUps.first().getByRole("link");
  const href = (await link.getAttribute("href"))!;
  expect(href).toMatch(/^\/projects\/[0-9a-f-]{36}\/filings#filing-[0-9a-f-]{36}$/);
  await link.click();
  await expect(page).toHaveURL(new RegExp(`${href.replace(/[/#]/g, "\\$&")}$`));
  await expect(page.locator(`#${href.split("#")[1]}`)).toBeVisible();
  await page.context().close();
});

test("installer's start page has no desk", async ({ browser }) => {
  const page = await pageFor(browser, DEMO.installer);
  await expect(page.getByRole("heading", { name: "Projects", level: 1 })).toBeVisible();
  await expect(page.getByTestId("today-desk")).toHaveCount(0);
  await page.context().close();
});

test("admin opens a booked inspection from the desk and downloads it as a calendar event", async ({ browser }) => {
  const page = await pageFor(browser, DEMO.admin);
  await page.getByTestId("desk-inspections").getByTestId("desk-row").first().getByRole("link").click();
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("inspection-ics").first().click()]);
  expect(download.suggestedFilename()).toMatch(/^inspection-project-\d+-\d{4}-\d{2}-\d{2}\.ics$/);
  const text = await readFile((await download.path())!, "utf8");
  const events = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent");
  expect(events).toHaveLength(1);
  expect(String(events[0]!.getFirstPropertyValue("summary"))).toContain("Final inspection");
  await page.context().close();
});

test("installer makes a private calendar address, a calendar reads it without signing in, and it stops once turned off", async ({
  browser,
  baseURL,
}) => {
  const page = await pageFor(browser, DEMO.installer);
  await page.getByTestId("viewer").click();
  await expect(page).toHaveURL(/\/profile$/);
  await page.getByRole("button", { name: /Make (my calendar address|a new address)/ }).click();
  const address = await page.getByLabel("Calendar address").inputValue();
  expect(address).toMatch(/\/calendar\/[A-Za-z0-9_-]{43}$/);
  await expect(page.getByTestId("calendar-feed-status")).toContainText("Your address was made on");

  const calendar = await request.newContext({ baseURL });
  const feed = await calendar.get(new URL(address).pathname);
  expect(feed.status()).toBe(200);
  expect(feed.headers()["content-type"]).toContain("text/calendar");
  expect(feed.headers()["x-robots-tag"]).toContain("noindex");
  const parsed = new ICAL.Component(ICAL.parse(await feed.text()));
  expect(parsed.getFirstPropertyValue("version")).toBe("2.0");

  page.once("dialog", (dialog) => dialog.accept());
  await page.getByRole("button", { name: "Turn it off" }).click();
  await expect(page.getByTestId("calendar-feed-status")).toContainText("You have no calendar address.");
  expect((await calendar.get(new URL(address).pathname)).status()).toBe(404);
  await calendar.dispose();
  await page.context().close();
});

test("coordinator turns the morning digest off and on again", async ({ browser }) => {
  const page = await pageFor(browser, DEMO.coordinator);
  await page.goto("/profile");
  const box = page.getByLabel("E-mail me the morning digest");
  await expect(box).toBeChecked();
  await box.uncheck();
  await expect(page.getByText("No more digests")).toBeVisible();
  await page.reload();
  await expect(box).not.toBeChecked();
  await box.check();
  await expect(page.getByText("The digest will come on working mornings.")).toBeVisible();
  await page.context().close();
});
