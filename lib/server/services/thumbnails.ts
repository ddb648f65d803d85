import "server-only";
import sharp from "sharp";
import { THUMBNAIL_PX } from "@/lib/field/upload-rules";

// Pictures are decoded whole before they are scaled, so a huge pixel count is refused rather than
// held in memory: 50 megapixels covers phone cameras' full-resolution photos with room to spare.
const MAX_INPUT_PIXELS = 50_000_000;
// Each thumbnail is made once per request from a different photo: libvips' operation cache would only hold memory.
sharp.cache(false);

/**
 * A small JPEG of an uploaded picture, turned upright by its EXIF orientation and fitted inside a
 * THUMBNAIL_PX square; its metadata (camera, GPS position) is not carried over. Throws when the bytes
 * cannot be read as a picture or have too many pixels.
 */
export async function makeThumbnail(bytes: Uint8Array): Promise<Buffer> {
  return sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "error" })
    .rotate()
    .resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: "inside", withoutEnlargement: true })
    .flatten({ background: "#ffffff" })
    .jpeg({ quality: 72, mozjpeg: true })
    .toBuffer();
}
