import { expect, test, type Page } from "@playwright/test";
import { DEMO, listProjectsAs, pageFor, signIn } from "../support/session";

/** Signs the coordinator in and opens the design of a demo project still in draft; returns the live review panel. */
async function openDraftDesign(page: Page, customerName: string) {
  await signIn(page, DEMO.coordinator);
  const [project] = await listProjectsAs(page, { q: customerName });
  expect(project.stage).toBe("draft");
  await page.goto(`/projects/${project.id}/design`);
  return { project, review: page.getByTestId("review-panel") };
}

test("coordinator builds a design step by step and fixes a failing check by its suggestion", async ({ page }) => {
  // A draft project in Brackenford: NEC 2023, record low −24 °C, 100 A service.
  const { project, review } = await openDraftDesign(page, "Imogen Halvorsen");
  await expect(review).toHaveAttribute("data-review", "incomplete");

  // 1. Equipment
  await page.getByLabel("PV module").selectOption({ label: "Larkspur LK-405M-54H — 405 W" });
  await page.getByLabel("Inverter line inv-1").selectOption({ label: "Quillon QS-7600 — string, 7600 W AC" });
  await page.getByLabel("Module-level device").selectOption({ label: "Stavemoor SR-1 Shutdown Unit — shutdown device" });
  await page.getByRole("button", { name: "Next", exact: true }).click();

  // 2. Arrays and strings: one string of 15, one too many for −24 °C.
  await page.getByLabel("Tilt").fill("22");
  await page.getByLabel("Modules", { exact: true }).fill("15");
  await page.getByLabel("Attachments").fill("20");
  await page.getByLabel("Racking weight").fill("120");
  await page.getByLabel("In series").fill("15");
  await page.getByRole("button", { name: "Next", exact: true }).click();

  // 3. Service: a bad entry is shown next to its field and kept; the 100 A panel takes a supply-side connection
  // through a fused disconnect beside the meter (705.11), with rapid shutdown started outside (690.12(C)).
  await page.getByLabel("PV breaker (or supply-side OCPD)").fill("forty");
  await expect(page.getByRole("alert").filter({ hasText: "PV breaker must be a number" })).toBeVisible();
  await page.getByLabel("PV breaker (or supply-side OCPD)").fill("40");
  await page.getByLabel("Point of connection").selectOption("supply-side");
  await page.getByLabel("Size", { exact: true }).selectOption("6");
  await page.getByLabel("Material", { exact: true }).selectOption("Cu");
  await page.getByLabel("Length to the overcurrent device").fill("5");
  await page.getByLabel("PV system disconnect").selectOption("fused-switch");
  await page.getByLabel("Switch rating").fill("60");
  await page.getByLabel("Switch voltage rating").fill("240");
  await page.getByLabel("Readily accessible", { exact: true }).selectOption("yes");
  await page.getByLabel("Rapid shutdown started by").selectOption("pv-disconnect");
  await page.getByLabel("Initiator outside, readily accessible").selectOption("yes");
  await page.getByRole("button", { name: "Next", exact: true }).click();

  // 4. Conductor runs
  await page.getByLabel("Length").nth(0).fill("60");
  await page.getByLabel("Length").nth(1).fill("30");

  // Coefficient method, NEC 2023 690.7(A)(1): 37.2 V × (1 + (−24 − 25)(−0.27 %/°C)) = 42.12 V per module;
  // 15 × 42.12 = 631.8 V is above the 600 V dwelling limit, 14 × 42.12 = 589.7 V is within it.
  const stringCheck = review.getByTestId("check").filter({ hasText: "String S1 maximum voltage" });
  await expect(stringCheck).toHaveAttribute("data-status", "fail");
  await expect(stringCheck).toContainText("NEC 2023 690.7(A)");
  await expect(stringCheck).toContainText("Suggested: Use at most 14 modules in this string.");

  // Follow the suggestion.
  await page.getByRole("button", { name: /2\. Arrays and strings/ }).click();
  await page.getByLabel("In series").fill("14");
  await page.getByLabel("Modules", { exact: true }).fill("14");
  await expect(review).toHaveAttribute("data-review", "pass");

  await page.getByRole("button", { name: /6\. Review/ }).click();
  const full = page.getByTestId("review-panel");
  await expect(full.getByTestId("check").filter({ hasText: "String S1 maximum voltage" })).toHaveAttribute("data-status", "pass");
  await expect(page.getByTestId("warning-label").first()).toBeVisible();
  // Labels in the code's words (NEC 2023 690.12(D), from memory) with our explanation beside them.
  const rsdSwitch = page.getByTestId("warning-label").filter({ hasText: "RAPID SHUTDOWN SWITCH FOR SOLAR PV SYSTEM" });
  await expect(rsdSwitch).toContainText("Wording prescribed by NEC 2023 690.12(D).");
  await expect(rsdSwitch.getByTestId("label-explanation")).toContainText("What it means:");
  await expect(page.getByText("PV source circuits stay energized in daylight")).toBeVisible();
  await expect(page.getByTestId("save-state")).toHaveText(/Saved, revision \d+/, { timeout: 15_000 });

  // Reloading shows the same design: nothing typed was lost.
  await page.reload();
  await page.getByRole("button", { name: /2\. Arrays and strings/ }).click();
  await expect(page.getByLabel("In series")).toHaveValue("14");
  await page.getByRole("button", { name: /3\. Service/ }).click();
  await expect(page.getByLabel("Point of connection")).toHaveValue("supply-side");

  // The saved review is the one the server computes.
  const saved = await (await page.request.get(`/api/v1/projects/${project.id}/review`)).json();
  expect(JSON.stringify(saved)).toContain("pass");
});

