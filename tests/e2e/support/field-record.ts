import { expect, type Locator, type Page } from "@playwright/test";

// Steps of the field record as a crew enters them, shared by the field and the whole-job journeys.

/** Types a reading and leaves the field, as a thumb on a phone does. */
export async function enter(input: Locator, value: string) {
  await input.fill(value);
  await input.blur();
}

export const byId = (page: Page, id: string) => page.locator(`[id="${id}"]`);

/** Polarity, Voc at the temperature typed, and insulation for every string, from what the page expects. */
export async function testStringsBeforeEnergizing(phone: Page) {
  const step = phone.getByTestId("step-before-energizing");
  if ((await step.getByLabel("Temperature during the Voc tests (°C)").count()) > 0)
    await enter(step.getByLabel("Temperature during the Voc tests (°C)"), "41");
  for (const group of await step.locator("fieldset[data-testid^=string-tests-]").all()) {
    await group.getByLabel("Correct (+ to +)").check();
    const voc = group.locator("input[id$='.vocV']");
    if ((await voc.count()) > 0) {
      await expect(voc).toHaveAttribute("data-expected-v", /\d/);
      await enter(voc, (Math.round(Number(await voc.getAttribute("data-expected-v")) * 10) / 10 - 1.5).toFixed(1));
    }
    await enter(group.locator("input[id$='.insulationMohm']"), "240");
  }
  await expect(step.locator("[data-testid^=result-string-][data-status=pass]")).toHaveCount(
    await step.locator("[data-testid^=result-string-]").count(),
  );
}

export async function shutDownStrings(phone: Page, belowExpectedV: number) {
  const strings = phone.getByTestId("step-shutdown").locator("input[data-expected-v]");
  for (let i = 0; i < (await strings.count()); i++) {
    const expectedV = Number(await strings.nth(i).getAttribute("data-expected-v"));
    await enter(strings.nth(i), (expectedV - belowExpectedV).toFixed(1));
  }
}

export async function acSideAndRapidShutdown(phone: Page) {
  await enter(phone.getByLabel("AC voltage (V)"), "241");
  const power = phone.locator("#firstPowerW");
  await enter(power, String(Math.round(Number(await power.getAttribute("data-rating-w")) * 0.62)));
  await phone.locator("#firstPowerTime").fill("12:40");
  await enter(byId(phone, "rapidShutdown.measuredV"), "11");
  await enter(byId(phone, "rapidShutdown.seconds"), "8");
}

/**
 * The storage part of a record whose design has batteries, as the design says it was built: the charge shown,
 * the backup test passed, and the power control setting and export limit read back as designed. Nothing
 * happens on a PV-only record.
 */
export async function recordStorageIfAny(phone: Page) {
  const step = phone.getByTestId("step-storage");
  if ((await step.count()) === 0) return;
  await enter(byId(phone, "storage.stateOfChargePct"), "80");
  if ((await step.getByRole("group", { name: "Grid supply opened" }).count()) > 0) {
    await step.getByRole("group", { name: "Grid supply opened" }).getByLabel("Yes").check();
    await step.getByRole("group", { name: "Backup loads panel stayed on" }).getByLabel("Yes").check();
    await enter(byId(phone, "storage.transferSeconds"), "0");
  }
  for (const [id, unit] of [
    ["storage.pcsSettingA", "A"],
    ["storage.exportLimitKw", "kW"],
  ] as const) {
    if ((await byId(phone, id).count()) === 0) continue;
    const hint = (await step.getByText(/^Designed: /).allTextContents()).find((t) => t.includes(` ${unit}`))!;
    await enter(byId(phone, id), hint.match(/Designed: ([\d.]+)/)![1]!);
  }
}

/** Every step of a record with string tests and no module-level devices that report, then "Mark complete". */
export async function completeFieldRecord(page: Page) {
  await testStringsBeforeEnergizing(page);
  const units = page.getByTestId("step-inverter").locator("fieldset");
  for (let i = 0; i < (await units.count()); i++) {
    const unit = units.nth(i);
    if ((await unit.locator("input[id$='.serial']").count()) === 0) continue;
    await enter(unit.locator("input[id$='.serial']"), `WK${i}0730499`);
    await enter(unit.locator("input[id$='.cardSerial']"), `WK${i}0730499`);
    await unit.getByLabel(/Activated with this card's key/).check();
  }
  const choice = page.getByLabel("Profile set on the inverter");
  const accepted = (await choice.locator("option").allTextContents()).filter((o) => o !== "Choose…" && !o.startsWith("Other"));
  await choice.selectOption({ label: accepted[0]! });
  await shutDownStrings(page, 0.2);
  await acSideAndRapidShutdown(page);
  await expect(page.getByTestId("completion-counts")).toHaveText("0 failing · 0 to record");
  await page.getByRole("button", { name: "Mark complete" }).click();
  await expect(page.getByTestId("save-state")).toHaveText("Saved and marked complete.");
}
