import { expect, type Page } from "@playwright/test";

/** Generates a packet revision on the Documents page through the real worker and waits until it is ready. */
export async function generatePacket(page: Page, kind: "permit" | "interconnection", revision: number) {
  const card = page.getByTestId(`packet-${kind}`);
  await card.getByRole("button", { name: `Generate Rev ${revision}` }).click();
  await expect(card.getByRole("progressbar")).toBeVisible();
  await expect(card.getByTestId("packet-revision").filter({ hasText: `Rev ${revision}` })).toBeVisible({ timeout: 60_000 });
  return card;
}