test("installer sees an assigned project's design read-only", async ({ browser }) => {
  const installer = await pageFor(browser, DEMO.installer);
  const mine = (await listProjectsAs(installer)).find((p) => p.stage !== "draft");
  await installer.goto(`/projects/${mine!.id}/design`);
  await expect(installer.getByText("Read only: your role cannot change the design.")).toBeVisible();
  await expect(installer.getByLabel("PV module")).toBeDisabled();
  const put = await installer.request.put(`/api/v1/projects/${mine!.id}/design`, { data: {} });
  expect(put.status()).toBe(403);
});

test("coordinator sees a 25-module string flagged on step 2, a missing length named, and two strings in one raceway scheduled as one run", async ({
  page,
}) => {
  // A draft project in Wendle County: NEC 2017, record low −28 °C, 200 A service.
  const { review } = await openDraftDesign(page, "Wilhelmina Coe");

  await page.getByLabel("PV module").selectOption({ label: "Larkspur LK-405M-54H — 405 W" });
  await page.getByLabel("Inverter line inv-1").selectOption({ label: "Quillon QS-7600 — string, 7600 W AC" });
  await page.getByLabel("Module-level device").selectOption({ label: "Stavemoor SR-1 Shutdown Unit — shutdown device" });
  await page.getByRole("button", { name: "Next", exact: true }).click();

  // Step 2, nothing else entered yet: 690.7(A)(1), 37.2 V × [1 + (−28 − 25)(−0.27 %/°C)] = 42.52 V per module;
  // 25 × 42.52 = 1063 V, far above the 600 V dwelling limit. The review is still incomplete, yet the string fails.
  await page.getByLabel("In series").fill("25");
  await expect(review).toHaveAttribute("data-review", "incomplete");
  const stringCheck = review.getByTestId("check").filter({ hasText: "String S1 maximum voltage" });
  await expect(stringCheck).toHaveAttribute("data-status", "fail");
  await expect(stringCheck).toContainText("NEC 2017 690.7(A)");
  await expect(stringCheck).toContainText("Suggested: Use at most 14 modules in this string.");

  // Two strings of 11 on the inverter's two inputs, 22 modules on the roof.
  await page.getByLabel("In series").fill("11");
  await page.getByRole("button", { name: "Add a string" }).click();
  await page.getByLabel("In series").nth(1).fill("11");
  await page.getByLabel("MPPT").nth(1).fill("2");
  await page.getByLabel("Tilt").fill("20");
  await page.getByLabel("Modules", { exact: true }).fill("22");
  await page.getByLabel("Attachments").fill("28");
  await page.getByLabel("Racking weight").fill("160");
  // 11 × 42.52 = 467.7 V: the live panel lists only what fails or warns, and the string no longer does.
  await expect(stringCheck).toHaveCount(0);

  await page.getByRole("button", { name: /3\. Service/ }).click();
  await page.getByLabel("PV breaker (or supply-side OCPD)").fill("40");
  await page.getByLabel("Rapid shutdown started by").selectOption("service-disconnect");
  await page.getByLabel("Initiator outside, readily accessible").selectOption("yes");

  // Step 4: both strings share the first run's raceway; its length is still missing and the review names the run.
  await page.getByRole("button", { name: /4\. Conductor runs/ }).click();
  await page.getByLabel("Carries").first().selectOption("dc:all");
  await page.getByLabel("Length").nth(1).fill("30");
  await expect(review.getByTestId("missing-entries")).toContainText('Run "Array to junction box": enter the length');
  await page.getByLabel("Length").first().fill("60");
  await expect(review).not.toHaveAttribute("data-review", "incomplete");
  // Counted from what the raceway carries: two circuits, four current-carrying conductors.
  await expect(page.getByTestId("conductor-run").first()).toContainText("Blank: 4, counted from its circuits");

  await page.getByRole("button", { name: /6\. Review/ }).click();
  const row = page.getByTestId("schedule-row").filter({ hasText: "Array to junction box" });
  await expect(row).toContainText("Every DC string (2 circuits)");
  await expect(row).toContainText("4 × 10 AWG Cu PV wire");
  await expect(page.getByTestId("schedule-row")).toHaveCount(2);
  // Each string keeps its own 1.25 × 13.85 = 17.31 A; the four conductors together take Table 310.15(B)(3)(a)'s 0.8 (2017).
  const ampacity = page.getByTestId("check").filter({ hasText: 'Run "Array to junction box" ampacity where installed' });
  await expect(ampacity).toContainText("4 current-carrying conductors together × 0.8");
  await expect(ampacity).toContainText("17.31 A");
  await expect(page.getByTestId("review-panel")).toHaveAttribute("data-review", "pass");
  await expect(page.getByTestId("save-state")).toHaveText(/Saved, revision \d+/, { timeout: 15_000 });
});
