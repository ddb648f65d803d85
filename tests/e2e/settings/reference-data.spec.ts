import { expect, test } from "@playwright/test";
import { DEMO, pageFor } from "../support/session";

test("admin adds a jurisdiction and a utility with its accepted grid profiles, and a coordinator reads them", async ({ browser }) => {
  const tag = Date.now().toString(36);
  const admin = await pageFor(browser, DEMO.admin);

  await admin.goto("/settings/jurisdictions");
  await admin.getByLabel("Authority").fill(`Town of Ivel Crossing ${tag}`);
  await admin.getByLabel("State").fill("co");
  await admin.getByLabel("Adopted NEC edition").selectOption("2020");
  await admin.getByLabel("Record low (°C)").fill("15");
  await admin.getByLabel("High design temperature (°C)").fill("12");
  await admin.getByRole("button", { name: "Add jurisdiction" }).click();
  await expect(admin.getByText("The high design temperature must be above the record low")).toBeVisible();
  await expect(admin.getByLabel("Authority")).toHaveValue(`Town of Ivel Crossing ${tag}`);
  await admin.getByLabel("Record low (°C)").fill("-26");
  await admin.getByLabel("High design temperature (°C)").fill("33");
  await admin.getByRole("button", { name: "Add jurisdiction" }).click();
  const row = admin.getByRole("row", { name: new RegExp(`Ivel Crossing ${tag}`) });
  await expect(row).toContainText("2020");
  await expect(row).toContainText("-26 °C");

  await admin.goto("/settings/utilities");
  await admin.getByLabel("Utility", { exact: true }).fill(`Ivel Valley Power ${tag}`);
  await admin.getByLabel("Service voltages").fill("120/240 V split-phase\n120/208 V three-phase");
  await admin.getByLabel("Accepted grid profiles").fill("IEEE 1547-2018 Category B, utility's default settings");
  await admin.getByRole("button", { name: "Add utility" }).click();
  await admin.getByRole("link", { name: `Edit Ivel Valley Power ${tag}` }).click();
  await expect(admin.getByLabel("Service voltages")).toHaveValue("120/240 V split-phase\n120/208 V three-phase");
  await expect(admin.getByLabel("Accepted grid profiles")).toHaveValue("IEEE 1547-2018 Category B, utility's default settings");
  await admin
    .getByLabel("Accepted grid profiles")
    .fill("IEEE 1547-2018 Category B, utility's default settings\n\nIEEE 1547-2018 Category B, volt-var on");
  await admin.getByRole("button", { name: "Save changes" }).click();
  await expect(admin).toHaveURL(/\/settings\/utilities$/);

  const coordinator = await pageFor(browser, DEMO.coordinator);
  await coordinator.goto("/settings/utilities");
  const utilityRow = coordinator.getByRole("row", { name: new RegExp(`Ivel Valley Power ${tag}`) });
  await expect(utilityRow.getByRole("cell").nth(2).getByRole("listitem")).toHaveText([
    "IEEE 1547-2018 Category B, utility's default settings",
    "IEEE 1547-2018 Category B, volt-var on",
  ]);
  await expect(coordinator.getByRole("link", { name: `Edit Ivel Valley Power ${tag}` })).toHaveCount(0);
  await expect(coordinator.getByRole("button", { name: "Add utility" })).toHaveCount(0);
  await coordinator.goto("/settings/jurisdictions");
  await expect(coordinator.getByRole("row", { name: new RegExp(`Ivel Crossing ${tag}`) })).toBeVisible();
  await expect(coordinator.getByRole("button", { name: "Add jurisdiction" })).toHaveCount(0);
});
