import { expect, test } from "@playwright/test";
import { copyProjectWithDesign } from "../support/projects";
import { DEMO, listProjectsAs, signIn } from "../support/session";

test("coordinator sees the design's checks on the first paint, before any script runs, and live once they edit", async ({
  page,
  browser,
}) => {
  await signIn(page, DEMO.coordinator);
  const [source] = await listProjectsAs(page, { q: "Tobias Wrenhall" });
  const stamp = Date.now().toString(36);
  // Thirty modules in series on a dwelling: far over the 600 V limit of NEC 690.7 whatever the module.
  const { id } = await copyProjectWithDesign(page.request, {
    sourceId: source.id,
    customerName: `First Paint ${stamp}`,
    street: `${stamp} Lantern Lane`,
    edit: (draft) => ({
      ...draft,
      array: { ...draft.array, strings: draft.array.strings.map((s, i) => (i ? s : { ...s, modulesInSeries: "30" })) },
    }),
  });

  // Without JavaScript the page shows what the server rendered: the review is already there.
  const still = await browser.newContext({
    javaScriptEnabled: false,
    baseURL: new URL(page.url()).origin,
    storageState: await page.context().storageState(),
  });
  const html = await still.newPage();
  await html.goto(`/projects/${id}/design`);
  const served = html.getByTestId("review-panel");
  await expect(served).toHaveAttribute("data-review", "fail");
  await expect(served.getByTestId("check").filter({ hasText: "String S1 maximum voltage" })).toHaveAttribute("data-status", "fail");
  await expect(html.getByText("Complete these to run the whole review")).toHaveCount(0);
  await still.close();

  // With it, the same checks stand from the first paint, and every change is checked live.
  await page.goto(`/projects/${id}/design`);
  const review = page.getByTestId("review-panel");
  const stringCheck = review.getByTestId("check").filter({ hasText: "String S1 maximum voltage" });
  await expect(stringCheck).toHaveAttribute("data-status", "fail");
  const suggested = (await stringCheck.textContent())?.match(/Use at most (\d+) modules in this string/)?.[1];
  expect(Number(suggested)).toBeGreaterThan(0);
  await page.getByRole("button", { name: /2\. Arrays and strings/ }).click();
  await page.getByLabel("In series").first().fill(suggested!);
  await expect(review.getByTestId("check").filter({ hasText: "String S1 maximum voltage" })).toHaveCount(0);
  await page.getByRole("button", { name: /6\. Review/ }).click();
  await expect(page.getByTestId("review-panel").getByTestId("check").filter({ hasText: "String S1 maximum voltage" })).toHaveAttribute(
    "data-status",
    "pass",
  );
});
