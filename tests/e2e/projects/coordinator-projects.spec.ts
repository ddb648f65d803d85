import { expect, test } from "@playwright/test";
import { DEMO, signIn } from "../support/session";

test("coordinator creates a project, finds it by search and moves its stage", async ({ page }) => {
  await signIn(page, DEMO.coordinator);
  await expect(page.getByTestId("project-row").first()).toBeVisible();

  await page.getByRole("link", { name: "New project" }).first().click();
  await expect(page.getByRole("heading", { name: "New project" })).toBeVisible();

  // A bad submit keeps what was typed and puts each error next to its field.
  await page.getByLabel("Customer name").fill("Juniper Ashvale");
  await page.getByLabel("ZIP code").fill("123");
  await page.getByRole("button", { name: "Create project" }).click();
  await expect(page.getByText("Use a 5-digit ZIP code")).toBeVisible();
  await expect(page.getByText("Enter the street address")).toBeVisible();
  await expect(page.getByLabel("Customer name")).toHaveValue("Juniper Ashvale");

  await page.getByLabel("Street address").fill("17 Spindle Ridge Rd");
  await page.getByLabel("City or town").fill("Brackenford");
  await page.getByLabel("State").fill("CO");
  await page.getByLabel("ZIP code").fill("80913");
  await page.getByLabel("Authority having jurisdiction (AHJ)").selectOption({ label: "City of Brackenford Building Division (NEC 2023)" });
  await page.getByLabel("Utility", { exact: true }).selectOption({ label: "Brackenford Municipal Light & Power" });
  await page.getByLabel("Utility account number").fill("BL-9900123");
  await page.getByLabel("Main breaker (A)").fill("200");
  await page.getByLabel("Busbar rating (A)").fill("225");
  await page.getByRole("button", { name: "Create project" }).click();

  await expect(page.getByRole("heading", { name: "Juniper Ashvale" })).toBeVisible();
  await expect(page.getByText("17 Spindle Ridge Rd, Brackenford, CO 80913")).toBeVisible();
  await expect(page.getByRole("region", { name: "Current stage" })).toContainText("Draft");

  // Found by the utility account number from the dashboard.
  await page.getByRole("link", { name: "Projects", exact: true }).click();
  await page.getByLabel("Search").fill("BL-9900123");
  await expect(page.getByTestId("project-row")).toHaveCount(1);
  await page.getByRole("link", { name: "Juniper Ashvale" }).click();

  await page.getByLabel("Move to stage").selectOption("design_checked");
  await page.getByLabel("Note").fill("All checks pass with the 225 A busbar");
  await page.getByRole("button", { name: "Change stage" }).click();
  await expect(page.getByRole("region", { name: "Current stage" })).toContainText("Design checked");
  await expect(page.getByTestId("stage-timeline")).toContainText("All checks pass with the 225 A busbar");
  await expect(page.getByTestId("stage-timeline")).toContainText("Dana Okafor");

  // The stage filter on the dashboard finds it in its new stage.
  await page.getByRole("link", { name: "Projects", exact: true }).click();
  await page.getByLabel("Stage", { exact: true }).selectOption("design_checked");
  await expect(page.getByRole("link", { name: "Juniper Ashvale" })).toBeVisible();
});
