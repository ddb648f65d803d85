import { expect, test } from "@playwright/test";
import sharp from "sharp";
import { DEMO, listProjectsAs, pageFor } from "../support/session";

// A phone held upright: the field record is laid out for this first.
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true });

const BEFORE_PTO = ["permit_issued", "installed", "inspection_passed", "utility_filed", "utility_approved"];

/** A phone photo: 1600 × 1200 pixels stored sideways with EXIF orientation 6, so upright it is portrait. */
const photo = (hue: number) =>
  sharp({ create: { width: 1600, height: 1200, channels: 3, background: { r: hue, g: 140, b: 90 } } })
    .jpeg({ quality: 80 })
    .withMetadata({ orientation: 6 })
    .toBuffer();

test("installer on a phone sees site photos as thumbnails and removes a wrong one after confirming; the coordinator removes one the crew sent; nobody outside the project reaches them", async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const phone = await pageFor(browser, DEMO.installer);
  const [project] = (await listProjectsAs(phone)).filter((p) => BEFORE_PTO.includes(p.stage));
  expect(project).toBeDefined();
  await phone.goto(`/projects/${project!.id}/field`);

  await phone.getByTestId("upload-site-photo").setInputFiles([
    { name: "roof-east.jpg", mimeType: "image/jpeg", buffer: await photo(200) },
    { name: "wrong-house.jpg", mimeType: "image/jpeg", buffer: await photo(60) },
  ]);
  const tile = (name: string) => phone.getByTestId("uploaded-file").filter({ hasText: name });
  await expect(tile("roof-east.jpg")).toBeVisible();
  await expect(tile("wrong-house.jpg")).toBeVisible();

  // Each photo shows as a thumbnail made on the server: upright, at most 320 pixels on its longer side.
  const thumbnail = tile("roof-east.jpg").getByRole("img", { name: "Site photo: roof-east.jpg" });
  await thumbnail.scrollIntoViewIfNeeded(); // thumbnails load lazily, as they come into view
  await expect.poll(() => thumbnail.evaluate((img: HTMLImageElement) => (img.complete ? img.naturalWidth : 0))).toBeGreaterThan(0);
  const natural = await thumbnail.evaluate((img: HTMLImageElement) => ({ width: img.naturalWidth, height: img.naturalHeight }));
  expect(natural).toEqual({ width: 240, height: 320 });
  const src = (await thumbnail.getAttribute("src"))!;
  expect(src).toMatch(/\/files\/[0-9a-f-]{36}\?size=thumbnail$/);
  const answer = await phone.request.get(src);
  expect(answer.status()).toBe(200);
  expect(answer.headers()).toMatchObject({
    "content-type": "image/jpeg",
    "x-content-type-options": "nosniff",
    "cache-control": "private, max-age=86400",
  });
  expect((await phone.request.get(src.replace("size=thumbnail", "size=huge"))).status()).toBe(422);

  // Nobody outside the project reaches the thumbnail or can remove the photo.
  const fileUrl = src.replace("?size=thumbnail", "");
  for (const outsider of [DEMO.otherInstaller, DEMO.rivalAdmin]) {
    const other = await pageFor(browser, outsider);
    expect((await other.request.get(src)).status(), outsider).toBe(404);
    expect((await other.request.delete(fileUrl)).status(), outsider).toBe(404);
    await other.context().close();
  }
  await test.info().attach("field-uploads-390.png", { body: await phone.screenshot({ fullPage: true }), contentType: "image/png" });

  // Removing asks first; going back keeps the photo.
  await tile("wrong-house.jpg").getByRole("button", { name: "Remove wrong-house.jpg" }).click();
  const dialog = phone.getByRole("dialog", { name: "Remove wrong-house.jpg?" });
  await expect(dialog).toContainText("It cannot be undone.");
  await dialog.getByRole("button", { name: "Go back" }).click();
  await expect(dialog).toBeHidden();
  await expect(tile("wrong-house.jpg")).toBeVisible();
  await tile("wrong-house.jpg").getByRole("button", { name: "Remove wrong-house.jpg" }).click();
  await dialog.getByRole("button", { name: "Remove", exact: true }).click();
  await expect(tile("wrong-house.jpg")).toHaveCount(0);
  await expect(phone.getByTestId("upload-notices")).toContainText("wrong-house.jpg: Removed.");
  await phone.reload();
  await expect(tile("roof-east.jpg")).toBeVisible();
  await expect(tile("wrong-house.jpg")).toHaveCount(0);

  // The coordinator removes the crew's photo too; the file is gone for everyone.
  const office = await pageFor(browser, DEMO.coordinator);
  await office.setViewportSize({ width: 1366, height: 900 });
  await office.goto(`/projects/${project!.id}/field`);
  const officeTile = office.getByTestId("uploaded-file").filter({ hasText: "roof-east.jpg" });
  await expect(officeTile.getByRole("img", { name: "Site photo: roof-east.jpg" })).toBeVisible();
  await test.info().attach("field-uploads-1366.png", { body: await office.screenshot({ fullPage: true }), contentType: "image/png" });
  await officeTile.getByRole("button", { name: "Remove roof-east.jpg" }).click();
  await office.getByRole("dialog", { name: "Remove roof-east.jpg?" }).getByRole("button", { name: "Remove", exact: true }).click();
  await expect(officeTile).toHaveCount(0);
  expect((await phone.request.get(fileUrl)).status()).toBe(404);
});
