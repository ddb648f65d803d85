import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect, test, type Page } from "@playwright/test";
import { generatePacket } from "../support/packets";
import { DEMO, listProjectsAs, signIn } from "../support/session";

const generate = generatePacket;

async function download(page: Page, card: ReturnType<Page["getByTestId"]>, revision: number) {
  const [file] = await Promise.all([
    page.waitForEvent("download"),
    card
      .getByTestId("packet-revision")
      .filter({ hasText: `Rev ${revision}` })
      .getByRole("link", { name: "Download PDF" })
      .click(),
  ]);
  const target = path.join(mkdtempSync(path.join(tmpdir(), "ohmstead-")), file.suggestedFilename());
  await file.saveAs(target);
  return target;
}

test("coordinator generates both packets, downloads them, and regenerates after a design change", async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, DEMO.coordinator);
  const [project] = await listProjectsAs(page, { q: "Rafael Quintero-Bask" });
  await page.goto(`/projects/${project.id}/documents`);

  const permit = await generate(page, "permit", 1);
  // The bar reported the worker's real steps on the way, and never went back.
  const seen = permit.seenProgress;
  expect(
    seen.some(
      (s) =>
        s.value > 0 &&
        s.value < 100 &&
        /^(Drawing sheet \d+ of \d+|Reading data sheet|Putting \d+ sheets|Storing the PDF|Checking the stored copy)/.test(s.step),
    ),
    JSON.stringify(seen),
  ).toBe(true);
  seen.slice(1).forEach((s, i) => expect(s.value, JSON.stringify(seen)).toBeGreaterThanOrEqual(seen[i]!.value));
  const interconnection = await generate(page, "interconnection", 1);

  const permitPdf = await download(page, permit, 1);
  expect(readFileSync(permitPdf).subarray(0, 5).toString()).toBe("%PDF-");
  expect(path.basename(permitPdf)).toMatch(/permit-rev1\.pdf$/);
  const interconnectionPdf = await download(page, interconnection, 1);
  expect(readFileSync(interconnectionPdf).subarray(0, 5).toString()).toBe("%PDF-");

  // The cover of the permit packet as a picture (pdftoppm from poppler-utils): it must not be blank.
  const out = path.join(path.dirname(permitPdf), "cover");
  const render = spawnSync("pdftoppm", ["-png", "-r", "40", "-f", "1", "-l", "1", "-singlefile", permitPdf, out]);
  expect(render.status).toBe(0);
  expect(statSync(`${out}.png`).size).toBeGreaterThan(20_000);
  await test.info().attach("permit-cover.png", { path: `${out}.png`, contentType: "image/png" });

  // Change the design: a longer home run.
  await page.goto(`/projects/${project.id}/design`);
  await page.getByRole("button", { name: /4\. Conductor runs/ }).click();
  const before = await page.getByTestId("save-state").textContent();
  await page.getByLabel("Length").nth(2).fill("52");
  await expect(page.getByTestId("save-state")).not.toHaveText(before ?? "", { timeout: 15_000 });
  await expect(page.getByTestId("save-state")).toHaveText(/Saved, revision \d+/, { timeout: 15_000 });

  await page.goto(`/projects/${project.id}/documents`);
  const again = await generate(page, "permit", 2);
  const rev2 = again.getByTestId("packet-revision").filter({ hasText: "Rev 2" });
  await rev2.getByText(/What changed since Rev 1/).click();
  await expect(rev2.getByTestId("packet-changes")).toContainText("52");
  writeFileSync(path.join(path.dirname(permitPdf), "page.png"), await page.screenshot({ fullPage: true }));
  await test.info().attach("documents-page.png", { path: path.join(path.dirname(permitPdf), "page.png"), contentType: "image/png" });
});

test("installer sees the packets of an assigned project but cannot generate", async ({ page }) => {
  await signIn(page, DEMO.installer);
  const [mine] = await listProjectsAs(page);
  await page.goto(`/projects/${mine.id}/documents`);
  await expect(page.getByTestId("packet-permit")).toBeVisible();
  await expect(page.getByRole("button", { name: /Generate Rev/ })).toHaveCount(0);
  const post = await page.request.post(`/api/v1/projects/${mine.id}/packets`, { data: { kind: "permit" } });
  expect(post.status()).toBe(403);
});
