import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { THUMBNAIL_PX } from "@/lib/field/upload-rules";
import { makeThumbnail } from "@/lib/server/services/thumbnails";

const picture = (width: number, height: number, channels: 3 | 4 = 3) =>
  sharp({ create: { width, height, channels, background: { r: 180, g: 120, b: 60, alpha: 0.5 } } });

describe("site photo thumbnails", () => {
  it("fit a landscape photo inside the square, as a JPEG", async () => {
    const out = await makeThumbnail(await picture(1200, 800).jpeg().toBuffer());
    const meta = await sharp(out).metadata();
    expect(meta).toMatchObject({ format: "jpeg", width: THUMBNAIL_PX, height: Math.round((THUMBNAIL_PX * 800) / 1200) });
  });

  it("turn a phone photo upright by its EXIF orientation and drop its metadata (camera, GPS position)", async () => {
    // Orientation 6: the camera was turned a quarter; the stored pixels are 1200 × 800, upright it is 800 × 1200.
    const turned = await picture(1200, 800).jpeg().withMetadata({ orientation: 6 }).toBuffer();
    expect((await sharp(turned).metadata()).orientation).toBe(6);
    const meta = await sharp(await makeThumbnail(turned)).metadata();
    expect([meta.width, meta.height]).toEqual([Math.round((THUMBNAIL_PX * 800) / 1200), THUMBNAIL_PX]);
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
  });

  it("never enlarge a small picture, and give a PNG with transparency a white ground", async () => {
    const meta = await sharp(await makeThumbnail(await picture(40, 30, 4).png().toBuffer())).metadata();
    expect(meta).toMatchObject({ format: "jpeg", width: 40, height: 30, hasAlpha: false });
  });

  it("refuse bytes that are not a picture and pictures with more pixels than it will decode", async () => {
    await expect(makeThumbnail(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 1, 2, 3]))).rejects.toThrow();
    // 7100 × 7100 = 50.4 million pixels, past the 50 million it decodes.
    await expect(makeThumbnail(await picture(7100, 7100).png({ compressionLevel: 1 }).toBuffer())).rejects.toThrow(/pixel limit/i);
  });
});
