import { expect, type Page } from "@playwright/test";

export type SeenProgress = { value: number; step: string };

/**
 * Generates a packet revision on the Documents page through the real worker and waits until it is ready.
 * Returns the card and every state its progress bar showed on the way (recorded in the page as it changed).
 */
export async function generatePacket(page: Page, kind: "permit" | "interconnection", revision: number) {
  const card = page.getByTestId(`packet-${kind}`);
  await card.evaluate((element) => {
    const seen: { value: number; step: string }[] = [];
    const record = () => {
      const bar = element.querySelector('[role="progressbar"]');
      const step = element.querySelector('[data-testid="packet-step"]')?.textContent ?? "";
      if (!bar) return;
      const value = Number(bar.getAttribute("aria-valuenow"));
      const last = seen.at(-1);
      if (!last || last.value !== value || last.step !== step) seen.push({ value, step });
    };
    new MutationObserver(record).observe(element, { subtree: true, childList: true, characterData: true, attributes: true });
    (element as unknown as { seenProgress: typeof seen }).seenProgress = seen;
  });
  await card.getByRole("button", { name: `Generate Rev ${revision}` }).click();
  await expect(card.getByRole("progressbar")).toBeVisible();
  await expect(card.getByTestId("packet-revision").filter({ hasText: `Rev ${revision}` })).toBeVisible({ timeout: 60_000 });
  const seen = await card.evaluate((element) => (element as unknown as { seenProgress: SeenProgress[] }).seenProgress);
  return Object.assign(card, { seenProgress: seen });
}
